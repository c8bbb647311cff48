package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportFilesTest {

    @TempDir
    Path tmp;

    @Test
    void uncommittedFolderLeavesNothing() throws Exception {
        Path target = tmp.resolve("study");
        try (OutputFolder f = OutputFolder.open(target)) {
            Files.writeString(f.file("a.txt"), "x");
        }
        assertFalse(Files.exists(target));
        try (var s = Files.list(tmp)) {
            assertEquals(0, s.count(), "staging folder removed");
        }
    }

    @Test
    void commitReplacesAnEarlierFolderWhole() throws Exception {
        Path target = tmp.resolve("study");
        Files.createDirectories(target);
        Files.writeString(target.resolve("stale.txt"), "old");
        try (OutputFolder f = OutputFolder.open(target)) {
            Files.writeString(f.file("new.txt"), "new");
            f.commit();
        }
        assertTrue(Files.exists(target.resolve("new.txt")));
        assertFalse(Files.exists(target.resolve("stale.txt")));
    }

    @Test
    void chartsAreWrittenInThreeForms() throws Exception {
        var c = ChartFiles.xyChart("t", "x", "y");
        c.addSeries("s", new double[] {0, 1, 2}, new double[] {0, 1, 4});
        List<Path> files = ChartFiles.save(c, tmp, "chart");
        assertEquals(3, files.size());
        for (Path p : files) {
            assertTrue(Files.size(p) > 100, p + " has content");
        }
        byte[] png = Files.readAllBytes(tmp.resolve("chart.png"));
        assertEquals((byte) 0x89, png[0]);
        assertTrue(Files.readString(tmp.resolve("chart.svg")).contains("<svg"));
    }

    @Test
    void jsonWritesNonFiniteAsNull() {
        String s = Json.text(Map.of("v", Double.NaN));
        assertTrue(s.contains("null"), s);
    }

    @Test
    void csvQuotesAndFormats() throws Exception {
        Path f = tmp.resolve("t.csv");
        Csv.write(f, List.of("a (V)", "b"), List.of(List.of(1.5, "x,y"), List.of(Double.NaN, true)));
        assertEquals("a (V),b\r\n1.5,\"x,y\"\r\n,true\r\n", Files.readString(f));
    }
}
