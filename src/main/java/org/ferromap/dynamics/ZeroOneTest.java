package org.ferromap.dynamics;

import java.util.Arrays;

/**
 * The 0-1 test for chaos, correlation method (G. A. Gottwald and I. Melbourne, "On the
 * implementation of the 0-1 test for chaos", SIAM J. Applied Dynamical Systems 8(1), 2009):
 * K near 1 for a chaotic series, near 0 for a regular one. Deterministic: the frequencies c are
 * a fixed golden-ratio sequence in (pi/5, 4 pi/5), the range the authors advise to avoid
 * resonances.
 */
public final class ZeroOneTest {

    /** Fewest samples for a meaningful K (the test needs n_cut = N/10 of at least 10). */
    public static final int MIN_SAMPLES = 100;

    private static final double GOLDEN = 0.6180339887498949;

    private ZeroOneTest() {
    }

    /**
     * The median over {@code frequencies} values of c of the correlation K_c.
     *
     * @param series an observable sampled once a period (at least {@link #MIN_SAMPLES} values)
     * @param frequencies number of c values, at least 1
     * @return K, in [-1, 1]; NaN if the series is too short or constant
     */
    public static double k(double[] series, int frequencies) {
        int n = series.length;
        if (n < MIN_SAMPLES || frequencies < 1) {
            return Double.NaN;
        }
        double mean = 0;
        for (double v : series) {
            mean += v;
        }
        mean /= n;
        int cut = n / 10;
        int terms = n - cut;
        double[] p = new double[n + 1];
        double[] q = new double[n + 1];
        double[] d = new double[cut];
        double[] kc = new double[frequencies];
        for (int m = 0; m < frequencies; m++) {
            double frac = ((m + 1) * GOLDEN) % 1.0;
            double c = Math.PI / 5 + frac * 3 * Math.PI / 5;
            for (int j = 1; j <= n; j++) {
                p[j] = p[j - 1] + series[j - 1] * Math.cos(j * c);
                q[j] = q[j - 1] + series[j - 1] * Math.sin(j * c);
            }
            for (int s = 1; s <= cut; s++) {
                double sum = 0;
                for (int j = 1; j <= terms; j++) {
                    double dp = p[j + s] - p[j];
                    double dq = q[j + s] - q[j];
                    sum += dp * dp + dq * dq;
                }
                // Subtract the oscillating term that the mean of the series adds (modified mean square displacement).
                double osc = mean * mean * (1 - Math.cos(s * c)) / (1 - Math.cos(c));
                d[s - 1] = sum / terms - osc;
            }
            kc[m] = correlationWithIndex(d);
        }
        Arrays.sort(kc);
        int nan = 0;
        for (double v : kc) {
            if (Double.isNaN(v)) {
                nan++;
            }
        }
        int valid = frequencies - nan;   // NaN sorts last
        if (valid == 0) {
            return Double.NaN;
        }
        return valid % 2 == 1 ? kc[valid / 2] : 0.5 * (kc[valid / 2 - 1] + kc[valid / 2]);
    }

    /** Pearson correlation of d against 1, 2, ..., d.length. */
    private static double correlationWithIndex(double[] d) {
        int n = d.length;
        double mx = (n + 1) / 2.0;
        double my = 0;
        for (double v : d) {
            my += v;
        }
        my /= n;
        double sxy = 0;
        double sxx = 0;
        double syy = 0;
        for (int i = 0; i < n; i++) {
            double dx = (i + 1) - mx;
            double dy = d[i] - my;
            sxy += dx * dy;
            sxx += dx * dx;
            syy += dy * dy;
        }
        if (syy <= 0) {
            return Double.NaN;
        }
        return sxy / Math.sqrt(sxx * syy);
    }
}
