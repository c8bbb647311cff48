package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OrbitChartsTest {

    @TempDir
    Path tmp;

    @Test
    void axesTakeTheDecimalPrefixThatKeepsNumbersBelowAThousand() {
        // SI prefixes (common practice, no source): the largest value shown lies in [1, 1000).
        assertEquals(new OrbitCharts.Scale("kV", 1e3), OrbitCharts.Scale.of("V", 84_510));
        assertEquals(new OrbitCharts.Scale("V", 1.0), OrbitCharts.Scale.of("V", 4.8));
        assertEquals(new OrbitCharts.Scale("nF", 1e-9), OrbitCharts.Scale.of("F", 2e-7));
        assertEquals(new OrbitCharts.Scale("MOhm", 1e6), OrbitCharts.Scale.of("ohm", 1.19e6));
        assertEquals(new OrbitCharts.Scale("ohm", 1.0), OrbitCharts.Scale.of("ohm", 10));
        // lengths in m or km only (no Mm, no mm for cable lengths)
        assertEquals(new OrbitCharts.Scale("km", 1e3), OrbitCharts.Scale.of("m", 3600));
        assertEquals(new OrbitCharts.Scale("m", 1.0), OrbitCharts.Scale.of("m", 250));
        assertEquals(1.0, OrbitCharts.Scale.of("V", 0).factor(), 0.0);
    }

    @Test
    void diagramIsWrittenWithBranchesMarksAndSamples() throws Exception {
        // A branch that loses stability halfway, a doubling marked there, a cloud of samples.
        double[] p = {1, 2, 3, 4};
        var curve = new OrbitCharts.Curve(0, 1, p, new double[] {10, 11, 12, 13}, new boolean[] {true, true, false, false});
        var mark = new OrbitCharts.Mark(0, "period-doubling", 2.5, 11.5);
        var cloud = new OrbitCharts.Cloud(new double[] {1, 1, 2, 3}, new double[] {10, 10.1, 11, 12});
        List<Path> files = OrbitCharts.diagram("t", "source peak voltage", "V", "peak terminal voltage", List.of(curve), List.of(mark),
                cloud, tmp, "d");
        assertEquals(3, files.size());
        for (Path f : files) {
            assertTrue(Files.size(f) > 1000, f.toString());
        }
        assertTrue(Files.readString(tmp.resolve("d.svg")).contains("<svg"));
        assertEquals((byte) 0x89, Files.readAllBytes(tmp.resolve("d.png"))[0], "PNG signature");
        assertThrows(IllegalArgumentException.class, () -> new OrbitCharts.Curve(0, 1, p, new double[] {1}, new boolean[] {true}));
    }
}
