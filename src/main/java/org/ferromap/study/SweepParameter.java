package org.ferromap.study;

import java.util.Arrays;
import java.util.List;
import org.ferromap.units.Dimension;

/**
 * The parameters a map axis may sweep, with the kind of quantity their bounds take. The
 * circuit-level ones apply to both study forms (an equipment study reduces to a circuit); the
 * equipment-level ones only to equipment studies. The map runner may add more.
 */
public enum SweepParameter {
    /** Source peak of the equivalent circuit, V (bounds must say peak or rms). */
    SOURCE("source", Dimension.VOLTAGE, false),
    /** Source angle, rad. */
    SOURCE_ANGLE("source-angle", Dimension.ANGLE, false),
    /** Series capacitance Cs, F. */
    SERIES_CAPACITANCE("series-capacitance", Dimension.CAPACITANCE, false),
    /** Shunt capacitance Cg, F. */
    SHUNT_CAPACITANCE("shunt-capacitance", Dimension.CAPACITANCE, false),
    /** Core-loss resistance, ohm. */
    CORE_LOSS_RESISTANCE("core-loss-resistance", Dimension.RESISTANCE, false),
    /** Load resistance, ohm. */
    LOAD_RESISTANCE("load-resistance", Dimension.RESISTANCE, false),
    /** Source frequency, Hz. */
    FREQUENCY("frequency", Dimension.FREQUENCY, false),
    /** Supply line-to-line voltage, V rms (equipment studies). */
    SOURCE_LINE_VOLTAGE("source-line-voltage", Dimension.VOLTAGE, true),
    /** Cable length, m (equipment studies). */
    CABLE_LENGTH("cable-length", Dimension.LENGTH, true),
    /** Transformer no-load loss, W (equipment studies). */
    NO_LOAD_LOSS("no-load-loss", Dimension.ACTIVE_POWER, true);

    private final String studyName;
    private final Dimension dimension;
    private final boolean equipmentOnly;

    SweepParameter(String studyName, Dimension dimension, boolean equipmentOnly) {
        this.studyName = studyName;
        this.dimension = dimension;
        this.equipmentOnly = equipmentOnly;
    }

    /** The name a study's map axis uses. */
    public String studyName() {
        return studyName;
    }

    /** What kind of quantity the bounds are. */
    public Dimension dimension() {
        return dimension;
    }

    /** Whether only equipment studies have this parameter. */
    public boolean equipmentOnly() {
        return equipmentOnly;
    }

    /** The names allowed for a study form. */
    public static List<String> names(boolean equipmentForm) {
        return Arrays.stream(values()).filter(p -> equipmentForm || !p.equipmentOnly)
                .map(SweepParameter::studyName).toList();
    }

    /** By study name, or null. */
    public static SweepParameter byName(String name) {
        for (SweepParameter p : values()) {
            if (p.studyName.equals(name)) {
                return p;
            }
        }
        return null;
    }
}
