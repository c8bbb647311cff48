package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Test;

class CircuitModelTest {

    /** The peer benchmark's circuit: n = 9 with b ~ 1e-17, kV and uF values (no hand scaling). */
    private static final EquivalentCircuit PEER = SimulationBenchmark.peerCircuit(28170);

    @Test
    void scaledEquationsAreTheSiEquationsScaled() {
        // dlambda/dt = v; C dv/dt = Cs de/dt - G v - i(lambda) (DOMAIN.md §1.1) evaluated in SI and
        // compared with the per-unit right-hand side times its bases [der].
        PerUnitCircuit m = PerUnitCircuit.of(PEER.withSourceAngle(0.3));
        double lambda = 97.0;
        double v = -12000.0;
        double t = 0.0123;
        double w = PEER.omega();
        double c = PEER.totalCapacitance();
        double dedt = PEER.sourcePeak() * w * Math.cos(w * t + 0.3);
        double dvdt = (PEER.seriesCapacitance() * dedt - PEER.conductance() * v - PEER.magnetizing().current(lambda)) / c;
        double[] dz = new double[2];
        m.derivatives(w * t, new double[] {lambda / m.fluxBase(), v / m.voltageBase()}, dz);
        // 1e-12 relative: only rounding separates the two evaluations.
        assertEquals(v, dz[0] * m.fluxBase() * w, 1e-12 * Math.abs(v));
        assertEquals(dvdt, dz[1] * m.voltageBase() * w, 1e-12 * Math.abs(dvdt));
    }

    @Test
    void polynomialFastPathEqualsTheGenericCurvePath() {
        PolynomialCurve p = new PolynomialCurve(1.5e-3, 1.33e-17, 9);
        PerUnitCircuit fast = PerUnitCircuit.of(PEER);
        PerUnitCircuit generic = PerUnitCircuit.of(PEER.withMagnetizing(new Delegate(p)));
        for (double x = -2; x <= 2; x += 0.125) {
            // 1e-12 relative: the two paths differ only in rounding of the scaling products.
            assertEquals(generic.restoring(x), fast.restoring(x), 1e-12 * (1 + Math.abs(generic.restoring(x))));
            assertEquals(generic.restoringSlope(x), fast.restoringSlope(x), 1e-12 * (1 + generic.restoringSlope(x)));
        }
    }

    @Test
    void monodromyDeterminantObeysLiouville() {
        // det M(T) = exp(integral of the Jacobian's trace) = exp(-2 pi g), g = G/(w C) [der: Liouville's formula].
        PerUnitCircuit m = PerUnitCircuit.of(PEER);
        StroboscopicMap map = new StroboscopicMap(m, 1e-12, 100_000);
        double expected = Math.exp(-PerUnitCircuit.PERIOD * m.damping());
        double[] image = new double[2];
        double[] jac = new double[4];
        for (double[] z : new double[][] {{0, 0}, {1.2, -0.5}, {-0.8, 1.6}}) {
            assertEquals(DormandPrince853.Status.OK, map.apply(z, 1, image, jac));
            double det = jac[0] * jac[3] - jac[1] * jac[2];
            // 1e-8 relative: the matrix entries reach O(10-100) through saturation, integrated to 1e-12.
            assertEquals(expected, det, 1e-8 * expected, "from " + z[0] + ", " + z[1]);
        }
    }

    @Test
    void trajectoryAgreesWithGraggBulirschStoer() {
        // The same scaled ODE integrated by a different algorithm (Hipparchus's Gragg-Bulirsch-Stoer
        // extrapolation) over 5 periods from rest, through saturation: before the transient's
        // sensitivity grows (it is chaotic at this source, see the peer's tolerance study).
        PerUnitCircuit m = PerUnitCircuit.of(PEER);
        double end = 5 * PerUnitCircuit.PERIOD;
        GraggBulirschStoerIntegrator gbs = new GraggBulirschStoerIntegrator(1e-12, 1.0, 1e-13, 1e-13);
        ODEStateAndDerivative ref = gbs.integrate(m.asOde(), new ODEState(0, new double[] {0, 0}), end);
        DormandPrince853 ours = DormandPrince853.uniform(2, 1e-12, 1e-12, 1e-12, PerUnitCircuit.PERIOD);
        double[] z = {0, 0};
        assertEquals(DormandPrince853.Status.OK, ours.integrate(m::derivatives, 0, z, end, 1_000_000, null));
        // 1e-7 per unit: both run at ~1e-12 per step over a few thousand steps through saturation,
        // where errors are amplified; a wrong coefficient would show at 1e-3 or worse.
        assertEquals(ref.getPrimaryState()[0], z[0], 1e-7);
        assertEquals(ref.getPrimaryState()[1], z[1], 1e-7);
        // Hipparchus's own DOP853 with the same tolerances, for the record of equal algorithms.
        DormandPrince853Integrator hdp = new DormandPrince853Integrator(1e-12, 1.0, 1e-12, 1e-12);
        ODEStateAndDerivative hd = hdp.integrate(m.asOde(), new ODEState(0, new double[] {0, 0}), end);
        assertEquals(hd.getPrimaryState()[0], z[0], 1e-7);
    }

    @Test
    void monodromyAgreesWithHipparchusVariationalIntegration() {
        PerUnitCircuit m = PerUnitCircuit.of(PEER);
        StroboscopicMap map = new StroboscopicMap(m, 1e-12, 100_000);
        double[] image = new double[2];
        double[] jac = new double[4];
        map.apply(new double[] {1.2, -0.5}, 1, image, jac);
        GraggBulirschStoerIntegrator gbs = new GraggBulirschStoerIntegrator(1e-12, 1.0, 1e-13, 1e-13);
        ODEStateAndDerivative ref = gbs.integrate(m.asVariationalOde(),
                new ODEState(0, new double[] {1.2, -0.5, 1, 0, 0, 1}), PerUnitCircuit.PERIOD);
        double[] r = ref.getPrimaryState();
        for (int i = 0; i < 4; i++) {
            // 1e-6 relative to the matrix size: entries reach O(10) through saturation.
            assertEquals(r[2 + i], jac[i], 1e-6 * (1 + Math.abs(r[2 + i])));
        }
    }

    /** Hides the polynomial type so the generic path is taken (test only). */
    private record Delegate(SaturationCurve inner) implements SaturationCurve {
        @Override
        public double current(double f) {
            return inner.current(f);
        }

        @Override
        public double currentSlope(double f) {
            return inner.currentSlope(f);
        }

        @Override
        public double fundamentalCurrent(double a) {
            return inner.fundamentalCurrent(a);
        }

        @Override
        public double fluxLinkage(double i) {
            return inner.fluxLinkage(i);
        }

        @Override
        public List<CurvePoint> definingPoints() {
            return inner.definingPoints();
        }

        @Override
        public double airCoreInductance() {
            return inner.airCoreInductance();
        }

        @Override
        public String describe() {
            return "delegate of " + inner.describe();
        }
    }
}
