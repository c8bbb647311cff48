package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MemoryTest {

    @TempDir
    Path tmp;

    /**
     * 200000 x 200000 cells of 4 values need 4e10 * 33 bytes, about 1.3 TB [der], more than any
     * heap here: refused with TOO_LARGE before anything is allocated or evaluated, and the message
     * names the grid, the bytes and the way out.
     */
    @Test
    void anAbsurdGridIsRefusedBeforeAllocating() {
        MapRequest huge = MapRequest.of(Axis.linear("x", "", 0, 1, 200_000), Axis.linear("y", "", 0, 1, 200_000));
        TestCells.Counting f = new TestCells.Counting(new TestCells.Smooth(4));
        FerromapException e = assertThrows(FerromapException.class,
                () -> MapRunner.run(huge, f, new LocalPoolExecutor(1), null, null, RefinementSettings.OFF));
        assertEquals(MessageKey.TOO_LARGE, e.key());
        assertEquals(0, f.count.get());
        String m = e.getMessage();
        assertTrue(m.contains("200000 x 200000"), m);
        long need = MapRunner.requiredBytes(huge, 4, RefinementSettings.OFF);
        assertTrue(need >= 40_000_000_000L * 33, "at least 4e10 cells x 33 bytes [der]");
        assertTrue(m.contains("(" + need + " bytes)"), m);
        assertTrue(m.contains("is available"), m);
        assertTrue(m.contains("FERROMAP_JAVA_OPTS=-Xmx") && m.contains("fewer steps"), m);
    }

    /** The budget is compared with nx * ny * (8 width + 1) + overhead [der: array sizes]. */
    @Test
    void theBudgetDecides() {
        MapRequest r = MapRequest.of(Axis.linear("x", "", 0, 1, 1000), Axis.linear("y", "", 0, 1, 1000));
        long need = MapRunner.requiredBytes(r, 4, RefinementSettings.OFF);
        assertEquals(1_000_000L * 33 + 8L * 2000 + MapRunner.FIXED_OVERHEAD_BYTES, need);
        FerromapException e = assertThrows(FerromapException.class, () -> MapRunner.run(r, new TestCells.Smooth(4),
                new LocalPoolExecutor(1), null, null, RefinementSettings.OFF, () -> need - 1));
        assertEquals(MessageKey.TOO_LARGE, e.key());
        assertTrue(MapRunner.requiredBytes(r, 4, RefinementSettings.DEFAULT) > need, "refinement bookkeeping counted");
    }

    /** A 1000 x 1000 map of 4 values (33 MB of results) completes in this JVM's default heap. */
    @Test
    void aMillionCellsFitTheDefaultHeap() {
        MapGrid g = LargeMapMain.compute(RefinementSettings.OFF);
        assertEquals(1_000_000L, g.stats().computed());
    }

    /**
     * The same map in a JVM limited to -Xmx256m, with and without refinement: memory is the
     * point, not time. The child exits 0 only when both maps completed with every cell resolved.
     */
    @Test
    void aMillionCellsFitIn256Megabytes() throws Exception {
        Path log = tmp.resolve("child.log");
        Process p = new ProcessBuilder(ResumeTest.javaBinary(), "-Xmx256m", "-cp", System.getProperty("java.class.path"),
                LargeMapMain.class.getName()).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "child did not end");
        String out = Files.readString(log, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), out);
        assertTrue(out.contains("off: 1000000 cells resolved") && out.contains("on: 1000000 cells resolved"), out);
    }
}
