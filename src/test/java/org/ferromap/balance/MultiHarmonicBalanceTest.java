package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.LinearCurve;
import org.ferromap.equipment.SaturationCurve;
import org.junit.jupiter.api.Test;

class MultiHarmonicBalanceTest {

    private static final SingleHarmonicBalance SHB = new SingleHarmonicBalance();

    /** Duffing case of DOMAIN.md §9.2 as a circuit (C = 1, G = 0.1, a = b = 1, w = 1.5, Cs = 1), source inside the window. */
    static EquivalentCircuit duffing(double sourcePeak) {
        return SingleHarmonicBalanceTest.circuit(1.5, sourcePeak, 1, 0, 10.0, new PolynomialCurve(1, 1, 3));
    }

    /**
     * With H = 1 and alias-free sampling the AFT projection of i(A cos t) is exactly the
     * describing function I1(A) (DOMAIN.md §3 [der]), so the multi-harmonic balance must
     * reproduce the single-harmonic points and folds: 1e-12 relative (Newton to round-off on
     * both sides; the folds via two different parametrisations of the same function: 1e-9).
     */
    @Test
    void oneHarmonicReproducesTheSingleHarmonicBalance() {
        EquivalentCircuit base = SingleHarmonicBalanceTest.siExample();
        List<Fold> sh = SHB.folds(base);
        EquivalentCircuit inside = base.withSourcePeak(Math.sqrt(sh.get(0).sourcePeak() * sh.get(1).sourcePeak()))
                .withSourceAngle(0.3);
        for (boolean odd : new boolean[] {true, false}) {
            MultiHarmonicBalance mhb = new MultiHarmonicBalance(inside, HarmonicSettings.DEFAULTS.withHarmonics(1).withOddOnly(odd));
            List<OperatingPoint> pts = SHB.operatingPoints(inside);
            assertEquals(3, pts.size());
            for (OperatingPoint op : pts) {
                PeriodicSolution s = mhb.solve(mhb.seed(op));
                assertEquals(op.flux(), s.fundamentalFlux(), 1e-12 * op.flux());
                assertEquals(op.flux(), s.peakFlux(), 1e-12 * op.flux());
                // The seed is already the solution: its phase came from the single-harmonic point.
                double[] x0 = mhb.seed(op);
                double[] x = s.perUnit();
                for (int k = 0; k < x.length; k++) {
                    assertEquals(x0[k], x[k], 1e-11 * Math.abs(x0[mhb.basis().cosIndex(1)]) + 1e-11 * Math.abs(x0[mhb.basis().sinIndex(1)]));
                }
            }
            List<Fold> mh = mhb.folds(SHB);
            assertEquals(2, mh.size());
            for (int k = 0; k < 2; k++) {
                assertEquals(sh.get(k).sourcePeak(), mh.get(k).sourcePeak(), 1e-9 * sh.get(0).sourcePeak());
                assertEquals(sh.get(k).flux(), mh.get(k).flux(), 1e-9 * sh.get(k).flux());
                assertEquals(sh.get(k).direction(), mh.get(k).direction());
            }
        }
    }

    /**
     * Analytic AFT Jacobian and dF/dp against central finite differences [cp: derivative check],
     * at a random non-symmetric coefficient vector with all harmonics and the constant, for every
     * standard parameter, for a polynomial and a smooth non-polynomial curve. Step 1e-6 per unit:
     * truncation ~1e-12, round-off ~1e-10 relative to the entries; tolerance 1e-6 of the largest
     * entry of the column.
     */
    @Test
    void jacobianMatchesFiniteDifferences() {
        Random rnd = new Random(20240611L);
        List<EquivalentCircuit> circuits = List.of(
                SingleHarmonicBalanceTest.siExample().withLoadResistance(5e5).withSourceAngle(0.7),
                SingleHarmonicBalanceTest.circuit(2 * Math.PI * 50, 10e3, 0.4e-6, 0.1e-6, 2e6,
                        new ArctanKneeCurve(400.0, 0.4, 1.2 * 10e3 / (2 * Math.PI * 50))).withLoadResistance(3e5));
        for (EquivalentCircuit c : circuits) {
            HarmonicBasis b = new HarmonicBasis(5, false, 97);
            for (CircuitParameter par : List.of(CircuitParameter.SOURCE, CircuitParameter.SERIES_CAPACITANCE,
                    CircuitParameter.SHUNT_CAPACITANCE, CircuitParameter.CORE_LOSS_RESISTANCE, CircuitParameter.LOAD_RESISTANCE)) {
                MultiHarmonicResidual r = new MultiHarmonicResidual(c, par, b);
                int d = r.dimension();
                double[] x = new double[d];
                for (int k = 0; k < d; k++) {
                    x[k] = (rnd.nextDouble() - 0.5) * (k < 3 ? 1.6 : 0.2);
                }
                double p = 1.1 * par.valueOf(c);
                double[][] j = new double[d][d];
                double[] jp = new double[d];
                r.jacobian(x, p, j, jp);
                double[] fp = new double[d];
                double[] fm = new double[d];
                double h = 1e-6;
                for (int col = 0; col < d; col++) {
                    double[] xp = x.clone();
                    double[] xm = x.clone();
                    xp[col] += h;
                    xm[col] -= h;
                    r.residual(xp, p, fp);
                    r.residual(xm, p, fm);
                    double scale = 0;
                    for (int row = 0; row < d; row++) {
                        scale = Math.max(scale, Math.abs(j[row][col]));
                    }
                    for (int row = 0; row < d; row++) {
                        assertEquals((fp[row] - fm[row]) / (2 * h), j[row][col], 1e-6 * scale, "column " + col + " row " + row);
                    }
                }
                double hp = 1e-6 * p;
                r.residual(x, p + hp, fp);
                r.residual(x, p - hp, fm);
                double scale = 0;
                for (double v : jp) {
                    scale = Math.max(scale, Math.abs(v));
                }
                assertTrue(scale > 0, par.name());
                for (int row = 0; row < d; row++) {
                    assertEquals((fp[row] - fm[row]) / (2 * hp), jp[row], 1e-6 * scale, par.name() + " row " + row);
                }
            }
        }
    }

    /**
     * A linear magnetizing branch makes the balance exact with one harmonic [cp, phasor circuit
     * theory]: Lambda = Cs w E e^{j phi} / (1/L - w^2 C + j w G), higher harmonics zero, even with
     * H = 7 and the constant term kept. 1e-13 relative: one linear solve.
     */
    @Test
    void linearBranchGivesThePhasorSolution() {
        double w = 2 * Math.PI * 60;
        double l = 12.0;
        EquivalentCircuit c = SingleHarmonicBalanceTest.circuit(w, 10e3, 0.3e-6, 0.2e-6, 4e5, new LinearCurve(l)).withSourceAngle(-0.4);
        MultiHarmonicBalance mhb = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS.withHarmonics(7).withOddOnly(false).withSamples(64));
        PeriodicSolution s = mhb.solve(new double[mhb.basis().dimension()]);
        double re = 1 / l - w * w * c.totalCapacitance();
        double im = w * c.conductance();
        double f = c.seriesCapacitance() * w * c.sourcePeak();
        double fr = f * Math.cos(c.sourceAngle());
        double fi = f * Math.sin(c.sourceAngle());
        double den = re * re + im * im;
        double lr = (fr * re + fi * im) / den;
        double li = (fi * re - fr * im) / den;
        double[] coef = s.fluxCoefficients();
        double amp = Math.hypot(lr, li);
        assertEquals(lr, coef[mhb.basis().cosIndex(1)], 1e-13 * amp);
        assertEquals(-li, coef[mhb.basis().sinIndex(1)], 1e-13 * amp);
        for (int k = 0; k < coef.length; k++) {
            if (k != mhb.basis().cosIndex(1) && k != mhb.basis().sinIndex(1)) {
                assertEquals(0.0, coef[k], 1e-13 * amp);
            }
        }
        assertEquals(amp, s.peakFlux(), 1e-12 * amp);
        assertEquals(w * amp, s.peakVoltage(), 1e-12 * w * amp);
    }

    /**
     * A multi-harmonic solution must be a periodic orbit of the circuit ODE (DOMAIN.md §1.1):
     * integrating one period from its state with Commons Math's Dormand-Prince 8(5,3) (an
     * independent integrator, tolerance 1e-13) must reproduce the harmonic-balance waveform.
     * Duffing circuit, upper (ferroresonant) point, H = 25: the neglected harmonics are below
     * 1e-12 of the fundamental there, so 1e-9 of the peak flux bounds both errors comfortably.
     */
    @Test
    void solutionIsAPeriodicOrbitOfTheOde() {
        EquivalentCircuit c = duffing(0.3 / 1.5).withSourceAngle(0.2);
        MultiHarmonicBalance mhb = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS.withHarmonics(25));
        List<OperatingPoint> pts = SHB.operatingPoints(c);
        assertEquals(3, pts.size());
        PeriodicSolution s = mhb.solve(mhb.seed(pts.get(2)));
        double[] x = s.fluxCoefficients();
        HarmonicBasis b = mhb.basis();
        double w = c.omega();
        double[] state = {b.evaluate(x, 0, 0), w * b.evaluate(x, 0, 1)};
        DormandPrince853Integrator ode = new DormandPrince853Integrator(1e-10, 1, 1e-13, 1e-13);
        double period = 2 * Math.PI / w;
        for (int q = 1; q <= 4; q++) {
            double[] y = state.clone();
            ode.integrate(odeOf(c), 0, state.clone(), q * period / 4, y);
            double tau = w * q * period / 4;
            assertEquals(b.evaluate(x, tau, 0), y[0], 1e-9 * s.peakFlux());
            assertEquals(w * b.evaluate(x, tau, 1), y[1], 1e-9 * s.peakVoltage());
        }
    }

    /**
     * Hill's method on the damped linear oscillator u'' + c u' + p0 u = 0 (DOMAIN.md §9.4 [der]:
     * the monodromy is exp(A T) exactly): exponents -c/2 +- i sqrt(p0 - c^2/4), multipliers
     * exp(2 pi sigma). 1e-12: the Hill matrix is block diagonal here, one small eigenproblem.
     */
    @Test
    void hillOnTheDampedLinearOscillator() {
        double c = 0.3;
        double p0 = 2.7;
        double[] samples = new double[81];
        java.util.Arrays.fill(samples, p0);
        FloquetExponents fe = HillStability.exponents(1.0, c, samples, 10, 1.0);
        double nu = Math.sqrt(p0 - c * c / 4);
        double mod = Math.exp(-Math.PI * c);
        double[][] expected = {{mod * Math.cos(2 * Math.PI * nu), mod * Math.sin(2 * Math.PI * nu)},
            {mod * Math.cos(2 * Math.PI * nu), -mod * Math.sin(2 * Math.PI * nu)}};
        assertMultipliers(expected, fe, 1e-12);
        assertEquals(-c / 2, fe.real()[0], 1e-12);
        assertEquals(-c / 2, fe.real()[1], 1e-12);
        assertTrue(fe.stable());
        assertEquals(0.0, fe.liouvilleMismatch(), 1e-12);
    }

    /**
     * Mathieu x'' + (a - 2q cos 2t) x = 0, q = 1: the stability boundaries a1 = 1.859108072514
     * (multiplier -1 over pi) and b2 = 3.917024773 (multiplier +1) [pub: Abramowitz and Stegun,
     * ch. 20 tables; DOMAIN.md §9.3], located by bisection on "some exponent has a positive real
     * part" from Hill's method. 1e-8: bisection to 1e-11 and a converged truncation (K = 12;
     * K = 5 was seen to misplace b2, K = 10 and 20 agree to 1e-12).
     */
    @Test
    void hillFindsMathieuBoundaries() {
        assertEquals(1.859108072514, mathieuBoundary(1.5, 2.5), 1e-8);   // unstable below, stable above
        assertEquals(3.917024773, mathieuBoundary(3.5, 4.1), 1e-8);     // stable below, unstable above
    }

    private static double mathieuBoundary(double lo, double hi) {
        boolean loUnstable = mathieuUnstable(lo);
        assertTrue(loUnstable != mathieuUnstable(hi));
        while (hi - lo > 1e-11) {
            double mid = 0.5 * (lo + hi);
            if (mathieuUnstable(mid) == loUnstable) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    private static boolean mathieuUnstable(double a) {
        int n = 161;
        double[] p = new double[n];
        for (int j = 0; j < n; j++) {
            p[j] = a - 2 * Math.cos(2 * (2 * Math.PI * j / n));
        }
        FloquetExponents fe = HillStability.exponents(1.0, 0.0, p, 12, 1.0);
        return Math.max(fe.real()[0], fe.real()[1]) > 1e-6;
    }

    /**
     * Hill multipliers of circuit orbits against the monodromy matrix from finite differences of
     * Commons Math Dormand-Prince integrations over one period (independent integrator; central
     * differences with a 1e-6 relative step, so ~1e-7 accuracy): Duffing circuit inside the
     * window, all three steady states; stable, saddle, stable as the slow flow says (DOMAIN.md §3).
     * Tolerance 1e-5 on the multipliers. The waveform-monodromy fallback is held to the same.
     */
    @Test
    void hillMultipliersMatchMonodromy() {
        EquivalentCircuit c = duffing(0.3 / 1.5);
        MultiHarmonicBalance mhb = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS.withHarmonics(15).withHillHarmonics(12));
        List<MultiHarmonicBalance.SteadyState> states = mhb.operatingPoints(SHB);
        assertEquals(3, states.size());
        boolean[] stable = {true, false, true};
        for (int i = 0; i < 3; i++) {
            MultiHarmonicBalance.SteadyState st = states.get(i);
            double[] m = monodromy(c, st.solution(), mhb.basis());
            double tr = m[0] + m[3];
            double det = m[0] * m[3] - m[1] * m[2];
            double disc = tr * tr / 4 - det;
            double[][] mu = disc >= 0
                    ? new double[][] {{tr / 2 + Math.sqrt(disc), 0}, {tr / 2 - Math.sqrt(disc), 0}}
                    : new double[][] {{tr / 2, Math.sqrt(-disc)}, {tr / 2, -Math.sqrt(-disc)}};
            assertMultipliers(mu, st.stability(), 1e-5);
            assertTrue(st.stability().truncation() > 0, "Hill's method itself was used");
            double lb = c.ratedPeak() / c.omega();
            double ib = c.omega() * c.totalCapacitance() * c.ratedPeak();
            double[] x = st.solution().perUnit();
            FloquetExponents direct = WaveformMonodromy.exponents(1.0, c.conductance() / (c.omega() * c.totalCapacitance()),
                    tau -> c.magnetizing().currentSlope(lb * mhb.basis().evaluate(x, tau, 0)) * lb / ib, c.omega());
            assertMultipliers(mu, direct, 1e-5);
            assertEquals(stable[i], direct.stable());
            assertEquals(stable[i], st.stability().stable());
            assertEquals(stable[i], st.seed().stable());
            assertTrue(st.stability().liouvilleMismatch() < 1e-9);
        }
    }

    /**
     * The jump-up fold of the SI-scale n = 9 example as H grows: a sequence that must settle
     * (successive changes shrink), the single-harmonic value being its first term. Printed for
     * the record. DOMAIN.md §3: single-harmonic folds are off by a few percent.
     */
    @Test
    void foldConvergesAsHarmonicsGrow() {
        EquivalentCircuit c = SingleHarmonicBalanceTest.siExample();
        List<Double> up = new ArrayList<>();
        List<Double> down = new ArrayList<>();
        for (int h = 1; h <= 15; h += 2) {
            List<Fold> f = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS.withHarmonics(h)).folds(SHB);
            assertEquals(2, f.size(), "H = " + h);
            up.add(f.get(0).sourcePeak());
            down.add(f.get(1).sourcePeak());
        }
        System.out.println("jump-up fold source peak (V) for H = 1, 3, ..., 15: " + up);
        System.out.println("jump-down fold source peak (V) for H = 1, 3, ..., 15: " + down);
        for (List<Double> seq : List.of(up, down)) {
            double last = Double.POSITIVE_INFINITY;
            for (int k = 2; k < seq.size(); k++) {
                double diff = Math.abs(seq.get(k) - seq.get(k - 1));
                assertTrue(diff < Math.abs(seq.get(1) - seq.get(0)), "change at step " + k + " not below the first");
                if (k >= 3) {
                    assertTrue(diff <= last * 1.0000001 || diff < 1e-9 * seq.get(k), "changes must shrink: " + seq);
                }
                last = diff;
            }
            double rel = Math.abs(seq.get(0) - seq.get(seq.size() - 1)) / seq.get(seq.size() - 1);
            assertTrue(rel < 0.2, "single-harmonic fold within 20 % of the converged one, was " + rel);
        }
    }

    /**
     * A smooth non-polynomial curve: the solver oversamples until the residual on twice the
     * samples is within tolerance, and the result is a periodic orbit of the ODE (Commons Math
     * integration as above). This knee is sharp (Lu/Lair = 1000) and the harmonics fall off
     * slowly, so the tolerance is the truncation estimate of common practice [cp]: ten times the
     * sum of the retained harmonics in the top quarter (k-weighted for the voltage); a wrong
     * solution misses by orders of magnitude more.
     */
    @Test
    void smoothCurveIsOversampledAndPeriodic() {
        double w = 2 * Math.PI * 50;
        EquivalentCircuit base = SingleHarmonicBalanceTest.circuit(w, 10e3, 0.4e-6, 0.1e-6, 2e6,
                new ArctanKneeCurve(400.0, 0.4, 1.2 * 10e3 / w));
        List<Fold> f = SHB.folds(base);
        EquivalentCircuit c = base.withSourcePeak(0.5 * (f.get(0).sourcePeak() + f.get(1).sourcePeak()));
        MultiHarmonicBalance mhb = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS.withHarmonics(63));
        OperatingPoint top = SHB.operatingPoints(c).get(2);
        PeriodicSolution s = mhb.solve(mhb.seed(top));
        MultiHarmonicResidual fine = new MultiHarmonicResidual(c, CircuitParameter.SOURCE, mhb.basis().withSamples(4 * s.samples()));
        double[] r = new double[fine.dimension()];
        fine.residual(s.perUnit(), c.sourcePeak(), r);
        assertTrue(DenseNewton.maxAbs(r) < 10 * HarmonicSettings.DEFAULTS.tolerance() * fine.scale(s.perUnit(), c.sourcePeak()));
        double[] x = s.fluxCoefficients();
        HarmonicBasis b = mhb.basis();
        double[] state = {b.evaluate(x, 0, 0), w * b.evaluate(x, 0, 1)};
        double[] y = state.clone();
        new DormandPrince853Integrator(1e-12, 1, 1e-13, 1e-13).integrate(odeOf(c), 0, state.clone(), 2 * Math.PI / w, y);
        double tailFlux = 0;
        double tailVoltage = 0;
        for (int q = 0; q < x.length; q++) {
            int k = b.harmonicOf(q);
            if (4 * k > 3 * b.harmonics()) {
                tailFlux += Math.abs(x[q]);
                tailVoltage += w * k * Math.abs(x[q]);
            }
        }
        System.out.println("smooth knee, H = 63: orbit return error " + Math.abs(state[0] - y[0]) + " Wb-turn, "
                + Math.abs(state[1] - y[1]) + " V; tail estimates " + tailFlux + ", " + tailVoltage + "; samples " + s.samples());
        assertTrue(tailVoltage < 1e-3 * s.peakVoltage(), "the test needs a converging series");
        assertEquals(state[0], y[0], 10 * tailFlux);
        assertEquals(state[1], y[1], 10 * tailVoltage);
        assertFalse(Double.isNaN(s.peakVoltage()));
    }

    // ------------------------------------------------------------------------------------------

    /** The circuit ODE of DOMAIN.md §1.1, SI: lambda' = v, C v' = Cs w E cos(w t + phi) - G v - i(lambda). */
    static FirstOrderDifferentialEquations odeOf(EquivalentCircuit c) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                double w = c.omega();
                dy[0] = y[1];
                dy[1] = (c.seriesCapacitance() * w * c.sourcePeak() * Math.cos(w * t + c.sourceAngle())
                        - c.conductance() * y[1] - c.magnetizing().current(y[0])) / c.totalCapacitance();
            }
        };
    }

    /** Monodromy (row-major 2x2) by central differences of one-period integrations. */
    private static double[] monodromy(EquivalentCircuit c, PeriodicSolution s, HarmonicBasis b) {
        double w = c.omega();
        double[] x = s.fluxCoefficients();
        double[] z0 = {b.evaluate(x, 0, 0), w * b.evaluate(x, 0, 1)};
        double[] scale = {s.peakFlux(), s.peakVoltage()};
        DormandPrince853Integrator ode = new DormandPrince853Integrator(1e-10, 1, 1e-13, 1e-13);
        double period = 2 * Math.PI / w;
        double[] m = new double[4];
        for (int col = 0; col < 2; col++) {
            double h = 1e-6 * scale[col];
            double[] zp = z0.clone();
            double[] zm = z0.clone();
            zp[col] += h;
            zm[col] -= h;
            double[] yp = new double[2];
            double[] ym = new double[2];
            ode.integrate(odeOf(c), 0, zp, period, yp);
            ode.integrate(odeOf(c), 0, zm, period, ym);
            for (int row = 0; row < 2; row++) {
                m[2 * row + col] = (yp[row] - ym[row]) / (2 * h);
            }
        }
        return m;
    }

    private static void assertMultipliers(double[][] expected, FloquetExponents fe, double tol) {
        double[] mr = fe.multiplierReal();
        double[] mi = fe.multiplierImaginary();
        double straight = Math.hypot(mr[0] - expected[0][0], mi[0] - expected[0][1]) + Math.hypot(mr[1] - expected[1][0], mi[1] - expected[1][1]);
        double crossed = Math.hypot(mr[0] - expected[1][0], mi[0] - expected[1][1]) + Math.hypot(mr[1] - expected[0][0], mi[1] - expected[0][1]);
        assertTrue(Math.min(straight, crossed) < 2 * tol,
                "multipliers " + java.util.Arrays.toString(mr) + " + i " + java.util.Arrays.toString(mi)
                        + " vs " + java.util.Arrays.deepToString(expected));
    }

}
