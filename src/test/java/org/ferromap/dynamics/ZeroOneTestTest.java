package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The 0-1 test on maps whose character is known [pub: G. A. Gottwald and I. Melbourne, Proc. R.
 * Soc. A 460, 2004, and SIAM J. Appl. Dyn. Syst. 8(1), 2009, use the logistic map this way].
 * Thresholds: K &gt; 0.9 for chaos and |K| &lt; 0.2 for regular series, the separation those papers
 * report for records of a few thousand points.
 */
class ZeroOneTestTest {

    private static double[] logistic(double r, int n) {
        double x = 0.3;
        for (int i = 0; i < 1000; i++) {
            x = r * x * (1 - x);
        }
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            x = r * x * (1 - x);
            s[i] = x;
        }
        return s;
    }

    @Test
    void chaoticLogisticMapGivesKNearOne() {
        double k = ZeroOneTest.k(logistic(3.97, 2000), 32);
        assertTrue(k > 0.9, "K = " + k);
    }

    @Test
    void periodicLogisticMapGivesKNearZero() {
        // r = 3.55: a stable period-8 orbit [pub: the logistic map's period-doubling cascade].
        double k = ZeroOneTest.k(logistic(3.55, 2000), 32);
        assertTrue(Math.abs(k) < 0.2, "K = " + k);
    }

    @Test
    void quasiPeriodicSeriesGivesKNearZero() {
        double[] s = new double[2000];
        for (int i = 0; i < s.length; i++) {
            s[i] = Math.cos(i * Math.sqrt(2)) + 0.5 * Math.cos(i * Math.sqrt(3));
        }
        double k = ZeroOneTest.k(s, 32);
        assertTrue(Math.abs(k) < 0.2, "K = " + k);
    }

    @Test
    void tooShortSeriesGivesNaN() {
        assertTrue(Double.isNaN(ZeroOneTest.k(new double[50], 32)));
    }
}
