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
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.BranchResult;
import org.ferromap.balance.Fold;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.balance.StartState;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.report.Json;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.StudyReader;
import org.ferromap.study.SweepParameter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The branch and folds commands run in-process. */
class BalanceCommandsTest {

    private static final String CIRCUIT = "maps/bench-circuit-kv-scale.yaml";
    private static final String EQUIPMENT = "maps/millbeck-belted-grounded-wye.yaml";

    @TempDir
    Path out;

    private record Run(int code, String out, String err) { }

    private Run run(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.execute(new PrintWriter(o, true), new PrintWriter(e, true), args);
        return new Run(code, o.toString(), e.toString());
    }

    /** Closed-form folds of DOMAIN.md §3 [der] for the study's polynomial circuit: {E_up, L_up, E_down, L_down}. */
    private static double[] closedForm(EquivalentCircuit c) {
        PolynomialCurve p = (PolynomialCurve) c.magnetizing();
        double w = c.omega();
        double kappa = w * w * c.totalCapacitance() - p.a();
        double delta = w * c.conductance();
        int m = p.n() - 1;
        double beta = PolynomialCurve.describingCoefficient(p.n()) * p.b();
        double disc = (2.0 + m) * (2.0 + m) * kappa * kappa - 4.0 * (1 + m) * (kappa * kappa + delta * delta);
        double[] x = {((2 + m) * kappa - Math.sqrt(disc)) / (2 * (1 + m)), ((2 + m) * kappa + Math.sqrt(disc)) / (2 * (1 + m))};
        double[] r = new double[4];
        for (int k = 0; k < 2; k++) {
            double l = Math.pow(x[k] / beta, 1.0 / m);
            r[2 * k] = l * Math.sqrt((x[k] - kappa) * (x[k] - kappa) + delta * delta) / (w * c.seriesCapacitance());
            r[2 * k + 1] = l;
        }
        return r;
    }

    /**
     * branch --json: the contract fields, the folds of the study's circuit against the closed
     * form (1e-8 relative, the engine's location accuracy), and every file beside the chart.
     */
    @Test
    void branchJsonAndFiles() throws Exception {
        Run r = run("branch", CIRCUIT, "--vary", "source", "--from", "0.1 kV peak", "--to", "60 kV peak", "--json",
                "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        JsonNode j = Json.mapper().readTree(r.out());
        assertTrue(j.get("points").size() > 20);
        for (JsonNode p : j.get("points")) {
            assertTrue(p.has("parameter") && p.has("flux") && p.has("voltage") && p.get("stable").isBoolean(), p.toString());
        }
        assertTrue(j.get("branchPoints").isArray());
        JsonNode folds = j.get("folds");
        assertEquals(2, folds.size());
        double[] ref = closedForm(StudyReader.read(Path.of(CIRCUIT)).circuit());
        assertEquals(ref[0], folds.get(0).get("parameter").asDouble(), 1e-8 * ref[0]);
        assertEquals(ref[1], folds.get(0).get("flux").asDouble(), 1e-8 * ref[1]);
        assertEquals(ref[2], folds.get(1).get("parameter").asDouble(), 1e-8 * ref[0]);
        assertEquals(ref[3], folds.get(1).get("flux").asDouble(), 1e-8 * ref[3]);
        Path dir = out.resolve("bench-circuit-kv-scale/branch");
        for (String f : List.of("branch.png", "branch.svg", "branch.pdf", "branch.csv", "branch.json")) {
            assertTrue(Files.size(dir.resolve(f)) > 0, f);
        }
        // The CSV holds every point and the folds.
        assertEquals(j.get("points").size() + 2 + 1, Files.readAllLines(dir.resolve("branch.csv")).size());
    }

    /** folds --json: the contract fields and the files; the study's Cs lies above the cusp, so two fold curves and no cusp. */
    @Test
    void foldsJsonAndFiles() throws Exception {
        Run r = run("folds", CIRCUIT, "--vary", "source", "--from", "0 kV peak", "--to", "80 kV peak",
                "--and", "series-capacitance", "--and-from", "0.05 uF", "--and-to", "0.5 uF", "--json", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        JsonNode j = Json.mapper().readTree(r.out());
        assertTrue(j.get("curve").size() > 10);
        for (JsonNode p : j.get("curve")) {
            assertTrue(p.has("p1") && p.has("p2"), p.toString());
        }
        assertTrue(j.get("cusps").isArray());
        // Bistable between the folds, ferroresonant only above the jump-up fold; the normal-only
        // strip below the jump-down fold (about 0.4 kV) is narrower than the region raster here.
        List<String> labels = new java.util.ArrayList<>();
        j.get("regions").forEach(g -> labels.add(g.get("label").asText()));
        assertTrue(labels.contains("bistable") && labels.contains("ferroresonant-only"), labels.toString());
        Path dir = out.resolve("bench-circuit-kv-scale/folds");
        for (String f : List.of("folds.png", "folds.svg", "folds.pdf", "folds.csv", "folds.json")) {
            assertTrue(Files.size(dir.resolve(f)) > 0, f);
        }
    }

    /** Requests that cannot be honoured: exit 2, a message, nothing written. */
    @ParameterizedTest
    @ValueSource(strings = {
        "branch|--vary|flux-capacitor|--from|1 kV peak|--to|2 kV peak",
        "branch|--vary|source|--from|10 kV peak|--to|10 kV peak",
        "branch|--vary|series-capacitance|--from|-0.1 uF|--to|0.5 uF",
        "branch|--vary|series-capacitance|--from|0 uF|--to|0.5 uF",
        "branch|--vary|series-capacitance|--from|0.1 km|--to|0.5 uF",
        "branch|--vary|source|--from|10 kV|--to|20 kV peak",
        "branch|--vary|cable-length|--from|1 km|--to|2 km",
        "branch|--vary|source|--from|1 kV peak|--to|2 kV peak|--harmonics|0",
        "branch|--vary|source|--from|1 kV peak|--to|2 kV peak|--harmonics|500",
        "branch|--vary|source|--from|1 kV peak|--to|2 kV peak|--start|middle",
        "folds|--vary|source|--from|1 kV peak|--to|2 kV peak|--and|source",
        "folds|--vary|source|--from|1 kV peak|--to|2 kV peak|--and|core-loss-resistance|--and-from|0 ohm|--and-to|1 MOhm",
        "folds|--vary|source|--from|1 kV peak|--to|2 kV peak|--and|shunt-capacitance|--and-from|1 uF"})
    void badRequestsExitTwoAndWriteNothing(String request) {
        String[] words = request.split("\\|");
        List<String> args = new java.util.ArrayList<>(List.of(words[0], CIRCUIT));
        args.addAll(List.of(words).subList(1, words.length));
        args.add("--out");
        args.add(out.toString());
        Run r = run(args.toArray(new String[0]));
        assertEquals(2, r.code(), "exit code for " + args + ": " + r.out() + r.err());
        assertFalse(r.err().isBlank());
        assertFalse(r.err().contains("Exception"), r.err());
        assertFalse(Files.exists(out.resolve("bench-circuit-kv-scale")), "nothing written for " + args);
    }

    /**
     * An equipment-level parameter (cable length, re-reduced, differenced rate): at each fold of
     * the cable-length branch the circuit's own source sits on a fold of its source branch [der:
     * both are where dF/dx is singular at the same circuit], to 1e-7 relative (the engine's
     * location plus the quadrature describing function of the study's smooth-knee curve).
     */
    @Test
    void cableLengthFoldsAreSourceFoldsOfTheirCircuit() {
        StudyParameters sp = new StudyParameters(StudyReader.read(Path.of(EQUIPMENT)));
        BranchResult b = new BalanceContinuation().branch(SweepAxes.axis(SweepParameter.CABLE_LENGTH),
                v -> sp.circuit(SweepParameter.CABLE_LENGTH, v), 100, 10_000, sp.valueOf(SweepParameter.CABLE_LENGTH), 1,
                StartState.NORMAL);
        assertFalse(b.folds().isEmpty(), "folds expected: " + b.increasingDetail() + " / " + b.decreasingDetail());
        SingleHarmonicBalance shb = new SingleHarmonicBalance();
        for (BranchResult.Special f : b.folds()) {
            EquivalentCircuit c = sp.circuit(SweepParameter.CABLE_LENGTH, f.parameter());
            double best = Double.POSITIVE_INFINITY;
            double flux = Double.NaN;
            for (Fold sf : shb.folds(c)) {
                if (Math.abs(sf.sourcePeak() - c.sourcePeak()) < best) {
                    best = Math.abs(sf.sourcePeak() - c.sourcePeak());
                    flux = sf.flux();
                }
            }
            assertEquals(0, best, 1e-7 * c.sourcePeak(), "fold at " + f);
            assertEquals(flux, f.flux(), 1e-6 * flux, "fold at " + f);
        }
    }
}
