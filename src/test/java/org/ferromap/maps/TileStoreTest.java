package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TileStoreTest {

    @TempDir
    Path tmp;

    static final String KEY = "0123456789abcdef".repeat(4);
    static final String OTHER_KEY = "fedcba9876543210".repeat(4);

    /** Values come back bit for bit, including NaN, -0.0 and infinities [der: raw long bits]. */
    @Test
    void roundTripIsBitExact() throws Exception {
        TileStore s = TileStore.at(tmp);
        s.prepare(KEY);
        WorkUnit u = new WorkUnit(2, 1, 0, 16, 0, 32, 16, 100, new int[] {17, 18, 2 * 100 + 20});
        double[] v = {Double.NaN, -0.0, Double.POSITIVE_INFINITY, 1e-308, Math.PI, -1.5};
        s.save(KEY, u, 2, v);
        double[] back = new double[6];
        assertTrue(s.load(KEY, u, 2, back));
        for (int i = 0; i < v.length; i++) {
            assertEquals(Double.doubleToRawLongBits(v[i]), Double.doubleToRawLongBits(back[i]), "value " + i);
        }
        try (var files = Files.list(s.folder(KEY))) {
            assertEquals(1, files.count(), "no temporary file left");
        }
    }

    /** A file is only reused for the very unit and width it was written for [cp]. */
    @Test
    void anythingDifferentIsRejected() {
        TileStore s = TileStore.at(tmp);
        s.prepare(KEY);
        WorkUnit u = new WorkUnit(1, 0, 0, 0, 0, 4, 4, 10, new int[] {1, 2, 3});
        s.save(KEY, u, 1, new double[] {1, 2, 3});
        double[] into = new double[8];
        assertFalse(s.load(KEY, new WorkUnit(1, 0, 0, 0, 0, 4, 4, 10, new int[] {1, 2, 13}), 1, into));
        assertFalse(s.load(KEY, u, 2, into), "another width");
        assertEquals(2, s.rejectedCount());
        assertFalse(s.load(KEY, new WorkUnit(1, 1, 0, 4, 0, 8, 4, 10, null), 1, into), "no such file");
        assertFalse(s.load(OTHER_KEY, u, 1, into), "another run's folder has nothing");
        assertEquals(2, s.rejectedCount(), "missing files are not rejections");
        assertTrue(s.load(KEY, u, 1, into));
        s.delete(KEY);
        assertFalse(Files.exists(s.folder(KEY)));
    }

    /** A command's store sits in its output folder, one folder per run key [cp]. */
    @Test
    void layout() {
        TileStore s = TileStore.forOutput(tmp.resolve("study-out"));
        assertEquals(tmp.resolve("study-out").resolve(".map-tiles").toAbsolutePath(), s.root());
        assertEquals(s.root().resolve(KEY.substring(0, 16)), s.folder(KEY));
        assertEquals("tile-p3-4-5.bin", s.file(KEY, new WorkUnit(3, 4, 5, 4, 5, 5, 6, 10, null)).getFileName().toString());
    }
}
