package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.report.sections.PointsSection;

/** {@code points}: every steady state at the study's source, the folds, the margin and the cusp condition. */
final class PointsAnalysis implements Analysis {

    @Override
    public String name() {
        return "points";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings.of(name(), settings, List.of());
        return c -> PointsSection.write(c.notebook, c.folder, c.study.title(), compute(c.study.circuit()));
    }

    static PointsSection.Data compute(EquivalentCircuit c) {
        SingleHarmonicBalance b = new SingleHarmonicBalance();
        return new PointsSection.Data(c, b.operatingPoints(c), b.folds(c), b.margin(c), b.cuspCondition(c),
                FoldFreeDamping.totalConductance(b, c));
    }
}
