package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.special.Gamma;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class ArresterDutyTest {

    /**
     * A loop that is linear in practice (b lambda^3 below 1e-30 of a lambda at these fluxes) settles
     * to the phasor solution |V| = w Cs E / sqrt(G^2 + (w C - a/w)^2) [der]; an arrester that draws a
     * negligible share of the loss then sees v = V sin(wt + theta), and its energy per cycle is
     * I_ref V (V/V_ref)^alpha (T/pi) B(1/2, (alpha+2)/2) with B(1/2, (m+1)/2) = integral over 0..pi
     * of sin^m [der; the beta function from Commons Math's log-gamma]. Tolerance 1e-4 relative: the
     * arrester's own draw (1e-7 of the loss) lowers V by about that and enters raised to alpha + 1;
     * the integration is good to 1e-8.
     */
    @Test
    void energyPerCycleOfASinusoidIsTheBetaIntegral() {
        double w = 2 * Math.PI * 60;
        double cs = 0.2e-6;
        double cg = 0.05e-6;
        double e = 20e3;
        double g = 1e-5;
        double a = 1.5e-3;
        EquivalentCircuit c = EquivalentCircuit.of(w, e, cs, cg, new PolynomialCurve(a, 1e-40, 3)).withCoreLossResistance(1 / g);
        double v = w * cs * e / Math.hypot(g, w * (cs + cg) - a / w);
        double alpha = 30;
        double vref = v / 1.1;
        double lossPower = g * v * v / 2;
        double beta = Math.exp(Gamma.logGamma(0.5) + Gamma.logGamma((alpha + 2) / 2) - Gamma.logGamma((alpha + 3) / 2));
        double perAmpere = v * Math.pow(v / vref, alpha) * beta / Math.PI;   // mean power per ampere of I_ref
        double iref = 1e-7 * lossPower / perAmpere;
        ArresterModel m = ArresterModel.ofRating(vref / Math.sqrt(2)).withReferenceVoltage(vref).withReferenceCurrent(iref)
                .withAlpha(alpha).withEnergyRating(1.0);
        ArresterDuty.Result r = ArresterDuty.simulate(c, 0.0, 0.0, m, 2.0, 150, 24);
        double expected = iref * perAmpere * (2 * Math.PI / w);
        assertEquals(expected, r.energyPerCycle(), 1e-4 * expected);
        assertEquals(expected * 60 * 2.0, r.eventEnergy(), 1e-4 * expected * 120);
        assertEquals(v, r.peakVoltage(), 1e-4 * v);
        assertEquals(m.ratedVoltage() * 1.0, r.capability(), 1e-9 * r.capability());
    }

    /**
     * The open terminal's voltage to ground from the loop voltage, V_a = W - c e, c from the
     * reduction's table [der]: W = V_a + E_a/2 (ungrounded, one open, e = E_a), W = V_a - E_c (two
     * open, e = -E_c), W = V_a (grounded wye).
     */
    @Test
    void terminalOffsetFollowsTheReductionTable() {
        assertEquals(0.5, ArresterDuty.terminalOffset(Connection.DELTA, OpenPhaseCase.ONE), 0.0);
        assertEquals(0.5, ArresterDuty.terminalOffset(Connection.UNGROUNDED_WYE, OpenPhaseCase.ONE), 0.0);
        assertEquals(1.0, ArresterDuty.terminalOffset(Connection.DELTA, OpenPhaseCase.TWO), 0.0);
        assertEquals(0.0, ArresterDuty.terminalOffset(Connection.GROUNDED_WYE, OpenPhaseCase.ONE), 0.0);
        assertEquals(0.0, ArresterDuty.terminalOffset(Connection.GROUNDED_WYE, OpenPhaseCase.TWO), 0.0);
    }

    /** Power law i = I_ref (v/V_ref)^alpha, odd in v [cp, DOMAIN.md §7]; the energy rating parses as kJ/kV only. */
    @Test
    void arresterModelAndItsInput() {
        ArresterModel m = ArresterModel.ofRating(30e3).withAlpha(25);
        assertEquals(1e-3, m.current(m.referenceVoltage()), 1e-15);
        assertEquals(-1e-3 * Math.pow(1.2, 25), m.current(-1.2 * m.referenceVoltage()), 1e-12);
        assertEquals(4.5, ArresterModel.parseEnergyRating("4.5 kJ/kV"), 0.0);
        assertEquals(MessageKey.BAD_QUANTITY, assertThrows(FerromapException.class, () -> ArresterModel.parseEnergyRating("4.5 kJ")).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> m.withAlpha(1)).key());
        ArresterDuty.Result noRating = ArresterDuty.simulate(EquivalentCircuit.of(2 * Math.PI * 60, 10e3, 0.2e-6, 0.05e-6,
                new PolynomialCurve(1.5e-3, 1e-40, 3)).withCoreLossResistance(1e5), 0, 0, ArresterModel.ofRating(30e3), 1.0, 10, 2);
        assertNull(noRating.withinRating());
    }
}
