package org.ferromap.continuation;

/**
 * LU factorisation with partial pivoting of a dense square matrix, kept for repeated solves with
 * the matrix and its transpose, and for the sign and magnitude of the determinant. Written here
 * rather than taken from Hipparchus because the engine needs a relative singularity threshold
 * (Hipparchus tests raw pivots against an absolute 1e-11), transpose solves and no allocation per
 * factorisation. Not thread-safe.
 */
final class DenseLu {

    /**
     * A pivot below this fraction of the largest entry counts as zero: a few hundred ulps of
     * growth on top of round-off in an equilibrated matrix.
     */
    private static final double SINGULAR_RATIO = 1e-14;

    private final int n;
    private final double[][] lu;
    private final int[] swaps;
    private int detSign;
    private double logAbsDet;

    DenseLu(int n) {
        this.n = n;
        this.lu = new double[n][n];
        this.swaps = new int[n];
    }

    int size() {
        return n;
    }

    /**
     * Factors the leading n-by-n block of a (left untouched).
     *
     * @return false when the matrix is singular to working precision or not finite
     */
    boolean factor(double[][] a) {
        double largest = 0;
        for (int i = 0; i < n; i++) {
            double[] src = a[i];
            double[] dst = lu[i];
            for (int j = 0; j < n; j++) {
                double v = src[j];
                dst[j] = v;
                largest = Math.max(largest, Math.abs(v));
            }
        }
        if (!(largest > 0) || !Double.isFinite(largest)) {
            return false;
        }
        double threshold = SINGULAR_RATIO * largest;
        int sign = 1;
        double logDet = 0;
        for (int k = 0; k < n; k++) {
            int pivotRow = k;
            double best = Math.abs(lu[k][k]);
            for (int i = k + 1; i < n; i++) {
                double v = Math.abs(lu[i][k]);
                if (v > best) {
                    best = v;
                    pivotRow = i;
                }
            }
            if (!(best > threshold)) {
                return false;
            }
            swaps[k] = pivotRow;
            if (pivotRow != k) {
                double[] t = lu[k];
                lu[k] = lu[pivotRow];
                lu[pivotRow] = t;
                sign = -sign;
            }
            double[] rowK = lu[k];
            double pivot = rowK[k];
            if (pivot < 0) {
                sign = -sign;
            }
            logDet += Math.log(Math.abs(pivot));
            double inv = 1.0 / pivot;
            for (int i = k + 1; i < n; i++) {
                double[] rowI = lu[i];
                double l = rowI[k] * inv;
                rowI[k] = l;
                if (l != 0) {
                    for (int j = k + 1; j < n; j++) {
                        rowI[j] -= l * rowK[j];
                    }
                }
            }
        }
        detSign = sign;
        logAbsDet = logDet;
        return true;
    }

    /** Solves A x = b in place (b becomes x). */
    void solve(double[] b) {
        for (int k = 0; k < n; k++) {
            int s = swaps[k];
            if (s != k) {
                double t = b[k];
                b[k] = b[s];
                b[s] = t;
            }
        }
        for (int i = 1; i < n; i++) {
            double[] row = lu[i];
            double sum = b[i];
            for (int j = 0; j < i; j++) {
                sum -= row[j] * b[j];
            }
            b[i] = sum;
        }
        for (int i = n - 1; i >= 0; i--) {
            double[] row = lu[i];
            double sum = b[i];
            for (int j = i + 1; j < n; j++) {
                sum -= row[j] * b[j];
            }
            b[i] = sum / row[i];
        }
    }

    /** Solves A^T x = b in place (b becomes x). */
    void solveTranspose(double[] b) {
        // A = P^T L U, so A^T = U^T L^T P: forward with U^T, backward with L^T, then undo P.
        for (int i = 0; i < n; i++) {
            double sum = b[i];
            for (int j = 0; j < i; j++) {
                sum -= lu[j][i] * b[j];
            }
            b[i] = sum / lu[i][i];
        }
        for (int i = n - 1; i >= 0; i--) {
            double sum = b[i];
            for (int j = i + 1; j < n; j++) {
                sum -= lu[j][i] * b[j];
            }
            b[i] = sum;
        }
        for (int k = n - 1; k >= 0; k--) {
            int s = swaps[k];
            if (s != k) {
                double t = b[k];
                b[k] = b[s];
                b[s] = t;
            }
        }
    }

    /** Sign of the determinant of the last factored matrix: +1 or -1. */
    int determinantSign() {
        return detSign;
    }

    /** Natural logarithm of the absolute determinant of the last factored matrix. */
    double logAbsDeterminant() {
        return logAbsDet;
    }
}
