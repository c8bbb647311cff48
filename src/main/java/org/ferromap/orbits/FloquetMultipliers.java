package org.ferromap.orbits;

import java.util.Arrays;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;
import org.hipparchus.linear.MatrixUtils;

/**
 * The Floquet multipliers of a periodic orbit: the eigenvalues of its monodromy matrix, sorted by
 * decreasing modulus (a complex pair with the positive imaginary part first).
 *
 * <p>2 by 2 matrices take the closed form (trace and determinant); larger ones Hipparchus's
 * non-symmetric eigen-decomposition. The bifurcation test functions are products over the
 * multipliers, real because complex multipliers come in conjugate pairs.
 *
 * @param re real parts, dimensionless
 * @param im imaginary parts, dimensionless
 */
public record FloquetMultipliers(double[] re, double[] im) {

    public FloquetMultipliers {
        re = re.clone();
        im = im.clone();
    }

    /** The multipliers of an n by n monodromy matrix given row-major. */
    public static FloquetMultipliers of(double[] monodromy, int n) {
        if (n == 2) {
            return ofTwoByTwo(monodromy[0], monodromy[1], monodromy[2], monodromy[3]);
        }
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(monodromy, i * n, m[i], 0, n);
        }
        Complex[] ev = new EigenDecompositionNonSymmetric(MatrixUtils.createRealMatrix(m)).getEigenvalues();
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = ev[i].getReal();
            im[i] = ev[i].getImaginary();
        }
        return sorted(re, im);
    }

    /** Closed form for [[a, b], [c, d]]: mu = tr/2 +- sqrt(tr^2/4 - det). */
    public static FloquetMultipliers ofTwoByTwo(double a, double b, double c, double d) {
        double half = 0.5 * (a + d);
        double det = a * d - b * c;
        // The discriminant as ((a - d)/2)^2 + b c avoids cancellation when the multipliers are close.
        double disc = 0.25 * (a - d) * (a - d) + b * c;
        if (disc >= 0) {
            double s = Math.sqrt(disc);
            // Larger-magnitude root directly, the other from the determinant (no cancellation).
            double big = half >= 0 ? half + s : half - s;
            double small = big != 0 ? det / big : 0.0;
            return sorted(new double[] {big, small}, new double[] {0, 0});
        }
        double s = Math.sqrt(-disc);
        return new FloquetMultipliers(new double[] {half, half}, new double[] {s, -s});
    }

    /** Squares of these multipliers (the orbit's multipliers from those of the half-period map). */
    public FloquetMultipliers squared() {
        int n = re.length;
        double[] r = new double[n];
        double[] i = new double[n];
        for (int j = 0; j < n; j++) {
            r[j] = re[j] * re[j] - im[j] * im[j];
            i[j] = 2 * re[j] * im[j];
        }
        return sorted(r, i);
    }

    /** Number of multipliers. */
    public int size() {
        return re.length;
    }

    /** Modulus of multiplier j. */
    public double modulus(int j) {
        return Math.hypot(re[j], im[j]);
    }

    /** Largest modulus. */
    public double largestModulus() {
        double m = 0;
        for (int j = 0; j < re.length; j++) {
            m = Math.max(m, modulus(j));
        }
        return m;
    }

    /** Whether every multiplier lies strictly inside the unit circle. */
    public boolean stable() {
        return largestModulus() < 1.0;
    }

    /** Multipliers outside the unit circle. */
    public int unstableCount() {
        int c = 0;
        for (int j = 0; j < re.length; j++) {
            if (modulus(j) > 1.0) {
                c++;
            }
        }
        return c;
    }

    /** The multipliers as [re, im] pairs, the JSON layout of the contract. */
    public double[][] pairs() {
        double[][] out = new double[re.length][];
        for (int j = 0; j < re.length; j++) {
            out[j] = new double[] {re[j], im[j]};
        }
        return out;
    }

    /** prod (mu_j - 1) = det(M - I): changes sign when a real multiplier passes +1. */
    public double plusOneTest() {
        return realProduct(-1.0);
    }

    /** prod (mu_j + 1) = det(M + I): changes sign when a real multiplier passes -1. */
    public double minusOneTest() {
        return realProduct(1.0);
    }

    /**
     * prod over i &lt; j of (mu_i mu_j - 1): changes sign when a complex pair crosses the unit circle
     * (Neimark-Sacker). It also changes sign at a neutral saddle (two real multipliers whose
     * product passes 1), which the caller tells apart by checking for a complex pair of modulus 1
     * at the located point. Continuous in the matrix, unlike a product over complex pairs only.
     */
    public double torusTest() {
        double pr = 1.0;
        double pi = 0.0;
        for (int a = 0; a < re.length; a++) {
            for (int b = a + 1; b < re.length; b++) {
                double xr = re[a] * re[b] - im[a] * im[b] - 1.0;
                double xi = re[a] * im[b] + im[a] * re[b];
                double nr = pr * xr - pi * xi;
                pi = pr * xi + pi * xr;
                pr = nr;
            }
        }
        return pr;
    }

    /** Whether the multipliers include a complex pair (imaginary part above 1e-12 of the modulus). */
    public boolean hasComplexPair() {
        for (int j = 0; j < re.length; j++) {
            if (Math.abs(im[j]) > 1e-12 * Math.max(1e-300, modulus(j))) {
                return true;
            }
        }
        return false;
    }

    /** Largest distance between these multipliers and another set of the same size, matched in order. */
    public double distance(FloquetMultipliers other) {
        double d = 0;
        for (int j = 0; j < re.length; j++) {
            d = Math.max(d, Math.hypot(re[j] - other.re[j], im[j] - other.im[j]));
        }
        return d;
    }

    private double realProduct(double shift) {
        // The product of (mu + shift) over conjugate pairs is real: take real parts of a complex product.
        double pr = 1.0;
        double pi = 0.0;
        for (int j = 0; j < re.length; j++) {
            double a = re[j] + shift;
            double b = im[j];
            double nr = pr * a - pi * b;
            pi = pr * b + pi * a;
            pr = nr;
        }
        return pr;
    }

    private static FloquetMultipliers sorted(double[] re, double[] im) {
        int n = re.length;
        Integer[] idx = new Integer[n];
        for (int j = 0; j < n; j++) {
            idx[j] = j;
        }
        Arrays.sort(idx, (x, y) -> {
            int c = Double.compare(Math.hypot(re[y], im[y]), Math.hypot(re[x], im[x]));
            if (c != 0) {
                return c;
            }
            c = Double.compare(re[y], re[x]);
            return c != 0 ? c : Double.compare(im[y], im[x]);
        });
        double[] r = new double[n];
        double[] i = new double[n];
        for (int j = 0; j < n; j++) {
            r[j] = re[idx[j]];
            i[j] = im[idx[j]];
        }
        return new FloquetMultipliers(r, i);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof FloquetMultipliers f && Arrays.equals(re, f.re) && Arrays.equals(im, f.im);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(re) + Arrays.hashCode(im);
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("[");
        for (int j = 0; j < re.length; j++) {
            b.append(j == 0 ? "" : ", ").append(re[j]).append(im[j] >= 0 ? "+" : "").append(im[j]).append('i');
        }
        return b.append(']').toString();
    }
}
