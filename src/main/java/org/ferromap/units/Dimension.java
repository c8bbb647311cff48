package org.ferromap.units;

/**
 * The kinds of quantity a study may write, each with its SI unit and an example the error
 * messages quote. Kinds that share SI base dimensions (W and VA, Wb and V s) are kept apart on
 * purpose: a transformer rating written in W is a mistake worth reporting.
 */
public enum Dimension {
    DIMENSIONLESS("a plain number", "1", "0.8 %, 1.2 pu or 9"),
    VOLTAGE("a voltage", "V", "34.5 kV"),
    CURRENT("a current", "A", "0.05 A"),
    ACTIVE_POWER("an active power", "W", "120 W"),
    APPARENT_POWER("an apparent power", "VA", "500 kVA"),
    ENERGY("an energy", "J", "2.5 kJ"),
    RESISTANCE("a resistance", "ohm", "1.19 MOhm"),
    CONDUCTANCE("a conductance", "S", "2 uS"),
    CAPACITANCE("a capacitance", "F", "0.2 uF"),
    CAPACITANCE_PER_LENGTH("a capacitance per length", "F/m", "0.28 uF/km"),
    INDUCTANCE("an inductance", "H", "350 mH"),
    FREQUENCY("a frequency", "Hz", "60 Hz"),
    ANGLE("an angle", "rad", "30 deg or 0.5 rad"),
    LENGTH("a length", "m", "2.5 km or 15.2 mm"),
    AREA("an area", "m2", "0.03 m2 or 300 cm2"),
    TIME("a time", "s", "2 ms"),
    CYCLES("a number of source cycles", "cycles", "0.5 cycles"),
    FLUX_LINKAGE("a flux linkage", "Wb-turn", "75 Wb-turn or 75 V s"),
    FLUX_DENSITY("a magnetic flux density", "T", "1.6 T"),
    FIELD_STRENGTH("a magnetic field strength", "A/m", "450 A/m");

    private final String noun;
    private final String siUnit;
    private final String example;

    Dimension(String noun, String siUnit, String example) {
        this.noun = noun;
        this.siUnit = siUnit;
        this.example = example;
    }

    /** Words for messages, e.g. "a capacitance". */
    public String noun() {
        return noun;
    }

    /** The SI unit the parsed value is expressed in. */
    public String siUnit() {
        return siUnit;
    }

    /** An example as a user would write it. */
    public String example() {
        return example;
    }

    /** "a capacitance (F), e.g. 0.2 uF". */
    public String describe() {
        return noun + " (" + siUnit + "), e.g. " + example;
    }
}
