package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.ferromap.circuit.Exactness;
import org.ferromap.report.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@code ferromap simulate} run in-process: the JSON contract for a circuit and an equipment
 * study, the undetermined outcome of a failed integration, and bad input (exit 2, nothing written).
 */
class SimulateCommandTest {

    @TempDir
    Path tmp;

    /**
     * A circuit whose magnetizing branch is linear in practice: i = a lambda + b lambda^9 with
     * b lambda^8 / a about 1e-11 at the flux reached (a few tens of Wb-turn), so the steady state
     * is the phasor solution of DOMAIN.md §1.1 with i = lambda / L, L = 1/a = 100 H.
     */
    static final String LINEAR = """
            study: Nearly linear circuit
            frequency: 50 Hz
            circuit:
              source: 10 kV peak
              source-angle: 0 deg
              series-capacitance: 1 uF
              shunt-capacitance: 0.5 uF
              core-loss-resistance: 100 kOhm
              magnetizing:
                polynomial: {a: 0.01, b: 1e-22, n: 9}
            """;

    /**
     * Grounded-wye bank on belted cable (r = 0.1), one phase open: driven through Ccc, and the
     * reduction is exact (DOMAIN.md §1.2). Invented equipment, only input; the high no-load loss
     * (1 % of rating) damps the transient so the network settles in under a hundred periods.
     */
    static final String GROUNDED_WYE_BELTED = """
            study: Test bank, grounded wye on belted cable
            frequency: 50 Hz
            equipment:
              source:
                line-voltage: 11 kV
              transformer:
                rating: 300 kVA
                primary-voltage: 11 kV
                connection: grounded-wye
                core: separate
                exciting-current: 1.5 %
                no-load-loss: 3000 W
                saturation:
                  polynomial: {a: 0.0093, b: 4.9e-15, n: 9}
              cable:
                kind: belted
                length: 3 km
                core-to-sheath: 0.3 uF/km
                core-to-core: 0.03 uF/km
              open-phases: 1
            """;

    /** The same bank on screened cable: grounded wye with r = 0 has no drive (DOMAIN.md §1.2). */
    static final String GROUNDED_WYE_SCREENED = GROUNDED_WYE_BELTED
            .replace("kind: belted", "kind: screened").replace("    core-to-core: 0.03 uF/km\n", "");

    /** A stiff circuit: g = G / (w C) = 1 / (3.2e-3 * 314.16 * 1e-6), about 1e6 (no explicit method keeps up). */
    static final String STIFF = """
            study: Stiff circuit
            frequency: 50 Hz
            circuit:
              source: 10 kV peak
              series-capacitance: 1 uF
              shunt-capacitance: 0 uF
              core-loss-resistance: 3.2 mOhm
              magnetizing:
                polynomial: {a: 0.01, b: 1e-22, n: 9}
            """;

    record Run(int code, String out, String err) {
        JsonNode json() throws Exception {
            return Json.mapper().readTree(out);
        }
    }

    Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Run(code, out.toString(), err.toString());
    }

    Path study(String name, String yaml) throws Exception {
        Path p = tmp.resolve(name + ".yaml");
        Files.writeString(p, yaml);
        return p;
    }

    Path out() {
        return tmp.resolve("out");
    }

    static final List<String> MODES = List.of("normal", "fundamental", "subharmonic", "quasi-periodic", "chaotic",
            "undetermined");

    /** The fields the issue names, with their JSON types. */
    static void assertContract(JsonNode j) {
        assertTrue(MODES.contains(j.get("mode").asText()), j.get("mode").asText());
        assertTrue(j.get("period").isInt());
        assertTrue(j.get("period").asInt() >= 0);
        assertTrue(j.get("peakVoltage").isNumber() || j.get("peakVoltage").isNull());
        assertTrue(j.get("peakVoltagePu").isNumber() || j.get("peakVoltagePu").isNull());
        assertTrue(j.get("lyapunov").isNumber() || j.get("lyapunov").isNull());
        assertTrue(j.get("section").isArray());
        for (JsonNode p : j.get("section")) {
            assertTrue(p.isArray() && p.size() == 2 && p.get(0).isNumber() && p.get(1).isNumber(), p.toString());
        }
        assertTrue(j.get("reason").isTextual());
        assertFalse(j.get("reason").asText().isBlank());
        assertTrue(j.get("exactness").isTextual());
        assertTrue(j.get("model").isTextual());
    }

    @Test
    void circuitStudyMatchesTheLinearSteadyState() throws Exception {
        Path s = study("linear", LINEAR);
        Run r = run("simulate", s.toString(), "--out", out().toString(), "--source-angle", "30", "--json");
        assertEquals(Main.OK, r.code(), r.err());
        JsonNode j = r.json();
        assertContract(j);
        assertEquals("single-phase", j.get("model").asText());
        assertEquals("normal", j.get("mode").asText());
        assertEquals(1, j.get("period").asInt());
        assertTrue(j.get("certified").asBoolean());
        assertEquals(Exactness.GIVEN.explanation(), j.get("exactness").asText());

        // Phasor solution [der, DOMAIN.md §1.1 with i = lambda / L]: V = H E e^{j phi},
        // H = j w Cs / (G + j (w C - 1/(w L))).
        double w = 2 * Math.PI * 50;
        double cs = 1e-6;
        double c = 1.5e-6;
        double g = 1e-5;
        double b = w * c - 1 / (w * 100.0);
        double gain = w * cs / Math.hypot(g, b);
        double arg = Math.PI / 2 - Math.atan2(b, g);
        double e = 10e3;
        // 1e-4 relative: the b term moves the state by ~1e-11 and the integration by ~1e-9; the
        // peak is read from 128 samples a period refined by a parabola (~1e-6 for a sinusoid).
        assertEquals(gain * e, j.get("peakVoltage").asDouble(), 1e-4 * gain * e);
        assertEquals(gain, j.get("peakVoltagePu").asDouble(), 1e-4 * gain);
        // 0.01 deg: the line's phase comes from an unwindowed transform of one exact period.
        assertEquals(Math.toDegrees(arg), j.get("fundamentalPhaseDeg").asDouble(), 0.01);
        // The section of a period-1 state is its one point at t = k T: v = Im V, lambda = -Re V / w.
        double phi = Math.toRadians(30);
        JsonNode p = j.get("section");
        assertEquals(1, p.size());
        double vAbs = gain * e;
        assertEquals(-vAbs * Math.cos(arg + phi) / w, p.get(0).get(0).asDouble(), 1e-4 * vAbs / w);
        assertEquals(vAbs * Math.sin(arg + phi), p.get(0).get(1).asDouble(), 1e-4 * vAbs);
        // Liouville [der, DOMAIN.md §6]: det M = exp(-2 pi g), g = G/(w C); a complex pair has
        // modulus exp(-pi g), so the largest exponent per period is -pi G/(w C). 1e-6: Newton's
        // monodromy is integrated to 1e-9.
        double lyap = -Math.PI * g / (w * c);
        assertEquals(lyap, j.get("lyapunov").asDouble(), 1e-6);
        assertEquals(2, j.get("multipliers").size());

        Path dir = out().resolve("linear").resolve("simulate");
        for (String f : List.of("event", "settled", "section", "spectrum")) {
            for (String ext : List.of(".png", ".svg", ".pdf", ".csv")) {
                assertTrue(Files.size(dir.resolve(f + ext)) > 0, f + ext);
            }
        }
        assertTrue(Files.exists(dir.resolve("simulate.json")));
        assertTrue(Files.readString(dir.resolve("event.csv")).startsWith("time (s),v (V),source e (V),lambda (Wb-turn)"));
    }

    @Test
    void humanSummaryNamesTheModeAndTheFolder() throws Exception {
        Path s = study("linear", LINEAR);
        Run r = run("simulate", s.toString(), "--out", out().toString(), "--periods", "60", "--no-charts");
        assertEquals(Main.OK, r.code(), r.err());
        assertTrue(r.out().contains("mode: normal"), r.out());
        assertTrue(r.out().contains("written: "), r.out());
    }

    /**
     * The three-phase network and the reduced circuit of a grounded-wye bank, where the reduction
     * is exact (DOMAIN.md §1.2 [der]): started alike, they settle in the same state with the same
     * peak. The network opens phase a at t = 0 from the energized bank, where the grounded-wye
     * winding's flux linkage is -E/w cos(phi) (its sinusoidal steady state) and the node voltage
     * E sin(phi); phi = 0 gives the reduced loop the start lambda = -1 pu, v = 0 (its rated peak is
     * the supply's phase peak, the loop ratio of a grounded wye being 1).
     */
    @Test
    void equipmentStudyNetworkAgreesWithItsExactReduction() throws Exception {
        Path s = study("gy", GROUNDED_WYE_BELTED);
        Run net = run("simulate", s.toString(), "--out", out().toString(), "--open-at", "0 s", "--source-angle", "0",
                "--json", "--no-charts");
        assertEquals(Main.OK, net.code(), net.err());
        JsonNode n = net.json();
        assertContract(n);
        assertEquals("three-phase", n.get("model").asText());
        assertTrue(n.get("lyapunov").isNull(), "no exponent for the network");
        assertTrue(n.get("method").asText().contains("recurrence"), n.get("method").asText());
        // the command time itself (an ideal disconnector opens at it)
        assertEquals(0.0, n.get("openingTimes").get(0).asDouble(), 1e-12);
        assertTrue(n.get("openingTimes").get(1).isNull());
        assertTrue(n.get("openingTimes").get(2).isNull());

        Run red = run("simulate", s.toString(), "--out", out().toString(), "--reduced", "--source-angle", "0",
                "--initial-flux", "-1 pu", "--initial-voltage", "0 pu", "--json", "--no-charts");
        assertEquals(Main.OK, red.code(), red.err());
        JsonNode r = red.json();
        assertContract(r);
        assertEquals("single-phase", r.get("model").asText());
        assertEquals(Exactness.EXACT.explanation(), r.get("exactness").asText());

        assertEquals(r.get("mode").asText(), n.get("mode").asText(), n.get("reason").asText());
        assertEquals(r.get("period").asInt(), n.get("period").asInt());
        // 1 %: the network is classified once its samples repeat to 1e-4 per unit of a state of
        // order 1 pu while the open phase sits near 0.1 pu (1e-3 relative).
        double vr = r.get("peakVoltage").asDouble();
        assertEquals(vr, n.get("peakVoltage").asDouble(), 0.01 * vr);
        // both per unit of the rated phase-to-neutral peak (the grounded-wye loop ratio is 1)
        assertEquals(r.get("peakVoltagePu").asDouble(), n.get("peakVoltagePu").asDouble(),
                0.01 * r.get("peakVoltagePu").asDouble());
    }

    @Test
    void shortThreePhaseRunGivesEveryField() throws Exception {
        Path s = study("gy", GROUNDED_WYE_BELTED);
        Run r = run("simulate", s.toString(), "--out", out().toString(), "--periods", "30", "--at-current-zero",
                "--source-angle", "45 deg", "--json", "--no-charts");
        assertEquals(Main.OK, r.code(), r.err());
        JsonNode j = r.json();
        assertContract(j);
        assertEquals(30, j.get("periodsSimulated").asInt());
        assertEquals("at current zero", j.get("opening").asText());
        assertEquals(45, j.get("sourceAngleDeg").asDouble(), 1e-9);
        // a current-zero opening comes at or after the command (default: one cycle, 20 ms)
        assertTrue(j.get("openingTimes").get(0).asDouble() >= 0.02 - 1e-12);
        assertTrue(Files.exists(out().resolve("gy").resolve("simulate").resolve("event.csv")));
    }

    @Test
    void integrationFailureIsAnUndeterminedResult() throws Exception {
        Path s = study("stiff", STIFF);
        Run r = run("simulate", s.toString(), "--out", out().toString(), "--json", "--no-charts");
        assertEquals(Main.OK, r.code(), r.err());
        JsonNode j = r.json();
        assertContract(j);
        assertEquals("undetermined", j.get("mode").asText());
        assertTrue(j.get("reason").asText().contains("stiff"), j.get("reason").asText());
        assertTrue(j.get("peakVoltage").isNull());
        assertFalse(r.out().contains("Exception"));
        assertTrue(Files.exists(out().resolve("stiff").resolve("simulate").resolve("simulate.json")));
    }

    @ParameterizedTest
    @ValueSource(strings = {"--periods=0", "--periods=-3", "--periods=many", "--source-angle=abc",
        "--source-angle=NaN", "--initial-flux=3 kV", "--initial-flux=12", "--initial-voltage=2 Wb",
        "--initial-voltage=5 kV rms", "--rtol=0.5", "--open-at=5 ms", "--reduced"})
    void badInputOnACircuitStudyExits2AndWritesNothing(String option) throws Exception {
        Path s = study("linear", LINEAR);
        Run r = run("simulate", s.toString(), "--out", out().toString(), option);
        assertEquals(Main.BAD_INPUT, r.code(), r.out() + r.err());
        assertFalse(r.err().isBlank());
        assertFalse(r.err().contains("\tat "), "no stack trace: " + r.err());
        assertFalse(Files.exists(out()), "nothing written");
    }

    @ParameterizedTest
    @ValueSource(strings = {"--initial-flux=1 Wb-turn", "--open-at=-5 ms", "--open-at=3 kV", "--open-at=1000 cycles"})
    void badInputOnAnEquipmentStudyExits2AndWritesNothing(String option) throws Exception {
        Path s = study("gy", GROUNDED_WYE_BELTED);
        Run r = run("simulate", s.toString(), "--out", out().toString(), "--periods", "50", option);
        assertEquals(Main.BAD_INPUT, r.code(), r.out() + r.err());
        assertFalse(r.err().isBlank());
        assertFalse(Files.exists(out()), "nothing written");
    }

    @Test
    void groundedWyeOnScreenedCableHasNoDrive() throws Exception {
        Path s = study("gys", GROUNDED_WYE_SCREENED);
        for (String[] extra : new String[][] {{}, {"--reduced"}}) {
            String[] args = new String[4 + extra.length];
            args[0] = "simulate";
            args[1] = s.toString();
            args[2] = "--out";
            args[3] = out().toString();
            System.arraycopy(extra, 0, args, 4, extra.length);
            Run r = run(args);
            assertEquals(Main.BAD_INPUT, r.code(), r.out() + r.err());
            assertTrue(r.err().contains("no drive"), r.err());
            assertFalse(Files.exists(out()), "nothing written");
        }
    }
}
