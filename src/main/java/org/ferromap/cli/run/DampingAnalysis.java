package org.ferromap.cli.run;

import org.ferromap.cli.DeliverableSections;
import org.ferromap.maps.DampingSettings;
import org.ferromap.maps.LocalPoolExecutor;

/**
 * {@code damping}: the smallest damping load that removes the risk, confirmed in the time domain,
 * and the arrester's duty (docs/DELIVERABLES.md), settings as docs/STUDY-FORMAT.md gives them
 * ({@link DampingSettings#from}).
 */
final class DampingAnalysis implements Analysis {

    @Override
    public String name() {
        return "damping";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        DampingSettings s = DampingSettings.from(ctx.study);
        return c -> DeliverableSections.damping(c.study, s, new LocalPoolExecutor(c.threads), c.folder, c.notebook);
    }
}
