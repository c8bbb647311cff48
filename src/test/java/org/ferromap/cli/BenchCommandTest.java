package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.ferromap.report.Json;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code ferromap bench simulate} run in-process: it prints its figures; it asserts nothing about speed. */
class BenchCommandTest {

    @TempDir
    Path tmp;

    private String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void printsMedianSecondsAndEvaluations() throws Exception {
        Path s = tmp.resolve("linear.yaml");
        Files.writeString(s, SimulateCommandTest.LINEAR);
        String[] r = run("bench", "simulate", s.toString(), "--periods", "10", "--repeat", "2", "--rtol", "1e-8",
                "--source", "20 kV peak", "--json");
        assertEquals("0", r[0], r[2]);
        JsonNode j = Json.mapper().readTree(r[1]);
        assertTrue(j.get("medianSeconds").isNumber());
        assertTrue(j.get("medianSeconds").asDouble() > 0);
        assertTrue(j.get("rhsEvaluations").isIntegralNumber());
        // DOP853 takes 12 evaluations a step, and at least one step a period here (the step is
        // capped at a period) [pub: Hairer, Norsett, Wanner, Solving ODEs I, §II.10]
        assertTrue(j.get("rhsEvaluations").asLong() >= 12 * 10, j.toString());
        assertEquals(20e3, j.get("sourcePeak").asDouble(), 1e-9, "the --source override, as given");
        assertEquals("OK", j.get("status").asText());
        assertFalse(Files.exists(tmp.resolve("notebooks-out")), "a benchmark writes nothing");
    }

    @Test
    void tooFewPeriodsIsBadInput() throws Exception {
        Path s = tmp.resolve("linear.yaml");
        Files.writeString(s, SimulateCommandTest.LINEAR);
        String[] r = run("bench", "simulate", s.toString(), "--periods", "5", "--json");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("--periods"), r[2]);
    }
}
