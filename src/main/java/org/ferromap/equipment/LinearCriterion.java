package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The linear screening rule for cable length (DOMAIN.md §4 [der]): compare the capacitive
 * reactance of the open-phase loop, X_c = 1 / (w C'_eq l), with the magnetizing reactance
 * X_m = V_line^2 / (I0 S) per phase (wye-equivalent), and call the case exposed when
 * X_c / X_m falls below a threshold K. Hence
 *
 * <pre>
 *   l_crit = 1 / (w C'_eq K X_m)        i.e.  l_crit[km] = 10 I0% S_kVA / (K w C'_eq[uF/km] V_kV^2)
 * </pre>
 *
 * with C'_eq the loop capacitance per length of DOMAIN.md §1.2 (C'cs for one open phase of an
 * ungrounded primary on screened cable, and so on). K is a setting; the two published or derived
 * choices disagree by more than an order of magnitude, so every result names the one used:
 * <ul>
 *   <li>{@link Rule#HOPKINSON}, K = 40, the rule usually quoted (overvoltage under about 1.25 pu
 *       for delta and ungrounded-wye primaries) [mem: R. H. Hopkinson, IEEE Trans. PAS-84(4), 1965];</li>
 *   <li>{@link Rule#LINEAR_RESONANCE}, K = L_eq / Lm (1.5 for ungrounded primaries, 1 for grounded
 *       wye): the loop's own linear resonance X_c,eq = X_L,eq. Beyond it a lossless loop has a fold
 *       pair (kappa = w^2 C - a &gt; 0 in DOMAIN.md §3) [der].</li>
 * </ul>
 * The tool's computed folds and simulations are better than either (DOMAIN.md §4).
 *
 * @param rule which threshold
 * @param threshold K, dimensionless, &gt; 0; ignored (NaN) for LINEAR_RESONANCE, which takes it from the case
 */
public record LinearCriterion(Rule rule, double threshold) {

    /** Where the threshold comes from. */
    public enum Rule {
        HOPKINSON("K = 40 [mem: R. H. Hopkinson, \"Ferroresonance during single-phase switching of 3-phase "
                + "distribution transformer banks\", IEEE Trans. PAS-84(4), 1965]"),
        LINEAR_RESONANCE("K = L_eq/Lm, the loop's linear resonance [der: DOMAIN.md §3-4]"),
        GIVEN("K set in the study");

        private final String source;

        Rule(String source) {
            this.source = source;
        }

        /** The source, tagged as DOMAIN.md tags it. */
        public String source() {
            return source;
        }
    }

    /** The ratio usually quoted, 40 [mem: Hopkinson 1965]. */
    public static final double HOPKINSON_THRESHOLD = 40.0;

    public LinearCriterion {
        if (rule == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "a linear criterion needs its rule");
        }
        if (rule == Rule.LINEAR_RESONANCE) {
            threshold = Double.NaN;
        } else if (!(threshold > 0) || Double.isInfinite(threshold)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "threshold K = " + threshold
                    + " is not allowed; expected a finite value > 0 (40 after Hopkinson, about 1 for the linear resonance)");
        }
    }

    /** The default: K = 40 after Hopkinson, the rule engineers quote. */
    public static LinearCriterion hopkinson() {
        return new LinearCriterion(Rule.HOPKINSON, HOPKINSON_THRESHOLD);
    }

    /** K = L_eq / Lm: the loop's linear resonance. */
    public static LinearCriterion linearResonance() {
        return new LinearCriterion(Rule.LINEAR_RESONANCE, Double.NaN);
    }

    /** A threshold chosen by the user. */
    public LinearCriterion withThreshold(double k) {
        return new LinearCriterion(Rule.GIVEN, k);
    }

    /** K for a given loop. */
    public double thresholdFor(OpenPhaseLoop loop) {
        return rule == Rule.LINEAR_RESONANCE ? loop.inductanceFactor() : threshold;
    }

    /**
     * The criterion for one installation.
     *
     * @param magnetizingReactance X_m per phase at the supply frequency, wye-equivalent, ohm
     * @param capacitancePerLength C'_eq of the loop, F/m
     * @param capacitiveReactance X_c = 1/(w C'_eq l) at the installed length, ohm
     * @param ratio X_c / X_m at the installed length
     * @param threshold K used
     * @param thresholdSource where K comes from
     * @param criticalLength l_crit, m; infinite when the case is not driven (grounded wye on screened cable)
     * @param driven whether the loop has any source at all
     * @param withinLimit whether the installed length is at most l_crit
     */
    public record Result(
            double magnetizingReactance,
            double capacitancePerLength,
            double capacitiveReactance,
            double ratio,
            double threshold,
            String thresholdSource,
            double criticalLength,
            boolean driven,
            boolean withinLimit) { }

    /** Evaluates the criterion at the installation's own length and supply frequency. */
    public Result evaluate(Installation in) {
        Transformer t = in.transformer();
        double w = in.omega();
        // X_m at the supply frequency: omega Lm with Lm from the rated-frequency exciting current.
        double xm = w * t.magnetizingInductance();
        OpenPhaseLoop perMetre = in.openPhases().loop(t.connection(), in.cable().coreToSheath(), in.cable().coreToCore());
        double cPrime = perMetre.capacitance();
        double k = thresholdFor(perMetre);
        double xc = 1.0 / (w * cPrime * in.cableLength());
        boolean driven = perMetre.driven();
        double lcrit = driven ? 1.0 / (w * cPrime * k * xm) : Double.POSITIVE_INFINITY;
        String src = rule == Rule.LINEAR_RESONANCE
                ? "K = " + k + " = L_eq/Lm, the loop's linear resonance [der: DOMAIN.md §3-4]"
                : rule.source();
        return new Result(xm, cPrime, xc, xc / xm, k, src, lcrit, driven, in.cableLength() <= lcrit);
    }
}
