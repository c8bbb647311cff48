package org.ferromap.cli.run;

import org.ferromap.cli.DeliverableSections;
import org.ferromap.maps.LimitSettings;
import org.ferromap.maps.LocalPoolExecutor;

/**
 * {@code limits}: the cable-length limit table (docs/DELIVERABLES.md), settings as
 * docs/STUDY-FORMAT.md gives them ({@link LimitSettings#from}); equipment studies only (noted and
 * skipped otherwise).
 */
final class LimitsAnalysis implements Analysis {

    @Override
    public String name() {
        return "limits";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        if (!ctx.study.isEquipmentForm()) {
            ctx.note("limits: skipped; a cable-length limit table needs an equipment study (the circuit form has no cable)");
            return null;
        }
        LimitSettings s = LimitSettings.from(ctx.study);
        return c -> DeliverableSections.limits(c.study, s, new LocalPoolExecutor(c.threads), c.folder, c.notebook);
    }
}
