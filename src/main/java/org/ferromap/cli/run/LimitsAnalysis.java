package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.balance.CriticalLength;
import org.ferromap.balance.CriticalLengthResult;
import org.ferromap.report.sections.LimitsSection;
import org.ferromap.study.SweepParameter;

/**
 * {@code limits}: the critical cable lengths of an equipment study (DOMAIN.md section 4).
 * Settings: {@code from}, {@code to} (lengths, or per unit of the study's length; default 0 to 4
 * times the study's length).
 */
final class LimitsAnalysis implements Analysis {

    @Override
    public String name() {
        return "limits";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("from", "to"));
        if (!ctx.study.isEquipmentForm()) {
            ctx.note("limits: skipped; critical cable lengths need an equipment study (the circuit form has no cable)");
            return null;
        }
        double length = ctx.params.valueOf(SweepParameter.CABLE_LENGTH);
        double from = s.bound("from", SweepParameter.CABLE_LENGTH, length);
        double to = s.bound("to", SweepParameter.CABLE_LENGTH, length);
        double lo = Double.isNaN(from) ? 0 : from;
        double hi = Double.isNaN(to) ? 4 * length : to;
        ctx.params.circuit(SweepParameter.CABLE_LENGTH, Math.max(lo, 1e-3));
        ctx.params.circuit(SweepParameter.CABLE_LENGTH, hi);
        return c -> {
            CriticalLengthResult r = new CriticalLength().find(l -> c.params.circuit(SweepParameter.CABLE_LENGTH,
                    Math.max(l, 1e-3)), lo, hi);
            LimitsSection.write(c.notebook, c.folder, new LimitsSection.Data(r, length, lo, hi));
        };
    }
}
