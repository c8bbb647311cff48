package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.junit.jupiter.api.Test;

class CoreComparisonTest {

    private static ComparisonResult compare(Study first, Study second) {
        ComparisonSettings s = ComparisonSettings.defaults(first).withSteps(4, 3);
        return CoreComparison.compare(List.of(first, second), s, new LocalPoolExecutor(2));
    }

    /**
     * Two designs that differ only in the magnetizing current (the per-unit curve's current and the
     * nameplate exciting current halved in the second). Plausibility [cp, with the reason derived]: a larger exciting current puts the loop's
     * resonance, and so its fold pair, at a longer cable (cusp length grows with a, DOMAIN.md §3), so
     * it ranks first unless the installed case separates them; each design's limit is the
     * fold-based limit of its own study (FoldLimit through the limit table's grid of one row).
     */
    @Test
    void theLargerExcitingCurrentRanksFirstOnTheLimit() {
        Study high = DeliverableStudies.equipmentStudy("delta", 2, "1 %", "400 W", 1.0, "");
        Study low = DeliverableStudies.equipmentStudy("delta", 2, "0.5 %", "400 W", 0.5, "");
        ComparisonResult r = compare(low, high);
        ComparisonResult.Design dl = r.designs().get(0);
        ComparisonResult.Design dh = r.designs().get(1);
        assertTrue(dh.ratedLimit() > dl.ratedLimit(), dh.ratedLimit() + " against " + dl.ratedLimit());
        assertEquals(dh.category(), dl.category(), "the installed case does not separate them");
        assertEquals(1, dh.rank());
        assertEquals(2, dl.rank());
        assertTrue(r.ranking().get(0).reasons().get(0).contains("longer cable-length limit"), r.ranking().get(0).reasons().toString());
        LimitSettings one = LimitSettings.defaults(high).withRatings(500e3).withOpenPhases(2)
                .withOverrides(List.of(new LimitSettings.TypicalOverride(500e3, Double.NaN, 400)));
        double tableLimit = LimitTable.compute(high, one, new LocalPoolExecutor(1)).rows().get(0).ratedLimit().length();
        assertEquals(tableLimit, dh.ratedLimit(), 1e-9 * tableLimit);
    }

    /**
     * The maps share their axes and one colour scale spanning every design's cells (the scale's ends
     * are the extreme cells, exactly); the per-unit curve samples increase as a magnetizing curve must.
     */
    @Test
    void mapsShareAxesAndScale() {
        Study a = DeliverableStudies.equipmentStudy("delta", 2, "1 %", "400 W", 1.0, "");
        Study b = DeliverableStudies.equipmentStudy("delta", 2, "0.5 %", "400 W", 0.5, "");
        ComparisonResult r = compare(a, b);
        assertEquals(4, r.x().steps());
        assertEquals(3, r.y().steps());
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (ComparisonResult.Design d : r.designs()) {
            assertEquals(12, d.mapPeakPu().size());
            for (Double v : d.mapPeakPu()) {
                if (v != null && Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        assertEquals(lo, r.scaleMin(), 0.0);
        assertEquals(hi, r.scaleMax(), 0.0);
        for (ComparisonResult.Design d : r.designs()) {
            for (int k = 1; k < d.curveFluxPu().length; k++) {
                assertTrue(d.curveCurrentPu()[k] > d.curveCurrentPu()[k - 1], "curve samples increase (monotone curve)");
            }
        }
    }

    @Test
    void needsTwoEquipmentStudies() {
        Study a = DeliverableStudies.equipmentStudy("delta", 2, "1 %", "400 W", "");
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> CoreComparison.compare(List.of(a), ComparisonSettings.defaults(a), new LocalPoolExecutor(1))).key());
        Study c = DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", "");
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> CoreComparison.compare(List.of(a, c), ComparisonSettings.defaults(a), new LocalPoolExecutor(1))).key());
    }
}
