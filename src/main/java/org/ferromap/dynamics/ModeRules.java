package org.ferromap.dynamics;

/**
 * The classification rules of DOMAIN.md §6 applied to a recorded run, shared by the single-phase
 * {@link Simulator} and the three-phase {@link NetworkClassifier} so that both call a state by the
 * same rules. Each rule reads plain recorded data (stroboscopic samples in per unit, indicator
 * figures) and knows nothing of the circuit that produced it.
 *
 * <ul>
 * <li>{@link #recurrence}: the least p at which the stroboscopic samples repeat, over the last
 * periods, to a relative tolerance.</li>
 * <li>{@link #periodOne}: a state periodic at the source period is <b>fundamental</b>
 * ferroresonance when its fundamental is in antiphase with its loop source (the terminal branch
 * is net inductive: the capacitive side of the LC balance, DOMAIN.md §3) or its peak exceeds the
 * threshold; otherwise <b>normal</b>.</li>
 * <li>{@link #notPeriodic}: chaotic, quasi-periodic or undetermined from the largest Lyapunov
 * exponent (when computed), the 0-1 test K, and, when no exponent is available, the spectrum's
 * line share and whether the samples are still contracting.</li>
 * </ul>
 * Stateless.
 */
public final class ModeRules {

    /**
     * Share of the AC power that the strongest lines of a Hann-windowed spectrum must hold for a
     * line spectrum (quasi-periodic rather than broadband) when no Lyapunov exponent is available.
     * A sum of a few sinusoids puts all but leakage (well under 1 %) into its main lobes;
     * 0.95 leaves room for many weak combination lines. Common practice, no source.
     */
    public static final double LINE_SHARE_MIN = 0.95;

    /** Peaks of the spectrum counted as lines by {@link #lineShare}. */
    public static final int LINES_COUNTED = 16;

    /** Half-width in bins of a line's main lobe under the Hann window (its main lobe spans 4 bins). */
    private static final int LOBE = 2;

    /**
     * Ratio of the late to the early recurrence distance below which the samples are still closing
     * in on a periodic state (a factor 2 between the start and the end of the record is far beyond
     * the jitter of a quasi-periodic or chaotic record's medians). A modelling choice, no source.
     */
    public static final double CONTRACTION_RATIO = 0.5;

    private ModeRules() {
    }

    /**
     * How the stroboscopic samples repeat.
     *
     * @param period least p &gt;= 1 with recurrence within the tolerance; 0 when none
     * @param residual the worst relative distance |z_j - z_{j-p}| / (1 + |z_j|) over the span for
     *        that p; when no p recurs, the smallest such worst distance over the orders tried
     *        (NaN when too few samples)
     * @param closest the order p that gave {@code residual}
     */
    public record Recurrence(int period, double residual, int closest) {

        /** Whether a period was found. */
        public boolean periodic() {
            return period > 0;
        }
    }

    /**
     * The least p in 1..maxOrder at which the samples repeat: over the last {@code span} samples,
     * |z_j - z_{j-p}| &lt;= tolerance (1 + |z_j|), the norm over all components (per unit).
     *
     * @param samples [component][k] stroboscopic samples in per unit, k = 0 the start
     * @param from first sample index that may be used (end of the transient)
     * @param newest index of the newest sample
     * @param maxOrder largest p tried
     * @param tolerance relative closeness
     * @param span samples checked at the end
     * @return the recurrence; period 0 and residual NaN when newest - from &lt; span + maxOrder
     */
    public static Recurrence recurrence(double[][] samples, int from, int newest, int maxOrder, double tolerance,
            int span) {
        return recurrence(samples, from, newest, maxOrder, tolerance, span, 0.0);
    }

    /**
     * As {@link #recurrence(double[][], int, int, int, double, int)}, and a p &gt; 1 counts only
     * when no smaller order comes within {@code distinct} (relative, like the tolerance): the p
     * points of a subharmonic are distinct, while a trajectory still settling onto a state of
     * lower period can, for a while, repeat better after p periods than after one (a decaying
     * transient whose own frequency is close to a multiple of f0/p). Then no period is returned,
     * and {@code closest} names the smaller order.
     *
     * @param distinct smallest relative distance at every order below p for p to count; 0 turns the check off
     */
    public static Recurrence recurrence(double[][] samples, int from, int newest, int maxOrder, double tolerance,
            int span, double distinct) {
        if (newest - from < span + maxOrder) {
            return new Recurrence(0, Double.NaN, 0);
        }
        double best = Double.POSITIVE_INFINITY;
        int bestP = 0;
        for (int p = 1; p <= maxOrder; p++) {
            double worst = 0;
            for (int j = newest - span + 1; j <= newest; j++) {
                worst = Math.max(worst, distance(samples, j, j - p) / (1 + norm(samples, j)));
            }
            if (worst <= tolerance) {
                if (best < distinct) {
                    return new Recurrence(0, best, bestP);
                }
                return new Recurrence(p, worst, p);
            }
            if (worst < best) {
                best = worst;
                bestP = p;
            }
        }
        return new Recurrence(0, best, bestP);
    }

    /**
     * Whether the samples are still closing in on a state of period p: the median distance
     * |z_j - z_{j-p}| over the last quarter of the samples after {@code from} is below
     * {@link #CONTRACTION_RATIO} times that over the first quarter. A quasi-periodic or chaotic
     * record keeps its distances from start to end (medians over a quarter of a record of a hundred
     * or more samples hardly move); a decaying transient loses them. False when a quarter holds
     * fewer than {@code minimum} samples.
     */
    public static boolean contracting(double[][] samples, int from, int newest, int p, int minimum) {
        int quarter = (newest - from + 1 - p) / 4;
        if (p < 1 || quarter < Math.max(1, minimum)) {
            return false;
        }
        double[] late = new double[quarter];
        double[] early = new double[quarter];
        for (int i = 0; i < quarter; i++) {
            int j = newest - i;
            late[i] = distance(samples, j, j - p);
            int k = from + p + i;
            early[i] = distance(samples, k, k - p);
        }
        return median(late) < CONTRACTION_RATIO * median(early);
    }

    /** A mode with the sentence that says how it was decided. */
    public record Verdict(SteadyMode mode, String reason) { }

    /**
     * Normal or fundamental for a state periodic at the source period.
     *
     * @param phase phase of the fundamental relative to the loop source, rad in (-pi, pi]
     * @param peakPerUnit peak over the settled window, per unit
     * @param peakThreshold peak above which the state is ferroresonant whatever its phase, per unit
     */
    public static Verdict periodOne(double phase, double peakPerUnit, double peakThreshold) {
        return periodOne(phase, peakPerUnit, peakThreshold, false);
    }

    /**
     * As {@link #periodOne(double, double, double)}, knowing whether the unsaturated loop already
     * puts the terminal in antiphase with the source (v/e = w^2 Cs / (w^2 C - a) &lt; 0 when the
     * magnetizing slope a exceeds w^2 C). Then the phase tells nothing and only the peak threshold
     * separates normal from ferroresonant.
     */
    public static Verdict periodOne(double phase, double peakPerUnit, double peakThreshold, boolean antiphaseWhenLinear) {
        boolean antiphase = Math.abs(phase) > Math.PI / 2 && !antiphaseWhenLinear;
        boolean high = peakPerUnit > peakThreshold;
        if (antiphase) {
            return new Verdict(SteadyMode.FUNDAMENTAL,
                    "fundamental-frequency state in antiphase with the source (capacitive branch)");
        }
        if (high) {
            return new Verdict(SteadyMode.FUNDAMENTAL,
                    "fundamental-frequency state in phase with the source but above the peak threshold");
        }
        return new Verdict(SteadyMode.NORMAL, "fundamental-frequency state in phase with the source, below the peak threshold");
    }

    /**
     * Indicators of a state that did not repeat.
     *
     * @param lyapunov largest Lyapunov exponent per source period, NaN when not computed
     * @param zeroOneK K of the 0-1 test, NaN when too few samples
     * @param lineShare {@link #lineShare} of the settled window's spectrum, NaN when none
     * @param contracting whether the samples are still closing in on a periodic state
     * @param periodsAfterTransient samples the indicators were computed from
     */
    public record Indicators(double lyapunov, double zeroOneK, double lineShare, boolean contracting,
                             int periodsAfterTransient) { }

    /**
     * Chaotic, quasi-periodic or undetermined (DOMAIN.md §6).
     *
     * <p>With a Lyapunov exponent: chaotic when it exceeds the zero band and K exceeds the
     * threshold; quasi-periodic when it lies within the band and K is below; undetermined
     * otherwise, saying which indicators disagree. Without one (a network, whose variational
     * equations are not integrated): chaotic when K exceeds the threshold and the spectrum is not
     * a line spectrum; quasi-periodic when K is below, the spectrum is a line spectrum and the
     * samples are not contracting; otherwise undetermined.
     *
     * @param band |exponent| per period below which it counts as zero
     * @param threshold K above which the 0-1 test says chaos
     * @param maxOrder largest subharmonic order looked for (for messages)
     * @param periods source periods simulated (for messages)
     */
    public static Verdict notPeriodic(Indicators in, double band, double threshold, int maxOrder, int periods) {
        double lyap = in.lyapunov();
        double k = in.zeroOneK();
        if (!Double.isNaN(lyap)) {
            String figures = String.format("largest Lyapunov exponent %.4g per period, 0-1 test K = %.3f", lyap, k);
            if (Double.isNaN(k)) {
                return new Verdict(SteadyMode.UNDETERMINED, "too few periods after the transient ("
                        + in.periodsAfterTransient() + ") for the 0-1 test and the Lyapunov exponent; raise the number of periods");
            }
            if (lyap > band && k > threshold) {
                return new Verdict(SteadyMode.CHAOTIC, "chaotic: " + figures);
            }
            if (Math.abs(lyap) <= band && k <= threshold) {
                return new Verdict(SteadyMode.QUASI_PERIODIC,
                        "bounded and not periodic up to order " + maxOrder + ": " + figures);
            }
            if (lyap < -band) {
                return new Verdict(SteadyMode.UNDETERMINED, "contracting (" + figures
                        + ") but no periodic orbit up to order " + maxOrder + " found within " + periods
                        + " periods: not yet settled, or of higher order");
            }
            return new Verdict(SteadyMode.UNDETERMINED, "indicators disagree: " + figures);
        }
        if (Double.isNaN(k)) {
            return new Verdict(SteadyMode.UNDETERMINED, "too few periods after the transient ("
                    + in.periodsAfterTransient() + ", the 0-1 test needs " + ZeroOneTest.MIN_SAMPLES
                    + ") and no periodic state up to order " + maxOrder + "; raise the number of periods");
        }
        boolean lines = in.lineShare() >= LINE_SHARE_MIN;
        String figures = String.format("0-1 test K = %.3f, %.1f %% of the spectrum in its %d strongest lines%s",
                k, 100 * in.lineShare(), LINES_COUNTED, in.contracting() ? ", stroboscopic samples still contracting" : "");
        if (in.contracting()) {
            return new Verdict(SteadyMode.UNDETERMINED, "still closing in on a state after " + periods
                    + " periods (" + figures + "): not yet settled; raise the number of periods");
        }
        if (k > threshold && !lines) {
            return new Verdict(SteadyMode.CHAOTIC, "chaotic: " + figures);
        }
        if (k <= threshold && lines) {
            return new Verdict(SteadyMode.QUASI_PERIODIC,
                    "bounded and not periodic up to order " + maxOrder + ": " + figures);
        }
        return new Verdict(SteadyMode.UNDETERMINED, "indicators disagree: " + figures);
    }

    /**
     * Share of the AC power (lines above DC) held by the {@link #LINES_COUNTED} strongest lines of
     * an amplitude spectrum, each with the +-2 bins of its Hann main lobe (taken greedily, strongest
     * first, never counting a bin twice); NaN when it has no AC power.
     */
    public static double lineShare(Spectrum spectrum) {
        double[] a = spectrum.amplitude();
        int n = a.length;
        double total = 0;
        for (int k = 1; k < n; k++) {
            total += a[k] * a[k];
        }
        if (!(total > 0)) {
            return Double.NaN;
        }
        boolean[] taken = new boolean[n];
        double held = 0;
        for (int line = 0; line < LINES_COUNTED; line++) {
            int best = -1;
            for (int k = 1; k < n; k++) {
                if (!taken[k] && (best < 0 || a[k] > a[best])) {
                    best = k;
                }
            }
            if (best < 0) {
                break;
            }
            for (int k = Math.max(1, best - LOBE); k <= Math.min(n - 1, best + LOBE); k++) {
                if (!taken[k]) {
                    taken[k] = true;
                    held += a[k] * a[k];
                }
            }
        }
        return held / total;
    }

    private static double distance(double[][] s, int i, int j) {
        double sum = 0;
        for (double[] c : s) {
            double d = c[i] - c[j];
            sum += d * d;
        }
        return Math.sqrt(sum);
    }

    private static double norm(double[][] s, int i) {
        double sum = 0;
        for (double[] c : s) {
            sum += c[i] * c[i];
        }
        return Math.sqrt(sum);
    }

    private static double median(double[] v) {
        double[] c = v.clone();
        java.util.Arrays.sort(c);
        int n = c.length;
        return n % 2 == 1 ? c[n / 2] : 0.5 * (c[n / 2 - 1] + c[n / 2]);
    }
}
