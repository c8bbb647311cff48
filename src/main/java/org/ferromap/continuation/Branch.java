package org.ferromap.continuation;

import java.util.List;

/**
 * A traced branch of F(x, p) = 0: the accepted points in order, what was found on the way, and
 * why the run stopped. A run that could not start has no points and says why in
 * {@link #stopDetail()}. Array accessors return copies; the indexed accessors do not copy.
 *
 * @param x states per point, units of the problem, [point][state]
 * @param p parameter per point, units of p
 * @param arclength cumulative chord length per point in the scaled variables (dimensionless)
 * @param tangentP p-component of the unit tangent in scaled variables per point: its sign says
 *     whether p grows along the branch and changes at folds
 * @param unstableCount unstable directions per point from the stability criterion, -1 where not
 *     assessed
 * @param specialPoints located folds and branch points in the order met
 * @param rejectedSteps refused steps in the order met
 * @param stopReason why the run ended
 * @param stopDetail where and why it ended, in words with values in the problem's units
 * @param xScale per-state scale used, units of each state
 * @param pScale scale of p used, units of p
 */
public record Branch(
        double[][] x,
        double[] p,
        double[] arclength,
        double[] tangentP,
        int[] unstableCount,
        List<SpecialPoint> specialPoints,
        List<RejectedStep> rejectedSteps,
        StopReason stopReason,
        String stopDetail,
        double[] xScale,
        double pScale) {

    public Branch {
        x = deepCopy(x);
        p = p.clone();
        arclength = arclength.clone();
        tangentP = tangentP.clone();
        unstableCount = unstableCount.clone();
        specialPoints = List.copyOf(specialPoints);
        rejectedSteps = List.copyOf(rejectedSteps);
        xScale = xScale.clone();
    }

    static double[][] deepCopy(double[][] a) {
        double[][] copy = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            copy[i] = a[i].clone();
        }
        return copy;
    }

    /** Number of points. */
    public int size() {
        return p.length;
    }

    /** State component j of point k, units of that state. */
    public double x(int k, int j) {
        return x[k][j];
    }

    /** Parameter at point k, units of p. */
    public double p(int k) {
        return p[k];
    }

    /** Unstable directions at point k, -1 where not assessed. */
    public int unstableCount(int k) {
        return unstableCount[k];
    }

    /** The special points of one kind, in the order met. */
    public List<SpecialPoint> specialPoints(SpecialPoint.Kind kind) {
        return specialPoints.stream().filter(s -> s.kind() == kind).toList();
    }

    @Override
    public double[][] x() {
        return deepCopy(x);
    }

    @Override
    public double[] p() {
        return p.clone();
    }

    @Override
    public double[] arclength() {
        return arclength.clone();
    }

    @Override
    public double[] tangentP() {
        return tangentP.clone();
    }

    @Override
    public int[] unstableCount() {
        return unstableCount.clone();
    }

    @Override
    public double[] xScale() {
        return xScale.clone();
    }
}
