package org.ferromap.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Expected values follow from the SI prefix and unit definitions [pub: SI brochure, 9th ed.,
 * 2019] (1 km = 1e3 m, 1 uF = 1e-6 F, 1 deg = pi/180 rad). Tolerance 1e-12 relative: one decimal
 * parse and one multiplication by a power of ten, a few ulps at most.
 */
class QuantitiesTest {

    @ParameterizedTest(name = "{0} -> {2} {1}")
    @CsvSource(delimiter = ';', value = {
        "34.5 kV; VOLTAGE; 34500",
        "34.5kV; VOLTAGE; 34500",
        "0.28 uF/km; CAPACITANCE_PER_LENGTH; 2.8e-10",
        "0.28 µF/km; CAPACITANCE_PER_LENGTH; 2.8e-10",
        "280 nF/km; CAPACITANCE_PER_LENGTH; 2.8e-10",
        "0.2 uF; CAPACITANCE; 2e-7",
        "50 pF; CAPACITANCE; 5e-11",
        "500 kVA; APPARENT_POWER; 5e5",
        "2 MVA; APPARENT_POWER; 2e6",
        "0.8 %; DIMENSIONLESS; 0.008",
        "1.2 pu; DIMENSIONLESS; 1.2",
        "9; DIMENSIONLESS; 9",
        "1.33e-17; DIMENSIONLESS; 1.33e-17",
        "1.19 MOhm; RESISTANCE; 1.19e6",
        "1.19 mOhm; RESISTANCE; 1.19e-3",
        "50 kOhm; RESISTANCE; 5e4",
        "50 kΩ; RESISTANCE; 5e4",
        "60 Hz; FREQUENCY; 60",
        "2.5 km; LENGTH; 2500",
        "800 m; LENGTH; 800",
        "15.2 mm; LENGTH; 0.0152",
        "120 W; ACTIVE_POWER; 120",
        "0.05 A; CURRENT; 0.05",
        "1.6 T; FLUX_DENSITY; 1.6",
        "450 A/m; FIELD_STRENGTH; 450",
        "2 kA/m; FIELD_STRENGTH; 2000",
        "0.03 m2; AREA; 0.03",
        "0.03 m^2; AREA; 0.03",
        "300 cm2; AREA; 0.03",
        "2 ms; TIME; 0.002",
        "0.5 Wb; FLUX_LINKAGE; 0.5",
        "75 Wb-turn; FLUX_LINKAGE; 75",
        "75 Wb turn; FLUX_LINKAGE; 75",
        "75 V s; FLUX_LINKAGE; 75",
        "350 mH; INDUCTANCE; 0.35",
        "0.5 rad; ANGLE; 0.5",
        "-1.5e3 V; VOLTAGE; -1500"})
    void parsesToSi(String text, Dimension dim, double expected) {
        Quantity q = Quantities.parse(text, dim);
        assertEquals(dim, q.dimension());
        assertEquals(expected, q.value(), 1e-12 * Math.abs(expected));
    }

    @Test
    void degreesBecomeRadians() {
        // 1 deg = pi/180 rad by definition.
        assertEquals(Math.PI / 6, Quantities.angle("30 deg"), 1e-15);
        assertEquals(0.0, Quantities.angle("0 deg"), 0.0);
    }

    @Test
    void cyclesBecomeSecondsAtTheSourceFrequency() {
        // 0.5 cycle of 60 Hz is 1/120 s by definition of the period.
        assertEquals(1.0 / 120, Quantities.time("0.5 cycles", 60), 1e-15);
        assertEquals(0.002, Quantities.time("2 ms", 60), 1e-15);
    }

    @Test
    void milliAndMegaAreNotConfused() {
        assertEquals(1e6, Quantities.si("1 MOhm", Dimension.RESISTANCE), 0.0);
        assertEquals(1e-3, Quantities.si("1 mOhm", Dimension.RESISTANCE), 0.0);
        assertEquals(1e-3, Quantities.si("1 mm", Dimension.LENGTH), 1e-18);
    }

    @Test
    void voltageKeepsItsFormAndConvertsRmsToPeak() {
        Voltage pk = Quantities.voltage("28.17 kV peak");
        assertEquals(Form.PEAK, pk.form());
        assertEquals(28170, pk.peak(Form.RMS), 1e-9);
        Voltage rms = Quantities.voltage("19.92 kV rms");
        assertEquals(Form.RMS, rms.form());
        // Sinusoid: peak = sqrt(2) rms (definition of rms); 19.92 kV rms is 28.171 kV peak.
        assertEquals(19920 * Math.sqrt(2), rms.peak(Form.PEAK), 1e-9);
        assertEquals(28171.1, rms.peak(Form.PEAK), 0.05);
        assertEquals(Form.PEAK, Quantities.voltage("28.17 kVpk").form());
        assertEquals(Form.RMS, Quantities.voltage("19.92 kVrms").form());
        Voltage plain = Quantities.voltage("34.5 kV");
        assertEquals(Form.UNSPECIFIED, plain.form());
        assertEquals(34500 * Math.sqrt(2), plain.peak(Form.RMS), 1e-9);
        assertEquals(34500 / Math.sqrt(2), Quantities.voltage("34.5 kV peak").rms(Form.RMS), 1e-9);
    }

    @ParameterizedTest(name = "{0} is not {1}")
    @CsvSource(delimiter = ';', value = {
        "0.2 uF/km; CAPACITANCE",
        "0.2 uF; CAPACITANCE_PER_LENGTH",
        "500 kW; APPARENT_POWER",
        "60; FREQUENCY",
        "34.5 kV; CURRENT",
        "1.2 T peak; FLUX_DENSITY",
        "12 furlongs; LENGTH",
        "kV 34.5; VOLTAGE",
        "; VOLTAGE",
        "2 cF; CAPACITANCE",
        "1 uF/km/s; CAPACITANCE_PER_LENGTH"})
    void refusesWhatDoesNotFit(String text, Dimension dim) {
        FerromapException e = assertThrows(FerromapException.class, () -> Quantities.parse(text, dim));
        assertEquals(MessageKey.BAD_QUANTITY, e.key());
    }

    @Test
    void messageNamesTheValueAndTheExpectedKind() {
        FerromapException e = assertThrows(FerromapException.class,
                () -> Quantities.parse("0.2 uF/km", Dimension.CAPACITANCE));
        assertTrue(e.getMessage().contains("0.2 uF/km"), e.getMessage());
        assertTrue(e.getMessage().contains(Dimension.CAPACITANCE.siUnit()), e.getMessage());
    }

    @Test
    void severalKindsMayBeAllowed() {
        Quantity q = Quantities.parse("120 W", Dimension.DIMENSIONLESS, Dimension.ACTIVE_POWER);
        assertEquals(Dimension.ACTIVE_POWER, q.dimension());
        Quantity p = Quantities.parse("0.1 %", Dimension.DIMENSIONLESS, Dimension.ACTIVE_POWER);
        assertEquals(Dimension.DIMENSIONLESS, p.dimension());
        assertEquals(1e-3, p.value(), 1e-18);
    }

    @Test
    void perUnitBaseFollowsItsDefinitions() {
        // 19.92 kV rms, 8.37 A rms, 60 Hz: flux base V/omega, impedance V/I, by definition.
        double w = Constants.omega(60);
        PerUnitBase b = PerUnitBase.fromRms(19920, 8.37, w);
        assertEquals(19920 * Math.sqrt(2) / w, b.flux(), 1e-9);
        assertEquals(19920 / 8.37, b.impedance(), 1e-9);
        assertEquals(19920 * 8.37, b.power(), 1e-6);
        assertEquals(1.0, b.inductance() * w / b.impedance(), 1e-15);
        assertEquals(1.0, b.capacitance() * w * b.impedance(), 1e-15);
    }

    @Test
    void constantsAgreeWithTheSpeedOfLight() {
        // CODATA 2018: mu0 eps0 c^2 = 1 to the 1.5e-10 relative uncertainty of mu0.
        double product = Constants.MU0 * Constants.EPS0 * Constants.SPEED_OF_LIGHT * Constants.SPEED_OF_LIGHT;
        assertEquals(1.0, product, 1e-9);
    }
}
