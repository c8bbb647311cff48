package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TypicalTransformerDataTest {

    /** EU 548/2014 Tier 2 as DOMAIN.md §2 recalls it [mem]: 100 kVA 130 W, 400 kVA 387 W, 1000 kVA 693 W. */
    @Test
    void tier2TableAsRecalled() {
        assertEquals(130.0, TypicalTransformerData.noLoadLoss(100e3).value(), 0.0);
        assertEquals(387.0, TypicalTransformerData.noLoadLoss(400e3).value(), 0.0);
        assertEquals(693.0, TypicalTransformerData.noLoadLoss(1000e3).value(), 0.0);
        assertTrue(TypicalTransformerData.noLoadLoss(400e3).source().contains("548/2014"));
    }

    /**
     * Between tabulated ratings the log-log interpolation [der] lies strictly between the
     * neighbours, and stays inside the 0.07 % to 0.13 % low-loss range [mem/cp] of DOMAIN.md §2.
     */
    @Test
    void interpolationStaysBetweenNeighboursAndInTheLowLossRange() {
        double w = TypicalTransformerData.noLoadLoss(500e3).value();
        assertTrue(w > 387 && w < 693, "500 kVA: " + w);
        assertTrue(TypicalTransformerData.NO_LOAD_LOSS_FRACTION.contains(w / 500e3), "fraction " + w / 500e3);
        assertTrue(TypicalTransformerData.noLoadLoss(500e3).source().startsWith("[der]"));
        // Outside the table: 0.1 % of rating.
        assertEquals(2000.0, TypicalTransformerData.noLoadLoss(2e6).value(), 1e-9);
    }

    @Test
    void remarksFlagUnusualFigures() {
        SaturationCurve c = new PolynomialCurve(1e-3, 1e-16, 9);
        Transformer ok = new Transformer(500e3, 34.5e3, 60, Connection.DELTA, CoreType.SEPARATE_PHASE_CORES, 0.008, 450, c);
        assertTrue(TypicalTransformerData.remarks(ok).isEmpty(), TypicalTransformerData.remarks(ok).toString());
        Transformer odd = ok.withExcitingCurrent(0.05).withNoLoadLoss(5000);
        assertEquals(2, TypicalTransformerData.remarks(odd).size());
        // The Tier 2 figure itself (693 W for 1000 kVA, 0.0693 %) is "about 0.07 %": no remark.
        Transformer tier2 = new Transformer(1000e3, 24.9e3, 60, Connection.DELTA, CoreType.SEPARATE_PHASE_CORES, 0.01, 693, c);
        assertTrue(TypicalTransformerData.remarks(tier2).isEmpty(), TypicalTransformerData.remarks(tier2).toString());
        assertEquals(1, TypicalTransformerData.remarks(tier2.withNoLoadLoss(250)).size());
    }
}
