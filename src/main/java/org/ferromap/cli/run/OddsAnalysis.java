package org.ferromap.cli.run;

import org.ferromap.cli.DeliverableSections;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.OddsSettings;

/**
 * {@code odds}: the probability of ferroresonance over random switching instants and residual flux
 * (docs/DELIVERABLES.md), settings as docs/STUDY-FORMAT.md gives them ({@link OddsSettings#from}).
 */
final class OddsAnalysis implements Analysis {

    @Override
    public String name() {
        return "odds";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        OddsSettings s = OddsSettings.from(ctx.study);
        return c -> DeliverableSections.odds(c.study, s, new LocalPoolExecutor(c.threads), c.folder, c.notebook);
    }
}
