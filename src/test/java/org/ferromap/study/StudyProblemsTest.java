package org.ferromap.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import java.util.stream.Collectors;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every kind of bad input is reported with its path and catalogue key (STYLE.md habits 8 and 9);
 * the tests check keys and paths, never wording.
 */
class StudyProblemsTest {

    static final String CIRCUIT = """
            study: test circuit
            frequency: 60 Hz
            circuit:
              source: 28.17 kV peak
              series-capacitance: 0.2 uF
              shunt-capacitance: 0.05 uF
              core-loss-resistance: 1.19 MOhm
              magnetizing:
                polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}
            """;

    static final String EQUIPMENT = """
            study: test equipment
            frequency: 60 Hz
            equipment:
              source: {line-voltage: 34.5 kV}
              transformer:
                rating: 500 kVA
                primary-voltage: 34.5 kV
                connection: delta
                core: separate
                exciting-current: 0.8 %
                no-load-loss: 450 W
                saturation:
                  polynomial: {a: 1.0e-3, b: 1.0e-16, n: 9}
              cable:
                kind: screened
                length: 2 km
                core-to-sheath: 0.25 uF/km
              open-phases: 1
            """;

    /** The problems of a text, which must fail validation. */
    static List<Problem> problems(String yaml) {
        StudyException e = assertThrows(StudyException.class, () -> StudyReader.validate(yaml, "test.yaml"));
        assertFalse(e.problems().isEmpty());
        return e.problems();
    }

    static void assertProblem(List<Problem> ps, String path, MessageKey key) {
        String all = ps.stream().map(p -> p.path() + " " + p.key()).collect(Collectors.joining("; "));
        assertTrue(ps.stream().anyMatch(p -> p.path().equals(path) && p.key() == key),
                "expected " + key + " at " + path + ", got: " + all);
    }

    @Test
    void validBaseTextsPass() {
        StudyReader.validate(CIRCUIT, "c.yaml");
        StudyReader.validate(EQUIPMENT, "e.yaml");
    }

    /** One edit of a valid text: replace {@code from} by {@code to}, expect {@code key} at {@code path}. */
    static Arguments c(String from, String to, String path, MessageKey key) {
        return Arguments.of(from, to, path, key);
    }

    static Stream<Arguments> circuitEdits() {
        return Stream.of(
                // missing keys
                c("  series-capacitance: 0.2 uF\n", "", "circuit.series-capacitance", MessageKey.MISSING_KEY),
                c("frequency: 60 Hz\n", "", "frequency", MessageKey.MISSING_KEY),
                c("study: test circuit\n", "", "study", MessageKey.MISSING_KEY),
                c("{a: 1.5e-3, b: 1.33e-17, n: 9}", "{a: 1.5e-3, n: 9}", "circuit.magnetizing.polynomial.b", MessageKey.MISSING_KEY),
                c("  magnetizing:\n    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}\n", "", "circuit.magnetizing", MessageKey.MISSING_KEY),
                // unknown keys
                c("  series-capacitance:", "  seires-capacitance:", "circuit.seires-capacitance", MessageKey.UNKNOWN_KEY),
                c("frequency: 60 Hz", "frequency: 60 Hz\nfrequncy: 50 Hz", "frequncy", MessageKey.UNKNOWN_KEY),
                c("{a: 1.5e-3,", "{a: 1.5e-3, c: 2,", "circuit.magnetizing.polynomial.c", MessageKey.UNKNOWN_KEY),
                // units that do not fit
                c("0.2 uF\n", "0.2 uF/km\n", "circuit.series-capacitance", MessageKey.BAD_QUANTITY),
                c("60 Hz", "60", "frequency", MessageKey.BAD_QUANTITY),
                c("1.19 MOhm", "1.19 MW", "circuit.core-loss-resistance", MessageKey.BAD_QUANTITY),
                c("28.17 kV peak", "28.17 kA peak", "circuit.source", MessageKey.BAD_QUANTITY),
                c("28.17 kV peak", "28.17 kV", "circuit.source", MessageKey.BAD_QUANTITY),
                c("0.05 uF", "{value: 0.05 uF}", "circuit.shunt-capacitance", MessageKey.BAD_QUANTITY),
                // negative or zero capacitance
                c("0.05 uF", "-0.05 uF", "circuit.shunt-capacitance", MessageKey.OUT_OF_RANGE),
                c("0.2 uF\n", "0 uF\n", "circuit.series-capacitance", MessageKey.OUT_OF_RANGE),
                // even or fractional exponent, negative coefficient
                c("n: 9", "n: 8", "circuit.magnetizing.polynomial.n", MessageKey.OUT_OF_RANGE),
                c("n: 9", "n: 8.5", "circuit.magnetizing.polynomial.n", MessageKey.BAD_QUANTITY),
                c("a: 1.5e-3", "a: -1.5e-3", "circuit.magnetizing.polynomial.a", MessageKey.OUT_OF_RANGE),
                // negative resistance
                c("1.19 MOhm", "-1.19 MOhm", "circuit.core-loss-resistance", MessageKey.OUT_OF_RANGE));
    }

    @ParameterizedTest(name = "{0} -> {1}: {3} at {2}")
    @MethodSource("circuitEdits")
    void circuitFormProblems(String from, String to, String path, MessageKey key) {
        assertProblem(problems(edit(CIRCUIT, from, to)), path, key);
    }

    static Stream<Arguments> equipmentEdits() {
        return Stream.of(
                c("connection: delta", "connection: detla", "equipment.transformer.connection", MessageKey.OUT_OF_RANGE),
                c("core: separate", "core: four-legged", "equipment.transformer.core", MessageKey.OUT_OF_RANGE),
                c("exciting-current: 0.8 %", "exciting-current: 0.8", "equipment.transformer.exciting-current", MessageKey.OUT_OF_RANGE),
                c("rating: 500 kVA", "rating: 500 kW", "equipment.transformer.rating", MessageKey.BAD_QUANTITY),
                c("0.25 uF/km", "0.25 uF", "equipment.cable.core-to-sheath", MessageKey.BAD_QUANTITY),
                c("0.25 uF/km", "-0.25 uF/km", "equipment.cable.core-to-sheath", MessageKey.OUT_OF_RANGE),
                c("core-to-sheath: 0.25 uF/km", "core-to-sheath: 0.25 uF/km\n    core-to-core: 0.08 uF/km",
                        "equipment.cable.core-to-core", MessageKey.OUT_OF_RANGE),
                c("    core-to-sheath: 0.25 uF/km\n", "", "equipment.cable", MessageKey.MISSING_KEY),
                c("    core-to-sheath: 0.25 uF/km\n", "    core-to-sheath: 0.25 uF/km\n    insulation: xlpe\n",
                        "equipment.cable", MessageKey.OUT_OF_RANGE),
                c("    core-to-sheath: 0.25 uF/km\n", "    insulation: xlpe\n    conductor-screen-diameter: 26 mm\n"
                        + "    insulation-diameter: 15 mm\n", "equipment.cable.insulation-diameter", MessageKey.OUT_OF_RANGE),
                c("    core-to-sheath: 0.25 uF/km\n", "    insulation: teflon\n    conductor-screen-diameter: 15 mm\n"
                        + "    insulation-diameter: 26 mm\n", "equipment.cable.insulation", MessageKey.OUT_OF_RANGE),
                c("kind: screened", "kind: shielded", "equipment.cable.kind", MessageKey.OUT_OF_RANGE),
                c("open-phases: 1", "open-phases: 3", "equipment.open-phases", MessageKey.OUT_OF_RANGE),
                c("open-phases: 1", "open-phase: 1", "equipment.open-phase", MessageKey.UNKNOWN_KEY),
                c("open-phases: 1", "open-phase: 1", "equipment.open-phases", MessageKey.MISSING_KEY),
                c("length: 2 km", "length: 0 km", "equipment.cable.length", MessageKey.OUT_OF_RANGE),
                c("no-load-loss: 450 W", "no-load-loss: -450 W", "equipment.transformer.no-load-loss", MessageKey.OUT_OF_RANGE),
                c("line-voltage: 34.5 kV", "line-voltage: 34.5 kV/km", "equipment.source.line-voltage", MessageKey.BAD_QUANTITY),
                c("n: 9", "n: 10", "equipment.transformer.saturation.polynomial.n", MessageKey.OUT_OF_RANGE));
    }

    @ParameterizedTest(name = "{0} -> {1}: {3} at {2}")
    @MethodSource("equipmentEdits")
    void equipmentFormProblems(String from, String to, String path, MessageKey key) {
        assertProblem(problems(edit(EQUIPMENT, from, to)), path, key);
    }

    @Test
    void nonMonotoneCurvePointsAreReportedAtThePoint() {
        String yaml = CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", """
                    piecewise:
                      - {flux: 50 Wb-turn, current: 0.05 A}
                      - {flux: 60 Wb-turn, current: 0.2 A}
                      - {flux: 70 Wb-turn, current: 0.1 A}
                      - {flux: 65 Wb-turn, current: 3 A}
                    air-core-inductance: 0.3 H\
                """);
        List<Problem> ps = problems(yaml);
        assertProblem(ps, "circuit.magnetizing.piecewise[2].current", MessageKey.NOT_MONOTONE);
        assertProblem(ps, "circuit.magnetizing.piecewise[3].flux", MessageKey.NOT_MONOTONE);
    }

    @Test
    void curvePointsAreNotRms() {
        String yaml = CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", """
                    table:
                      - {flux: 50 Wb-turn, current: 0.05 A rms}
                      - {flux: 60 Wb-turn, current: 0.2 A}\
                """);
        assertProblem(problems(yaml), "circuit.magnetizing.table[0].current", MessageKey.BAD_QUANTITY);
    }

    @Test
    void rmsTestPointsOutOfOrder() {
        String yaml = CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", """
                    rms-test:
                      - {voltage: 15.9 kV, current: 0.03 A}
                      - {voltage: 19.9 kV, current: 0.07 A}
                      - {voltage: 17.9 kV, current: 0.09 A}
                      - {voltage: 21.9 kV, current: 0.08 A}\
                """);
        List<Problem> ps = problems(yaml);
        assertProblem(ps, "circuit.magnetizing.rms-test[2].voltage", MessageKey.NOT_MONOTONE);
        assertProblem(ps, "circuit.magnetizing.rms-test[3].current", MessageKey.NOT_MONOTONE);
    }

    @Test
    void rmsTestLossGivenForSomePointsOnlyOrTooLarge() {
        String yaml = CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", """
                    rms-test:
                      - {voltage: 15.9 kV, current: 0.03 A, loss: 96 W}
                      - {voltage: 19.9 kV, current: 0.07 A}\
                """);
        assertProblem(problems(yaml), "circuit.magnetizing.rms-test[1].loss", MessageKey.MISSING_KEY);
        String big = CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", """
                    rms-test:
                      - {voltage: 15.9 kV, current: 0.03 A, loss: 600 W}\
                """);
        // 600 W / 15.9 kV = 0.038 A exceeds the measured 0.03 A: no magnetizing current would remain.
        assertProblem(problems(big), "circuit.magnetizing.rms-test[0].loss", MessageKey.OUT_OF_RANGE);
    }

    @Test
    void curveSectionNeedsExactlyOneForm() {
        assertProblem(problems(CIRCUIT.replace("    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}", "    air-core-inductance: 0.3 H")),
                "circuit.magnetizing", MessageKey.MISSING_KEY);
        assertProblem(problems(CIRCUIT.replace("n: 9}", "n: 9}\n    smooth-knee: {unsaturated-inductance: 800 H, "
                + "air-core-inductance: 0.3 H, saturation-flux: 80 Wb-turn}")), "circuit.magnetizing", MessageKey.OUT_OF_RANGE);
        // per-unit data belong to equipment studies
        assertProblem(problems(CIRCUIT.replace("n: 9}", "n: 9}\n    basis: per-unit")), "circuit.magnetizing.basis",
                MessageKey.UNKNOWN_KEY);
    }

    @Test
    void steelDataAreAbsolute() {
        String yaml = EQUIPMENT.replace("      polynomial: {a: 1.0e-3, b: 1.0e-16, n: 9}", """
                      basis: per-unit
                      steel:
                        b-h: [{b: 1.2 T, h: 20 A/m}, {b: 1.6 T, h: 60 A/m}, {b: 1.9 T, h: 2000 A/m}]
                        area: 300 cm2
                        path: 1.6 m
                        turns: 1200\
                """);
        assertProblem(problems(yaml), "equipment.transformer.saturation.basis", MessageKey.OUT_OF_RANGE);
        String bad = yaml.replace("      basis: per-unit\n", "").replace("{b: 1.6 T, h: 60 A/m}", "{b: 1.6 T, h: 10 A/m}");
        assertProblem(problems(bad), "equipment.transformer.saturation.steel.b-h[1].h", MessageKey.NOT_MONOTONE);
    }

    @Test
    void beltedCableMeasurementsMustBeConsistent() {
        String yaml = EQUIPMENT.replace("kind: screened", "kind: belted").replace("    core-to-sheath: 0.25 uF/km",
                "    one-core-to-rest: 0.2 uF/km\n    bunched-cores-to-sheath: 0.9 uF/km");
        assertProblem(problems(yaml), "equipment.cable.one-core-to-rest", MessageKey.OUT_OF_RANGE);
    }

    @Test
    void formsAreExclusive() {
        String both = CIRCUIT + EQUIPMENT.substring(EQUIPMENT.indexOf("equipment:"));
        assertProblem(problems(both), "equipment", MessageKey.OUT_OF_RANGE);
        String neither = "study: x\nfrequency: 50 Hz\n";
        assertProblem(problems(neither), "circuit", MessageKey.MISSING_KEY);
    }

    @Test
    void analysesAndMapAreChecked() {
        String yaml = CIRCUIT + """
                analyses:
                  folds:
                  simulat: {cycles: 10}
                map:
                  x: {parameter: cable-length, from: 1 km, to: 3 km, steps: 10}
                  y: {parameter: series-capacitance, from: 0.1 uF, to: 1 uF, steps: 1, scale: log}
                """;
        List<Problem> ps = problems(yaml);
        assertProblem(ps, "analyses.simulat", MessageKey.UNKNOWN_KEY);
        // cable-length exists only in equipment studies
        assertProblem(ps, "map.x.parameter", MessageKey.BAD_REQUEST);
        assertProblem(ps, "map.y.steps", MessageKey.BAD_REQUEST);
        String axis = CIRCUIT + "map:\n  x: {parameter: source, from: 10 kV, to: 30 kV peak, steps: 5}\n";
        assertProblem(problems(axis), "map.x.from", MessageKey.BAD_QUANTITY);
        String log = CIRCUIT + "map:\n  x: {parameter: source-angle, from: -1 rad, to: 1 rad, steps: 5, scale: log}\n";
        assertProblem(problems(log), "map.x.from", MessageKey.BAD_REQUEST);
        String unitless = CIRCUIT + "map:\n  x: {parameter: series-capacitance, from: 0.5, to: 0.3 uF, steps: 5}\n";
        assertProblem(problems(unitless), "map.x.to", MessageKey.BAD_REQUEST);
    }

    /** STYLE.md habit 9: every problem of a file at once, not the first only. */
    @Test
    void allProblemsAreReportedTogether() {
        String yaml = CIRCUIT.replace("60 Hz", "60 kg").replace("0.05 uF", "-1 uF").replace("n: 9", "n: 4")
                .replace("study: test circuit", "title: test circuit");
        List<Problem> ps = problems(yaml);
        assertProblem(ps, "frequency", MessageKey.BAD_QUANTITY);
        assertProblem(ps, "circuit.shunt-capacitance", MessageKey.OUT_OF_RANGE);
        assertProblem(ps, "circuit.magnetizing.polynomial.n", MessageKey.OUT_OF_RANGE);
        assertProblem(ps, "title", MessageKey.UNKNOWN_KEY);
        assertProblem(ps, "study", MessageKey.MISSING_KEY);
        assertEquals(5, ps.size(), ps.toString());
        // Each problem names its file and the value written.
        Problem shunt = ps.stream().filter(p -> p.path().equals("circuit.shunt-capacitance")).findFirst().orElseThrow();
        assertEquals("test.yaml", shunt.file());
        assertEquals("-1 uF", shunt.value());
    }

    @Test
    void unknownKeysGetASuggestion() {
        Problem p = problems(edit(CIRCUIT, "  series-capacitance:", "  series_capacitance:")).stream()
                .filter(x -> x.key() == MessageKey.UNKNOWN_KEY).findFirst().orElseThrow();
        assertTrue(p.allowed().contains("'series-capacitance'"), p.allowed());
    }

    @Test
    void unreadableFiles(@TempDir Path dir) throws IOException {
        StudyException missing = assertThrows(StudyException.class, () -> StudyReader.read(dir.resolve("nope.yaml")));
        assertEquals(MessageKey.UNREADABLE_FILE, missing.key());
        StudyException folder = assertThrows(StudyException.class, () -> StudyReader.read(dir));
        assertEquals(MessageKey.UNREADABLE_FILE, folder.key());
        Path binary = dir.resolve("binary.yaml");
        Files.write(binary, new byte[] {(byte) 0xC3, (byte) 0x28, 0, (byte) 0xFF, (byte) 0xFE});
        assertEquals(MessageKey.UNREADABLE_FILE, assertThrows(StudyException.class, () -> StudyReader.read(binary)).key());
    }

    static Stream<String> notStudies() {
        return Stream.of("study: [unclosed", "study: x\n\tfrequency: 60 Hz", "just some words, not a study",
                "- a\n- list", "study: x\nstudy: y\nfrequency: 60 Hz", "", "   \n");
    }

    @ParameterizedTest
    @MethodSource("notStudies")
    void notYamlOrNotAStudy(String yaml) {
        StudyException e = assertThrows(StudyException.class, () -> StudyReader.validate(yaml, "bad.yaml"));
        assertEquals(MessageKey.UNREADABLE_FILE, e.key());
        assertEquals(1, e.problems().size());
    }

    /** Replaces {@code from} by {@code to}; {@code from} must be in the text, or the test would prove nothing. */
    static String edit(String base, String from, String to) {
        assertTrue(base.contains(from), "test set-up: '" + from + "' not in the base text");
        return base.replace(from, to);
    }
}
