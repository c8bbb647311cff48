package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Problem;
import org.ferromap.study.Study;
import org.ferromap.study.StudyException;
import org.junit.jupiter.api.Test;

class LimitTableTest {

    private static final double W = 2 * Math.PI * 60;

    /** A polynomial winding (grounded wye, belted cable: the loop's curve is the winding's own). */
    private static final double A = 7e-3;
    private static final double B = 1e-14;
    private static final int N = 9;

    private static LimitTableResult table(Study s, LimitSettings settings) {
        return LimitTable.compute(s, settings, new LocalPoolExecutor(2));
    }

    /**
     * The linear column is l_crit = 10 I0% S_kVA / (K w C'eq[uF/km] V_kV^2) km (DOMAIN.md §4 [der])
     * with C'eq from the table of DOMAIN.md §1.2 [der], for every connection, cable kind, voltage
     * class and open-phase case of the grid; a grounded wye on screened cable is not driven (no
     * limit). Tolerance 1e-12 relative: the same formula in other units.
     */
    @Test
    void linearColumnIsTheFormula() {
        String analyses = String.join("\n",
                "analyses:",
                "  limits:",
                "    ratings: [100 kVA]",
                "    connections: [delta, grounded-wye]",
                "    voltages: [12.47 kV, 24.9 kV]",
                "    open-phases: [1, 2]",
                "    cables:",
                "      - {name: screened, core-to-sheath: 0.25 uF/km}",
                "      - {name: belted, core-to-sheath: 0.3 uF/km, core-to-core: 0.1 uF/km}",
                "    linear-k: 40");
        Study s = DeliverableStudies.equipmentStudy("delta", 1, "0.8 %", "typical", analyses);
        LimitSettings settings = LimitSettings.from(s);
        LimitTableResult r = table(s, settings);
        assertEquals(2 * 2 * 2 * 2, r.rows().size());
        // an ungrounded wye, one open phase (two open phases take a composite curve whose balance is slow)
        LimitTableResult wye = table(s, settings.withRatings(100e3).withOpenPhases(1).withVoltages(12.47e3)
                .withConnections(List.of(org.ferromap.equipment.Connection.UNGROUNDED_WYE)));
        List<LimitRow> rows = new java.util.ArrayList<>(r.rows());
        rows.addAll(wye.rows());
        assertEquals(2, wye.rows().size());
        for (LimitRow row : rows) {
            double ccs = 0.25;
            double ccc = 0;
            if (row.cable().equals("belted")) {
                ccs = 0.3;
                ccc = 0.1;
            }
            boolean ungrounded = !row.connection().equals("grounded-wye");
            double ceq = ungrounded ? (row.openPhases() == 1 ? ccs + 2 * ccc : 2 * (ccc + ccs))
                    : (row.openPhases() == 1 ? 2 * ccc + ccs : ccc + ccs);
            double i0 = 0.8;
            double km = 10 * i0 * (row.rating() / 1e3) / (40 * W * ceq * Math.pow(row.voltage() / 1e3, 2));
            boolean driven = ungrounded || ccc > 0;
            assertEquals(driven, row.driven(), row.toString());
            if (driven) {
                assertEquals(km * 1e3, row.linearLength(), 1e-12 * km * 1e3, row.toString());
                assertEquals(40.0, row.linearK(), 0.0);
            } else {
                assertTrue(Double.isInfinite(row.linearLength()));
                assertTrue(Double.isInfinite(row.ratedLimit().length()), "no drive, no limit");
            }
        }
    }

    /**
     * The fold-based columns of a polynomial winding against the closed forms (DOMAIN.md §3 [der],
     * {@link PolynomialFolds}): cusp length C_min / C'eq with the loop conductance P0 / V^2 (grounded
     * wye, R = V^2/P), and the margins' limits at the cusp or where the jump-down fold reaches the
     * source. The table works through the curve scaled to the row's nameplate, so the numerical
     * balance runs: tolerance 1e-6 relative (a cusp located by a minimiser over the flux, 1e-10 in
     * log flux, on a flat extremum).
     */
    @Test
    void foldColumnsFollowTheClosedForm() {
        String analyses = String.join("\n",
                "analyses:",
                "  limits:",
                "    ratings: [300 kVA]",
                "    open-phases: 1",
                "    margins: [0.2, 0.5, 1.0]",
                "    transformers: [{rating: 300 kVA, no-load-loss: 400 W}]");
        Study s = org.ferromap.study.StudyReader.read(DeliverableStudies.polynomialEquipment(A, B, N, analyses), "poly.yaml");
        LimitTableResult r = table(s, LimitSettings.from(s));
        assertEquals(1, r.rows().size());
        LimitRow row = r.rows().get(0);
        double v = 12.47e3;
        double g = 400 / (v * v);
        double cPerM = (0.3 + 2 * 0.1) * 1e-9;         // Ccs + 2 Ccc, F/m
        double sPerM = 0.1e-9;                          // E_eq C_eq = Ccc
        PolynomialFolds pf = new PolynomialFolds(A, B, N, W);
        double lc = pf.cuspCapacitance(g) / cPerM;
        assertEquals(lc, row.cuspLength(), 1e-6 * lc);
        double birth = pf.birthSource(g, sPerM * lc);
        double phasePeak = v * Math.sqrt(2) / Math.sqrt(3);
        for (LimitRow.MarginLimit m : row.limits()) {
            assertEquals(m.margin() * phasePeak, m.sourcePeak(), 1e-9 * phasePeak);
            double expected = m.sourcePeak() >= birth ? lc
                    : pf.crossingLength(m.sourcePeak(), sPerM, cPerM - sPerM, g, lc * (1 + 1e-12), lc * 1e4);
            assertEquals(expected, m.length(), 1e-6 * expected, "margin " + m.margin());
        }
        assertTrue(row.limits().get(0).sourcePeak() < birth, "the low margin exercises the crossing");
        assertEquals("the study (analyses.limits.transformers)", row.noLoadLossSource());
    }

    /**
     * Plausibility [cp, with the reason derived]: with the per-unit curve fixed, the loop's per-unit
     * capacitance scales as l/S, so a limit grows about in proportion to the rating; the typical
     * no-load loss fraction changes by less than 2x between 100 and 1000 kVA, so each step's
     * log-log slope stays between 0.5 and 1.5 (smooth) and the limits increase (monotone).
     */
    @Test
    void limitsGrowSmoothlyWithRating() {
        Study s = DeliverableStudies.equipmentStudy("delta", 2, "1 %", "typical", "");
        double[] ratings = {100e3, 150e3, 225e3, 300e3, 500e3, 750e3, 1000e3};
        LimitTableResult r = table(s, LimitSettings.defaults(s).withRatings(ratings).withOpenPhases(2));
        for (int k = 1; k < ratings.length; k++) {
            double l0 = r.rows().get(k - 1).ratedLimit().length();
            double l1 = r.rows().get(k).ratedLimit().length();
            double slope = Math.log(l1 / l0) / Math.log(ratings[k] / ratings[k - 1]);
            assertTrue(l1 > l0, "monotone in rating at " + ratings[k]);
            assertTrue(slope > 0.5 && slope < 1.5, "smooth in rating: slope " + slope + " at " + ratings[k]);
        }
    }

    /**
     * Plausibility [cp]: a larger exciting current means a smaller magnetizing reactance, so a
     * longer cable before the loop resonates: the linear criterion grows in proportion to it
     * (DOMAIN.md §4 [der]) and the fold-based limit grows too (monotone, smooth: per-unit current
     * scaled with the exciting current).
     */
    @Test
    void limitsGrowWithExcitingCurrent() {
        Study s = DeliverableStudies.equipmentStudy("delta", 2, "1 %", "typical", "");
        double[] i0 = {0.004, 0.006, 0.009, 0.0135, 0.02};
        double prevLinear = 0;
        double prevFold = 0;
        double prevI0 = 0;
        for (double x : i0) {
            LimitSettings ls = LimitSettings.defaults(s).withRatings(500e3).withOpenPhases(2)
                    .withOverrides(List.of(new LimitSettings.TypicalOverride(500e3, x, Double.NaN)));
            LimitRow row = table(s, ls).rows().get(0);
            assertEquals(x, row.excitingCurrent(), 0.0);
            if (prevLinear > 0) {
                assertEquals(x / prevI0, row.linearLength() / prevLinear, 1e-12, "linear criterion in proportion to I0");
                double ratio = row.ratedLimit().length() / prevFold;
                assertTrue(ratio > 1.0 && ratio < 2.0, "fold-based limit grows smoothly with I0: ratio " + ratio);
            }
            prevLinear = row.linearLength();
            prevFold = row.ratedLimit().length();
            prevI0 = x;
        }
    }

    /**
     * With the time-domain check on, switching events at 0.95 of the rated-voltage limit all settle
     * on the single steady state the balance predicts there (no jump) [plausibility, cp: a
     * subharmonic state or a jump below the fold limit would show up as a failed check].
     */
    @Test
    void checkJustBelowTheLimitFindsThePredictedState() {
        String analyses = String.join("\n",
                "analyses:",
                "  limits:",
                "    ratings: [300 kVA]",
                "    open-phases: 1",
                "    transformers: [{rating: 300 kVA, no-load-loss: 400 W}]",
                "    confirm: {angles: 2, residual-flux: [0, 0.8]}");
        Study s = org.ferromap.study.StudyReader.read(DeliverableStudies.polynomialEquipment(A, B, N, analyses), "poly.yaml");
        LimitSettings ls = LimitSettings.from(s);
        assertNotNull(ls.confirm());
        LimitRow row = table(s, ls).rows().get(0);
        LimitRow.Check c = row.check();
        assertNotNull(c);
        assertEquals(2 * 3, c.events());
        assertEquals(0.95 * row.ratedLimit().length(), c.length(), 1e-9 * c.length());
        assertTrue(c.confirmed(), c.note());
        assertEquals(0, c.offBranch());
    }

    /** Every problem of the block is reported together, with its path in the file, before anything runs. */
    @Test
    void badSettingsAreReportedWithTheirPaths() {
        String analyses = String.join("\n",
                "analyses:",
                "  limits:",
                "    ratingz: [100 kVA]",
                "    ratings: [100 kW]",
                "    margins: [1.0, 5]",
                "    cables: [{name: x}]");
        Study s = DeliverableStudies.equipmentStudy("delta", 1, "1 %", "typical", analyses);
        StudyException e = assertThrows(StudyException.class, () -> LimitSettings.from(s));
        List<String> paths = e.problems().stream().map(Problem::path).toList();
        assertTrue(paths.contains("analyses.limits.ratingz"), paths.toString());
        assertTrue(paths.contains("analyses.limits.ratings[0]"), paths.toString());
        assertTrue(paths.contains("analyses.limits.margins"), paths.toString());
        assertTrue(paths.contains("analyses.limits.cables[0].core-to-sheath"), paths.toString());
        assertEquals(MessageKey.UNKNOWN_KEY, e.problems().get(0).key());
        Study circuit = DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", "");
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(org.ferromap.errors.FerromapException.class,
                () -> LimitSettings.from(circuit)).key());
        assertFalse(paths.isEmpty());
    }
}
