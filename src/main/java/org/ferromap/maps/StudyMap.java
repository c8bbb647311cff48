package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Computes the layers of a study map: the balance grid ({@link BalanceCell}) when any balance
 * layer is asked for, the time-domain grid ({@link TimeDomainCell}) for the time layer, and the
 * fold curves ({@link FoldBoundaries}) over the balance grid. Each grid is its own
 * {@link MapRunner} run with its own resume key, so an interrupted time-domain layer resumes
 * without recomputing the balance, and the other way round.
 */
public final class StudyMap {

    /**
     * Allowance per cell for writing the map out (boxed CSV rows, JSON records, chart rasters),
     * bytes: measured order of magnitude for five columns, rounded up.
     */
    static final long REPORT_BYTES_PER_CELL = 600;

    private StudyMap() {
    }

    /** Bytes the map needs: the grids ({@link MapRunner#requiredBytes}) and writing them out. */
    public static long requiredBytes(StudyPlane plane, StudyMapSettings s) {
        long b = 0;
        if (s.needsBalance()) {
            b = add(b, MapRunner.requiredBytes(plane.request(s.balanceTileSize()), 2, s.balanceRefinement()));
        }
        if (s.has(MapLayer.TIME)) {
            b = add(b, MapRunner.requiredBytes(plane.request(s.timeTileSize()), 4, s.timeRefinement()));
        }
        long cells = plane.request(1).cells();
        return add(b, cells > Long.MAX_VALUE / REPORT_BYTES_PER_CELL ? Long.MAX_VALUE : cells * REPORT_BYTES_PER_CELL);
    }

    /**
     * Refuses a map that cannot fit, before anything is computed or written: {@code TOO_LARGE}
     * saying what it needs and what to change.
     */
    public static void checkMemory(StudyPlane plane, StudyMapSettings s) {
        long need = requiredBytes(plane, s);
        long cells = plane.request(1).cells();
        String grid = plane.x().axis().steps() + " x " + plane.y().axis().steps() + " cells";
        if (cells * 4 > Integer.MAX_VALUE - 16 || cells < 0) {
            throw new FerromapException(MessageKey.TOO_LARGE, "the map grid " + grid + " has more cells than one array "
                    + "can hold; use fewer steps on the axes");
        }
        long have = MapRunner.availableBytes();
        if (need > have) {
            System.gc(); // "used" counts garbage too: measure once more before refusing
            have = MapRunner.availableBytes();
        }
        if (need > have) {
            long xmxGiB = (long) Math.ceil(need / MapRunner.HEAP_SHARE / (1L << 30)) + 1;
            throw new FerromapException(MessageKey.TOO_LARGE, "the map grid " + grid + " needs about " + mb(need)
                    + " of memory but " + mb(have) + " is available; use fewer steps on the axes, or raise the heap, "
                    + "e.g. FERROMAP_JAVA_OPTS=-Xmx" + xmxGiB + "g");
        }
    }

    /**
     * Computes every layer asked for.
     *
     * @param plane    the plane
     * @param s        layers and settings
     * @param executor evaluates the tiles (one executor for both grids; a stop request ends both)
     * @param store    resume tiles; null for none. Keep it outside any staging folder that an
     *                 aborted run discards (e.g. {@code <out>/.tiles/<study>})
     * @param progress hears the passes; null for none
     * @param threads  threads for the fold curves' bisections
     * @throws FerromapException {@code TOO_LARGE} before computing when the map cannot fit,
     *         {@code INTERRUPTED} when stopped (finished tiles are saved)
     */
    public static StudyMapResult run(StudyPlane plane, StudyMapSettings s, CellExecutor executor, TileStore store,
            ProgressListener progress, int threads) {
        checkMemory(plane, s);
        ProgressListener p = progress == null ? ProgressListener.NONE : progress;
        List<String> keys = new ArrayList<>();
        MapGrid balance = null;
        BalanceCell bc = null;
        if (s.needsBalance()) {
            bc = new BalanceCell(plane, new SingleHarmonicBalance(s.balance()));
            MapRequest r = plane.request(s.balanceTileSize());
            keys.add(MapRunner.runKey(r, bc, s.balanceRefinement()));
            balance = MapRunner.run(r, bc, executor, store, prefixed("balance", p), s.balanceRefinement());
        }
        MapGrid time = null;
        if (s.has(MapLayer.TIME)) {
            TimeDomainCell tc = new TimeDomainCell(plane, s.ensemble());
            MapRequest r = plane.request(s.timeTileSize());
            keys.add(MapRunner.runKey(r, tc, s.timeRefinement()));
            time = MapRunner.run(r, tc, executor, store, prefixed("time domain", p), s.timeRefinement());
        }
        FoldBoundaries.Result folds = null;
        if (s.has(MapLayer.FOLDS)) {
            folds = FoldBoundaries.trace(bc, balance, threads);
        }
        return new StudyMapResult(plane, s, balance, time, folds, keys);
    }

    /** Removes the resume tiles of a finished map (call once its output is saved). */
    public static void forgetTiles(TileStore store, StudyMapResult r) {
        if (store != null) {
            for (String k : r.runKeys()) {
                store.delete(k);
            }
        }
    }

    /** A listener that names the layer in every pass label. */
    static ProgressListener prefixed(String layer, ProgressListener p) {
        return new ProgressListener() {
            @Override
            public void passStarted(int pass, String label, long cellsToCompute, long cellsReused) {
                p.passStarted(pass, layer + ", " + label, cellsToCompute, cellsReused);
            }

            @Override
            public void cellsDone(long cells) {
                p.cellsDone(cells);
            }

            @Override
            public void passFinished(int pass) {
                p.passFinished(pass);
            }

            @Override
            public void stopping(int unitsInProgress) {
                p.stopping(unitsInProgress);
            }

            @Override
            public void mapFinished(MapStats stats) {
                p.mapFinished(stats);
            }
        };
    }

    private static long add(long a, long b) {
        long s = a + b;
        return s < 0 ? Long.MAX_VALUE : s;
    }

    private static String mb(long b) {
        return b == Long.MAX_VALUE ? "more than any machine has" : String.format(Locale.ROOT, "%.0f MB", b / 1e6);
    }
}
