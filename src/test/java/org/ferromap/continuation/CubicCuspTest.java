package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The cubic normal form F = x^3 - q x - p. Source [der]: F = F_x = 0 gives q = 3 x^2 and
 * p = -2 x^3, i.e. the fold curve p = -+2 (q/3)^{3/2}, with its cusp at x = p = q = 0 where
 * F_xx = 6x vanishes.
 */
class CubicCuspTest {

    private static final TwoParameterProblem CUBIC = TestProblems.cubicCusp();

    @Test
    void foldCurveFollowsTheClosedFormThroughTheCusp() {
        // Find the fold on the branch at q = 3 first, as a user would.
        ContinuationSettings s = ContinuationSettings.DEFAULTS.withWindow(-5, 5);
        Branch b = new BranchTracer(s).trace(CUBIC.atFixedQ(3), new double[] {-2}, -2, Direction.INCREASING);
        SpecialPoint fold = b.specialPoints(SpecialPoint.Kind.FOLD).get(0);
        // First fold met from below: x = -1, p = 2 [der]; 1e-10 scaled, scales 2 (x) and 10 (p).
        assertEquals(-1, fold.x(0), 1e-10 * 2);
        assertEquals(2, fold.p(), 1e-10 * 10);

        FoldCurveSettings fs = FoldCurveSettings.DEFAULTS.withContinuation(s).withQWindow(-1, 3);
        FoldCurve curve = new FoldCurveTracer(fs).trace(CUBIC, fold.x(), fold.p(), 3);

        assertEquals(1, curve.cusps().size());
        SpecialPoint cusp = curve.cusps().get(0);
        assertTrue(cusp.located());
        // Cusp at the origin [der]; 1e-10 times each scale (x 1, p 10, q 4 = window width).
        assertEquals(0, cusp.x(0), 1e-10);
        assertEquals(0, cusp.p(), 1e-9);
        assertEquals(0, cusp.q(), 4e-10);
        // Every point on the closed form; 1e-9 for Newton's 1e-9 scaled updates.
        for (int k = 0; k < curve.size(); k++) {
            double x = curve.x(k, 0);
            assertEquals(3 * x * x, curve.q(k), 1e-9, "q at point " + k);
            assertEquals(-2 * x * x * x, curve.p(k), 1e-9, "p at point " + k);
        }
        // Through the cusp to the other edge: x from -1 to +1, both ends at q = 3 [der].
        assertEquals(StopReason.WINDOW_LEFT, curve.decreasingStop(), curve.decreasingDetail());
        assertEquals(-1, curve.x(curve.startIndex(), 0), 1e-9);
        assertEquals(1, curve.x(0, 0), 1e-9);
        assertEquals(-2, curve.p(0), 1e-9);
        assertEquals(3, curve.q(0), 1e-12);
        // Monotone in x along the curve: no jumping between the two fold branches.
        for (int k = 1; k < curve.size(); k++) {
            assertTrue(curve.x(k, 0) < curve.x(k - 1, 0), "x not monotone at " + k);
        }
    }

    @Test
    void foldCurveOverADecadeOfQ() {
        // The branch p = -2 (q/3)^{3/2} for x > 0 from q = 3 down to q = 0.3, no cusp inside [der].
        FoldCurveSettings fs = FoldCurveSettings.DEFAULTS.withContinuation(ContinuationSettings.DEFAULTS.withWindow(-5, 5))
                .withQWindow(0.3, 3);
        FoldCurve curve = new FoldCurveTracer(fs).trace(CUBIC, new double[] {1.02}, -1.98, 3);
        assertTrue(curve.cusps().isEmpty());
        assertEquals(StopReason.WINDOW_LEFT, curve.decreasingStop());
        assertEquals(0.3, curve.q(0), 1e-12);
        assertEquals(-2 * Math.pow(0.1, 1.5), curve.p(0), 1e-9);
        // The start was corrected onto the fold with q = 3 held: x = 1, p = -2 [der].
        assertEquals(1, curve.x(curve.startIndex(), 0), 1e-9);
        assertEquals(-2, curve.p(curve.startIndex()), 1e-9);
    }
}
