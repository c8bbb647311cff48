package org.ferromap.study;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.circuit.ReducedCircuit;
import org.ferromap.equipment.Installation;

/**
 * A study ready to analyse: read with {@link StudyReader#read(Path)}.
 *
 * @param title the study's title ({@code study:})
 * @param description free text, empty when absent
 * @param file the file it was read from (or a name given for text)
 * @param frequency source frequency, Hz
 * @param circuit the single-phase equivalent circuit, SI
 * @param equipment the installation for equipment studies; null for circuit studies
 * @param reduction how the circuit was reduced from the equipment; null for circuit studies
 * @param exactness how faithful the circuit is (GIVEN for circuit studies)
 * @param analyses the {@code analyses:} section, analysis name to its settings as plain Java values
 *        (Map, List, String, Number, Boolean or null), names checked against {@link #ANALYSIS_NAMES};
 *        empty when absent. Kept opaque here: the notebook interprets it.
 * @param map the {@code map:} section, or null
 * @param notes assumptions taken and remarks on unusual data, for reports
 */
public record Study(
        String title,
        String description,
        Path file,
        double frequency,
        EquivalentCircuit circuit,
        Installation equipment,
        ReducedCircuit reduction,
        Exactness exactness,
        Map<String, Object> analyses,
        MapSettings map,
        List<String> notes) {

    /**
     * The analyses a study may ask for: points (operating points), curve (the magnetizing curve),
     * branch (continuation of a branch), folds (fold points and the cusp), simulate (time domain),
     * map (a parameter map), limits (critical length and damping limits), compare (against other
     * studies), damping (sizing a damping resistor), odds (probability over random switching instants and residual flux of ending in
     * ferroresonance).
     */
    public static final List<String> ANALYSIS_NAMES = List.of(
            "points", "curve", "branch", "folds", "simulate", "map", "limits", "compare", "damping", "odds");

    public Study {
        description = description == null ? "" : description;
        analyses = analyses == null ? Map.of() : java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(analyses));
        notes = notes == null ? List.of() : List.copyOf(notes);
    }

    /** Whether the study was written in the equipment form. */
    public boolean isEquipmentForm() {
        return equipment != null;
    }
}
