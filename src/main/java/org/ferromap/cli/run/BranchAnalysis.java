package org.ferromap.cli.run;

import java.util.List;
import java.util.Locale;
import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.BranchResult;
import org.ferromap.balance.Fold;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.balance.StartState;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.sections.BranchSection;
import org.ferromap.study.SweepParameter;

/**
 * {@code branch}: the steady state followed by continuation through its folds as one parameter
 * varies, as the branch command does. Settings: {@code parameter} (default source), {@code from},
 * {@code to} (quantities, or plain numbers per unit of the study's value; default for the source
 * 0.05 to the larger of 2 and 1.3 times the jump-up fold, per unit of the study's source, else a
 * fifth to five times the study's value), {@code harmonics} (default 1), {@code start} (normal or
 * upper, default normal).
 */
final class BranchAnalysis implements Analysis {

    @Override
    public String name() {
        return "branch";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("parameter", "from", "to", "harmonics", "start"));
        SweepParameter p = s.parameter(ctx.params, "parameter", SweepParameter.SOURCE, List.of(SweepParameter.SOURCE_ANGLE));
        BalanceAxis axis = Axes.of(p);
        int harmonics = s.integer("harmonics", 1, 1, BalanceContinuation.MAX_HARMONICS);
        StartState state = switch (s.text("start", "normal").toLowerCase(Locale.ROOT)) {
            case "normal" -> StartState.NORMAL;
            case "upper" -> StartState.UPPER;
            default -> throw AnalysisSettings.bad(name(), "start", s.text("start", ""), "normal or upper");
        };
        double own = ctx.params.valueOf(p);
        double[] range = defaultRange(ctx.study.circuit(), p, own);
        double from = s.has("from") ? s.bound("from", p, own) : range[0];
        double to = s.has("to") ? s.bound("to", p, own) : range[1];
        if (!(from != to) || Double.isNaN(from) || Double.isNaN(to)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.branch: give a range (from, to) for " + p.studyName()
                    + "; the study's value is " + own);
        }
        axis.checkRange(Math.min(from, to), Math.max(from, to));
        double lo = from;
        double hi = to;
        return c -> {
            BranchResult r = new BalanceContinuation().branch(axis, v -> c.params.circuit(p, v), lo, hi, own, harmonics, state);
            BranchSection.write(c.notebook, c.folder, new BranchSection.Data(c.study.title(), r, own));
        };
    }

    /** For the source: 0.05 to max(2, 1.3 x jump-up fold / source) times the source; else v/5 to 5v. */
    static double[] defaultRange(EquivalentCircuit c, SweepParameter p, double own) {
        if (p == SweepParameter.SOURCE) {
            double top = 2 * own;
            try {
                for (Fold f : new SingleHarmonicBalance().folds(c)) {
                    top = Math.max(top, 1.3 * f.sourcePeak());
                }
            } catch (FerromapException e) {
                // keep twice the source
            }
            return new double[] {0.05 * own, top};
        }
        return own > 0 && Double.isFinite(own) ? Axes.around(own) : new double[] {Double.NaN, Double.NaN};
    }
}
