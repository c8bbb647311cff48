package org.ferromap.orbits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Direction;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Continuation of orbits on a circuit given in SI at distribution voltage: 34.5 kV class (rated
 * peak phase-to-neutral 28.2 kV), 50 Hz, Cs = 0.3 uF, Cg = 0.1 uF, Rc = 80 kOhm, and
 * i = 1e-3 lambda + 1e-17 lambda^9 (test numbers chosen to put the bifurcations in reach, not a
 * real transformer). No hand scaling: the source peak is continued in volts.
 */
class SiScaleCircuitTest {

    private static final double RATED_PEAK = 34_500 * Math.sqrt(2.0 / 3.0);
    private static final double OMEGA = 2 * Math.PI * 50;
    private static final double CS = 0.3e-6;
    private static final double CG = 0.1e-6;
    private static final double RC = 80e3;
    private static final PolynomialCurve CURVE = new PolynomialCurve(1e-3, 1e-17, 9);

    private static OrbitBranch symmetric;
    private static OrbitBranch asymmetric;
    private static OrbitBranch doubled;
    private static OrbitContinuation continuation;

    static EquivalentCircuit circuit(double sourcePeak) {
        return new EquivalentCircuit(OMEGA, sourcePeak, 0.0, CS, CG, RC, Double.POSITIVE_INFINITY, CURVE, null, RATED_PEAK);
    }

    @BeforeAll
    static void trace() {
        EquivalentCircuit base = circuit(0.6 * RATED_PEAK);
        double[] seed = CircuitOrbits.settledState(base, 0, 0, 300, 1e-10);
        OrbitContinuationSettings settings = OrbitContinuationSettings.DEFAULTS.withWindow(0.2 * RATED_PEAK, 3.0 * RATED_PEAK);
        continuation = new OrbitContinuation(settings);
        symmetric = CircuitOrbits.continueOrbit(base, CircuitParameter.SOURCE, seed[0], seed[1], Section.halfPeriod(),
                Direction.INCREASING, settings);
        LocatedBifurcation pitchfork = symmetric.bifurcations(BifurcationType.PITCHFORK).get(0);
        asymmetric = continuation.switchBranch(CircuitOrbits.family(base, CircuitParameter.SOURCE), pitchfork)
                .orElseThrow(() -> new AssertionError(continuation.lastFailure()));
        LocatedBifurcation pd = asymmetric.bifurcations(BifurcationType.PERIOD_DOUBLING).get(0);
        doubled = continuation.switchBranch(CircuitOrbits.family(base, CircuitParameter.SOURCE), pd)
                .orElseThrow(() -> new AssertionError(continuation.lastFailure()));
    }

    @Test
    void passesFoldsAndPeriodDoublingsInVolts() {
        List<LocatedBifurcation> folds = asymmetric.bifurcations(BifurcationType.FOLD);
        List<LocatedBifurcation> doublings = asymmetric.bifurcations(BifurcationType.PERIOD_DOUBLING);
        assertTrue(!folds.isEmpty(), "a fold on the asymmetric branch");
        assertTrue(doublings.size() >= 2, "period doublings on the asymmetric branch");
        for (LocatedBifurcation b : folds) {
            assertTrue(b.located());
            // A fold has a multiplier +1 [der]; 1e-6 leaves room for the location tolerance.
            assertEquals(1.0, b.critical()[0], 1e-6);
        }
        for (LocatedBifurcation b : doublings) {
            assertTrue(b.located());
            assertEquals(-1.0, b.critical()[0], 1e-6);
            assertTrue(b.parameter() > 1e4 && b.parameter() < 1e5, "parameter in volts: " + b.parameter());
        }
        // The symmetric branch breaks symmetry (half-period map multiplier -1) before the asymmetric orbits double.
        LocatedBifurcation pitchfork = symmetric.bifurcations(BifurcationType.PITCHFORK).get(0);
        assertEquals(-1.0, pitchfork.critical()[0], 1e-6);
        assertTrue(pitchfork.parameter() < doublings.get(0).parameter());
    }

    @Test
    void switchAtTheDoublingGivesPeriodTwoNotThePeriodOneOrbitAgain() {
        assertEquals(2, doubled.period());
        assertTrue(doubled.size() > 3, "the doubled branch was traced: " + doubled.stopDetail());
        Shooting shooting = new Shooting(ShootingSettings.DEFAULTS);
        int mid = doubled.size() / 2;
        CircuitSystem sys = CircuitSystem.of(circuit(doubled.parameter(mid)));
        Orbit o = shooting.solve(sys, doubled.states()[mid], Section.periods(2));
        assertEquals(2, o.period());
        double[] image = new double[2];
        shooting.map(2).apply(sys, o.state(), 1, image, null);
        assertTrue(Shooting.distance(image, o.state(), 2) > 1e-3, "P(z) differs from z");
    }

    @Test
    void perUnitTwinHasTheSamePitchfork() {
        // The same circuit written directly in per unit (omega = 1, C = 1, rated peak 1, curve and
        // damping scaled as in PerUnitCircuit) [der: substitution tau = omega t, x = lambda/lambda_b,
        // y = v/V_b]: its pitchfork in the forcing e must equal Cs E / (C V_b) of the SI pitchfork.
        CircuitSystem si = CircuitSystem.of(circuit(RATED_PEAK));
        double lambdaB = RATED_PEAK / OMEGA;
        double c = CS + CG;
        double scale = 1.0 / (OMEGA * c * RATED_PEAK);
        PolynomialCurve twinCurve = new PolynomialCurve(CURVE.a() * lambdaB * scale, CURVE.b() * Math.pow(lambdaB, 9) * scale, 9);
        double g = si.model().damping();
        double e0 = CS * 0.6 * RATED_PEAK / (c * RATED_PEAK);
        EquivalentCircuit twin = EquivalentCircuit.of(1.0, e0, 1.0, 0.0, twinCurve).withCoreLossResistance(1 / g).withRatedPeak(1.0);
        double[] seed = CircuitOrbits.settledState(twin, 0, 0, 300, 1e-10);
        OrbitBranch b = CircuitOrbits.continueOrbit(twin, CircuitParameter.SOURCE, seed[0], seed[1], Section.halfPeriod(),
                Direction.INCREASING, OrbitContinuationSettings.DEFAULTS.withWindow(0.1, 3.0));
        double ePitchfork = b.bifurcations(BifurcationType.PITCHFORK).get(0).parameter();
        double eFromSi = CS * symmetric.bifurcations(BifurcationType.PITCHFORK).get(0).parameter() / (c * RATED_PEAK);
        // 1e-7 relative: both are located to 1e-10 of the parameter; the models differ only in
        // rounding of their scaled coefficients and in integration error (1e-11).
        assertEquals(ePitchfork, eFromSi, 1e-7 * ePitchfork);
    }

    @Test
    void liouvilleHoldsOnEveryOrbit() {
        // Liouville [der]: trace J = -g, g = G / (omega C), so the multipliers of a period-m orbit
        // multiply to exp(-2 pi g m). 1e-8 relative: monodromy integrated at 1e-11 over one or two periods.
        double g = (1 / RC) / (OMEGA * (CS + CG));
        for (OrbitBranch b : List.of(symmetric, asymmetric, doubled)) {
            double expected = Math.exp(-2 * Math.PI * g * b.period());
            for (FloquetMultipliers mu : b.multipliers()) {
                double product = mu.re()[0] * mu.re()[1] - mu.im()[0] * mu.im()[1];
                assertEquals(expected, product, 1e-8 * expected, b.section() + " " + mu);
            }
        }
    }

    @Test
    void reportIsInSiUnits() {
        OrbitsReport r = CircuitOrbits.report(circuit(RATED_PEAK), CircuitParameter.SOURCE, List.of(symmetric, asymmetric));
        assertEquals(symmetric.size() + asymmetric.size(), r.points().size());
        OrbitPoint p = r.points().get(0);
        CircuitSystem sys = CircuitSystem.of(circuit(RATED_PEAK));
        // Flux in Wb-turn = per unit times lambda_b = V_b / omega [der].
        assertEquals(symmetric.state(0, 0) * RATED_PEAK / OMEGA, p.flux(), 1e-12 * Math.abs(p.flux()));
        assertEquals(symmetric.state(0, 1) * RATED_PEAK, p.voltage(), 1e-12 * Math.abs(p.voltage()));
        assertEquals(sys.flux(symmetric.state(0, 0)), p.flux(), 0.0);
        assertTrue(r.bifurcations().stream().anyMatch(b -> b.type().equals("pitchfork")));
        assertTrue(r.bifurcations().stream().anyMatch(b -> b.type().equals("period-doubling")));
        assertEquals("V", r.unit());
    }
}
