package org.ferromap.continuation;

/**
 * Newton's method on a curve system closed by one linear row, row . z = rhs (the pseudo-arclength
 * constraint, a fixed coordinate, a window edge), or on a square system alone. Full Newton: the
 * Jacobian is refreshed every iteration, which keeps the iteration counts that drive the step size
 * meaningful. Work arrays are reused; not thread-safe.
 */
final class Newton {

    private final CurveSystem system;
    private final int size;
    private final double[][] matrix;
    private final double[] rhsWork;
    private final DenseLu lu;
    private String failure = "";

    Newton(CurveSystem system) {
        this.system = system;
        this.size = system.unknowns();
        this.matrix = new double[size][size];
        this.rhsWork = new double[size];
        this.lu = new DenseLu(size);
    }

    /** Why the last {@link #solve} failed, for stop messages. */
    String failure() {
        return failure;
    }

    /**
     * Corrects z in place.
     *
     * @param z start guess, overwritten with the solution (or the last iterate on failure)
     * @param row coefficients of the closing linear row, or null for a square system
     * @param rhs right-hand side of the closing row
     * @param maxIterations iteration limit
     * @param tolerance largest update (max norm, scaled) that counts as converged
     * @return iterations used (at least 1), or -1 on failure
     */
    int solve(double[] z, double[] row, double rhs, int maxIterations, double tolerance) {
        int equations = system.equations();
        double previous = Double.POSITIVE_INFINITY;
        for (int it = 1; it <= maxIterations; it++) {
            system.value(z, rhsWork);
            if (row != null) {
                double s = -rhs;
                for (int j = 0; j < size; j++) {
                    s += row[j] * z[j];
                }
                rhsWork[equations] = s;
            }
            for (int i = 0; i < size; i++) {
                if (!Double.isFinite(rhsWork[i])) {
                    failure = "residual not finite at iteration " + it;
                    return -1;
                }
                rhsWork[i] = -rhsWork[i];
            }
            system.jacobian(z, matrix);
            if (row != null) {
                System.arraycopy(row, 0, matrix[equations], 0, size);
            }
            if (!lu.factor(matrix)) {
                failure = "singular or non-finite Jacobian at iteration " + it;
                return -1;
            }
            lu.solve(rhsWork);
            double norm = 0;
            for (int j = 0; j < size; j++) {
                z[j] += rhsWork[j];
                norm = Math.max(norm, Math.abs(rhsWork[j]));
            }
            if (!Double.isFinite(norm)) {
                failure = "update not finite at iteration " + it;
                return -1;
            }
            if (norm <= tolerance) {
                return it;
            }
            if (it >= 2 && norm > 2 * previous) {
                failure = "diverging at iteration " + it + " (update " + norm + " after " + previous + ")";
                return -1;
            }
            previous = norm;
        }
        failure = "no convergence in " + maxIterations + " iterations (last update " + previous + ")";
        return -1;
    }
}
