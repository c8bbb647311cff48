package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class LinearCriterionTest {

    private static Installation site(Connection c, Cable cable, double lengthM, OpenPhaseCase open) {
        Transformer t = new Transformer(500e3, 34.5e3, 60, c, CoreType.SEPARATE_PHASE_CORES, 0.008, 450,
                new PolynomialCurve(1e-3, 1e-16, 9));
        return new Installation(34.5e3, 0.0, 60, t, cable, lengthM, open);
    }

    /**
     * DOMAIN.md §4 [der] in its practical units: l_crit[km] = 10 I0% S_kVA / (K w C'eq[uF/km] V_kV^2),
     * C'eq = C'cs for one open phase of an ungrounded primary on screened cable. The code works
     * in SI, so agreement checks the unit handling. Tolerance 1e-12 relative: a handful of operations.
     */
    @Test
    void criticalLengthMatchesThePracticalFormula() {
        double cUfPerKm = 0.2554;
        Cable cable = Cable.screened(cUfPerKm * 1e-9);
        double w = 2 * Math.PI * 60;
        LinearCriterion.Result r = LinearCriterion.hopkinson().evaluate(site(Connection.DELTA, cable, 2500, OpenPhaseCase.ONE));
        double practicalKm = 10 * 0.8 * 500 / (40 * w * cUfPerKm * 34.5 * 34.5);
        assertEquals(practicalKm * 1e3, r.criticalLength(), 1e-12 * practicalKm * 1e3);
        assertEquals(40.0, r.threshold(), 0.0);
        assertTrue(r.thresholdSource().contains("Hopkinson"));
        assertFalse(r.withinLimit(), "2.5 km is far beyond a few tens of metres");
    }

    /** At l_crit the ratio X_c / X_m equals K, by the definition of l_crit [der]. */
    @Test
    void ratioEqualsTheThresholdAtTheCriticalLength() {
        Cable cable = Cable.belted(0.30e-9, 0.09e-9);
        for (Connection c : Connection.values()) {
            for (OpenPhaseCase open : new OpenPhaseCase[] {OpenPhaseCase.ONE, OpenPhaseCase.TWO}) {
                for (LinearCriterion crit : new LinearCriterion[] {LinearCriterion.hopkinson(),
                        LinearCriterion.linearResonance(), LinearCriterion.hopkinson().withThreshold(3.0)}) {
                    double l = crit.evaluate(site(c, cable, 1000, open)).criticalLength();
                    LinearCriterion.Result at = crit.evaluate(site(c, cable, l, open));
                    assertEquals(at.threshold(), at.ratio(), 1e-12 * at.threshold(), c + " " + open + " " + crit);
                }
            }
        }
    }

    /**
     * The linear-resonance threshold is L_eq/Lm of the case (DOMAIN.md §1.2 [der]): 1.5 for ungrounded
     * primaries, 1 for grounded wye. There X_c,eq = X_L,eq exactly.
     */
    @Test
    void linearResonanceThresholdIsTheInductanceFactor() {
        Cable cable = Cable.belted(0.30e-9, 0.09e-9);
        assertEquals(1.5, LinearCriterion.linearResonance().evaluate(site(Connection.DELTA, cable, 1000, OpenPhaseCase.ONE)).threshold(), 0.0);
        assertEquals(1.5, LinearCriterion.linearResonance().evaluate(site(Connection.UNGROUNDED_WYE, cable, 1000, OpenPhaseCase.TWO)).threshold(), 0.0);
        assertEquals(1.0, LinearCriterion.linearResonance().evaluate(site(Connection.GROUNDED_WYE, cable, 1000, OpenPhaseCase.ONE)).threshold(), 0.0);
    }

    /** DOMAIN.md §1.2: grounded wye with separate cores on screened cable is not driven at all. */
    @Test
    void undrivenCaseHasNoCriticalLength() {
        LinearCriterion.Result r = LinearCriterion.hopkinson()
                .evaluate(site(Connection.GROUNDED_WYE, Cable.screened(0.25e-9), 10_000, OpenPhaseCase.ONE));
        assertFalse(r.driven());
        assertEquals(Double.POSITIVE_INFINITY, r.criticalLength());
        assertTrue(r.withinLimit());
    }

    @Test
    void thresholdMustBePositive() {
        assertEquals(MessageKey.OUT_OF_RANGE,
                assertThrows(FerromapException.class, () -> LinearCriterion.hopkinson().withThreshold(0)).key());
    }
}
