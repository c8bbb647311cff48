package org.ferromap.cli.run;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.Fold;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.Axis;
import org.ferromap.maps.PlaneAxis;
import org.ferromap.report.sections.BranchSection;
import org.ferromap.study.SweepParameter;

/**
 * {@code branch}: the steady states as one parameter varies. In the source voltage the branch is
 * E(Lambda) of the balance, drawn as one curve; for any other parameter each value is solved on
 * its own and drawn as points. Settings: {@code parameter} (default source), {@code from},
 * {@code to} (quantities, or plain numbers per unit of the study's value), {@code points}.
 */
final class BranchAnalysis implements Analysis {

    @Override
    public String name() {
        return "branch";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("parameter", "from", "to", "points"));
        SweepParameter p = s.parameter(ctx.params, "parameter", SweepParameter.SOURCE,
                List.of(SweepParameter.SOURCE_ANGLE));
        int points = s.integer("points", p == SweepParameter.SOURCE ? 400 : 121, 10, 5000);
        if (p == SweepParameter.SOURCE) {
            if (s.has("from") || s.has("to")) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.branch: the source branch is drawn whole; "
                        + "from and to apply to other parameters");
            }
            return c -> BranchSection.write(c.notebook, c.folder, sourceBranch(c.study.circuit(), points));
        }
        double value = ctx.params.valueOf(p);
        double from = s.bound("from", p, value);
        double to = s.bound("to", p, value);
        if (Double.isNaN(from) || Double.isNaN(to)) {
            if (!(value > 0)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.branch: give from and to for "
                        + p.studyName() + " (the study's value is " + value + ")");
            }
            from = Double.isNaN(from) ? 0.2 * value : from;
            to = Double.isNaN(to) ? 3 * value : to;
        }
        boolean log = from > 0 && to > 0 && Math.max(from, to) / Math.min(from, to) > 10;
        PlaneAxis axis = PlaneAxis.ofSi(p, from, to, points, log ? Axis.Scale.LOG : Axis.Scale.LINEAR);
        ctx.params.circuit(p, from);
        ctx.params.circuit(p, to); // range checks before anything runs
        return c -> BranchSection.write(c.notebook, c.folder, sweep(c, p, axis, value));
    }

    static BranchSection.Data sourceBranch(EquivalentCircuit c, int points) {
        SingleHarmonicBalance b = new SingleHarmonicBalance();
        List<Fold> folds = b.folds(c);
        double top = c.ratedPeak() / c.omega();
        for (OperatingPoint p : b.operatingPoints(c)) {
            top = Math.max(top, p.flux());
        }
        for (Fold f : folds) {
            top = Math.max(top, f.flux());
        }
        List<SingleHarmonicBalance.BranchSample> samples = b.branch(c, 1.6 * top, points);
        double rated = c.ratedPeak();
        double limit = 2.5 * Math.max(c.sourcePeak(), folds.isEmpty() ? 0 : folds.get(0).sourcePeak());
        List<double[]> kept = new ArrayList<>();
        for (SingleHarmonicBalance.BranchSample s : samples) {
            if (s.sourcePeak() <= limit) {
                kept.add(new double[] {s.sourcePeak() / rated, c.omega() * s.flux() / rated, s.stable() ? 1 : 0});
            }
        }
        double[] x = new double[kept.size()];
        double[] y = new double[kept.size()];
        boolean[] st = new boolean[kept.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = kept.get(i)[0];
            y[i] = kept.get(i)[1];
            st[i] = kept.get(i)[2] > 0;
        }
        double[] fx = new double[folds.size()];
        double[] fy = new double[folds.size()];
        for (int i = 0; i < fx.length; i++) {
            fx[i] = folds.get(i).sourcePerUnit();
            fy[i] = folds.get(i).voltage() / rated;
        }
        return new BranchSection.Data("source", "pu of rated peak", x, y, st, true, fx, fy, c.sourcePeak() / rated,
                "The single-harmonic branch E(Lambda) traced in flux from 1/1000 of " + "1.6 times the largest steady-state "
                        + "flux, drawn against the source it needs; where the source falls as the flux rises the states are "
                        + "unstable, and the turning points are the folds.");
    }

    private static BranchSection.Data sweep(RunContext c, SweepParameter p, PlaneAxis axis, double studyValue) {
        SingleHarmonicBalance b = new SingleHarmonicBalance();
        List<double[]> pts = new ArrayList<>();
        double[] q = axis.axis().values();
        int failed = 0;
        for (double v : q) {
            EquivalentCircuit ci = c.params.circuit(p, axis.si(v));
            try {
                for (OperatingPoint op : b.operatingPoints(ci)) {
                    pts.add(new double[] {v, op.voltagePerUnit(), op.stable() ? 1 : 0});
                }
            } catch (FerromapException e) {
                failed++;
            }
        }
        double[] x = new double[pts.size()];
        double[] y = new double[pts.size()];
        boolean[] st = new boolean[pts.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = pts.get(i)[0];
            y[i] = pts.get(i)[1];
            st[i] = pts.get(i)[2] > 0;
        }
        return new BranchSection.Data(p.studyName(), axis.unit(), x, y, st, false, new double[0], new double[0],
                studyValue / axis.siPerUnit(), "Every steady state of the balance solved at " + q.length + " values of "
                        + p.studyName() + " from " + axis.axis().from() + " to " + axis.axis().to() + " " + axis.unit()
                        + ", other values as in the study" + (failed > 0 ? "; the balance failed at " + failed + " values" : "")
                        + ".");
    }
}
