package org.ferromap.balance;

import org.ferromap.circuit.EquivalentCircuit;

/**
 * A named circuit quantity that a residual, a continuation or a map can vary. Implementations
 * return changed copies of the circuit and never mutate it. The standard ones are the constants
 * below; {@link #name()} is the machine key (as in "SERIES_CAPACITANCE"), {@link #description()}
 * the words for people.
 */
public interface CircuitParameter {

    /** Source peak voltage E_pk, V. */
    CircuitParameter SOURCE = Standard.SOURCE;
    /** Series capacitance Cs, F. */
    CircuitParameter SERIES_CAPACITANCE = Standard.SERIES_CAPACITANCE;
    /** Shunt capacitance Cg, F. */
    CircuitParameter SHUNT_CAPACITANCE = Standard.SHUNT_CAPACITANCE;
    /** Core-loss resistance Rc, ohm. */
    CircuitParameter CORE_LOSS_RESISTANCE = Standard.CORE_LOSS_RESISTANCE;
    /** Load resistance Rload, ohm. */
    CircuitParameter LOAD_RESISTANCE = Standard.LOAD_RESISTANCE;

    /** Machine key, upper case with underscores. */
    String name();

    /** SI unit symbol of the value. */
    String unit();

    /** Words for reports, such as "series capacitance". */
    String description();

    /** A copy of the circuit with this quantity set to {@code value} (in {@link #unit()}). */
    EquivalentCircuit apply(EquivalentCircuit circuit, double value);

    /** The quantity's value in the circuit, in {@link #unit()}. */
    double valueOf(EquivalentCircuit circuit);

    /** The five quantities of the single-phase equivalent circuit. */
    enum Standard implements CircuitParameter {
        SOURCE("V", "source peak voltage") {
            @Override
            public EquivalentCircuit apply(EquivalentCircuit c, double v) {
                return c.withSourcePeak(v);
            }

            @Override
            public double valueOf(EquivalentCircuit c) {
                return c.sourcePeak();
            }
        },
        SERIES_CAPACITANCE("F", "series capacitance") {
            @Override
            public EquivalentCircuit apply(EquivalentCircuit c, double v) {
                return c.withSeriesCapacitance(v);
            }

            @Override
            public double valueOf(EquivalentCircuit c) {
                return c.seriesCapacitance();
            }
        },
        SHUNT_CAPACITANCE("F", "shunt capacitance") {
            @Override
            public EquivalentCircuit apply(EquivalentCircuit c, double v) {
                return c.withShuntCapacitance(v);
            }

            @Override
            public double valueOf(EquivalentCircuit c) {
                return c.shuntCapacitance();
            }
        },
        CORE_LOSS_RESISTANCE("ohm", "core-loss resistance") {
            @Override
            public EquivalentCircuit apply(EquivalentCircuit c, double v) {
                return c.withCoreLossResistance(v);
            }

            @Override
            public double valueOf(EquivalentCircuit c) {
                return c.coreLossResistance();
            }
        },
        LOAD_RESISTANCE("ohm", "load resistance") {
            @Override
            public EquivalentCircuit apply(EquivalentCircuit c, double v) {
                return c.withLoadResistance(v);
            }

            @Override
            public double valueOf(EquivalentCircuit c) {
                return c.loadResistance();
            }
        };

        private final String unit;
        private final String description;

        Standard(String unit, String description) {
            this.unit = unit;
            this.description = description;
        }

        @Override
        public String unit() {
            return unit;
        }

        @Override
        public String description() {
            return description;
        }
    }
}
