package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Single-harmonic balance of the Duffing oscillator x'' + d x' + a x + g x^3 = F cos(w t),
 * d = 0.1, a = g = 1, in the two-state form (u, v) of TestProblems.duffing.
 *
 * <p>Sources: DOMAIN.md §9.2 [der; response equation as in Nayfeh and Mook, Nonlinear
 * Oscillations, 1979] for the published digits; the closed forms below [der, here]: with
 * U = 0.75 g A^2 and k = a - w^2 the response is F^2 = A^2 ((k + U)^2 + (d w)^2), its folds in F
 * are the roots of 3 U^2 + 4 k U + k^2 + (d w)^2 = 0, and the cusp is where that quadratic has a
 * double root: w^2 - a = sqrt(3) d w, U = -2k/3.
 */
class DuffingTest {

    private static final double D = 0.1;
    private static final double A = 1;
    private static final double G = 1;
    private static final TwoParameterProblem DUFFING = TestProblems.duffing(D, A, G);
    /** Unit state scale: the run starts at small amplitude but the folds lie near amplitude 1. */
    private static final ContinuationSettings SETTINGS = ContinuationSettings.DEFAULTS
            .withWindow(0, 1).withScales(new double[] {1, 1}, Double.NaN);

    /** Closed-form folds at frequency w: {amplitude, force} for the upper (sign +1) or lower root. */
    private static double[] closedFormFold(double w, int sign) {
        double k = A - w * w;
        double u = (-4 * k + sign * Math.sqrt(16 * k * k - 12 * (k * k + D * D * w * w))) / 6;
        double amp = Math.sqrt(u / (0.75 * G));
        return new double[] {amp, amp * Math.sqrt((k + u) * (k + u) + D * D * w * w)};
    }

    private static double amplitude(double[] x) {
        return Math.hypot(x[0], x[1]);
    }

    private Branch branchAt15() {
        return new BranchTracer(SETTINGS).trace(DUFFING.atFixedQ(1.5), new double[] {-0.04, 0}, 0.05, Direction.INCREASING);
    }

    @Test
    void foldsInForceAtFrequency15() {
        Branch b = branchAt15();
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        List<SpecialPoint> folds = b.specialPoints(SpecialPoint.Kind.FOLD);
        assertEquals(2, folds.size(), "folds: " + b.specialPoints());
        SpecialPoint jumpUp = folds.get(0);
        SpecialPoint jumpDown = folds.get(1);
        // DOMAIN.md §9.2 digits; tolerance half a unit of the last published digit.
        assertEquals(0.753451, amplitude(jumpUp.x()), 5e-7);
        assertEquals(0.631220, jumpUp.p(), 5e-7);
        assertEquals(1.286287, amplitude(jumpDown.x()), 5e-7);
        assertEquals(0.193298, jumpDown.p(), 5e-7);
        // Closed form [der]; 1e-9: location converges to 1e-10 in scaled variables (scales 1).
        double[] lower = closedFormFold(1.5, -1);
        double[] upper = closedFormFold(1.5, 1);
        assertEquals(lower[0], amplitude(jumpUp.x()), 1e-9);
        assertEquals(lower[1], jumpUp.p(), 1e-9);
        assertEquals(upper[0], amplitude(jumpDown.x()), 1e-9);
        assertEquals(upper[1], jumpDown.p(), 1e-9);
    }

    @Test
    void foldCurveInForceAndFrequencyPassesTheCusp() {
        SpecialPoint start = branchAt15().specialPoints(SpecialPoint.Kind.FOLD).get(0);
        FoldCurveSettings fs = FoldCurveSettings.DEFAULTS.withContinuation(SETTINGS.withWindow(0, 2)).withQWindow(0.5, 1.5);
        FoldCurve curve = new FoldCurveTracer(fs).trace(DUFFING, start.x(), start.p(), 1.5);

        assertEquals(1, curve.cusps().size(), "cusps: " + curve.cusps());
        SpecialPoint cusp = curve.cusps().get(0);
        assertTrue(cusp.located());
        // DOMAIN.md §9.2 digits, half a unit of the last digit (plus 1e-9 of location error).
        assertEquals(1.0903455, cusp.q(), 5e-8 + 1e-9);
        assertEquals(0.409719, amplitude(cusp.x()), 5e-7 + 1e-9);
        assertEquals(0.0515845, cusp.p(), 5e-8 + 1e-9);
        // Closed form [der]. The frequency and force are stationary along the curve at a cusp, so
        // they meet the location tolerance squared; the amplitude moves at order one: 1e-9 covers
        // the 1e-10 location tolerance and the 1e-8 difference error of the cusp coefficient.
        double wc = (Math.sqrt(3) * D + Math.sqrt(3 * D * D + 4 * A)) / 2;
        double kc = A - wc * wc;
        double uc = -2 * kc / 3;
        double ampC = Math.sqrt(uc / (0.75 * G));
        double forceC = ampC * Math.sqrt((kc + uc) * (kc + uc) + D * D * wc * wc);
        assertEquals(wc, cusp.q(), 1e-9);
        assertEquals(forceC, cusp.p(), 1e-9);
        assertEquals(ampC, amplitude(cusp.x()), 1e-8);

        // Through the cusp: the curve comes back to w = 1.5 on the other fold [der closed form].
        assertEquals(StopReason.WINDOW_LEFT, curve.decreasingStop(), curve.decreasingDetail());
        double[] upper = closedFormFold(1.5, 1);
        assertEquals(1.5, curve.q(0), 1e-12);
        assertEquals(upper[1], curve.p(0), 1e-9);
        assertEquals(upper[0], amplitude(curve.x()[0]), 1e-9);
        double[] lower = closedFormFold(1.5, -1);
        int s = curve.startIndex();
        assertEquals(lower[1], curve.p(s), 1e-9);

        // Every point is a fold: 3U^2 + 4kU + k^2 + (dw)^2 = 0 [der]; 1e-8 for Newton's 1e-9 steps.
        for (int k = 0; k < curve.size(); k++) {
            double w = curve.q(k);
            double kk = A - w * w;
            double[] x = curve.x()[k];
            double u = 0.75 * G * (x[0] * x[0] + x[1] * x[1]);
            assertEquals(0, 3 * u * u + 4 * kk * u + kk * kk + D * D * w * w, 1e-8, "point " + k);
            assertTrue(w >= wc - 1e-9, "no fold below the cusp frequency");
        }
        // Points on both sides of the cusp: w falls towards it along the upper folds and rises
        // after it along the lower folds (its projection turns back in the (F, w) plane).
        int after = cusp.afterIndex();
        assertTrue(after > 0 && after < curve.size() - 1);
        for (int k = 1; k < curve.size(); k++) {
            if (k <= after) {
                assertTrue(curve.q(k) < curve.q(k - 1), "w should fall before the cusp at " + k);
            } else if (k > after + 1) {
                assertTrue(curve.q(k) > curve.q(k - 1), "w should rise after the cusp at " + k);
            }
        }
    }
}
