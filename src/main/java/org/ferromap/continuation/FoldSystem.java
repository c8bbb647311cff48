package org.ferromap.continuation;

/**
 * The minimally augmented fold system (Govaerts): F = 0 and g = 0, where g comes from the
 * bordered system [F_x b; c^T 0] [v; g] = [0; 1] and vanishes exactly where F_x is singular.
 * With one parameter it is square (fold location); with two it is the fold curve. Its gradient is
 * g_z = -w^T F_xz v with w from the transposed bordered system; w^T F_xz v is obtained as a
 * central difference of the Jacobian along v, which also gives the quadratic normal-form
 * coefficient w^T F_xx(v, v) whose zeros are the cusps. Scaled variables; not thread-safe.
 */
final class FoldSystem implements CurveSystem {

    private final ScaledProblem problem;
    private final int n;
    private final int cols;
    private final double[] b;
    private final double[] c;
    private final double[][] bordered;
    private final DenseLu lu;
    private final double[][] jz;
    private final double[][] jPlus;
    private final double[][] jMinus;
    private final double[] v;
    private final double[] w;
    private final double[] gradient;
    private final double[] shifted;
    private final double[] cacheZ;
    private boolean cached;
    private boolean regular;
    private double g;
    private double cusp;

    FoldSystem(ScaledProblem problem) {
        this.problem = problem;
        this.n = problem.n;
        this.cols = problem.unknowns();
        this.b = new double[n];
        this.c = new double[n];
        this.bordered = new double[n + 1][n + 1];
        this.lu = new DenseLu(n + 1);
        this.jz = new double[n][cols];
        this.jPlus = new double[n][cols];
        this.jMinus = new double[n][cols];
        this.v = new double[n + 1];
        this.w = new double[n + 1];
        this.gradient = new double[cols];
        this.shifted = new double[cols];
        this.cacheZ = new double[cols];
    }

    @Override
    public int unknowns() {
        return cols;
    }

    @Override
    public int equations() {
        return n + 1;
    }

    @Override
    public void value(double[] z, double[] out) {
        problem.value(z, out);
        evaluate(z);
        out[n] = regular ? g : Double.NaN;
    }

    @Override
    public void jacobian(double[] z, double[][] out) {
        evaluate(z);
        for (int i = 0; i < n; i++) {
            System.arraycopy(jz[i], 0, out[i], 0, cols);
        }
        double[] last = out[n];
        for (int k = 0; k < cols; k++) {
            last[k] = regular ? -gradient[k] : Double.NaN;
        }
    }

    /** The quadratic normal-form coefficient w^T F_xx(v, v) at z (scaled), NaN where undefined. */
    double cuspCoefficient(double[] z) {
        evaluate(z);
        return regular ? cusp : Double.NaN;
    }

    /**
     * Chooses borders at z: starting from the guess (or fixed fallbacks when the bordered matrix
     * is singular), a few inverse iterations turn c and b into the right and left null vectors.
     *
     * @param guess approximate right null vector of F_x (length at least n), or null
     * @return false when no border made the bordered matrix regular
     */
    boolean initBorders(double[] z, double[] guess) {
        for (int attempt = 0; attempt < 3; attempt++) {
            for (int i = 0; i < n; i++) {
                double e;
                if (attempt == 0 && guess != null) {
                    e = guess[i];
                } else if (attempt <= 1) {
                    e = 1.0;
                } else {
                    // A fixed, deterministic vector with no structure, for matrices the others miss.
                    e = Math.cos(1.3 * i + 0.7);
                }
                c[i] = e;
                b[i] = e;
            }
            if (!normalize(c) || !normalize(b)) {
                continue;
            }
            boolean ok = true;
            for (int k = 0; k < 3 && ok; k++) {
                ok = updateBorders(z);
            }
            if (ok) {
                return true;
            }
        }
        return false;
    }

    /**
     * Replaces the borders by the current null-vector approximations at z: c = v/|v|, b = w/|w|.
     * Keeps orientation (c_new . v_next > 0), so the cusp coefficient keeps a continuous sign.
     */
    boolean updateBorders(double[] z) {
        cached = false;
        evaluate(z);
        if (!regular) {
            return false;
        }
        System.arraycopy(v, 0, c, 0, n);
        System.arraycopy(w, 0, b, 0, n);
        boolean ok = normalize(c) && normalize(b);
        cached = false;
        return ok;
    }

    private boolean normalize(double[] a) {
        double s = 0;
        for (int i = 0; i < n; i++) {
            s += a[i] * a[i];
        }
        s = Math.sqrt(s);
        if (!(s > 0) || !Double.isFinite(s)) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            a[i] /= s;
        }
        return true;
    }

    private void evaluate(double[] z) {
        if (cached && java.util.Arrays.equals(z, 0, cols, cacheZ, 0, cols)) {
            return;
        }
        System.arraycopy(z, 0, cacheZ, 0, cols);
        cached = true;
        regular = false;
        problem.jacobian(z, jz);
        for (int i = 0; i < n; i++) {
            System.arraycopy(jz[i], 0, bordered[i], 0, n);
            bordered[i][n] = b[i];
        }
        System.arraycopy(c, 0, bordered[n], 0, n);
        bordered[n][n] = 0;
        if (!lu.factor(bordered)) {
            return;
        }
        java.util.Arrays.fill(v, 0.0);
        v[n] = 1;
        lu.solve(v);
        g = v[n];
        java.util.Arrays.fill(w, 0.0);
        w[n] = 1;
        lu.solveTranspose(w);
        double norm = 0;
        for (int i = 0; i < n; i++) {
            norm += v[i] * v[i];
        }
        norm = Math.sqrt(norm);
        if (!(norm > 0) || !Double.isFinite(norm)) {
            return;
        }
        double h = FiniteDifferences.SECOND_STEP;
        System.arraycopy(z, 0, shifted, 0, cols);
        for (int i = 0; i < n; i++) {
            shifted[i] = z[i] + h * v[i] / norm;
        }
        problem.jacobian(shifted, jPlus);
        for (int i = 0; i < n; i++) {
            shifted[i] = z[i] - h * v[i] / norm;
        }
        problem.jacobian(shifted, jMinus);
        double factor = norm / (2 * h);
        for (int k = 0; k < cols; k++) {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s += w[i] * (jPlus[i][k] - jMinus[i][k]);
            }
            gradient[k] = s * factor;
        }
        double coefficient = 0;
        for (int k = 0; k < n; k++) {
            coefficient += gradient[k] * v[k];
        }
        cusp = coefficient;
        regular = Double.isFinite(g) && Double.isFinite(coefficient);
    }
}
