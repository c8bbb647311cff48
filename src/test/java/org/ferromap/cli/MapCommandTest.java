package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.ferromap.cli.run.MapPlanner;
import org.ferromap.cli.run.ResumeTiles;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.ProgressListener;
import org.ferromap.maps.StudyMap;
import org.ferromap.maps.StudyMapSettings;
import org.ferromap.maps.StudyPlane;
import org.ferromap.report.Json;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.StudyReader;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The map command in-process: its JSON contract, its files, resuming, and bad requests. */
class MapCommandTest {

    @TempDir
    Path tmp;

    Path study;
    Path out;
    StringWriter stdout;
    StringWriter stderr;

    /** A ninth-power core with enough core loss that every event settles within tens of periods. */
    static final String STUDY = """
            study: map command check
            frequency: 60 Hz
            circuit:
              source: 20 kV peak
              series-capacitance: 0.1 uF
              shunt-capacitance: 10 nF
              core-loss-resistance: 50 kOhm
              magnetizing:
                polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}
            map:
              x: {parameter: source, from: 2 kV peak, to: 60 kV peak, steps: 12}
              y: {parameter: series-capacitance, from: 10 nF, to: 500 nF, steps: 9, scale: log}
            """;

    @BeforeEach
    void setUp() throws IOException {
        study = tmp.resolve("check-study.yaml");
        Files.writeString(study, STUDY);
        out = tmp.resolve("out");
    }

    int run(String... args) {
        stdout = new StringWriter();
        stderr = new StringWriter();
        return Main.execute(new PrintWriter(stdout, true), new PrintWriter(stderr, true), args);
    }

    /**
     * The fields the issue names are a contract: x/y with name, unit, values; one cell per grid
     * point with x, y, states, peakVoltagePu and ferroFraction (a share, 0 to 1). Every layer is
     * asked for, with a two-event ensemble to stay quick.
     */
    @Test
    void jsonHasTheContractFields() throws IOException {
        assertEquals(Main.OK, run("map", study.toString(), "--out", out.toString(), "--json", "--threads", "2",
                "--layers", "balance,peak,time,folds", "--angles", "2", "--residual-flux", "0", "--max-periods", "300"),
                stderr.toString());
        JsonNode j = Json.mapper().readTree(stdout.toString());
        assertEquals("source", j.get("x").get("name").asText());
        assertEquals("kV peak", j.get("x").get("unit").asText());
        assertEquals(12, j.get("x").get("values").size());
        assertEquals(2.0, j.get("x").get("values").get(0).asDouble(), 0.0);
        assertEquals(60.0, j.get("x").get("values").get(11).asDouble(), 0.0);
        assertEquals("series-capacitance", j.get("y").get("name").asText());
        assertEquals("nF", j.get("y").get("unit").asText());
        assertEquals(9, j.get("y").get("values").size());
        JsonNode cells = j.get("cells");
        assertEquals(12 * 9, cells.size());
        Set<String> allowed = Set.of("safe", "at-risk", "ferroresonant-only");
        for (JsonNode c : cells) {
            for (String f : List.of("x", "y", "states", "peakVoltagePu", "ferroFraction")) {
                assertTrue(c.has(f), "cell field " + f);
            }
            assertTrue(allowed.contains(c.get("states").asText()), c.toString());
            assertTrue(c.get("peakVoltagePu").asDouble() > 0);
            double f = c.get("ferroFraction").asDouble();
            assertTrue(f >= 0 && f <= 1, c.toString());
        }
        Path dir = out.resolve("check-study").resolve("map");
        List<String> csv = Files.readAllLines(dir.resolve("map.csv"));
        assertEquals(1 + 12 * 9, csv.size());
        assertTrue(csv.get(0).contains("states") && csv.get(0).contains("peakVoltagePu") && csv.get(0).contains("ferroFraction"));
        for (String f : List.of("balance-map", "peak-map", "ferro-fraction-map", "worst-mode-map")) {
            for (String ext : List.of(".png", ".svg", ".pdf", ".csv", ".json")) {
                assertTrue(Files.isRegularFile(dir.resolve(f + ext)), f + ext);
            }
        }
        assertTrue(Files.isRegularFile(dir.resolve("fold-curves.csv")));
        assertFalse(Files.exists(out.resolve(".tiles")), "resume tiles removed once the map is saved");
    }

    /**
     * Tiles saved by an interrupted map (here stopped through its executor, as Ctrl-C does) are
     * picked up by the command: it reports them reused and computes only the rest.
     */
    @Test
    void aRerunResumesFromTheTilesOfAnInterruptedMap() {
        Study s = StudyReader.read(study);
        StudyParameters sp = new StudyParameters(s);
        // 40 x 20 cells: six tiles of the default 16 x 16
        StudyPlane plane = MapPlanner.plane(sp, new MapPlanner.AxisRequest(null, null, null, 40, null),
                new MapPlanner.AxisRequest(null, null, null, 20, null));
        StudyMapSettings settings = MapPlanner.settings(s, MapPlanner.SettingsRequest.NONE).withRefine(false);
        LocalPoolExecutor first = new LocalPoolExecutor(1, false, Duration.ZERO);
        ProgressListener stopAfterATile = new ProgressListener() {
            @Override
            public void passStarted(int pass, String label, long cellsToCompute, long cellsReused) {
            }

            @Override
            public void cellsDone(long cells) {
                first.requestStop();
            }

            @Override
            public void passFinished(int pass) {
            }
        };
        var store = ResumeTiles.store(out, "check-study");
        FerromapException e = assertThrows(FerromapException.class,
                () -> StudyMap.run(plane, settings, first, store, stopAfterATile, 1));
        assertEquals(MessageKey.INTERRUPTED, e.key());

        assertEquals(Main.OK, run("map", study.toString(), "--out", out.toString(), "--refine", "off", "--x-steps", "40",
                "--y-steps", "20", "--layers", "balance"), stderr.toString());
        assertTrue(stderr.toString().contains("reused from an earlier run"), stderr.toString());
        assertFalse(Files.exists(out.resolve(".tiles")));
    }

    /** Every bad request exits 2 with a message and leaves nothing behind. */
    @Test
    void badRequestsExitTwoAndWriteNothing() throws IOException {
        assertBad("unknown parameter", "--x", "cable-lenght", "--x-from", "1 km", "--x-to", "2 km");
        assertBad("does not say peak or rms", "--x", "source", "--x-from", "10 kV", "--x-to", "20 kV");
        assertBad("needs about", "--x-steps", "20000", "--y-steps", "20000");
        assertBad("unknown map layer", "--layers", "balance,waves");
        assertBad("threads", "--threads", "0");
        assertBad("must be positive", "--y-from", "-5 nF", "--y-to", "50 nF", "--y-scale", "linear");
        Path bare = tmp.resolve("no-map.yaml");
        Files.writeString(bare, STUDY.substring(0, STUDY.indexOf("map:")));
        assertEquals(Main.BAD_INPUT, run("map", bare.toString(), "--out", out.toString()));
        assertTrue(stderr.toString().contains("no x axis"), stderr.toString());
        assertFalse(Files.exists(out));
        Path file = tmp.resolve("a-file");
        Files.writeString(file, "not a folder");
        assertEquals(Main.BAD_INPUT, run("map", study.toString(), "--out", file.resolve("sub").toString()));
        assertTrue(stderr.toString().contains("cannot write"), stderr.toString());
        assertTrue(Files.readString(file).equals("not a folder"));
    }

    private void assertBad(String message, String... extra) {
        String[] args = Stream.concat(Stream.of("map", study.toString(), "--out", out.toString()), Stream.of(extra))
                .toArray(String[]::new);
        int code = run(args);
        assertEquals(Main.BAD_INPUT, code, String.join(" ", extra) + ": " + stderr);
        assertTrue(stderr.toString().contains(message), "message for " + String.join(" ", extra) + ": " + stderr);
        assertFalse(Files.exists(out), "nothing written for " + String.join(" ", extra));
    }
}
