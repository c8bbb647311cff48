package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PointsCommandTest {

    @TempDir
    Path tmp;

    /**
     * DOMAIN.md §9.1 [der, closed form]: cubic balance, lossless, w = 1 rad/s, Cs = 1 F, Cg = 0,
     * a = 0.5, b = 1: jump-up fold at E_up = (4/9) kappa^1.5 / sqrt(b) = 0.157135 V at
     * Lambda = 0.4714. Written as a study file, so the check covers reading, SI conversion, the
     * balance and the JSON contract. Tolerance 1e-6 V: the published figure has six digits.
     */
    private Path cubicStudy(String source) throws Exception {
        Path f = tmp.resolve("cubic.yaml");
        Files.writeString(f, String.join("\n",
                "study: cubic check",
                "frequency: 0.15915494309189535 Hz",
                "circuit:",
                "  source: " + source,
                "  series-capacitance: 1 F",
                "  shunt-capacitance: 0 F",
                "  magnetizing:",
                "    polynomial: {a: 0.5, b: 1, n: 3}",
                ""));
        return f;
    }

    @Test
    void foldsMatchTheClosedFormThroughTheWholeChain() throws Exception {
        var r = CliTestSupport.run("points", cubicStudy("0.1 V peak").toString(), "--out", tmp.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = r.json();
        JsonNode up = null;
        for (JsonNode f : j.get("folds")) {
            if (f.get("jump").asText().equals("up")) {
                up = f;
            }
        }
        assertTrue(up != null, "a jump-up fold is reported");
        assertEquals(0.157135, up.get("source").asDouble(), 1e-6);
        assertEquals(0.4714, up.get("flux").asDouble(), 1e-4);
        // below the fold, lossless: three steady states, normal / unstable / ferroresonant
        JsonNode pts = j.get("operatingPoints");
        assertEquals(3, pts.size());
        assertEquals("normal", pts.get(0).get("kind").asText());
        assertEquals("unstable", pts.get(1).get("kind").asText());
        assertFalse(pts.get(1).get("stable").asBoolean());
        assertEquals("ferroresonant", pts.get(2).get("kind").asText());
        JsonNode ec = j.get("equivalentCircuit");
        assertEquals(0.1, ec.get("source").asDouble(), 1e-12);
        assertEquals(1.0, ec.get("seriesCapacitance").asDouble(), 0.0);
        assertTrue(ec.get("coreLossResistance").isNull(), "lossless is null");
        assertTrue(Files.exists(tmp.resolve("cubic/points/graphical-method.png")));
        assertTrue(Files.exists(tmp.resolve("cubic/points/graphical-method.svg")));
        assertTrue(Files.exists(tmp.resolve("cubic/points/operating-points.csv")));
    }

    /** Above the jump-up fold the normal state is gone: one (ferroresonant) point [der, DOMAIN.md §3]. */
    @Test
    void aboveTheFoldOnlyTheFerroresonantStateRemains() throws Exception {
        var r = CliTestSupport.run("points", cubicStudy("0.16 V peak").toString(), "--out", tmp.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode pts = r.json().get("operatingPoints");
        assertEquals(1, pts.size());
        assertEquals("ferroresonant", pts.get(0).get("kind").asText());
    }

    @Test
    void equipmentStudiesListBothLinearCriteria() {
        var r = CliTestSupport.run("points", "maps/quarry-lane-grain-oriented.yaml", "--out", tmp.toString(), "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode cl = r.json().get("criticalLength");
        assertEquals(2, cl.size());
        assertEquals(40.0, cl.get(1).get("threshold").asDouble(), 0.0);
        // l_crit scales as 1/K for the same installation (DOMAIN.md §4 formula [der])
        double ratio = cl.get(0).get("criticalLength").asDouble() / cl.get(1).get("criticalLength").asDouble();
        assertEquals(40.0 / cl.get(0).get("threshold").asDouble(), ratio, 1e-9 * ratio);
    }

    @Test
    void badInputExitsTwoAndWritesNothing() throws Exception {
        var missing = CliTestSupport.run("points", tmp.resolve("nope.yaml").toString(), "--out", tmp.resolve("o").toString());
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("nope.yaml"), missing.err());
        var neg = CliTestSupport.run("points", cubicStudy("0.1 V peak").toString().replace("cubic", "cubic"), "--k", "-3",
                "--out", tmp.resolve("o").toString());
        assertEquals(2, neg.code());
        Path bad = tmp.resolve("bad.yaml");
        Files.writeString(bad, Files.readString(cubicStudy("0.1 V peak")).replace("1 F", "-1 uF"));
        var r = CliTestSupport.run("points", bad.toString(), "--out", tmp.resolve("o").toString());
        assertEquals(2, r.code());
        assertTrue(r.err().contains("circuit.series-capacitance"), r.err());
        assertFalse(Files.exists(tmp.resolve("o")), "nothing written");
        assertFalse(r.err().contains("\tat "), "no stack trace");
    }
}
