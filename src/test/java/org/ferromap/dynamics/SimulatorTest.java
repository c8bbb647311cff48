package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class SimulatorTest {

    // ---------------------------------------------------------------- Ueda's chaotic case

    /**
     * x'' + 0.05 x' + x^3 = 7.5 cos t (DOMAIN.md §9.5) as the circuit: w = 1, Cs = 1, Cg = 0,
     * G = 0.05 (R = 20), i = lambda^3 (a = 0, b = 1), E = 7.5, phi = pi/2 so that
     * Cs de/dt = 7.5 cos t, rated peak 1 so per unit equals SI [der, §1.1 normalised form].
     */
    private static final EquivalentCircuit UEDA = new EquivalentCircuit(1.0, 7.5, Math.PI / 2, 1.0, 0.0, 20.0,
            Double.POSITIVE_INFINITY, new PolynomialCurve(0, 1, 3), Exactness.GIVEN, 1.0);

    @Test
    void uedaCaseIsChaoticWithTheKnownExponent() {
        SimulationResult r = Simulator.simulate(UEDA,
                SimulationSettings.defaults().withMaxPeriods(3000).withTransientPeriods(100));
        assertEquals(SteadyMode.CHAOTIC, r.mode(), r.reason());
        assertEquals(0, r.period());
        // Chaos [pub: Y. Ueda, J. Stat. Phys. 20, 1979]; exponent 0.10 +- 0.01 per unit time
        // [der, DOMAIN.md §9.5]. With w = 1 one source period is 2 pi units of time.
        double perUnitTime = r.lyapunovPerPeriod() / (2 * Math.PI);
        assertEquals(0.10, perUnitTime, 0.01);
        assertEquals(0.10 * 2 * Math.PI, r.lyapunovPerPeriod(), 0.01 * 2 * Math.PI);
        // 0-1 test near 1 for chaos [pub: Gottwald and Melbourne 2009]; 0.8 leaves room for the
        // finite record (2900 samples).
        assertTrue(r.zeroOneK() > 0.8, "K = " + r.zeroOneK());
        // Broadband: the strongest line carries less than half the spectral energy [cp].
        double total = 0;
        double[] a = r.spectrum().amplitude();
        for (int k = 1; k < a.length; k++) {
            total += a[k] * a[k];
        }
        double top = a[r.spectrum().strongestLine()];
        assertTrue(top * top < 0.5 * total, "strongest line share " + top * top / total);
    }

    // ---------------------------------------------------------------- bistability from §3

    // Cubic circuit, w = 1 rad/s, Cs = Cg = 1 F, a = 0.2, b = 1, n = 3, G = 0.05 S: kappa = 1.8,
    // delta = 0.05 > cusp value (2 sqrt 3 / 2) delta, so a fold pair exists (DOMAIN.md §3 [der]).
    private static final double A = 0.2;
    private static final double B = 1.0;
    private static final double G = 0.05;

    private static EquivalentCircuit cubic(double e) {
        return new EquivalentCircuit(1.0, e, 0.0, 1.0, 1.0, 1 / G, Double.POSITIVE_INFINITY,
                new PolynomialCurve(A, B, 3), Exactness.GIVEN, e);
    }

    /** Fold sources (jump-down, jump-up) from the closed form of DOMAIN.md §3 [der]. */
    private static double[] folds() {
        double kappa = 2 - A;
        double delta = G;
        double beta = 0.75 * B;
        double disc = Math.sqrt(25 * kappa * kappa - 16 * (kappa * kappa + delta * delta));
        double[] e = new double[2];
        double[] xs = {(5 * kappa + disc) / 8, (5 * kappa - disc) / 8};
        for (int i = 0; i < 2; i++) {
            double lam = Math.sqrt(xs[i] / beta);
            e[i] = lam * Math.hypot(xs[i] - kappa, delta);
        }
        return e;
    }

    /** Single-harmonic flux amplitudes solving the balance of DOMAIN.md §3 at source e, ascending. */
    private static double[] balanceAmplitudes(double e) {
        java.util.function.DoubleUnaryOperator f = lam -> {
            double i1 = A * lam + 0.75 * B * lam * lam * lam;
            double re = i1 - 2 * lam;
            return re * re + G * lam * G * lam - e * e;
        };
        double[] roots = new double[3];
        int found = 0;
        double step = 1e-3;
        for (double x = step; x < 5 && found < 3; x += step) {
            if (Math.signum(f.applyAsDouble(x)) != Math.signum(f.applyAsDouble(x + step))) {
                double lo = x;
                double hi = x + step;
                for (int it = 0; it < 100; it++) {
                    double mid = 0.5 * (lo + hi);
                    if (Math.signum(f.applyAsDouble(mid)) == Math.signum(f.applyAsDouble(lo))) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                roots[found++] = 0.5 * (lo + hi);
            }
        }
        assertEquals(3, found, "three crossings expected between the folds");
        return roots;
    }

    @Test
    void bistableCubicCircuitSettlesNormalOrFerroresonantByInitialState() {
        double[] fold = folds();
        assertTrue(fold[0] < fold[1]);
        double e = 0.5 * (fold[0] + fold[1]);   // between jump-down (0.077) and jump-up (1.047)
        double[] lam = balanceAmplitudes(e);

        SimulationResult normal = Simulator.simulate(cubic(e), SimulationSettings.defaults());
        assertEquals(SteadyMode.NORMAL, normal.mode(), normal.reason());
        assertTrue(normal.certified());
        assertEquals(1, normal.period());
        assertTrue(Math.abs(normal.fundamentalPhase()) < Math.PI / 2);
        // Fundamental of v against w Lambda of the lower branch: 1 %, the single-harmonic error is
        // tiny where the core is barely saturated.
        assertEquals(lam[0], normal.spectrum().amplitude()[1], 0.01 * lam[0]);

        // Started at the upper branch's flux with v = 0 (the antiphase orbit passes near there).
        SimulationResult ferro = Simulator.simulate(cubic(e),
                SimulationSettings.defaults().withInitialState(lam[2], 0.0));
        assertEquals(SteadyMode.FUNDAMENTAL, ferro.mode(), ferro.reason());
        assertTrue(ferro.certified());
        assertTrue(Math.abs(ferro.fundamentalPhase()) > Math.PI / 2, "antiphase expected");
        // 5 %: the single-harmonic balance neglects the third harmonic, a few percent for a cubic
        // in saturation (DOMAIN.md §3).
        assertEquals(lam[2], ferro.spectrum().amplitude()[1], 0.05 * lam[2]);
        assertTrue(ferro.largestMultiplierModulus() < 1);
        assertTrue(ferro.peakPerUnit() > normal.peakPerUnit());
    }

    @Test
    void certificationOffReachesTheSameVerdictByRecurrence() {
        double e = 0.5 * (folds()[0] + folds()[1]);
        SimulationResult r = Simulator.simulate(cubic(e),
                SimulationSettings.defaults().withCertify(false).withMaxPeriods(600));
        assertEquals(SteadyMode.NORMAL, r.mode(), r.reason());
        assertFalse(r.certified());
        assertEquals(600, r.periodsSimulated());
    }

    // ---------------------------------------------------------------- a subharmonic

    /**
     * Found by this code: the peer benchmark's circuit at E = 40 kV, simulated from rest, passes a
     * chaotic transient and settles at period 5 (the peer's own trajectory, integrated with other
     * steps, reaches a coexisting period-1 state instead). The start below is one stroboscopic
     * sample of that orbit, rounded; only properties are asserted.
     */
    @Test
    void periodFiveSubharmonicRepeatsAndIsStable() {
        EquivalentCircuit c = SimulationBenchmark.peerCircuit(40000);
        SimulationResult r = Simulator.simulate(c,
                SimulationSettings.defaults().withInitialState(73.977862, -36346.793));
        assertEquals(SteadyMode.SUBHARMONIC, r.mode(), r.reason());
        assertEquals(5, r.period());
        assertTrue(r.certified());
        assertTrue(r.largestMultiplierModulus() < 1);
        // The settled orbit repeats after 5 periods and not before (per unit 1e-6: Newton's
        // tolerance 1e-6 times the state size; the non-returns are O(0.1) apart).
        PerUnitCircuit m = PerUnitCircuit.of(c);
        StroboscopicMap map = new StroboscopicMap(m, 1e-11, 100_000);
        double[] z = {r.window().flux()[0] / m.fluxBase(), r.window().voltage()[0] / m.voltageBase()};
        double[] p = z.clone();
        double[] img = new double[2];
        for (int k = 1; k <= 5; k++) {
            map.apply(p, 1, img, null);
            p = img.clone();
            double d = Math.hypot(p[0] - z[0], p[1] - z[1]);
            if (k < 5) {
                assertTrue(d > 1e-2, "returned early after " + k);
            } else {
                assertEquals(0, d, 1e-5);
            }
        }
        // Lines at multiples of f0/5 = 12 Hz, and the orbit's spectrum has energy off the harmonics of 60 Hz.
        assertEquals(12.0, r.spectrum().frequency()[1], 1e-9);
        double off = 0;
        for (int k = 1; k < r.spectrum().size(); k++) {
            if (k % 5 != 0) {
                off = Math.max(off, r.spectrum().amplitude()[k]);
            }
        }
        assertTrue(off > 0.01 * r.peakVoltage(), "subharmonic content " + off);
    }

    // ---------------------------------------------------------------- failures become outcomes

    @Test
    void curveReturningNaNEndsUndetermined() {
        SaturationCurve broken = new TestCurve(f -> Math.abs(f) > 0.5 ? Double.NaN : f);
        EquivalentCircuit c = EquivalentCircuit.of(1.0, 3.0, 1.0, 0.0, broken);
        SimulationResult r = Simulator.simulate(c, SimulationSettings.defaults());
        assertEquals(SteadyMode.UNDETERMINED, r.mode());
        assertFalse(r.reason().isBlank());
        assertTrue(Double.isNaN(r.peakVoltage()));
    }

    @Test
    void curveThrowingEndsUndetermined() {
        SaturationCurve throwing = new TestCurve(f -> {
            if (Math.abs(f) > 0.5) {
                throw new IllegalStateException("outside the table");
            }
            return f;
        });
        SimulationResult r = Simulator.simulate(EquivalentCircuit.of(1.0, 3.0, 1.0, 0.0, throwing),
                SimulationSettings.defaults());
        assertEquals(SteadyMode.UNDETERMINED, r.mode());
        assertFalse(r.reason().isBlank());
    }

    @Test
    void stiffCircuitEndsUndeterminedInTheFirstPeriod() {
        // g = G/(w C) = 1e6: a decay a million times faster than the source, beyond any explicit
        // method's stability at an affordable step [der].
        EquivalentCircuit c = EquivalentCircuit.of(1.0, 1.0, 1.0, 0.0, new PolynomialCurve(1.0, 1.0, 3))
                .withCoreLossResistance(1e-6);
        SimulationResult r = Simulator.simulate(c, SimulationSettings.defaults());
        assertEquals(SteadyMode.UNDETERMINED, r.mode());
        assertEquals(0, r.periodsSimulated());
        assertFalse(r.reason().isBlank());
    }

    @Test
    void stepBudgetExhaustionEndsUndetermined() {
        SimulationResult r = Simulator.simulate(SimulationBenchmark.peerCircuit(28170),
                SimulationSettings.defaults().withMaxStepsPerPeriod(10));
        assertEquals(SteadyMode.UNDETERMINED, r.mode());
        assertFalse(r.reason().isBlank());
    }

    @Test
    void invalidSettingsAreInputErrors() {
        FerromapException e = org.junit.jupiter.api.Assertions.assertThrows(FerromapException.class,
                () -> SimulationSettings.defaults().withSpectrumPeriods(48));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
        e = org.junit.jupiter.api.Assertions.assertThrows(FerromapException.class,
                () -> SimulationSettings.defaults().withTransientPeriods(5000));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
    }

    /** A test-local odd curve built from a current function (slope by central difference). */
    private record TestCurve(java.util.function.DoubleUnaryOperator i) implements SaturationCurve {
        @Override
        public double current(double f) {
            return i.applyAsDouble(f);
        }

        @Override
        public double currentSlope(double f) {
            return (i.applyAsDouble(f + 1e-6) - i.applyAsDouble(f - 1e-6)) / 2e-6;
        }

        @Override
        public double fundamentalCurrent(double a) {
            return a;
        }

        @Override
        public double fluxLinkage(double c) {
            return c;
        }

        @Override
        public List<CurvePoint> definingPoints() {
            return List.of(new CurvePoint(0.5, 0.5));
        }

        @Override
        public double airCoreInductance() {
            return 1.0;
        }

        @Override
        public String describe() {
            return "test curve";
        }
    }
}
