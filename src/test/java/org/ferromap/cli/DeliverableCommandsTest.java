package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The four deliverable commands in-process: exit codes, the JSON contract, the files, bad input. */
class DeliverableCommandsTest {

    @TempDir
    Path tmp;

    private static final double W = 2 * Math.PI * 60;

    /** A kV-scale circuit with a ninth-power curve (closed forms apply) and the given analyses. */
    private Path circuit(String name, String analyses) throws Exception {
        Path f = tmp.resolve(name + ".yaml");
        Files.writeString(f, String.join("\n",
                "study: command test circuit",
                "frequency: 60 Hz",
                "circuit:",
                "  source: 15 kV peak",
                "  series-capacitance: 0.2 uF",
                "  shunt-capacitance: 0.05 uF",
                "  core-loss-resistance: 100 kOhm",
                "  magnetizing:",
                "    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}",
                analyses,
                ""));
        return f;
    }

    /** An equipment study (delta bank, screened cable, per-unit table curve scaled by k). */
    private Path equipment(String name, double k, String analyses) throws Exception {
        Path f = tmp.resolve(name + ".yaml");
        Files.writeString(f, String.join("\n",
                "study: command test " + name,
                "frequency: 60 Hz",
                "equipment:",
                "  source:",
                "    line-voltage: 24.9 kV",
                "  transformer:",
                "    rating: 500 kVA",
                "    primary-voltage: 24.9 kV",
                "    connection: delta",
                "    core: separate",
                "    exciting-current: " + k + " %",
                "    no-load-loss: 400 W",
                "    saturation:",
                "      basis: per-unit",
                "      table:",
                "        - {flux: 0.5, current: " + 0.003 * k + "}",
                "        - {flux: 1.0, current: " + 0.01 * k + "}",
                "        - {flux: 1.2, current: " + 0.12 * k + "}",
                "        - {flux: 1.4, current: " + 2.5 * k + "}",
                "      air-core-inductance: 0.03",
                "  cable:",
                "    kind: screened",
                "    length: 1 km",
                "    core-to-sheath: 0.25 uF/km",
                "  open-phases: 2",
                analyses,
                ""));
        return f;
    }

    private void assertCharts(Path dir, String base) {
        for (String ext : new String[] {".png", ".svg", ".pdf"}) {
            assertTrue(Files.exists(dir.resolve(base + ext)), dir.resolve(base + ext) + " written");
        }
    }

    /**
     * limits: the table's JSON contract and files; the linear column is l = 10 I0% S/(K w C' V^2)
     * km (DOMAIN.md §4 [der]) with C' = 2 C'cs for two open phases of a delta (DOMAIN.md §1.2
     * [der]); tolerance 1e-12 relative (one formula in other units).
     */
    @Test
    void limitsWritesTheTable() throws Exception {
        Path s = equipment("bank", 1.0, "analyses:\n  limits: {ratings: [250 kVA, 500 kVA], open-phases: 2}");
        var r = CliTestSupport.run("limits", s.toString(), "--out", tmp.resolve("out").toString(), "--json", "--threads", "2");
        assertEquals(0, r.code(), r.err());
        JsonNode rows = r.json().get("rows");
        assertEquals(2, rows.size());
        for (JsonNode row : rows) {
            double kva = row.get("rating").asDouble() / 1e3;
            double expected = 1e3 * 10 * 1.0 * kva / (40 * W * 0.5 * 24.9 * 24.9);
            assertEquals(expected, row.get("linearLength").asDouble(), 1e-12 * expected);
            assertEquals(3, row.get("limits").size());
            assertTrue(row.get("limits").get(0).get("length").asDouble() > 0);
            assertTrue(row.get("noLoadLossSource").asText().contains("548/2014"), "typical loss named with its source");
        }
        assertTrue(r.json().get("sources").size() >= 4);
        Path dir = tmp.resolve("out/bank/limits");
        assertCharts(dir, "limits");
        assertTrue(Files.exists(dir.resolve("limits.csv")));
        assertTrue(Files.exists(dir.resolve("limits.json")));
    }

    /** compare: two designs ranked, maps on one scale, the files. */
    @Test
    void compareRanksTwoDesigns() throws Exception {
        Path a = equipment("design-a", 1.0, "");
        Path b = equipment("design-b", 0.5, "");
        var r = CliTestSupport.run("compare", a.toString(), b.toString(), "--steps", "3,2", "--out", tmp.resolve("out").toString(),
                "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = r.json();
        assertEquals(2, j.get("ranking").size());
        assertEquals(2, j.get("designs").size());
        assertTrue(j.get("scaleMax").asDouble() >= j.get("scaleMin").asDouble());
        Path dir = tmp.resolve("out/design-a/compare");
        assertCharts(dir, "compare-curves");
        assertCharts(dir, "compare-map-1");
        assertCharts(dir, "compare-map-2");
        assertTrue(Files.exists(dir.resolve("compare-ranking.csv")));
        assertTrue(Files.exists(dir.resolve("compare.json")));
    }

    /**
     * damping: G_min = (w^2 C - a)(n-1)/(2 sqrt(n) w) through the whole chain (DOMAIN.md §7 [der]);
     * tolerance 1e-12 relative (closed form on both sides). The arrester's duty is reported.
     */
    @Test
    void dampingSizesTheLoadAndTheArrester() throws Exception {
        Path s = circuit("loop", "analyses:\n  damping: {angles: 2, residual-flux: [0]}");
        var r = CliTestSupport.run("damping", s.toString(), "--arrester", "12 kV", "--energy-rating", "4.5 kJ/kV",
                "--duration", "2 s", "--out", tmp.resolve("out").toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = r.json();
        double expected = (W * W * 0.25e-6 - 1.5e-3) * 8 / (2 * 3 * W);
        assertEquals(expected, j.get("cuspConductance").asDouble(), 1e-12 * expected);
        assertFalse(j.get("steps").isEmpty());
        assertTrue(j.get("recommended").isObject());
        JsonNode duty = j.get("arrester").get("duty");
        assertTrue(duty.get("energyPerCycle").asDouble() > 0);
        assertEquals(4.5 * 12e3, duty.get("capability").asDouble(), 1e-6);
        Path dir = tmp.resolve("out/loop/damping");
        assertCharts(dir, "damping-steps");
        assertCharts(dir, "damping-arrester");
        assertTrue(Files.exists(dir.resolve("damping.json")));
    }

    /** odds: the same runs for a seed whatever the thread count; interval and files. */
    @Test
    void oddsIsReproducible() throws Exception {
        Path s = circuit("odds", "");
        var one = CliTestSupport.run("odds", s.toString(), "--runs", "6", "--seed", "11", "--threads", "1", "--out",
                tmp.resolve("o1").toString(), "--json");
        var two = CliTestSupport.run("odds", s.toString(), "--runs", "6", "--seed", "11", "--threads", "2", "--out",
                tmp.resolve("o2").toString(), "--json");
        assertEquals(0, one.code(), one.err());
        assertEquals(0, two.code(), two.err());
        assertEquals(one.json().get("runList"), two.json().get("runList"));
        assertEquals(6, one.json().get("runs").asInt());
        JsonNode ci = one.json().get("interval");
        assertTrue(ci.get("lower").asDouble() <= one.json().get("probability").asDouble());
        assertTrue(ci.get("upper").asDouble() >= one.json().get("probability").asDouble());
        Path dir = tmp.resolve("o1/odds/odds");
        assertCharts(dir, "odds-estimate");
        assertCharts(dir, "odds-runs");
        assertTrue(Files.exists(dir.resolve("odds-runs.csv")));
    }

    /**
     * The notebook's entry: each analysis a study lists runs with the settings written there, the
     * comparison reading its other designs relative to the study's folder.
     */
    @Test
    void sectionsRunFromTheStudysAnalyses() throws Exception {
        equipment("other", 0.5, "");
        Path s = equipment("main", 1.0, "analyses:\n  compare: {with: other.yaml, steps: [3, 2]}\n  limits: {ratings: [500 kVA]}");
        var study = org.ferromap.study.StudyReader.read(s);
        var nb = new org.ferromap.report.Notebook("sections");
        Path dir = Files.createDirectories(tmp.resolve("nb"));
        var ex = new org.ferromap.maps.LocalPoolExecutor(2);
        var cmp = (org.ferromap.maps.ComparisonResult) DeliverableSections.section("compare", study, ex, dir, nb);
        assertEquals(2, cmp.designs().size());
        assertEquals("other", cmp.designs().get(1).name());
        var lim = (org.ferromap.maps.LimitTableResult) DeliverableSections.section("limits", study, ex, dir, nb);
        assertEquals(2, lim.rows().size(), "one rating, both open-phase cases by default");
        assertTrue(Files.exists(dir.resolve("compare.json")) && Files.exists(dir.resolve("limits.json")));
        Path noWith = equipment("alone", 1.0, "analyses:\n  compare:");
        assertEquals(org.ferromap.errors.MessageKey.MISSING_KEY, org.junit.jupiter.api.Assertions.assertThrows(
                org.ferromap.errors.FerromapException.class, () -> DeliverableSections.section("compare",
                        org.ferromap.study.StudyReader.read(noWith), ex, dir, null)).key());
    }

    /** Bad input of every kind exits 2 with the reason and writes nothing. */
    @Test
    void badInputExitsTwoAndWritesNothing() throws Exception {
        Path out = tmp.resolve("nothing");
        Path badBlock = equipment("bad", 1.0, "analyses:\n  limits: {ratingz: [1 kVA]}");
        var r = CliTestSupport.run("limits", badBlock.toString(), "--out", out.toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("analyses.limits.ratingz"), r.err());
        Path c = circuit("c", "");
        assertEquals(2, CliTestSupport.run("limits", c.toString(), "--out", out.toString()).code(), "limits need equipment");
        assertEquals(2, CliTestSupport.run("odds", c.toString(), "--runs", "0", "--out", out.toString()).code());
        assertEquals(2, CliTestSupport.run("odds", c.toString(), "--method", "guess", "--out", out.toString()).code());
        assertEquals(2, CliTestSupport.run("odds", c.toString(), "--precision", "0.7", "--out", out.toString()).code());
        assertEquals(2, CliTestSupport.run("damping", c.toString(), "--length", "1 km", "--out", out.toString()).code());
        assertEquals(2, CliTestSupport.run("damping", c.toString(), "--energy-rating", "4 kJ/kV", "--out", out.toString()).code());
        assertEquals(2, CliTestSupport.run("damping", c.toString(), "--voltage", "12 kV", "--out", out.toString()).code(),
                "a circuit source must say peak or rms");
        assertEquals(2, CliTestSupport.run("compare", badBlock.toString(), "--out", out.toString()).code(), "one study");
        var missing = CliTestSupport.run("compare", badBlock.toString(), tmp.resolve("none.yaml").toString(), "--out", out.toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("none.yaml"), missing.err());
        assertFalse(Files.exists(out), "nothing written");
        assertFalse(r.err().contains("\tat "), "no stack trace");
    }
}
