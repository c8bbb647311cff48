package org.ferromap.continuation;

/**
 * A system F(x, p, q) = 0 of n equations in n states and two parameters, the input of
 * {@link FoldCurveTracer}: p is the parameter a fold is found in, q the second parameter along
 * which the fold is followed.
 */
public interface TwoParameterProblem {

    /** Number of states n (and of equations). */
    int dimension();

    /**
     * Evaluates the residual.
     *
     * @param x state, length n, units of the problem
     * @param p first parameter, units of the problem
     * @param q second parameter, units of the problem
     * @param out receives F(x, p, q), length n
     */
    void residual(double[] x, double p, double q, double[] out);

    /**
     * Evaluates the Jacobian; override with an analytic one when available. As for
     * {@link ContinuationProblem#jacobian}, the engine differentiates in its own scaled variables
     * when this default is not overridden.
     *
     * @param x state, length n
     * @param p first parameter
     * @param q second parameter
     * @param dFdx receives dF_i/dx_j, n by n
     * @param dFdp receives dF_i/dp, length n
     * @param dFdq receives dF_i/dq, length n
     */
    default void jacobian(double[] x, double p, double q, double[][] dFdx, double[] dFdp, double[] dFdq) {
        int n = dimension();
        double[] xx = x.clone();
        double[] fPlus = new double[n];
        double[] fMinus = new double[n];
        for (int j = 0; j <= n + 1; j++) {
            double base = j < n ? x[j] : (j == n ? p : q);
            double h = FiniteDifferences.CENTRAL_STEP * Math.max(Math.abs(base), 1.0);
            double up = base + h;
            double down = base - h;
            if (j < n) {
                xx[j] = up;
                residual(xx, p, q, fPlus);
                xx[j] = down;
                residual(xx, p, q, fMinus);
                xx[j] = base;
            } else if (j == n) {
                residual(xx, up, q, fPlus);
                residual(xx, down, q, fMinus);
            } else {
                residual(xx, p, up, fPlus);
                residual(xx, p, down, fMinus);
            }
            double inv = 1.0 / (up - down);
            for (int i = 0; i < n; i++) {
                double d = (fPlus[i] - fMinus[i]) * inv;
                if (j < n) {
                    dFdx[i][j] = d;
                } else if (j == n) {
                    dFdp[i] = d;
                } else {
                    dFdq[i] = d;
                }
            }
        }
    }

    /**
     * This problem with q held fixed, as a one-parameter problem in p (to trace a branch and find
     * the fold a fold curve starts from). The engine still uses this problem's analytic Jacobian
     * when it has one.
     *
     * @param q value of the second parameter, units of the problem
     */
    default ContinuationProblem atFixedQ(double q) {
        return new FixedSecondParameter(this, q);
    }
}
