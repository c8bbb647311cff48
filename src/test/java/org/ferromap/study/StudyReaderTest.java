package org.ferromap.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.equipment.Cable;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Reading valid studies. Expected SI values follow from the prefix definitions and the
 * nameplate base definitions (V_winding, S/(3 V_winding), peak = sqrt(2) rms), never from the
 * code under test. Tolerances: 1e-12 relative where only a parse and a product are involved.
 */
class StudyReaderTest {

    static final Path MAPS = Path.of("maps");
    static final double W60 = 2 * Math.PI * 60;

    static Stream<Path> examples() throws IOException {
        try (Stream<Path> s = Files.list(MAPS)) {
            List<Path> l = s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
            assertTrue(l.size() >= 4, "examples in maps/: " + l);
            return l.stream();
        }
    }

    @ParameterizedTest
    @MethodSource("examples")
    void everyExampleValidates(Path file) {
        ValidatedStudy v = StudyReader.validate(file);
        assertFalse(v.title().isBlank());
        assertTrue(v.circuit() != null ^ v.equipment() != null);
    }

    /**
     * Full assembly of every example. Examples whose curves need the curve implementations
     * (rms-test conversion, floating-wye composite) are skipped until the curves branch is merged,
     * then run by themselves.
     */
    @ParameterizedTest
    @MethodSource("examples")
    void everyExampleAssembles(Path file) {
        Study s;
        try {
            s = StudyReader.read(file);
        } catch (UnsupportedOperationException pending) {
            assumeTrue(false, "needs the curves branch: " + pending.getMessage());
            return;
        }
        assertNotNull(s.circuit());
        assertEquals(s.circuit().exactness(), s.exactness());
        assertEquals(file, s.file());
        if (s.isEquipmentForm()) {
            assertNotNull(s.reduction());
            assertFalse(s.notes().isEmpty());
        }
    }

    @Test
    void benchCircuitInSi() {
        Study s = StudyReader.read(MAPS.resolve("bench-circuit-kv-scale.yaml"));
        EquivalentCircuit c = s.circuit();
        assertEquals(W60, c.omega(), 1e-12 * W60);
        assertEquals(28170.0, c.sourcePeak(), 1e-12 * 28170);
        assertEquals(0.2e-6, c.seriesCapacitance(), 1e-12 * 0.2e-6);
        assertEquals(0.05e-6, c.shuntCapacitance(), 1e-12 * 0.05e-6);
        assertEquals(1.19e6, c.coreLossResistance(), 1e-12 * 1.19e6);
        assertEquals(Double.POSITIVE_INFINITY, c.loadResistance());
        assertEquals(new PolynomialCurve(1.5e-3, 1.33e-17, 9), c.magnetizing());
        assertEquals(Exactness.GIVEN, s.exactness());
        assertEquals(c.sourcePeak(), c.ratedPeak(), 0.0);
        assertNull(s.equipment());
        assertEquals(List.of("folds", "branch", "simulate"), List.copyOf(s.analyses().keySet()));
        MapAxis x = s.map().x();
        assertEquals(SweepParameter.SOURCE, x.parameter());
        assertEquals(10e3, x.from(), 1e-9);
        assertEquals(40e3, x.to(), 1e-9);
        MapAxis y = s.map().y();
        assertEquals(MapAxis.Scale.LOG, y.scale());
        assertEquals(41, y.values().length);
    }

    @Test
    void rmsSourceBecomesPeak() {
        String yaml = StudyProblemsTest.CIRCUIT.replace("28.17 kV peak", "19.92 kV rms");
        // Sinusoid: peak = sqrt(2) rms.
        assertEquals(19920 * Math.sqrt(2), StudyReader.read(yaml, "rms.yaml").circuit().sourcePeak(), 1e-9);
    }

    /** Coaxial formula [mem: IEC 60287-1-1] with the study's diameters, and the rms-test data in SI. */
    @Test
    void harlowRidgeEquipmentInSi() {
        ValidatedStudy v = StudyReader.validate(MAPS.resolve("harlow-ridge-one-open.yaml"));
        ValidatedStudy.EquipmentSpec e = v.equipment();
        assertEquals(34.5e3, e.sourceLineVoltage(), 1e-9);
        assertEquals(2500, e.cableLength(), 1e-9);
        double c = 2 * Math.PI * 8.8541878128e-12 * 2.5 / Math.log(37.6 / 20.0);
        assertEquals(c, e.cable().coreToSheath(), 1e-12 * c);
        assertEquals(Cable.Kind.SCREENED, e.cable().kind());
        ValidatedStudy.TransformerSpec t = e.transformer();
        assertEquals(Connection.UNGROUNDED_WYE, t.connection());
        assertEquals(CoreType.SEPARATE_PHASE_CORES, t.core());
        assertEquals(0.008, t.excitingCurrent(), 1e-15);
        assertEquals(450, t.noLoadLoss(), 0.0);
        CurveSpec.RmsTest r = (CurveSpec.RmsTest) t.saturation();
        assertEquals(W60, r.omega(), 1e-12 * W60);
        assertArrayEquals(new double[] {15940, 17930, 19920, 21910, 23900}, r.voltageRms(), 1e-9);
        assertArrayEquals(new double[] {0.030, 0.042, 0.067, 0.140, 0.420}, r.currentRms(), 1e-15);
        assertArrayEquals(new double[] {96, 122, 150, 185, 225}, r.lossWatts(), 1e-12);
        assertEquals(0.26, r.airCoreInductance(), 1e-15);
        assertEquals(1, e.openPhases().openPhases());
        assertEquals(List.of("folds", "simulate", "limits"), List.copyOf(v.analyses().keySet()));
        assertEquals(SweepParameter.CABLE_LENGTH, v.map().x().parameter());
        assertEquals(SweepParameter.NO_LOAD_LOSS, v.map().y().parameter());
    }

    @Test
    void rmsTestVoltageWrittenAsPeakIsConverted() {
        String yaml = StudyProblemsTest.CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", """
                    rms-test:
                      - {voltage: 20 kV peak, current: 0.05 A}
                      - {voltage: 25 kV, current: 0.2 A}\
                """);
        CurveSpec.RmsTest r = (CurveSpec.RmsTest) StudyReader.validate(yaml, "t.yaml").circuit().magnetizing();
        assertEquals(20e3 / Math.sqrt(2), r.voltageRms()[0], 1e-9);
        assertEquals(25e3, r.voltageRms()[1], 1e-9);
        assertNull(r.lossWatts());
        assertTrue(Double.isNaN(r.airCoreInductance()));
    }

    /**
     * Per-unit tables convert with the winding base: a delta winding at line voltage V, flux base
     * sqrt(2) V / w, current base sqrt(2) S / (3 V) (nameplate definitions).
     */
    @Test
    void perUnitTableConvertsWithTheWindingBase() {
        ValidatedStudy v = StudyReader.validate(MAPS.resolve("quarry-lane-grain-oriented.yaml"));
        ValidatedStudy.TransformerSpec t = v.equipment().transformer();
        CurveSpec.Points p = (CurveSpec.Points) t.saturation();
        assertTrue(p.tabulated());
        double fluxBase = Math.sqrt(2) * 24.9e3 / W60;
        double currentBase = Math.sqrt(2) * 1000e3 / (3 * 24.9e3);
        assertEquals(1.0 * fluxBase, p.flux()[2], 1e-12 * fluxBase);
        assertEquals(0.009 * currentBase, p.current()[2], 1e-12 * currentBase);
        assertEquals(1.4 * fluxBase, p.flux()[6], 1e-12 * fluxBase);
        assertEquals(0.033 * fluxBase / currentBase, p.airCoreInductance(), 1e-12 * fluxBase / currentBase);
        // no-load-loss: typical -> EU 548/2014 Tier 2 for 1000 kVA, 693 W [mem], and a note saying so.
        assertEquals(693.0, t.noLoadLoss(), 0.0);
        assertTrue(v.notes().stream().anyMatch(n -> n.contains("548/2014")), v.notes().toString());
    }

    /**
     * A per-unit polynomial i/I_b = a x + b x^n, x = lambda/lambda_b, converted to SI must give the
     * same current at the same flux (evaluated both ways, on the wye winding of 34.5 kV, 500 kVA).
     */
    @Test
    void perUnitPolynomialConverts() {
        String yaml = StudyProblemsTest.EQUIPMENT.replace("connection: delta", "connection: grounded-wye")
                .replace("      polynomial: {a: 1.0e-3, b: 1.0e-16, n: 9}",
                        "      basis: per-unit\n      polynomial: {a: 0.008, b: 0.004, n: 11}");
        CurveSpec.Polynomial p = (CurveSpec.Polynomial) StudyReader.validate(yaml, "pu.yaml").equipment()
                .transformer().saturation();
        double vw = 34.5e3 / Math.sqrt(3);
        double lb = Math.sqrt(2) * vw / W60;
        double ib = Math.sqrt(2) * 500e3 / (3 * vw);
        for (double x : new double[] {0.3, 1.0, 1.25}) {
            double expected = ib * (0.008 * x + 0.004 * Math.pow(x, 11));
            double got = new PolynomialCurve(p.a(), p.b(), p.n()).current(x * lb);
            assertEquals(expected, got, 1e-12 * expected);
        }
        assertEquals(11, p.n());
    }

    @Test
    void smoothKneePerUnitAndBeltedCableFromMeasurements() {
        ValidatedStudy v = StudyReader.validate(MAPS.resolve("millbeck-belted-grounded-wye.yaml"));
        ValidatedStudy.EquipmentSpec e = v.equipment();
        // DOMAIN.md §5 [der]: C'cs = C2/3, C'cc = (C1 - C2/3)/2 with C1 = 0.52, C2 = 0.96 uF/km.
        assertEquals(0.32e-9, e.cable().coreToSheath(), 1e-12 * 0.32e-9);
        assertEquals(0.10e-9, e.cable().coreToCore(), 1e-12 * 0.10e-9);
        CurveSpec.SmoothKnee k = (CurveSpec.SmoothKnee) e.transformer().saturation();
        double w50 = 2 * Math.PI * 50;
        double vw = 11e3 / Math.sqrt(3);
        double zb = vw / (300e3 / (3 * vw));
        assertEquals(70 * zb / w50, k.unsaturatedInductance(), 1e-12 * 70 * zb / w50);
        assertEquals(1.15 * Math.sqrt(2) * vw / w50, k.saturationFlux(), 1e-12);
        assertEquals(List.of("folds", "simulate", "damping"), List.copyOf(v.analyses().keySet()));
        assertNull(v.map());
    }

    /**
     * The Millbeck reduction: grounded wye, separate cores, one open phase on belted cable is an
     * EXACT row with E_eq = r/(1+2r), C_eq = Ccs + 2Ccc (DOMAIN.md §1.2 [der]); the circuit keeps the
     * supply (11 kV, 50 Hz) as its source, so Cs = E_eq C_eq = Ccc.
     */
    @Test
    void millbeckReducesExactly() {
        Study s = StudyReader.read(MAPS.resolve("millbeck-belted-grounded-wye.yaml"));
        assertEquals(Exactness.EXACT, s.exactness());
        EquivalentCircuit c = s.circuit();
        double ccs = 0.32e-9 * 1200;
        double ccc = 0.10e-9 * 1200;
        assertEquals(ccc, c.seriesCapacitance(), 1e-12 * ccc);
        assertEquals(ccs + 2 * ccc, c.totalCapacitance(), 1e-12 * (ccs + 2 * ccc));
        assertEquals(11e3 * Math.sqrt(2) / Math.sqrt(3), c.sourcePeak(), 1e-9);
        assertEquals(2 * Math.PI * 50, c.omega(), 1e-12);
        // R = V_line^2 / P per phase (3 V_phase^2 / P); the loss is typical for 300 kVA.
        double p = s.equipment().transformer().noLoadLoss();
        assertEquals(11e3 * 11e3 / p, c.coreLossResistance(), 1e-9 * c.coreLossResistance());
    }

    /** The two Quarry Lane files must differ only in the core design (the brief of the pair). */
    @Test
    void quarryLanePairDiffersOnlyInCoreDesign() {
        ValidatedStudy go = StudyReader.validate(MAPS.resolve("quarry-lane-grain-oriented.yaml"));
        ValidatedStudy am = StudyReader.validate(MAPS.resolve("quarry-lane-amorphous.yaml"));
        ValidatedStudy.EquipmentSpec a = go.equipment();
        ValidatedStudy.EquipmentSpec b = am.equipment();
        assertEquals(a.sourceLineVoltage(), b.sourceLineVoltage());
        assertEquals(a.cable(), b.cable());
        assertEquals(a.cableLength(), b.cableLength());
        assertEquals(a.openPhases(), b.openPhases());
        assertEquals(go.frequency(), am.frequency());
        assertEquals(go.map(), am.map());
        ValidatedStudy.TransformerSpec ta = a.transformer();
        ValidatedStudy.TransformerSpec tb = b.transformer();
        assertEquals(ta.rating(), tb.rating());
        assertEquals(ta.primaryVoltage(), tb.primaryVoltage());
        assertEquals(ta.connection(), tb.connection());
        assertEquals(ta.core(), tb.core());
        assertTrue(tb.excitingCurrent() < ta.excitingCurrent());
        assertTrue(tb.noLoadLoss() < ta.noLoadLoss());
    }

    @Test
    void readsFromAFile(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("s.yaml");
        Files.writeString(f, StudyProblemsTest.CIRCUIT);
        Study s = StudyReader.read(f);
        assertEquals(f, s.file());
        assertEquals("test circuit", s.title());
        assertTrue(s.notes().isEmpty(), s.notes().toString());
        Files.writeString(f, StudyProblemsTest.CIRCUIT.replace("  core-loss-resistance: 1.19 MOhm\n", ""));
        Study lossless = StudyReader.read(f);
        assertEquals(Double.POSITIVE_INFINITY, lossless.circuit().coreLossResistance());
        assertEquals(1, lossless.notes().size());
    }

    /** Grid definitions: evenly spaced in value (linear) or in log value (log), ends exact. */
    @Test
    void axisValues() {
        MapAxis lin = new MapAxis(SweepParameter.CABLE_LENGTH, 100, 500, 5, MapAxis.Scale.LINEAR, false);
        assertArrayEquals(new double[] {100, 200, 300, 400, 500}, lin.values(), 1e-12);
        MapAxis log = new MapAxis(SweepParameter.CABLE_LENGTH, 10, 1000, 3, MapAxis.Scale.LOG, false);
        assertArrayEquals(new double[] {10, 100, 1000}, log.values(), 1e-12);
    }

    @Test
    void perUnitAxis() {
        MapAxis y = StudyReader.validate(MAPS.resolve("quarry-lane-amorphous.yaml")).map().y();
        assertTrue(y.perUnit());
        assertEquals(0.9, y.from(), 0.0);
        assertEquals(SweepParameter.SOURCE_LINE_VOLTAGE, y.parameter());
    }
}
