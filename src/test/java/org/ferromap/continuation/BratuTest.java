package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The 1-D Bratu problem u'' + p e^u = 0, u(0) = u(1) = 0, discretised by second differences:
 * a problem of dimension 50 and 101. Source for the fold of the continuous problem: p* = 3.51383
 * [pub: known value, recalled from memory, not re-read]. Second differences err by O(h^2), so the
 * discrete fold converges to p* at that order as the mesh is refined.
 */
class BratuTest {

    private static final double P_STAR = 3.51383;

    private static double fold(int n) {
        ContinuationSettings s = ContinuationSettings.DEFAULTS.withWindow(0.5, 4).withMaxSteps(300);
        Branch b = new BranchTracer(s, StabilityCriterion.none()).trace(TestProblems.bratu(n), new double[n], 0.5, Direction.INCREASING);
        List<SpecialPoint> folds = b.specialPoints(SpecialPoint.Kind.FOLD);
        assertEquals(1, folds.size(), "one fold on the branch, got " + b.specialPoints() + "; " + b.stopDetail());
        assertTrue(folds.get(0).located());
        // The branch turns back and leaves the window at its lower edge on the upper solution.
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        assertTrue(b.x(b.size() - 1, n / 2) > 2, "upper solution expected at the end");
        return folds.get(0).p();
    }

    @Test
    void foldConvergesAtSecondOrder() {
        double coarse = fold(50);   // h = 1/51
        double fine = fold(101);    // h = 1/102, half the spacing
        double h = 1.0 / 51;
        // Second differences err by (h^2/12) u'''' with u'''' of order ten at the fold: 3 h^2
        // bounds the error of the coarse mesh (the order check below confirms the h^2 law).
        assertEquals(P_STAR, coarse, 3 * h * h);
        // Halving h divides an O(h^2) error by 4; +-10 % for the O(h^4) term and the six-digit reference.
        double ratio = (P_STAR - coarse) / (P_STAR - fine);
        assertEquals(4, ratio, 0.4);
        // Richardson extrapolation removes the h^2 term; what is left is O(h^4) (about 1e-6) plus the
        // rounding of the recalled reference (5e-6): 1e-5.
        assertEquals(P_STAR, (4 * fine - coarse) / 3, 1e-5);
    }
}
