package org.ferromap.orbits;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The scalar circuit parameters an orbit branch or a sweep can follow, each read from and set on an
 * {@link EquivalentCircuit} through its {@code withX} copies (the circuit is never mutated). The
 * voltage base of the per-unit model is the circuit's rated peak, which none of these changes, so
 * the scaled states of all points of a branch share one base.
 */
public enum CircuitParameter {
    /** E_pk, peak source voltage, V. */
    SOURCE_PEAK("source peak", "V"),
    /** Cs, series capacitance, F. */
    SERIES_CAPACITANCE("series capacitance", "F"),
    /** Cg, shunt capacitance, F. */
    SHUNT_CAPACITANCE("shunt capacitance", "F"),
    /** Rc, core-loss resistance, ohm. */
    CORE_LOSS_RESISTANCE("core-loss resistance", "ohm"),
    /** Rload, load resistance, ohm. */
    LOAD_RESISTANCE("load resistance", "ohm");

    private final String label;
    private final String unit;

    CircuitParameter(String label, String unit) {
        this.label = label;
        this.unit = unit;
    }

    /** Words for messages and axis titles. */
    public String label() {
        return label;
    }

    /** SI unit symbol. */
    public String unit() {
        return unit;
    }

    /** The parameter's value in a circuit, SI. */
    public double valueIn(EquivalentCircuit c) {
        return switch (this) {
            case SOURCE_PEAK -> c.sourcePeak();
            case SERIES_CAPACITANCE -> c.seriesCapacitance();
            case SHUNT_CAPACITANCE -> c.shuntCapacitance();
            case CORE_LOSS_RESISTANCE -> c.coreLossResistance();
            case LOAD_RESISTANCE -> c.loadResistance();
        };
    }

    /**
     * A copy of the circuit with this parameter set.
     *
     * @throws FerromapException OUT_OF_RANGE for a value the circuit does not allow, saying which
     */
    public EquivalentCircuit apply(EquivalentCircuit c, double value) {
        return switch (this) {
            case SOURCE_PEAK -> c.withSourcePeak(value);
            case SERIES_CAPACITANCE -> c.withSeriesCapacitance(value);
            case SHUNT_CAPACITANCE -> c.withShuntCapacitance(value);
            case CORE_LOSS_RESISTANCE -> c.withCoreLossResistance(value);
            case LOAD_RESISTANCE -> c.withLoadResistance(value);
        };
    }

    /** Parses a name such as "source-peak", "SOURCE_PEAK" or "series capacitance". */
    public static CircuitParameter parse(String name) {
        String key = name == null ? "" : name.trim().toUpperCase(java.util.Locale.ROOT).replace('-', '_').replace(' ', '_');
        for (CircuitParameter p : values()) {
            if (p.name().equals(key)) {
                return p;
            }
        }
        throw new FerromapException(MessageKey.BAD_REQUEST, "unknown circuit parameter '" + name
                + "'; expected one of source-peak, series-capacitance, shunt-capacitance, core-loss-resistance, load-resistance");
    }
}
