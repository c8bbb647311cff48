package org.ferromap.study;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.ferromap.equipment.Cable;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.OpenPhaseCase;

/**
 * A study file that passed validation: every value in SI, every curve as a {@link CurveSpec} not yet
 * built. {@link StudyReader#read(Path)} assembles it into a {@link Study}; tools that only check a
 * file stop here ({@link StudyReader#validate(Path)}).
 *
 * @param title {@code study:}
 * @param description {@code description:}, empty when absent
 * @param file the file
 * @param frequency Hz
 * @param circuit the circuit form's values, or null
 * @param equipment the equipment form's values, or null
 * @param analyses see {@link Study#analyses()}
 * @param map see {@link Study#map()}
 * @param notes assumptions taken while reading
 */
public record ValidatedStudy(
        String title,
        String description,
        Path file,
        double frequency,
        CircuitSpec circuit,
        EquipmentSpec equipment,
        Map<String, Object> analyses,
        MapSettings map,
        List<String> notes) {

    public ValidatedStudy {
        description = description == null ? "" : description;
        analyses = analyses == null ? Map.of()
                : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(analyses));
        notes = notes == null ? List.of() : List.copyOf(notes);
    }

    /**
     * The {@code circuit:} form.
     *
     * @param sourcePeak V peak
     * @param sourceAngle rad
     * @param seriesCapacitance F
     * @param shuntCapacitance F
     * @param coreLossResistance ohm, infinite when absent
     * @param loadResistance ohm, infinite when absent
     * @param magnetizing the curve
     */
    public record CircuitSpec(double sourcePeak, double sourceAngle, double seriesCapacitance,
                              double shuntCapacitance, double coreLossResistance, double loadResistance,
                              CurveSpec magnetizing) { }

    /**
     * The {@code equipment:} form.
     *
     * @param sourceLineVoltage V rms line to line
     * @param sourceAngle rad, of supply phase a
     * @param transformer the bank's values
     * @param cable the cable (no curves: built already)
     * @param cableLength m
     * @param openPhases the case
     */
    public record EquipmentSpec(double sourceLineVoltage, double sourceAngle, TransformerSpec transformer,
                                Cable cable, double cableLength, OpenPhaseCase openPhases) { }

    /**
     * The transformer's values.
     *
     * @param rating VA
     * @param primaryVoltage V rms line to line
     * @param ratedFrequency Hz
     * @param connection primary connection
     * @param core core construction
     * @param excitingCurrent fraction of rated current
     * @param noLoadLoss W, 0 when lossless
     * @param saturation the winding curve, absolute (per-unit data converted)
     */
    public record TransformerSpec(double rating, double primaryVoltage, double ratedFrequency, Connection connection,
                                  CoreType core, double excitingCurrent, double noLoadLoss, CurveSpec saturation) { }

    /** Builds the curves and the circuit; see {@link StudyReader#assemble(ValidatedStudy)}. */
    public Study assemble() {
        return StudyReader.assemble(this);
    }
}
