package org.ferromap.dynamics;

/**
 * Radix-2 discrete Fourier transform of a real sequence, X_k = sum_j x_j exp(-2 pi i j k / N).
 * Hipparchus keeps its transforms in the hipparchus-fft module, which the build does not
 * include, so this small iterative Cooley-Tukey transform stands in; tests compare it with
 * Commons Math's FastFourierTransformer.
 */
final class RealFourier {

    private RealFourier() {
    }

    /**
     * Forward transform.
     *
     * @param x samples, a power of two in number
     * @return {re, im} arrays of length N
     */
    static double[][] forward(double[] x) {
        int n = x.length;
        if (n < 1 || Integer.bitCount(n) != 1) {
            throw new IllegalArgumentException("length " + n + " must be a power of two");
        }
        double[] re = x.clone();
        double[] im = new double[n];
        // Bit-reversal permutation.
        for (int i = 1, j = 0; i < n; i++) {
            int bit = n >> 1;
            for (; (j & bit) != 0; bit >>= 1) {
                j ^= bit;
            }
            j ^= bit;
            if (i < j) {
                double t = re[i];
                re[i] = re[j];
                re[j] = t;
            }
        }
        for (int len = 2; len <= n; len <<= 1) {
            double ang = -2 * Math.PI / len;
            int half = len >> 1;
            for (int k = 0; k < half; k++) {
                // Twiddle computed directly (not by recurrence) to keep rounding error at one ulp.
                double wr = Math.cos(ang * k);
                double wi = Math.sin(ang * k);
                for (int i = k; i < n; i += len) {
                    int j = i + half;
                    double tr = re[j] * wr - im[j] * wi;
                    double ti = re[j] * wi + im[j] * wr;
                    re[j] = re[i] - tr;
                    im[j] = im[i] - ti;
                    re[i] += tr;
                    im[i] += ti;
                }
            }
        }
        return new double[][] {re, im};
    }
}
