package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class CableTest {

    /**
     * DOMAIN.md §9.6 [der]: eps_r 2.5, d_c 15.2 mm, D_i 26.2 mm gives 0.2554 uF/km. The value is
     * quoted to 4 digits, so the tolerance is half a unit of the last digit, 0.00005 uF/km. (The
     * rounded practical form eps_r/(18 ln) gives 0.2551 and would fail: the check also pins the
     * use of the exact 2 pi eps0.)
     */
    @Test
    void coaxialCapacitanceMatchesTheDerivedCheckValue() {
        double perMetre = Cable.coaxialCapacitance(2.5, 15.2e-3, 26.2e-3);
        assertEquals(0.2554, perMetre * 1e9, 0.00005); // F/m -> uF/km is x 1e9
        Cable c = Cable.screened(Insulation.XLPE, 15.2e-3, 26.2e-3);
        assertEquals(perMetre, c.coreToSheath(), 1e-24);
        assertEquals(0.0, c.ratio(), 0.0);
    }

    /**
     * The practical form eps_r / (18 ln(D_i/d_c)) uF/km [mem: IEC 60287-1-1] rounds 1/(2 pi eps0)
     * (17.975 in these units) to 18, so it must agree within 0.2 % (18/17.975 - 1 = 0.14 %).
     */
    @Test
    void agreesWithThePracticalFormula() {
        for (Insulation ins : Insulation.values()) {
            double practical = ins.permittivity() / (18 * Math.log(30.0 / 12.0)); // uF/km
            double exact = Cable.coaxialCapacitance(ins.permittivity(), 12e-3, 30e-3) * 1e9;
            assertEquals(practical, exact, 0.002 * practical, ins.name());
        }
    }

    /** Permittivities as DOMAIN.md §5 lists them [mem: IEC 60287-1-1]; exact table entries. */
    @Test
    void permittivityTable() {
        assertEquals(2.5, Insulation.fromName("xlpe").permittivity(), 0.0);
        assertEquals(3.0, Insulation.fromName("filled-xlpe").permittivity(), 0.0);
        assertEquals(3.0, Insulation.fromName("EPR").permittivity(), 0.0);
        assertEquals(8.0, Insulation.fromName("pvc").permittivity(), 0.0);
        assertEquals(2.3, Insulation.fromName("pe").permittivity(), 0.0);
        assertEquals(4.0, Insulation.fromName("paper").permittivity(), 0.0);
        assertEquals(3.6, Insulation.fromName("oil-filled-paper").permittivity(), 0.0);
        assertEquals(4.0, Insulation.fromName("butyl-rubber").permittivity(), 0.0);
        assertEquals(MessageKey.OUT_OF_RANGE,
                assertThrows(FerromapException.class, () -> Insulation.fromName("kapton")).key());
    }

    /**
     * DOMAIN.md §5 [der]: C1 = C'cs + 2 C'cc and C2 = 3 C'cs, so measurements built from known
     * C'cs, C'cc must return them. Tolerance 1e-15 relative: two additions and a division.
     */
    @Test
    void beltedCableFromMeasurementsRecoversItsCapacitances() {
        double ccs = 0.30e-9;
        double ccc = 0.09e-9;
        Cable c = Cable.beltedFromMeasurements(ccs + 2 * ccc, 3 * ccs);
        assertEquals(ccs, c.coreToSheath(), 1e-15 * ccs);
        assertEquals(ccc, c.coreToCore(), 1e-15 * ccc);
        assertEquals(0.3, c.ratio(), 1e-12);
        // Operating capacitance C'cs + 3 C'cc [der].
        assertEquals(ccs + 3 * ccc, c.operatingCapacitance(), 1e-24);
    }

    @Test
    void refusesInconsistentData() {
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> Cable.beltedFromMeasurements(0.1e-9, 0.9e-9)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> Cable.screened(-0.2e-9)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> Cable.belted(0.2e-9, 0.0)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> new Cable(Cable.Kind.SCREENED, 0.2e-9, 0.05e-9, "")).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> Cable.coaxialCapacitance(2.5, 26.2e-3, 15.2e-3)).key());
    }
}
