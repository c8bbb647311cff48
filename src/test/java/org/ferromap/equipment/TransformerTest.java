package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.PerUnitBase;
import org.junit.jupiter.api.Test;

class TransformerTest {

    private static final SaturationCurve CURVE = new PolynomialCurve(1e-3, 1e-16, 9);

    private static Transformer bank(Connection c, double i0, double loss) {
        return new Transformer(500e3, 34.5e3, 60, c, CoreType.SEPARATE_PHASE_CORES, i0, loss, CURVE);
    }

    /**
     * DOMAIN.md §4 [der], practical units: X_m = 1e5 V_kV^2 / (I0% S_kVA) ohm per phase,
     * wye-equivalent, for either connection. Tolerance 1e-12 relative: a handful of operations.
     */
    @Test
    void magnetizingReactanceInPracticalUnits() {
        double practical = 1e5 * 34.5 * 34.5 / (0.8 * 500);
        for (Connection c : Connection.values()) {
            Transformer t = bank(c, 0.008, 450);
            assertEquals(practical, t.magnetizingReactance(), 1e-12 * practical);
            assertEquals(practical / (2 * Math.PI * 60), t.magnetizingInductance(), 1e-12 * practical);
        }
    }

    /**
     * Each of three phases dissipates P/3 at its phase voltage: R = 3 V_phase^2 / P (the brief's
     * definition; Joule's law). Tolerance 1e-12 relative.
     */
    @Test
    void coreLossResistanceFromNoLoadLoss() {
        double vph = 34.5e3 / Math.sqrt(3);
        Transformer t = bank(Connection.GROUNDED_WYE, 0.008, 450);
        assertEquals(3 * vph * vph / 450, t.coreLossResistance(), 1e-12 * t.coreLossResistance());
        assertEquals(Double.POSITIVE_INFINITY, bank(Connection.DELTA, 0.008, 0).coreLossResistance());
    }

    /** Nameplate bases by definition: a delta winding sits at line voltage and carries S/(3 V_line). */
    @Test
    void windingBasesFollowTheConnection() {
        Transformer y = bank(Connection.UNGROUNDED_WYE, 0.008, 450);
        Transformer d = bank(Connection.DELTA, 0.008, 450);
        assertEquals(34.5e3 / Math.sqrt(3), y.windingVoltage(), 1e-9);
        assertEquals(34.5e3, d.windingVoltage(), 1e-9);
        assertEquals(500e3 / (3 * 34.5e3), d.windingCurrent(), 1e-12);
        PerUnitBase b = y.windingBase();
        assertEquals(Math.sqrt(2) * 34.5e3 / Math.sqrt(3) / (2 * Math.PI * 60), b.flux(), 1e-9);
        assertEquals(Math.sqrt(2) * 500e3 / (Math.sqrt(3) * 34.5e3), b.current(), 1e-12);
        assertEquals(500e3 / 3, b.power(), 1e-6);
        assertEquals(Math.sqrt(2) * 34.5e3 / Math.sqrt(3), y.ratedPhasePeak(), 1e-9);
    }

    @Test
    void wyeCurveIsTheWindingCurveAndDeltaIsWrapped() {
        assertSame(CURVE, bank(Connection.GROUNDED_WYE, 0.008, 450).wyeEquivalentCurve());
        assertTrue(bank(Connection.DELTA, 0.008, 450).wyeEquivalentCurve() instanceof ScaledCurve);
    }

    /**
     * A per-unit curve scales by the winding base: at lambda = x lambda_b the current is I_b i_pu(x)
     * (definition of per unit). Needs ScaledCurve (curves branch): skipped until it evaluates.
     */
    @Test
    void perUnitCurveScalesByTheWindingBase() {
        PolynomialCurve pu = new PolynomialCurve(0.008, 0.004, 11);
        Transformer t = bank(Connection.DELTA, 0.008, 450).withPerUnitCurve(pu);
        assertTrue(t.phaseCurve() instanceof ScaledCurve);
        PerUnitBase b = t.windingBase();
        double got;
        try {
            got = t.phaseCurve().current(1.2 * b.flux());
        } catch (UnsupportedOperationException pending) {
            org.junit.jupiter.api.Assumptions.assumeTrue(false, "needs the curves branch (ScaledCurve)");
            return;
        }
        double expected = b.current() * pu.current(1.2);
        assertEquals(expected, got, 1e-12 * expected);
    }

    @Test
    void refusesImpossibleNameplates() {
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> bank(Connection.DELTA, 0, 450)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> bank(Connection.DELTA, 1.5, 450)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> bank(Connection.DELTA, 0.01, -1)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> new Transformer(-5, 34.5e3, 60, Connection.DELTA, CoreType.THREE_LEGGED, 0.01, 1, CURVE)).key());
        assertEquals(MessageKey.MISSING_KEY, assertThrows(FerromapException.class,
                () -> new Transformer(5e5, 34.5e3, 60, Connection.DELTA, CoreType.THREE_LEGGED, 0.01, 1, null)).key());
    }
}
