package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The S-curve F = x^3 - x - p. Source [der, calculus]: F_x = 3x^2 - 1 vanishes at x = -+1/sqrt(3),
 * where p = x^3 - x = +-2/(3 sqrt 3); p = x^3 - x is a graph over x, so a branch that does not
 * jump visits x monotonically; as an ODE x' = F the outer parts (F_x > 0) are unstable.
 */
class SCurveTest {

    private static final double X_FOLD = 1 / Math.sqrt(3);
    private static final double P_FOLD = 2 / (3 * Math.sqrt(3));
    /** Root of x^3 - x - 2 = 0 (Cardano), the branch's end on the window edge p = 2 [der]. */
    private static final double X_END = Math.cbrt(1 + Math.sqrt(1 - 1 / 27.0)) + Math.cbrt(1 - Math.sqrt(1 - 1 / 27.0));

    private static final ContinuationSettings SETTINGS = ContinuationSettings.DEFAULTS.withWindow(-2, 2);

    @ParameterizedTest
    @ValueSource(booleans = {true, false})
    void passesBothFoldsFromTheLowerBranch(boolean analytic) {
        ContinuationProblem problem = analytic ? TestProblems.sCurve() : TestProblems.sCurveDifferenced();
        Branch b = new BranchTracer(SETTINGS).trace(problem, new double[] {-1.5}, -1.875, Direction.INCREASING);

        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        List<SpecialPoint> folds = b.specialPoints(SpecialPoint.Kind.FOLD);
        assertEquals(2, folds.size(), "two folds expected, got " + b.specialPoints());
        assertTrue(b.specialPoints(SpecialPoint.Kind.BRANCH_POINT).isEmpty(), "no branch point on the S-curve");
        // Located to 1e-10 in scaled variables (the requirement); scales here: x 1.5, p 4 (window width).
        double xTol = 1e-10 * b.xScale()[0];
        double pTol = 1e-10 * b.pScale();
        assertTrue(folds.get(0).located() && folds.get(1).located());
        assertEquals(-X_FOLD, folds.get(0).x(0), xTol);
        assertEquals(P_FOLD, folds.get(0).p(), pTol);
        assertEquals(X_FOLD, folds.get(1).x(0), xTol);
        assertEquals(-P_FOLD, folds.get(1).p(), pTol);

        // No jump: x grows monotonically along the branch and every point is on the curve
        // (residual within 1e-8: Newton stops at updates of 1e-9 scaled, then converges quadratically).
        for (int k = 1; k < b.size(); k++) {
            assertTrue(b.x(k, 0) > b.x(k - 1, 0), "x not monotone at point " + k);
            double x = b.x(k, 0);
            assertEquals(0, x * x * x - x - b.p(k), 1e-8);
        }
        // The run ends on the window edge p = 2 (edge point solved with p fixed; 1e-12 is round-off).
        assertEquals(2.0, b.p(b.size() - 1), 1e-12);
        assertEquals(X_END, b.x(b.size() - 1, 0), 1e-8);
        // The fold indices bracket the folds.
        assertTrue(b.x(folds.get(0).afterIndex(), 0) < -X_FOLD && b.x(folds.get(0).afterIndex() + 1, 0) > -X_FOLD);
    }

    @Test
    void passesBothFoldsFromTheUpperBranch() {
        Branch b = new BranchTracer(SETTINGS).trace(TestProblems.sCurve(), new double[] {1.5}, 1.875, Direction.DECREASING);
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        List<SpecialPoint> folds = b.specialPoints(SpecialPoint.Kind.FOLD);
        assertEquals(2, folds.size());
        assertEquals(X_FOLD, folds.get(0).x(0), 1e-10 * b.xScale()[0]);
        assertEquals(-P_FOLD, folds.get(0).p(), 1e-10 * b.pScale());
        assertEquals(-X_FOLD, folds.get(1).x(0), 1e-10 * b.xScale()[0]);
        assertEquals(P_FOLD, folds.get(1).p(), 1e-10 * b.pScale());
        for (int k = 1; k < b.size(); k++) {
            assertTrue(b.x(k, 0) < b.x(k - 1, 0), "x not monotone at point " + k);
        }
        assertEquals(-2.0, b.p(b.size() - 1), 1e-12);
        assertEquals(-X_END, b.x(b.size() - 1, 0), 1e-8);
    }

    @Test
    void steadyStateStabilityChangesAtTheFolds() {
        Branch b = new BranchTracer(SETTINGS).trace(TestProblems.sCurve(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        // [der] x' = x^3 - x - p: the one eigenvalue is 3x^2 - 1.
        for (int k = 0; k < b.size(); k++) {
            double slope = 3 * b.x(k, 0) * b.x(k, 0) - 1;
            if (Math.abs(slope) > 1e-6) {
                assertEquals(slope > 0 ? 1 : 0, b.unstableCount(k), "point " + k + " x = " + b.x(k, 0));
            }
        }
        // The tangent's p-component changes sign exactly twice (at the folds).
        double[] tp = b.tangentP();
        int changes = 0;
        for (int k = 1; k < tp.length; k++) {
            if (tp[k] * tp[k - 1] < 0) {
                changes++;
            }
        }
        assertEquals(2, changes);
    }

    @Test
    void siScaledCurveNeedsNoHandScaling() {
        // x in fake units of 1e4, p of 1e-7, residual of 1e-3: F = 1e-3 ((X/1e4)^3 - X/1e4 - P/1e-7).
        ContinuationProblem si = new ContinuationProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double[] out) {
                double xs = x[0] / 1e4;
                out[0] = 1e-3 * (xs * xs * xs - xs - p / 1e-7);
            }
        };
        ContinuationSettings s = ContinuationSettings.DEFAULTS.withWindow(-2e-7, 2e-7);
        Branch b = new BranchTracer(s).trace(si, new double[] {-1.5e4}, -1.875e-7, Direction.INCREASING);
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        List<SpecialPoint> folds = b.specialPoints(SpecialPoint.Kind.FOLD);
        assertEquals(2, folds.size());
        // Same closed form in the fake units [der]; tolerance 1e-10 scaled as above.
        assertEquals(-1e4 * X_FOLD, folds.get(0).x(0), 1e-10 * b.xScale()[0]);
        assertEquals(1e-7 * P_FOLD, folds.get(0).p(), 1e-10 * b.pScale());
        assertEquals(1e4 * X_FOLD, folds.get(1).x(0), 1e-10 * b.xScale()[0]);
        assertEquals(-1e-7 * P_FOLD, folds.get(1).p(), 1e-10 * b.pScale());
        assertEquals(1e4 * X_END, b.x(b.size() - 1, 0), 1e-8 * 1e4);
    }
}
