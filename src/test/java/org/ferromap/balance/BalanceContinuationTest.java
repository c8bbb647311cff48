package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.StopReason;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class BalanceContinuationTest {

    private static final BalanceContinuation CONTINUATION = new BalanceContinuation();
    private static final BalanceAxis SOURCE = BalanceAxis.of(CircuitParameter.SOURCE);

    /** SI-scale circuit of the kind the studies hold: 60 Hz, 0.2 uF + 0.05 uF, 1.19 MOhm or lossless, n-th power curve near 1e-17 for n = 9. */
    static EquivalentCircuit siCircuit(int n, boolean lossy) {
        PolynomialCurve si = new PolynomialCurve(1.5e-3, 1.33e-17 * Math.pow(75.0, 9 - n), n);
        return SingleHarmonicBalanceTest.circuit(2 * Math.PI * 60, 28.17e3, 0.2e-6, 0.05e-6,
                lossy ? 1.19e6 : Double.POSITIVE_INFINITY, si);
    }

    /**
     * Folds of the source branch against the closed form of DOMAIN.md §3 [der], transcribed
     * independently in {@link SingleHarmonicBalanceTest#closedFormFolds}, n = 3..11, lossless and
     * lossy, at SI scale with no hand scaling. 1e-8 relative: the engine locates folds to 1e-10
     * in its scaled variables (scales: the window width for E, about 1.5 pu for the flux).
     */
    @ParameterizedTest
    @CsvSource({"3,false", "5,false", "7,false", "9,false", "11,false", "3,true", "5,true", "7,true", "9,true", "11,true"})
    void sourceFoldsMatchTheClosedForm(int n, boolean lossy) {
        EquivalentCircuit c = siCircuit(n, lossy);
        double[] ref = SingleHarmonicBalanceTest.closedFormFolds(c, (PolynomialCurve) c.magnetizing());
        double top = 2 * ref[0];
        // Start on the normal state at half the jump-up voltage (the study's 28.17 kV lies above it for n < 11).
        BranchResult b = CONTINUATION.branch(SOURCE, c::withSourcePeak, lossy ? 0.2 * ref[2] : 0.0, top,
                0.5 * ref[0], 1, StartState.NORMAL);
        System.out.println("n=" + n + " lossy=" + lossy + " points=" + b.points().size() + " folds=" + b.folds()
                + " stops " + b.increasingStop() + "/" + b.decreasingStop() + " " + b.increasingDetail());
        assertEquals(StopReason.WINDOW_LEFT, b.increasingStop(), b.increasingDetail());
        List<BranchResult.Special> folds = b.folds();
        if (lossy) {
            assertEquals(2, folds.size(), "folds " + folds);
            assertEquals(ref[0], folds.get(0).parameter(), 1e-8 * ref[0]);
            assertEquals(ref[1], folds.get(0).flux(), 1e-8 * ref[1]);
            assertEquals(ref[2], folds.get(1).parameter(), 1e-8 * ref[0]);
            assertEquals(ref[3], folds.get(1).flux(), 1e-8 * ref[3]);
        } else {
            // Lossless: the jump-down fold sits at E = 0, the window's edge [der]; one fold inside.
            assertEquals(1, folds.size(), "folds " + folds);
            assertEquals(ref[0], folds.get(0).parameter(), 1e-8 * ref[0]);
            assertEquals(ref[1], folds.get(0).flux(), 1e-8 * ref[1]);
        }
    }

    /**
     * Duffing single-harmonic balance, DOMAIN.md §9.2 [der; response equation as in Nayfeh and
     * Mook]: x'' + 0.1 x' + x + x^3 = F cos(w t) is the circuit C = Cs = 1 F, Cg = 0, G = 0.1 S
     * (R = 10 ohm), a = b = 1, n = 3, at w = 1.5 rad/s, with F = w Cs E. Folds at amplitude
     * 1.286287 (F = 0.193298) and 0.753451 (F = 0.631220). Tolerance half a unit of the last
     * digit given.
     */
    @Test
    void duffingFoldsThroughTheSourceAxis() {
        double w = 1.5;
        EquivalentCircuit c = SingleHarmonicBalanceTest.circuit(w, 0.1, 1, 0, 10.0, new PolynomialCurve(1, 1, 3));
        BranchResult b = CONTINUATION.branch(SOURCE, c::withSourcePeak, 0.01, 0.6, 0.1, 1, StartState.NORMAL);
        assertEquals(2, b.folds().size(), "folds " + b.folds());
        BranchResult.Special up = b.folds().get(0);
        BranchResult.Special down = b.folds().get(1);
        assertEquals(0.753451, up.flux(), 5e-7);
        assertEquals(0.631220, w * up.parameter(), 5e-7);
        assertEquals(1.286287, down.flux(), 5e-7);
        assertEquals(0.193298, w * down.parameter(), 5e-7);
        // Stability changes at the folds [der, slow flow]: stable, saddle between the folds, stable.
        for (BranchResult.Point p : b.points()) {
            boolean between = p.flux() > up.flux() * (1 + 1e-6) && p.flux() < down.flux() * (1 - 1e-6);
            boolean outside = p.flux() < up.flux() * (1 - 1e-6) || p.flux() > down.flux() * (1 + 1e-6);
            if (between) {
                assertEquals(1, p.unstableDirections(), "saddle at flux " + p.flux());
            } else if (outside) {
                assertEquals(0, p.unstableDirections(), "stable at flux " + p.flux());
            }
        }
    }

    /**
     * The Duffing cusp of DOMAIN.md §9.2 [der]: w = 1.0903455, amplitude 0.409719,
     * F = 0.0515845, found by the fold curve in the (source, frequency) plane of the same
     * circuit (frequency in Hz = w / 2 pi, F = w E). Half a unit of the last digit given.
     */
    @Test
    void duffingCuspInTheSourceFrequencyPlane() {
        EquivalentCircuit c = SingleHarmonicBalanceTest.circuit(1.5, 0.1, 1, 0, 10.0, new PolynomialCurve(1, 1, 3));
        double twoPi = 2 * Math.PI;
        FoldCurveResult r = CONTINUATION.foldCurves(SOURCE, BalanceAxis.frequency(),
                (e, f) -> c.withSourcePeak(e).withOmega(twoPi * f), 0.001, 0.6, 0.5 / twoPi, 1.5 / twoPi, 0.1, 1.5 / twoPi);
        assertEquals(1, r.cusps().size(), "cusps " + r.cusps());
        FoldCurveResult.Cusp cusp = r.cusps().get(0);
        double wc = twoPi * cusp.p2();
        assertEquals(1.0903455, wc, 5e-8);
        assertEquals(0.409719, cusp.flux(), 5e-7);
        assertEquals(0.0515845, wc * cusp.p1(), 5e-8);
    }

    /**
     * The cusp condition kappa = (2 sqrt(n)/(n-1)) delta (DOMAIN.md §3 [der]) reproduced by the
     * fold curve in the (source, series-capacitance) plane with Cg = 0: the cusp's capacitance
     * is C_min = (a + (2 sqrt(n)/(n-1)) w G)/w^2, and in the (source, core-loss-resistance)
     * plane its resistance is 1/G_min, G_min = (w^2 C - a)(n-1)/(2 sqrt(n) w). 1e-6 relative:
     * the cusp is located to 1e-10 in scaled arclength and the second parameter is stationary
     * there, so the error is set by the 1e-8 difference error of the cusp coefficient.
     */
    @ParameterizedTest
    @CsvSource({"3", "9", "11"})
    void cuspConditionFromTheFoldCurve(int n) {
        EquivalentCircuit base = siCircuit(n, true);
        PolynomialCurve pc = (PolynomialCurve) base.magnetizing();
        double w = base.omega();
        double coefficient = 2 * Math.sqrt(n) / (n - 1);
        // (source, series capacitance), no shunt capacitance.
        EquivalentCircuit c = base.withShuntCapacitance(0);
        double cMin = (pc.a() + coefficient * w * c.conductance()) / (w * w);
        double eTop = 3 * SingleHarmonicBalanceTest.closedFormFolds(c, pc)[0];
        FoldCurveResult r = CONTINUATION.foldCurves(SOURCE, BalanceAxis.of(CircuitParameter.SERIES_CAPACITANCE),
                (e, cs) -> c.withSourcePeak(e).withSeriesCapacitance(cs), 0, eTop, 0.5 * cMin, c.seriesCapacitance(),
                c.sourcePeak(), c.seriesCapacitance());
        System.out.println("n=" + n + " Cs plane: cusps " + r.cusps() + " segments " + r.segments() + " regions " + r.regions());
        assertEquals(1, r.cusps().size(), "cusps " + r.cusps());
        assertEquals(cMin, r.cusps().get(0).p2(), 1e-6 * cMin);
        checkRegions(r, (e, cs) -> c.withSourcePeak(e).withSeriesCapacitance(cs));

        // (source, core-loss resistance) with the shunt capacitance in place.
        double gMin = (w * w * base.totalCapacitance() - pc.a()) / (coefficient * w);
        double rCusp = 1 / gMin;
        FoldCurveResult rr = CONTINUATION.foldCurves(SOURCE, BalanceAxis.of(CircuitParameter.CORE_LOSS_RESISTANCE),
                (e, res) -> base.withSourcePeak(e).withCoreLossResistance(res), 0, 3 * base.sourcePeak(), 0.5 * rCusp, 20 * rCusp,
                base.sourcePeak(), base.coreLossResistance());
        System.out.println("n=" + n + " R plane: cusps " + rr.cusps() + " segments " + rr.segments() + " regions " + rr.regions());
        assertEquals(1, rr.cusps().size(), "cusps " + rr.cusps());
        assertEquals(rCusp, rr.cusps().get(0).p2(), 1e-6 * rCusp);
        checkRegions(rr, (e, res) -> base.withSourcePeak(e).withCoreLossResistance(res));
    }

    /**
     * Above the cusp (core-loss resistance from 1.5 to 10 times 1/G_min) the jump-up and
     * jump-down folds lie on two separate fold curves, both traced, and cut the window into three
     * regions: normal only below the jump-down voltage, bistable between, ferroresonant only
     * above the jump-up voltage, each checked against the closed form at its probe [der].
     */
    @Test
    void threeRegionsAboveTheCusp() {
        EquivalentCircuit base = siCircuit(9, true);
        PolynomialCurve pc = (PolynomialCurve) base.magnetizing();
        double w = base.omega();
        double rCusp = 1 / ((w * w * base.totalCapacitance() - pc.a()) / (2 * Math.sqrt(9) / 8 * w));
        CircuitPlane plane = (e, res) -> base.withSourcePeak(e).withCoreLossResistance(res);
        FoldCurveResult r = CONTINUATION.foldCurves(SOURCE, BalanceAxis.of(CircuitParameter.CORE_LOSS_RESISTANCE), plane,
                0, 2 * base.sourcePeak(), 1.5 * rCusp, 10 * rCusp, base.sourcePeak(), 3 * rCusp);
        assertTrue(r.cusps().isEmpty(), "no cusp in the window: " + r.cusps());
        assertEquals(2, r.segments().size(), "segments " + r.segments());
        assertEquals(3, r.regions().size(), "regions " + r.regions());
        checkRegions(r, plane);
        for (FoldCurveResult.Region region : r.regions()) {
            EquivalentCircuit c = plane.at(region.p1(), region.p2());
            double[] f = SingleHarmonicBalanceTest.closedFormFolds(c, pc);
            if (FoldCurveResult.FERRORESONANT_ONLY.equals(region.label())) {
                assertTrue(region.p1() > f[0], "above the jump-up fold: " + region);
            } else if (FoldCurveResult.ONE_STATE.equals(region.label())) {
                assertTrue(region.p1() < f[2], "below the jump-down fold: " + region);
            }
        }
        assertEquals(List.of(FoldCurveResult.BISTABLE, FoldCurveResult.FERRORESONANT_ONLY, FoldCurveResult.ONE_STATE),
                r.regions().stream().map(FoldCurveResult.Region::label).sorted().toList());
        // Every curve point is a fold of the closed form [der]: its source voltage is E_up or E_down of its circuit.
        for (FoldCurveResult.CurvePoint p : r.curve()) {
            double[] f = SingleHarmonicBalanceTest.closedFormFolds(plane.at(p.p1(), p.p2()), pc);
            double nearest = Math.min(Math.abs(p.p1() - f[0]), Math.abs(p.p1() - f[2]));
            assertEquals(0, nearest, 1e-7 * f[0], "point " + p);
        }
    }

    /**
     * n = 11 at SI scale (b near 1e-21, kV, uF, MOhm, no hand scaling): the source branch passes
     * both folds of the S without jumping. The fundamental flux is a single-valued, increasing
     * parameter of the single-harmonic S curve (E is an explicit function of it, DOMAIN.md §3
     * [der]), so a branch that does not jump visits the flux monotonically; every point satisfies
     * the balance equation (relative residual 1e-9: Newton's 1e-9 scaled updates, quadratic).
     * Started on the upper (ferroresonant) state it is followed the other way through the same
     * folds [der: the same closed form].
     */
    @ParameterizedTest
    @CsvSource({"NORMAL", "UPPER"})
    void elevenThPowerSCurveWithoutJumping(StartState state) {
        EquivalentCircuit c = siCircuit(11, true);
        double[] ref = SingleHarmonicBalanceTest.closedFormFolds(c, (PolynomialCurve) c.magnetizing());
        // The study's 28.17 kV lies between the folds: both states exist there.
        assertTrue(c.sourcePeak() > ref[2] && c.sourcePeak() < ref[0]);
        BranchResult b = CONTINUATION.branch(SOURCE, c::withSourcePeak, 0.5 * ref[2], 2 * ref[0], c.sourcePeak(), 1, state);
        assertEquals(StartState.UPPER == state ? ref[3] : ref[1], b.startFlux(), 0.3 * ref[1], "start state " + state);
        assertEquals(StopReason.WINDOW_LEFT, b.increasingStop(), b.increasingDetail());
        assertEquals(StopReason.WINDOW_LEFT, b.decreasingStop(), b.decreasingDetail());
        assertEquals(2, b.folds().size(), "folds " + b.folds());
        List<BranchResult.Special> byFlux = b.folds().stream().sorted((x, y) -> Double.compare(x.flux(), y.flux())).toList();
        assertEquals(ref[0], byFlux.get(0).parameter(), 1e-8 * ref[0]);
        assertEquals(ref[2], byFlux.get(1).parameter(), 1e-8 * ref[0]);
        List<BranchResult.Point> pts = b.points();
        for (int k = 1; k < pts.size(); k++) {
            assertTrue(pts.get(k).flux() > pts.get(k - 1).flux(), "flux not monotone at point " + k);
        }
        for (BranchResult.Point p : pts) {
            EquivalentCircuit at = c.withSourcePeak(p.parameter());
            assertEquals(0, SingleHarmonicBalanceTest.balanceResidual(at, p.flux()), 1e-9, "point " + p);
        }
        // Both ends on the window's edges, the upper state reached at the top.
        assertEquals(0.5 * ref[2], pts.get(0).parameter(), 1e-9 * ref[0]);
        assertEquals(2 * ref[0], pts.get(pts.size() - 1).parameter(), 1e-9 * ref[0]);
        assertTrue(pts.get(pts.size() - 1).stable() && pts.get(0).stable());
    }

    /**
     * With H harmonics the jump-up fold converges as H grows (DOMAIN.md §3 [der]: the harmonic
     * balance converges to the periodic solution): the sequence is printed, the differences
     * between successive odd orders shrink, and the last one is below 1e-4 of the fold voltage.
     * Each fold also agrees with the fold found by the balance's own multi-harmonic tracer
     * (MultiHarmonicBalance.folds, a different parametrisation and corrector) to 1e-7.
     */
    @Test
    void multiHarmonicFoldConverges() {
        EquivalentCircuit c = siCircuit(9, true);
        double[] ref = SingleHarmonicBalanceTest.closedFormFolds(c, (PolynomialCurve) c.magnetizing());
        int[] orders = {1, 3, 5, 7, 9};
        double[] fold = new double[orders.length];
        StringBuilder sequence = new StringBuilder("jump-up fold (V peak) by H:");
        for (int i = 0; i < orders.length; i++) {
            BranchResult b = CONTINUATION.branch(SOURCE, c::withSourcePeak, 0.9 * ref[0], 1.05 * ref[0], 0.95 * ref[0], orders[i],
                    StartState.NORMAL);
            assertTrue(b.folds().size() >= 1, "H = " + orders[i] + ": " + b.increasingDetail());
            fold[i] = b.folds().get(0).parameter();
            sequence.append(String.format(" H=%d %.6f", orders[i], fold[i]));
            double other = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS.withHarmonics(orders[i]))
                    .folds(new SingleHarmonicBalance()).get(0).sourcePeak();
            assertEquals(other, fold[i], 1e-7 * other, "H = " + orders[i]);
            // A saddle-node exchanges stability [der]: the normal branch is stable up to the fold,
            // the part past it has one unstable direction (slow flow for H = 1, Hill for H > 1).
            // The two points next to the fold are left out: there one exponent is near zero.
            int after = b.folds().get(0).afterIndex();
            for (int k = 0; k < b.points().size(); k++) {
                BranchResult.Point p = b.points().get(k);
                if (k < after) {
                    assertTrue(p.stable(), "H = " + orders[i] + " point " + k + " before the fold");
                } else if (k > after + 1) {
                    assertEquals(1, p.unstableDirections(), "H = " + orders[i] + " point " + k + " after the fold");
                }
            }
        }
        System.out.println(sequence);
        for (int i = 2; i < orders.length; i++) {
            assertTrue(Math.abs(fold[i] - fold[i - 1]) < Math.abs(fold[i - 1] - fold[i - 2]),
                    "differences should shrink: " + sequence);
        }
        assertTrue(Math.abs(fold[orders.length - 1] - fold[orders.length - 2]) < 1e-4 * fold[0], sequence.toString());
    }

    /**
     * Each region's label against the closed form at its probe point [der, DOMAIN.md §3]: two
     * stable states exactly when the fold pair exists (kappa &gt; (2 sqrt(n)/(n-1)) delta) and
     * E lies between the jump-down and jump-up voltages; one bistable region (the wedge).
     */
    private static void checkRegions(FoldCurveResult r, CircuitPlane plane) {
        int bistable = 0;
        for (FoldCurveResult.Region region : r.regions()) {
            EquivalentCircuit c = plane.at(region.p1(), region.p2());
            int states = closedFormStableStates(c, (PolynomialCurve) c.magnetizing());
            assertEquals(states, region.stableStates(), "region " + region);
            assertEquals(states == 2, FoldCurveResult.BISTABLE.equals(region.label()), "region " + region);
            bistable += states == 2 ? 1 : 0;
        }
        assertEquals(1, bistable, "regions " + r.regions());
    }

    /** Stable single-harmonic states of a polynomial circuit from the closed form of DOMAIN.md §3 [der]. */
    static int closedFormStableStates(EquivalentCircuit c, PolynomialCurve pc) {
        double w = c.omega();
        double kappa = w * w * c.totalCapacitance() - pc.a();
        double delta = w * c.conductance();
        int n = pc.n();
        if (!(kappa > 2 * Math.sqrt(n) / (n - 1) * delta)) {
            return 1;
        }
        double[] f = SingleHarmonicBalanceTest.closedFormFolds(c, pc);
        double eDown = delta == 0 ? 0 : f[2];
        return c.sourcePeak() > eDown && c.sourcePeak() < f[0] ? 2 : 1;
    }
}
