package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code ferromap run}: bad analysis settings end the run before anything is written. */
class RunCommandTest {

    @TempDir
    Path tmp;

    static final String CIRCUIT = """
            study: run command check
            frequency: 60 Hz
            circuit:
              source: 20 kV peak
              series-capacitance: 0.1 uF
              shunt-capacitance: 10 nF
              core-loss-resistance: 50 kOhm
              magnetizing:
                polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}
            """;

    StringWriter err;

    int run(String analyses) throws IOException {
        Path study = tmp.resolve("s.yaml");
        Files.writeString(study, CIRCUIT + analyses);
        err = new StringWriter();
        return Main.execute(new PrintWriter(new StringWriter(), true), new PrintWriter(err, true), "run", study.toString(),
                "--out", tmp.resolve("out").toString());
    }

    /**
     * A typo in a setting, a value out of range, a missing comparison file, an unknown map layer:
     * each is refused with exit 2 and a message naming the setting, before any output exists.
     */
    @Test
    void badSettingsExitTwoWithNothingWritten() throws IOException {
        String[][] cases = {
            {"analyses:\n  simulate: {cylces: 100}\n", "analyses.simulate.cylces"},
            {"analyses:\n  odds: {angles: 0}\n", "analyses.odds.angles"},
            {"analyses:\n  compare: {with: missing.yaml}\n", "missing.yaml"},
            {"analyses:\n  map: {layers: [balance, wave]}\n", "unknown map layer"},
            {"analyses:\n  branch: {parameter: source-angle}\n", "analyses.branch.parameter"},
            {"analyses:\n  folds: {parameter: series-capacitance, and: series-capacitance}\n", "both series-capacitance"},
        };
        for (String[] c : cases) {
            assertEquals(Main.BAD_INPUT, run(c[0]), c[0] + err);
            assertTrue(err.toString().contains(c[1]), "message names " + c[1] + ": " + err);
            assertFalse(Files.exists(tmp.resolve("out")), "nothing written for " + c[0]);
        }
    }

    /** The threads option is checked before anything runs. */
    @Test
    void aBadThreadCountIsRefused() throws IOException {
        Path study = tmp.resolve("s.yaml");
        Files.writeString(study, CIRCUIT);
        err = new StringWriter();
        assertEquals(Main.BAD_INPUT, Main.execute(new PrintWriter(new StringWriter(), true), new PrintWriter(err, true), "run",
                study.toString(), "--out", tmp.resolve("out").toString(), "--threads", "0"));
        assertFalse(Files.exists(tmp.resolve("out")));
    }
}
