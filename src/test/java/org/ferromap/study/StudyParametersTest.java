package org.ferromap.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class StudyParametersTest {

    private static final Path EQUIPMENT = Path.of("maps/quarry-lane-grain-oriented.yaml");
    private static final Path CIRCUIT = Path.of("maps/bench-circuit-kv-scale.yaml");

    /** Lumped cable capacitance is C' times length (DOMAIN.md §5 [der]); the loop capacitance scales with it. */
    @Test
    void cableLengthScalesTheLoopCapacitanceLinearly() {
        StudyParameters sp = new StudyParameters(StudyReader.read(EQUIPMENT));
        double l = sp.valueOf(SweepParameter.CABLE_LENGTH);
        EquivalentCircuit c1 = sp.circuit(SweepParameter.CABLE_LENGTH, l);
        EquivalentCircuit c3 = sp.circuit(SweepParameter.CABLE_LENGTH, 3 * l);
        assertEquals(3 * c1.totalCapacitance(), c3.totalCapacitance(), 1e-12 * c3.totalCapacitance());
        assertEquals(c1.sourcePeak(), c3.sourcePeak(), 0.0);
        assertEquals(c1.magnetizing(), c3.magnetizing(), "loop curve reused");
    }

    @Test
    void twoParametersCombine() {
        StudyParameters sp = new StudyParameters(StudyReader.read(CIRCUIT));
        EquivalentCircuit c = sp.circuit(SweepParameter.SOURCE, 10e3, SweepParameter.SERIES_CAPACITANCE, 1e-7);
        assertEquals(10e3, c.sourcePeak(), 0.0);
        assertEquals(1e-7, c.seriesCapacitance(), 0.0);
    }

    @Test
    void equipmentParametersAreRefusedForCircuitStudies() {
        StudyParameters sp = new StudyParameters(StudyReader.read(CIRCUIT));
        FerromapException e = assertThrows(FerromapException.class, () -> sp.parameter("cable-length"));
        assertEquals(MessageKey.BAD_REQUEST, e.key());
        assertThrows(FerromapException.class, () -> sp.parameter("flux-capacitor"));
        FerromapException neg = assertThrows(FerromapException.class,
                () -> sp.circuit(SweepParameter.SERIES_CAPACITANCE, -1e-9));
        assertEquals(MessageKey.OUT_OF_RANGE, neg.key());
    }
}
