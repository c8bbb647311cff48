package org.ferromap.continuation;

import java.util.List;

/**
 * A traced fold curve of F(x, p, q) = 0 in the (p, q) plane, joined from the runs in decreasing
 * and increasing q through the start fold, with the cusps met on the way (the curve continues
 * through them). Array accessors return copies; the indexed accessors do not copy.
 *
 * @param x states per point, units of the problem, [point][state]
 * @param p first parameter per point, units of p
 * @param q second parameter per point, units of q
 * @param arclength signed chord length from the start fold in scaled variables per point
 *     (negative on the decreasing-q side)
 * @param startIndex index of the start fold in the arrays
 * @param cusps located cusps, ordered along the curve
 * @param rejectedSteps refused steps of both runs (indices refer to the joined arrays)
 * @param increasingStop why the run that left the start with increasing q ended
 * @param increasingDetail where and why, in words
 * @param decreasingStop why the run in decreasing q ended (BRANCH_CLOSED, without a second run,
 *     when the first run closed)
 * @param decreasingDetail where and why, in words
 */
public record FoldCurve(
        double[][] x,
        double[] p,
        double[] q,
        double[] arclength,
        int startIndex,
        List<SpecialPoint> cusps,
        List<RejectedStep> rejectedSteps,
        StopReason increasingStop,
        String increasingDetail,
        StopReason decreasingStop,
        String decreasingDetail) {

    public FoldCurve {
        x = Branch.deepCopy(x);
        p = p.clone();
        q = q.clone();
        arclength = arclength.clone();
        cusps = List.copyOf(cusps);
        rejectedSteps = List.copyOf(rejectedSteps);
    }

    /** Number of points. */
    public int size() {
        return p.length;
    }

    /** State component j of point k, units of that state. */
    public double x(int k, int j) {
        return x[k][j];
    }

    /** First parameter at point k, units of p. */
    public double p(int k) {
        return p[k];
    }

    /** Second parameter at point k, units of q. */
    public double q(int k) {
        return q[k];
    }

    @Override
    public double[][] x() {
        return Branch.deepCopy(x);
    }

    @Override
    public double[] p() {
        return p.clone();
    }

    @Override
    public double[] q() {
        return q.clone();
    }

    @Override
    public double[] arclength() {
        return arclength.clone();
    }
}
