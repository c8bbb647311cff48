package org.ferromap.orbits;

/**
 * Dense solves and determinants for the small systems of shooting (n + 1 unknowns at most, a
 * handful in practice): Gaussian elimination with partial pivoting on row-major arrays.
 */
final class SmallLinear {

    private SmallLinear() {
    }

    /**
     * Solves a x = b in place: {@code a} (n by n row-major) is destroyed, {@code b} receives x.
     *
     * @return false when a pivot falls below 1e-14 times the largest entry of a (singular)
     */
    static boolean solve(double[] a, double[] b, int n) {
        double scale = 0;
        for (double v : a) {
            scale = Math.max(scale, Math.abs(v));
        }
        if (!(scale > 0) || !Double.isFinite(scale)) {
            return false;
        }
        for (int col = 0; col < n; col++) {
            int piv = col;
            for (int r = col + 1; r < n; r++) {
                if (Math.abs(a[r * n + col]) > Math.abs(a[piv * n + col])) {
                    piv = r;
                }
            }
            if (!(Math.abs(a[piv * n + col]) > 1e-14 * scale)) {
                return false;
            }
            if (piv != col) {
                for (int c = 0; c < n; c++) {
                    double t = a[col * n + c];
                    a[col * n + c] = a[piv * n + c];
                    a[piv * n + c] = t;
                }
                double t = b[col];
                b[col] = b[piv];
                b[piv] = t;
            }
            double d = a[col * n + col];
            for (int r = col + 1; r < n; r++) {
                double f = a[r * n + col] / d;
                if (f != 0) {
                    for (int c = col; c < n; c++) {
                        a[r * n + c] -= f * a[col * n + c];
                    }
                    b[r] -= f * b[col];
                }
            }
        }
        for (int r = n - 1; r >= 0; r--) {
            double s = b[r];
            for (int c = r + 1; c < n; c++) {
                s -= a[r * n + c] * b[c];
            }
            b[r] = s / a[r * n + r];
        }
        return true;
    }

    /** Determinant of an n by n row-major matrix (not modified). */
    static double determinant(double[] m, int n) {
        if (n == 1) {
            return m[0];
        }
        if (n == 2) {
            return m[0] * m[3] - m[1] * m[2];
        }
        double[] a = m.clone();
        double det = 1;
        for (int col = 0; col < n; col++) {
            int piv = col;
            for (int r = col + 1; r < n; r++) {
                if (Math.abs(a[r * n + col]) > Math.abs(a[piv * n + col])) {
                    piv = r;
                }
            }
            if (a[piv * n + col] == 0) {
                return 0;
            }
            if (piv != col) {
                det = -det;
                for (int c = 0; c < n; c++) {
                    double t = a[col * n + c];
                    a[col * n + c] = a[piv * n + c];
                    a[piv * n + c] = t;
                }
            }
            double d = a[col * n + col];
            det *= d;
            for (int r = col + 1; r < n; r++) {
                double f = a[r * n + col] / d;
                for (int c = col; c < n; c++) {
                    a[r * n + c] -= f * a[col * n + c];
                }
            }
        }
        return det;
    }

    /** c = a b for n by n row-major matrices. */
    static double[] multiply(double[] a, double[] b, int n) {
        double[] c = new double[n * n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int k = 0; k < n; k++) {
                    s += a[i * n + k] * b[k * n + j];
                }
                c[i * n + j] = s;
            }
        }
        return c;
    }

    static double norm(double[] v, int n) {
        double s = 0;
        for (int i = 0; i < n; i++) {
            s += v[i] * v[i];
        }
        return Math.sqrt(s);
    }
}
