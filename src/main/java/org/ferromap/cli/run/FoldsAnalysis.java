package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.FoldCurveResult;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.sections.FoldsSection;
import org.ferromap.study.SweepParameter;

/**
 * {@code folds}: the study's folds and cusp condition, and the fold curves traced by continuation
 * in a plane of two parameters, as the folds command does. Settings: {@code parameter} (P1, default
 * source), {@code from}, {@code to} (default as for the branch), {@code and} (P2, default cable
 * length for equipment studies, series capacitance otherwise), {@code and-from}, {@code and-to}
 * (default a decade centred on the study's value).
 */
final class FoldsAnalysis implements Analysis {

    @Override
    public String name() {
        return "folds";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("parameter", "from", "to", "and", "and-from", "and-to"));
        SweepParameter p1 = s.parameter(ctx.params, "parameter", SweepParameter.SOURCE, List.of(SweepParameter.SOURCE_ANGLE));
        SweepParameter dflt2 = ctx.study.isEquipmentForm() ? SweepParameter.CABLE_LENGTH : SweepParameter.SERIES_CAPACITANCE;
        if (p1 == dflt2) {
            dflt2 = SweepParameter.SOURCE;
        }
        SweepParameter p2 = s.parameter(ctx.params, "and", dflt2, List.of(SweepParameter.SOURCE_ANGLE));
        if (p1 == p2) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.folds: parameter and 'and' are both " + p1.studyName());
        }
        BalanceAxis a1 = Axes.of(p1);
        BalanceAxis a2 = Axes.of(p2);
        double own1 = ctx.params.valueOf(p1);
        double own2 = ctx.params.valueOf(p2);
        double[] r1 = BranchAnalysis.defaultRange(ctx.study.circuit(), p1, own1);
        double lo1 = s.has("from") ? s.bound("from", p1, own1) : r1[0];
        double hi1 = s.has("to") ? s.bound("to", p1, own1) : r1[1];
        double lo2 = s.has("and-from") ? s.bound("and-from", p2, own2) : own2 / Math.sqrt(10);
        double hi2 = s.has("and-to") ? s.bound("and-to", p2, own2) : own2 * Math.sqrt(10);
        for (double v : new double[] {lo1, hi1, lo2, hi2}) {
            if (!Double.isFinite(v)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.folds: give from/to and and-from/and-to (the "
                        + "study's values give no default range)");
            }
        }
        a1.checkRange(Math.min(lo1, hi1), Math.max(lo1, hi1));
        a2.checkRange(Math.min(lo2, hi2), Math.max(lo2, hi2));
        return c -> {
            EquivalentCircuit ci = c.study.circuit();
            SingleHarmonicBalance b = new SingleHarmonicBalance();
            FoldCurveResult r = new BalanceContinuation().foldCurves(a1, a2, (x, y) -> c.params.circuit(p1, x, p2, y),
                    lo1, hi1, lo2, hi2, own1, own2);
            FoldsSection.write(c.notebook, c.folder, new FoldsSection.Data(c.study.title(), b.folds(ci), b.cuspCondition(ci),
                    FoldFreeDamping.totalConductance(b, ci), ci.conductance(), r, own1, own2));
        };
    }
}
