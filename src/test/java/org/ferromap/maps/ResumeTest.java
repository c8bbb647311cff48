package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import java.util.stream.Stream;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResumeTest {

    @TempDir
    Path tmp;

    /** 64 x 64 cells in tiles of 8: 64 tiles of 64 cells. */
    static final MapRequest GRID = new MapRequest(Axis.linear("x", "", -1, 1, 64), Axis.linear("y", "", -0.3, 1.5, 64), 8);

    static LocalPoolExecutor pool(int threads) {
        return new LocalPoolExecutor(threads, false, LocalPoolExecutor.DEFAULT_STOP_GRACE);
    }

    /**
     * Stop a map after some cells, rerun it: the rerun loads every finished tile, computes only
     * the others, and the result is bit-identical to an uninterrupted run. Units in progress
     * finish when stopped, so every evaluated cell of the first run is in a saved tile and
     * evaluations add up to the grid exactly [der: counting].
     */
    @Test
    void anInterruptedMapResumesWhereItStopped() {
        MapGrid reference = MapRunner.run(GRID, new TestCells.Cubic(), pool(2), null, null, RefinementSettings.OFF);
        TileStore store = TileStore.at(tmp.resolve("tiles"));
        LocalPoolExecutor first = pool(2);
        TestCells.Counting stopping = new TestCells.Counting(new TestCells.Cubic(), 1000, first::requestStop);
        FerromapException e = assertThrows(FerromapException.class,
                () -> MapRunner.run(GRID, stopping, first, store, null, RefinementSettings.OFF));
        assertEquals(MessageKey.INTERRUPTED, e.key());
        long firstEvaluations = stopping.count.get();
        assertTrue(firstEvaluations >= 1000 && firstEvaluations < GRID.cells(), "stopped midway: " + firstEvaluations);
        assertEquals(0, firstEvaluations % 64, "whole tiles only");

        TestCells.Counting again = new TestCells.Counting(new TestCells.Cubic());
        MapGrid resumed = MapRunner.run(GRID, again, pool(2), TileStore.at(tmp.resolve("tiles")), null,
                RefinementSettings.OFF);
        assertTrue(resumed.sameAs(reference));
        assertEquals(GRID.cells() - firstEvaluations, again.count.get(), "only the missing tiles");
        assertEquals(firstEvaluations, resumed.stats().reused());
        assertEquals(again.count.get(), resumed.stats().computed());
        assertEquals(0, resumed.stats().tilesRejected());

        TestCells.Counting third = new TestCells.Counting(new TestCells.Cubic());
        MapGrid cached = MapRunner.run(GRID, third, pool(1), store, null, RefinementSettings.OFF);
        assertEquals(0, third.count.get(), "a complete run is reused whole");
        assertTrue(cached.sameAs(reference));
    }

    /**
     * The same with refinement: each level's work list depends only on values, so a rerun builds
     * the same units, loads the saved ones (coarse lattice and part of a level) and ends identical,
     * with the two runs' evaluations adding up to one uninterrupted refined run [der: counting].
     */
    @Test
    void refinementPassesResumeToo() {
        MapRequest r = MapRunnerTest.CUSP.withTileSize(8);
        RefinementSettings refine = RefinementSettings.DEFAULT.withTolerances(0, Double.POSITIVE_INFINITY);
        TestCells.Counting plain = new TestCells.Counting(new TestCells.Cubic());
        MapGrid reference = MapRunner.run(r, plain, pool(2), null, null, refine);
        long coarse = 17L * 13; // lattice of 129 x 97 cells at stride 8: 17 x 13 points
        assertTrue(plain.count.get() > coarse + 200, "enough refinement work to stop inside it");

        TileStore store = TileStore.at(tmp.resolve("tiles"));
        LocalPoolExecutor first = pool(2);
        TestCells.Counting stopping = new TestCells.Counting(new TestCells.Cubic(), coarse + 100, first::requestStop);
        assertEquals(MessageKey.INTERRUPTED, assertThrows(FerromapException.class,
                () -> MapRunner.run(r, stopping, first, store, null, refine)).key());

        TestCells.Counting again = new TestCells.Counting(new TestCells.Cubic());
        MapGrid resumed = MapRunner.run(r, again, pool(2), store, null, refine);
        assertTrue(resumed.sameAs(reference));
        assertEquals(plain.count.get(), stopping.count.get() + again.count.get());
        assertEquals(stopping.count.get(), resumed.stats().reused());
    }

    /**
     * Saved tiles are never trusted blindly: a flipped byte (CRC), a truncated file and a tile
     * copied from another study's folder (run key) are each rejected and recomputed, and the
     * result still equals the reference.
     */
    @Test
    void damagedOrForeignTilesAreRecomputed() throws IOException {
        MapRequest r = new MapRequest(Axis.linear("x", "", 0, 3, 48), Axis.linear("y", "", 0, 2, 48), 16); // 9 tiles
        TileStore store = TileStore.at(tmp.resolve("tiles"));
        CellFunction smooth = new TestCells.Smooth(3);
        MapGrid reference = MapRunner.run(r, smooth, pool(2), store, null, RefinementSettings.OFF);
        String key = MapRunner.runKey(r, smooth, RefinementSettings.OFF);
        WorkUnit u11 = new WorkUnit(0, 1, 1, 16, 16, 32, 32, 48, null);
        WorkUnit u02 = new WorkUnit(0, 0, 2, 0, 32, 16, 48, 48, null);
        WorkUnit u20 = new WorkUnit(0, 2, 0, 32, 0, 48, 16, 48, null);

        Path f11 = store.file(key, u11);
        byte[] b = Files.readAllBytes(f11);
        b[b.length / 2] ^= 0x10; // one bit inside the values
        Files.write(f11, b);
        Path f02 = store.file(key, u02);
        byte[] c = Files.readAllBytes(f02);
        Files.write(f02, java.util.Arrays.copyOf(c, c.length - 100));

        CellFunction other = new TestCells.Smooth(3) {
            @Override
            public String fingerprint() {
                return "another study";
            }
        };
        MapRunner.run(r, other, pool(2), store, null, RefinementSettings.OFF);
        String otherKey = MapRunner.runKey(r, other, RefinementSettings.OFF);
        assertFalse(store.folder(otherKey).equals(store.folder(key)), "another fingerprint, another folder");
        Files.copy(store.file(otherKey, u20), store.file(key, u20), StandardCopyOption.REPLACE_EXISTING);

        TestCells.Counting again = new TestCells.Counting(smooth);
        MapGrid rerun = MapRunner.run(r, again, pool(2), store, null, RefinementSettings.OFF);
        assertEquals(3 * 256, again.count.get(), "the three bad tiles, 16 x 16 cells each");
        assertEquals(3, rerun.stats().tilesRejected());
        assertTrue(rerun.sameAs(reference));

        TestCells.Counting fourth = new TestCells.Counting(smooth);
        MapRunner.run(r, fourth, pool(2), store, null, RefinementSettings.OFF);
        assertEquals(0, fourth.count.get(), "the recomputed tiles were saved again");
    }

    /**
     * Interrupting the thread that runs the map stops it cleanly: INTERRUPTED, the thread's
     * interrupt status kept, finished tiles saved, and a rerun completes the map [cp].
     */
    @Test
    void threadInterruptStopsCleanly() throws Exception {
        TileStore store = TileStore.at(tmp.resolve("tiles"));
        AtomicReference<Thread> runner = new AtomicReference<>();
        AtomicReference<Throwable> thrown = new AtomicReference<>();
        AtomicReference<Boolean> flagKept = new AtomicReference<>();
        TestCells.Counting slowStart = new TestCells.Counting(new TestCells.Cubic(), 300,
                () -> runner.get().interrupt());
        Thread t = new Thread(() -> {
            try {
                MapRunner.run(GRID, slowStart, pool(2), store, null, RefinementSettings.OFF);
            } catch (Throwable e) {
                thrown.set(e);
            }
            flagKept.set(Thread.currentThread().isInterrupted());
        });
        runner.set(t);
        t.start();
        t.join(60_000);
        assertFalse(t.isAlive());
        assertTrue(thrown.get() instanceof FerromapException fe && fe.key() == MessageKey.INTERRUPTED,
                String.valueOf(thrown.get()));
        assertTrue(flagKept.get());
        long saved = countTiles(store.folder(MapRunner.runKey(GRID, slowStart, RefinementSettings.OFF)));
        assertEquals(slowStart.count.get(), saved * 64, "every evaluated cell is in a saved tile");

        TestCells.Counting again = new TestCells.Counting(new TestCells.Cubic());
        MapGrid done = MapRunner.run(GRID, again, pool(2), store, null, RefinementSettings.OFF);
        assertEquals(GRID.cells() - saved * 64, again.count.get());
        assertTrue(done.sameAs(MapRunner.run(GRID, new TestCells.Cubic(), pool(1), null, null, RefinementSettings.OFF)));
    }

    /**
     * Ctrl-C: a child JVM computing a slow map is sent SIGTERM (which runs shutdown hooks exactly
     * as SIGINT does) once a few tiles are saved. The hook lets tiles in progress finish, so no
     * half-written file is left, and the parent resumes from the saved tiles to the same map [cp].
     */
    @Test
    void ctrlCLeavesFinishedTilesSaved() throws Exception {
        Path tiles = tmp.resolve("tiles");
        ProcessBuilder pb = new ProcessBuilder(javaBinary(), "-cp", System.getProperty("java.class.path"),
                SlowMapMain.class.getName(), tiles.toString());
        pb.redirectErrorStream(true);
        pb.redirectOutput(tmp.resolve("child.log").toFile());
        Process child = pb.start();
        Path folder = TileStore.at(tiles).folder(MapRunner.runKey(SlowMapMain.REQUEST, new SlowMapMain.Slow(),
                RefinementSettings.OFF));
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (countTiles(folder) < 5 && child.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        assertTrue(child.isAlive(), "child still computing: " + Files.readString(tmp.resolve("child.log")));
        child.destroy(); // SIGTERM
        assertTrue(child.waitFor(60, java.util.concurrent.TimeUnit.SECONDS));
        String log = Files.readString(tmp.resolve("child.log"));
        assertTrue(log.contains("stopping"), log);
        try (Stream<Path> s = Files.list(folder)) {
            List<Path> partial = s.filter(p -> p.toString().endsWith(".part")).toList();
            assertTrue(partial.isEmpty(), "no half-written tile: " + partial);
        }
        long saved = countTiles(folder);
        assertTrue(saved >= 5 && saved < 100, "saved " + saved);

        TestCells.Counting again = new TestCells.Counting(new SlowMapMain.Slow(0));
        MapGrid resumed = MapRunner.run(SlowMapMain.REQUEST, again, pool(2), TileStore.at(tiles), null,
                RefinementSettings.OFF);
        assertEquals(saved * 16, resumed.stats().reused());
        assertEquals(0, resumed.stats().tilesRejected());
        assertEquals(SlowMapMain.REQUEST.cells() - saved * 16, again.count.get());
        assertTrue(resumed.sameAs(MapRunner.run(SlowMapMain.REQUEST, new SlowMapMain.Slow(0), pool(2), null, null,
                RefinementSettings.OFF)));
    }

    static String javaBinary() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    static long countTiles(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return 0;
        }
        try (Stream<Path> s = Files.list(folder)) {
            return s.filter(p -> p.getFileName().toString().endsWith(".bin")).count();
        }
    }
}
