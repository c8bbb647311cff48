package org.ferromap.continuation;

/** Small generic problems with closed-form branches, shared by the tests and the benchmark. */
public final class TestProblems {

    private TestProblems() {
    }

    /** The S-curve F = x^3 - x - p with an analytic Jacobian. */
    public static ContinuationProblem sCurve() {
        return new ContinuationProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double[] out) {
                out[0] = x[0] * x[0] * x[0] - x[0] - p;
            }

            @Override
            public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
                dFdx[0][0] = 3 * x[0] * x[0] - 1;
                dFdp[0] = -1;
            }
        };
    }

    /** The same S-curve with the engine's own (difference) Jacobian. */
    public static ContinuationProblem sCurveDifferenced() {
        return new ContinuationProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double[] out) {
                out[0] = x[0] * x[0] * x[0] - x[0] - p;
            }
        };
    }

    /**
     * The cubic normal form F = x^3 - q x - p: folds where 3 x^2 = q, p = -2 x^3, cusp at the origin.
     */
    public static TwoParameterProblem cubicCusp() {
        return new TwoParameterProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double q, double[] out) {
                out[0] = x[0] * x[0] * x[0] - q * x[0] - p;
            }

            @Override
            public void jacobian(double[] x, double p, double q, double[][] dFdx, double[] dFdp, double[] dFdq) {
                dFdx[0][0] = 3 * x[0] * x[0] - q;
                dFdp[0] = -1;
                dFdq[0] = -x[0];
            }
        };
    }

    /**
     * Single-harmonic balance of x'' + d x' + a x + g x^3 = F cos(w t) with x = u cos wt + v sin wt:
     * cos: (a - w^2) u + d w v + 0.75 g r^2 u - F = 0; sin: (a - w^2) v - d w u + 0.75 g r^2 v = 0,
     * r^2 = u^2 + v^2. First parameter F (force amplitude), second w (forcing frequency).
     */
    public static TwoParameterProblem duffing(double d, double a, double g) {
        return new TwoParameterProblem() {
            @Override
            public int dimension() {
                return 2;
            }

            @Override
            public void residual(double[] x, double force, double w, double[] out) {
                double u = x[0];
                double v = x[1];
                double k = a - w * w + 0.75 * g * (u * u + v * v);
                out[0] = k * u + d * w * v - force;
                out[1] = k * v - d * w * u;
            }

            @Override
            public void jacobian(double[] x, double force, double w, double[][] j, double[] dF, double[] dW) {
                double u = x[0];
                double v = x[1];
                double k = a - w * w + 0.75 * g * (u * u + v * v);
                j[0][0] = k + 1.5 * g * u * u;
                j[0][1] = d * w + 1.5 * g * u * v;
                j[1][0] = -d * w + 1.5 * g * u * v;
                j[1][1] = k + 1.5 * g * v * v;
                dF[0] = -1;
                dF[1] = 0;
                dW[0] = -2 * w * u + d * v;
                dW[1] = -2 * w * v - d * u;
            }
        };
    }

    /**
     * The 1-D Bratu problem u'' + p e^u = 0 on [0, 1], u(0) = u(1) = 0, by second differences on
     * n interior nodes (h = 1/(n+1)), with its tridiagonal Jacobian.
     */
    public static ContinuationProblem bratu(int n) {
        double h2 = 1.0 / ((n + 1.0) * (n + 1.0));
        return new ContinuationProblem() {
            @Override
            public int dimension() {
                return n;
            }

            @Override
            public void residual(double[] u, double p, double[] out) {
                for (int i = 0; i < n; i++) {
                    double left = i > 0 ? u[i - 1] : 0;
                    double right = i < n - 1 ? u[i + 1] : 0;
                    out[i] = (left - 2 * u[i] + right) / h2 + p * Math.exp(u[i]);
                }
            }

            @Override
            public void jacobian(double[] u, double p, double[][] dFdx, double[] dFdp) {
                for (int i = 0; i < n; i++) {
                    java.util.Arrays.fill(dFdx[i], 0.0);
                    double e = Math.exp(u[i]);
                    dFdx[i][i] = -2 / h2 + p * e;
                    if (i > 0) {
                        dFdx[i][i - 1] = 1 / h2;
                    }
                    if (i < n - 1) {
                        dFdx[i][i + 1] = 1 / h2;
                    }
                    dFdp[i] = e;
                }
            }
        };
    }
}
