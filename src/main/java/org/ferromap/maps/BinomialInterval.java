package org.ferromap.maps;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.distribution.continuous.BetaDistribution;
import org.hipparchus.distribution.continuous.NormalDistribution;
import org.hipparchus.stat.interval.BinomialProportion;
import org.hipparchus.stat.interval.ConfidenceInterval;

/**
 * Confidence intervals for a proportion k/n and the sample size for a wanted precision.
 *
 * <ul>
 *   <li>Clopper-Pearson ("exact"): lower = B^-1(alpha/2; k, n-k+1), upper = B^-1(1-alpha/2; k+1,
 *   n-k), with B^-1 the quantile of the beta distribution, lower = 0 when k = 0 and upper = 1 when
 *   k = n [pub: C. J. Clopper and E. S. Pearson, Biometrika 26(4), 1934; the beta form as in
 *   standard texts]. Computed here from Hipparchus' beta quantiles: Hipparchus' own
 *   {@code BinomialProportion.getClopperPearsonInterval} takes k/n as a double and rebuilds k by
 *   truncation, which loses one success whenever k/n * n rounds below k (n = 22, k = 15), and it
 *   refuses k = 0 and k = n.</li>
 *   <li>Wilson score: Hipparchus' {@link BinomialProportion#getWilsonScoreInterval} (it uses k/n as a
 *   proportion, which is exact enough).</li>
 *   <li>Runs needed for a half-width h: n = z^2 p (1 - p) / h^2, z the two-sided normal quantile
 *   [pub: the normal-approximation sample size for a proportion, e.g. W. G. Cochran, Sampling
 *   Techniques, 3rd ed., Wiley 1977, ch. 4 (from memory)].</li>
 * </ul>
 */
public final class BinomialInterval {

    private BinomialInterval() {
    }

    /** The interval methods offered. */
    public enum Method {
        CLOPPER_PEARSON("clopper-pearson"),
        WILSON("wilson");

        private final String label;

        Method(String label) {
            this.label = label;
        }

        /** The name used on the command line and in studies. */
        public String label() {
            return label;
        }

        /** By label, or null. */
        public static Method of(String label) {
            for (Method m : values()) {
                if (m.label.equals(label)) {
                    return m;
                }
            }
            return null;
        }
    }

    /**
     * A two-sided confidence interval.
     *
     * @param lower      lower bound of the proportion
     * @param upper      upper bound
     * @param confidence confidence level, e.g. 0.95
     * @param method     how it was computed
     */
    public record Interval(double lower, double upper, double confidence, String method) {
        /** Half the width, (upper - lower) / 2. */
        public double halfWidth() {
            return 0.5 * (upper - lower);
        }
    }

    /** The interval for k successes in n trials at a confidence level in (0, 1). */
    public static Interval of(int k, int n, double confidence, Method method) {
        check(k, n, confidence);
        if (method == Method.WILSON) {
            ConfidenceInterval ci = BinomialProportion.getWilsonScoreInterval(n, (double) k / n, confidence);
            return new Interval(Math.max(0, ci.getLowerBound()), Math.min(1, ci.getUpperBound()), confidence, method.label());
        }
        double a = (1 - confidence) / 2;
        double lo = k == 0 ? 0.0 : new BetaDistribution(k, n - k + 1.0).inverseCumulativeProbability(a);
        double hi = k == n ? 1.0 : new BetaDistribution(k + 1.0, n - k).inverseCumulativeProbability(1 - a);
        return new Interval(lo, hi, confidence, method.label());
    }

    /** The two-sided standard-normal quantile z for a confidence level: Phi^-1(1 - (1 - confidence)/2). */
    public static double z(double confidence) {
        if (!(confidence > 0 && confidence < 1)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "confidence = " + confidence + " is not allowed; expected between 0 and 1");
        }
        return new NormalDistribution(0, 1).inverseCumulativeProbability(1 - (1 - confidence) / 2);
    }

    /**
     * Runs needed so that the normal-approximation half-width is at most h: ceil(z^2 p (1-p) / h^2),
     * at least 1.
     *
     * @param p          the planning proportion in [0, 1]
     * @param halfWidth  h in (0, 0.5]
     * @param confidence confidence level
     */
    public static long runsNeeded(double p, double halfWidth, double confidence) {
        if (!(p >= 0 && p <= 1)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "planning proportion = " + p + " is not allowed; expected 0 to 1");
        }
        if (!(halfWidth > 0 && halfWidth <= 0.5)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "precision (half-width) = " + halfWidth
                    + " is not allowed; expected above 0 and at most 0.5 (0.05 means +-5 points of probability)");
        }
        double z = z(confidence);
        return Math.max(1, (long) Math.ceil(z * z * p * (1 - p) / (halfWidth * halfWidth) - 1e-9));
    }

    private static void check(int k, int n, double confidence) {
        if (n < 1 || k < 0 || k > n) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, k + " successes in " + n + " trials is not allowed; expected 0 <= k <= n, n >= 1");
        }
        if (!(confidence > 0 && confidence < 1)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "confidence = " + confidence + " is not allowed; expected between 0 and 1");
        }
    }
}
