package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldDirection;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.Axis;
import org.ferromap.maps.PlaneAxis;
import org.ferromap.report.sections.FoldsSection;
import org.ferromap.study.SweepParameter;

/**
 * {@code folds}: the study's folds and cusp condition, and the fold voltages as a second parameter
 * varies (default: cable length for equipment studies, series capacitance otherwise), with the
 * cusp located by bisection where the fold pair is born. Settings: {@code parameter},
 * {@code from}, {@code to}, {@code points}.
 */
final class FoldsAnalysis implements Analysis {

    /** Bisections for the cusp along the parameter: 2^-40 of a step. */
    private static final int BISECTIONS = 40;

    @Override
    public String name() {
        return "folds";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("parameter", "from", "to", "points"));
        SweepParameter dflt = ctx.study.isEquipmentForm() ? SweepParameter.CABLE_LENGTH : SweepParameter.SERIES_CAPACITANCE;
        SweepParameter p = s.parameter(ctx.params, "parameter", dflt, List.of(SweepParameter.SOURCE,
                SweepParameter.SOURCE_LINE_VOLTAGE, SweepParameter.SOURCE_ANGLE));
        int points = s.integer("points", 161, 10, 5000);
        double value = ctx.params.valueOf(p);
        double from = s.bound("from", p, value);
        double to = s.bound("to", p, value);
        if (Double.isNaN(from) || Double.isNaN(to)) {
            if (!(value > 0)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.folds: give from and to for " + p.studyName()
                        + " (the study's value is " + value + ")");
            }
            from = Double.isNaN(from) ? value / 5 : from;
            to = Double.isNaN(to) ? value * 5 : to;
        }
        boolean log = from > 0 && to > 0 && Math.max(from, to) / Math.min(from, to) > 10;
        PlaneAxis axis = PlaneAxis.ofSi(p, from, to, points, log ? Axis.Scale.LOG : Axis.Scale.LINEAR);
        ctx.params.circuit(p, from);
        ctx.params.circuit(p, to);
        return c -> FoldsSection.write(c.notebook, c.folder, compute(c, p, axis, value));
    }

    static FoldsSection.Data compute(RunContext ctx, SweepParameter p, PlaneAxis axis, double studyValue) {
        SingleHarmonicBalance b = new SingleHarmonicBalance();
        EquivalentCircuit c = ctx.study.circuit();
        double[] q = axis.axis().values();
        double[] up = new double[q.length];
        double[] down = new double[q.length];
        boolean[] pair = new boolean[q.length];
        for (int i = 0; i < q.length; i++) {
            double[] f = pair(b, ctx.params.circuit(p, axis.si(q[i])));
            up[i] = f[0];
            down[i] = f[1];
            pair[i] = !Double.isNaN(f[0]);
        }
        double cuspQ = Double.NaN;
        double cuspE = Double.NaN;
        for (int i = 0; i + 1 < q.length && Double.isNaN(cuspQ); i++) {
            if (pair[i] != pair[i + 1]) {
                // bisect in the axis's own scale towards where the fold pair is born
                boolean lg = axis.log();
                double a = lg ? Math.log(q[i]) : q[i];
                double bb = lg ? Math.log(q[i + 1]) : q[i + 1];
                boolean pa = pair[i];
                double[] atPair = pa ? new double[] {up[i], down[i]} : new double[] {up[i + 1], down[i + 1]};
                for (int k = 0; k < BISECTIONS; k++) {
                    double m = 0.5 * (a + bb);
                    double[] f = pair(b, ctx.params.circuit(p, axis.si(lg ? Math.exp(m) : m)));
                    boolean pm = !Double.isNaN(f[0]);
                    if (pm) {
                        atPair = f;
                    }
                    if (pm == pa) {
                        a = m;
                    } else {
                        bb = m;
                    }
                }
                double m = 0.5 * (a + bb);
                cuspQ = lg ? Math.exp(m) : m;
                cuspE = 0.5 * (atPair[0] + atPair[1]);
            }
        }
        return new FoldsSection.Data(b.folds(c), b.cuspCondition(c), p.studyName(), axis.unit(), q, up, down,
                studyValue / axis.siPerUnit(), c.sourcePeak() / c.ratedPeak(), cuspQ, cuspE, axis.log(),
                FoldFreeDamping.totalConductance(b, c), c.conductance());
    }

    /** Source (pu) of the first jump-up fold and of the jump-down fold after it; NaN, NaN without a pair. */
    private static double[] pair(SingleHarmonicBalance b, EquivalentCircuit c) {
        try {
            List<Fold> folds = b.folds(c);
            for (int k = 0; k + 1 < folds.size(); k++) {
                if (folds.get(k).direction() == FoldDirection.JUMP_UP && folds.get(k + 1).direction() == FoldDirection.JUMP_DOWN) {
                    return new double[] {folds.get(k).sourcePerUnit(), folds.get(k + 1).sourcePerUnit()};
                }
            }
        } catch (FerromapException e) {
            // no fold figures at this value: drawn as a gap
        }
        return new double[] {Double.NaN, Double.NaN};
    }
}
