package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.report.sections.CurveSection;

/** {@code curve}: the magnetizing curve held for the equivalent circuit. */
final class CurveAnalysis implements Analysis {

    @Override
    public String name() {
        return "curve";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings.of(name(), settings, List.of());
        return c -> CurveSection.write(c.notebook, c.folder, c.study.title(), c.study.circuit().magnetizing());
    }
}
