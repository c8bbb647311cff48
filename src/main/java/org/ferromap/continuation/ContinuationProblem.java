package org.ferromap.continuation;

/**
 * A system F(x, p) = 0 of n equations in n states and one parameter, the input of
 * {@link BranchTracer}. Implementations are plain providers: no state changes between calls, no
 * allocation expected in {@link #residual}. Units are the implementer's (SI in ferromap); the
 * engine scales internally.
 *
 * <p>The signatures match the harmonic-balance residuals of the balance package, so an adapter is
 * three delegating methods.
 */
public interface ContinuationProblem {

    /** Number of states n (and of equations). */
    int dimension();

    /**
     * Evaluates the residual.
     *
     * @param x state, length n, units of the problem
     * @param p continuation parameter, units of the problem
     * @param out receives F(x, p), length n, units of the residual
     */
    void residual(double[] x, double p, double[] out);

    /**
     * Evaluates the Jacobian. Override with an analytic Jacobian when one is available.
     *
     * <p>The default uses central differences with a step of eps^(1/3) times max(|x_j|, 1). When
     * this default is NOT overridden, {@link BranchTracer} never calls it: it differentiates the
     * residual itself in its scaled variables, which is what SI problems need (a state of 1e-7 and
     * a parameter of 1e4 get steps of their own size).
     *
     * @param x state, length n
     * @param p parameter
     * @param dFdx receives dF_i/dx_j, n by n
     * @param dFdp receives dF_i/dp, length n
     */
    default void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
        int n = dimension();
        double[] xx = x.clone();
        double[] fPlus = new double[n];
        double[] fMinus = new double[n];
        for (int j = 0; j <= n; j++) {
            double base = j < n ? x[j] : p;
            double h = FiniteDifferences.CENTRAL_STEP * Math.max(Math.abs(base), 1.0);
            double up = base + h;
            double down = base - h;
            if (j < n) {
                xx[j] = up;
                residual(xx, p, fPlus);
                xx[j] = down;
                residual(xx, p, fMinus);
                xx[j] = base;
            } else {
                residual(xx, up, fPlus);
                residual(xx, down, fMinus);
            }
            double inv = 1.0 / (up - down);
            for (int i = 0; i < n; i++) {
                double d = (fPlus[i] - fMinus[i]) * inv;
                if (j < n) {
                    dFdx[i][j] = d;
                } else {
                    dFdp[i] = d;
                }
            }
        }
    }
}
