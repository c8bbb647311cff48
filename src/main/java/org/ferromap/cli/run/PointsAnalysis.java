package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.balance.Fold;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.report.sections.PointsSection;

/** {@code points}: every steady state at the study's source, the folds, the margin and the cusp condition. */
final class PointsAnalysis implements Analysis {

    /** Samples of the V-I curve in the graphical-method chart. */
    private static final int CURVE_SAMPLES = 300;

    @Override
    public String name() {
        return "points";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings.of(name(), settings, List.of());
        return c -> PointsSection.write(c.notebook, c.folder, compute(c.study.circuit()));
    }

    static PointsSection.Data compute(EquivalentCircuit c) {
        SingleHarmonicBalance b = new SingleHarmonicBalance();
        List<OperatingPoint> points = b.operatingPoints(c);
        List<Fold> folds = b.folds(c);
        double top = c.ratedPeak() / c.omega();
        for (OperatingPoint p : points) {
            top = Math.max(top, p.flux());
        }
        for (Fold f : folds) {
            top = Math.max(top, f.flux());
        }
        top *= 1.15;
        double[] i1 = new double[CURVE_SAMPLES + 1];
        double[] v = new double[CURVE_SAMPLES + 1];
        for (int k = 0; k <= CURVE_SAMPLES; k++) {
            double lambda = top * k / CURVE_SAMPLES;
            i1[k] = c.magnetizing().fundamentalCurrent(lambda);
            v[k] = c.omega() * lambda;
        }
        return new PointsSection.Data(c, points, folds, b.margin(c), b.cuspCondition(c), FoldFreeDamping.totalConductance(b, c),
                i1, v);
    }
}
