package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.interval.ConfidenceInterval;
import org.apache.commons.math3.stat.interval.IntervalUtils;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/**
 * Confidence intervals and sample sizes against Commons Math (an independent implementation:
 * its Clopper-Pearson goes through the F distribution, ours through beta quantiles) and against
 * textbook closed forms.
 */
class BinomialIntervalTest {

    /**
     * Clopper-Pearson equals Commons Math's for every 0 &lt; k &lt; n, n up to 60 and three
     * confidence levels. Tolerance 1e-8 absolute: both invert a distribution function with an
     * iterative solver good to about 1e-9.
     */
    @Test
    void clopperPearsonEqualsCommonsMath() {
        for (double conf : new double[] {0.9, 0.95, 0.99}) {
            for (int n = 2; n <= 60; n++) {
                for (int k = 1; k < n; k++) {
                    BinomialInterval.Interval ours = BinomialInterval.of(k, n, conf, BinomialInterval.Method.CLOPPER_PEARSON);
                    ConfidenceInterval cm = IntervalUtils.getClopperPearsonInterval(n, k, conf);
                    assertEquals(cm.getLowerBound(), ours.lower(), 1e-8, "lower, n = " + n + ", k = " + k);
                    assertEquals(cm.getUpperBound(), ours.upper(), 1e-8, "upper, n = " + n + ", k = " + k);
                }
            }
        }
    }

    /**
     * A count whose k/n times n rounds below k (n = 22, k = 15): the case Hipparchus'
     * BinomialProportion gets wrong by rebuilding k from the proportion. Against Commons Math, 1e-8.
     */
    @Test
    void clopperPearsonKeepsTheCountExact() {
        ConfidenceInterval cm = IntervalUtils.getClopperPearsonInterval(22, 15, 0.95);
        BinomialInterval.Interval ours = BinomialInterval.of(15, 22, 0.95, BinomialInterval.Method.CLOPPER_PEARSON);
        assertEquals(cm.getLowerBound(), ours.lower(), 1e-8);
        assertEquals(cm.getUpperBound(), ours.upper(), 1e-8);
    }

    /**
     * No success or all successes: the exact interval is [0, 1 - (alpha/2)^(1/n)] and its mirror
     * [(alpha/2)^(1/n), 1] [pub: C. J. Clopper and E. S. Pearson, Biometrika 26(4), 1934; the x = 0
     * closed form of the beta quantile]. Commons Math 3.6.1 refuses these counts. Tolerance 1e-9:
     * a beta quantile by iteration against a closed form.
     */
    @Test
    void clopperPearsonAtTheEdgesIsTheClosedForm() {
        for (int n : new int[] {1, 5, 20, 200}) {
            double a = 0.05;
            BinomialInterval.Interval none = BinomialInterval.of(0, n, 0.95, BinomialInterval.Method.CLOPPER_PEARSON);
            assertEquals(0.0, none.lower(), 0.0);
            assertEquals(1 - Math.pow(a / 2, 1.0 / n), none.upper(), 1e-9, "n = " + n);
            BinomialInterval.Interval all = BinomialInterval.of(n, n, 0.95, BinomialInterval.Method.CLOPPER_PEARSON);
            assertEquals(Math.pow(a / 2, 1.0 / n), all.lower(), 1e-9, "n = " + n);
            assertEquals(1.0, all.upper(), 0.0);
        }
    }

    /**
     * Wilson score interval equals Commons Math's and the closed form (p + z^2/2n +- z sqrt(p(1-p)/n +
     * z^2/4n^2)) / (1 + z^2/n) [pub: E. B. Wilson, J. Am. Stat. Assoc. 22, 1927], z from Commons
     * Math's normal quantile. Tolerance 1e-12: the same closed form evaluated in three places.
     */
    @Test
    void wilsonEqualsCommonsMathAndTheClosedForm() {
        double z = new NormalDistribution(0, 1).inverseCumulativeProbability(0.975);
        for (int n : new int[] {1, 7, 30, 500}) {
            for (int k = 0; k <= n; k += Math.max(1, n / 7)) {
                BinomialInterval.Interval ours = BinomialInterval.of(k, n, 0.95, BinomialInterval.Method.WILSON);
                ConfidenceInterval cm = IntervalUtils.getWilsonScoreInterval(n, k, 0.95);
                double p = (double) k / n;
                double centre = (p + z * z / (2 * n)) / (1 + z * z / n);
                double half = z * Math.sqrt(p * (1 - p) / n + z * z / (4.0 * n * n)) / (1 + z * z / n);
                assertEquals(Math.max(0, cm.getLowerBound()), ours.lower(), 1e-12, "n = " + n + ", k = " + k);
                assertEquals(Math.min(1, cm.getUpperBound()), ours.upper(), 1e-12);
                assertEquals(Math.max(0, centre - half), ours.lower(), 1e-12);
                assertEquals(Math.min(1, centre + half), ours.upper(), 1e-12);
            }
        }
    }

    /**
     * n = z^2 p (1-p) / h^2, rounded up [pub: the normal-approximation sample size for a proportion,
     * W. G. Cochran, Sampling Techniques, 3rd ed., 1977, ch. 4 (from memory)]: the classic 385 runs
     * for +-5 points at 95 % and p = 1/2, and the formula itself at other points with z from
     * Commons Math. Exact (whole numbers).
     */
    @Test
    void runsNeededIsTheNormalApproximation() {
        assertEquals(385, BinomialInterval.runsNeeded(0.5, 0.05, 0.95));
        NormalDistribution nd = new NormalDistribution(0, 1);
        for (double conf : new double[] {0.9, 0.95, 0.99}) {
            double z = nd.inverseCumulativeProbability(1 - (1 - conf) / 2);
            assertEquals(z, BinomialInterval.z(conf), 1e-9);
            for (double p : new double[] {0.01, 0.1, 0.3, 0.5}) {
                for (double h : new double[] {0.1, 0.02, 0.005}) {
                    long expected = (long) Math.ceil(z * z * p * (1 - p) / (h * h));
                    long got = BinomialInterval.runsNeeded(p, h, conf);
                    // the formula's value may sit within rounding of a whole number: allow the neighbour then
                    double exact = z * z * p * (1 - p) / (h * h);
                    if (Math.abs(exact - Math.rint(exact)) > 1e-6) {
                        assertEquals(expected, got, "p = " + p + ", h = " + h + ", confidence " + conf);
                    }
                }
            }
        }
    }

    @Test
    void badRequestsAreRefusedWithTheirKeys() {
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> BinomialInterval.of(3, 2, 0.95, BinomialInterval.Method.WILSON)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> BinomialInterval.runsNeeded(0.5, 0, 0.95)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> BinomialInterval.z(1.0)).key());
    }
}
