package org.ferromap.continuation;

/**
 * A located bifurcation on a branch or fold curve.
 *
 * @param kind what it is
 * @param afterIndex index of the last computed point before it on its branch or curve
 * @param x state at the point, units of the problem (a copy is returned)
 * @param p first parameter, units of p
 * @param q second parameter, units of q; NaN on one-parameter branches
 * @param located true when the location converged to the location tolerance; false means the
 *     values are the best estimate (interpolated between neighbouring points)
 */
public record SpecialPoint(Kind kind, int afterIndex, double[] x, double p, double q, boolean located) {

    /** The kinds of special point the engine reports. */
    public enum Kind {
        /** Limit point in p: the branch turns back; the Jacobian dF/dx is singular. */
        FOLD,
        /** Simple branch point: another branch crosses; [dF/dx dF/dp] loses rank. */
        BRANCH_POINT,
        /** Cusp on a fold curve: two folds meet, the quadratic normal-form coefficient vanishes. */
        CUSP
    }

    public SpecialPoint {
        x = x.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }

    /** State component j at the point, units of that state. */
    public double x(int j) {
        return x[j];
    }
}
