package org.ferromap.maps;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.LongSupplier;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Computes a map: checks that it fits in memory, cuts the grid into tiles, reuses tiles saved by
 * an interrupted earlier run, has the executor evaluate the rest, and (with refinement) repeats
 * pass after pass from a coarse lattice down to single cells where neighbours disagree.
 *
 * <p>Every decision (which cells a pass computes, how they are grouped into tiles, which cells
 * are inferred) is made on this thread from values alone, so the result is bit-identical whatever
 * the executor, the thread count, or how many tiles came from a resume folder.
 */
public final class MapRunner {

    /** Share of the free heap a map may take; the rest is left to the cell functions and the report. */
    public static final double HEAP_SHARE = 0.6;

    /** Fixed allowance for worker buffers, tile lists and the like, in bytes. */
    static final long FIXED_OVERHEAD_BYTES = 8L << 20;

    /** Worst-case refinement bookkeeping per cell (block lists and per-pass cell lists), in bytes. */
    static final long REFINEMENT_BYTES_PER_CELL = 10;

    /** Temporary flag: cell marked for the pass being assembled. */
    private static final byte PENDING = 3;
    private static final byte UNKNOWN = 0;

    private MapRunner() {
    }

    /**
     * Computes the map.
     *
     * @param request    the axes and the tile size
     * @param cell       the pure cell function
     * @param executor   who evaluates the tiles ({@link LocalPoolExecutor} on this machine)
     * @param store      resume tiles; {@code null} for none
     * @param progress   hears the passes; {@code null} for none
     * @param refinement refinement settings; {@code null} computes every cell ({@link RefinementSettings#OFF})
     * @return the grid, its flags and how it was obtained
     * @throws FerromapException {@code TOO_LARGE} before allocating when the grid does not fit,
     *         {@code BAD_REQUEST} for inconsistent settings, {@code INTERRUPTED} when stopped (the
     *         finished tiles are saved), {@code CANNOT_WRITE} when the store cannot be written
     */
    public static MapGrid run(MapRequest request, CellFunction cell, CellExecutor executor, TileStore store,
            ProgressListener progress, RefinementSettings refinement) {
        return run(request, cell, executor, store, progress, refinement, MapRunner::availableBytes);
    }

    static MapGrid run(MapRequest request, CellFunction cell, CellExecutor executor, TileStore store,
            ProgressListener progress, RefinementSettings refinement, LongSupplier available) {
        RefinementSettings refine = refinement == null ? RefinementSettings.OFF : refinement;
        int width = cell.width();
        if (width < 1) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "a cell function must write at least 1 value, this one says "
                    + width);
        }
        if (refine.enabled()) {
            refine.comparator().checkWidth(width);
        }
        checkMemory(request, width, refine, available);
        long start = System.nanoTime();
        String key = runKey(request, cell, refine);
        if (store != null) {
            store.prepare(key);
        }
        Run run = new Run(request, cell, executor, store, progress == null ? ProgressListener.NONE : progress, width, key);
        int rejectedBefore = store == null ? 0 : store.rejectedCount();
        if (refine.enabled()) {
            run.refined(refine);
        } else {
            run.full();
        }
        long inferred = 0;
        for (byte f : run.flags) {
            if (f == MapGrid.INFERRED) {
                inferred++;
            } else if (f != MapGrid.COMPUTED) {
                throw new IllegalStateException("map engine left a cell unresolved"); // a bug, never the user's input
            }
        }
        int rejected = store == null ? 0 : store.rejectedCount() - rejectedBefore;
        MapStats stats = new MapStats(request.cells(), run.computed.get(), run.reused, inferred, run.passes, rejected,
                (System.nanoTime() - start) * 1e-9);
        run.progress.mapFinished(stats);
        return new MapGrid(request.x(), request.y(), width, run.data, run.flags, stats);
    }

    /**
     * Bytes a map needs: {@code nx * ny * (8 * width + 1)} for the values and flags, plus the
     * axis values, worst-case refinement bookkeeping and a fixed allowance.
     */
    public static long requiredBytes(MapRequest request, int width, RefinementSettings refinement) {
        long cells = request.cells();
        long perCell = 8L * width + 1 + (refinement != null && refinement.enabled() ? REFINEMENT_BYTES_PER_CELL : 0);
        return satMul(cells, perCell) + 8L * (request.nx() + request.ny()) + FIXED_OVERHEAD_BYTES;
    }

    /** The heap a map may take now: {@value #HEAP_SHARE} of what is not in use, in bytes. */
    public static long availableBytes() {
        Runtime rt = Runtime.getRuntime();
        long used = rt.totalMemory() - rt.freeMemory();
        return (long) (HEAP_SHARE * (rt.maxMemory() - used));
    }

    private static void checkMemory(MapRequest request, int width, RefinementSettings refine, LongSupplier available) {
        long need = requiredBytes(request, width, refine);
        String grid = request.nx() + " x " + request.ny() + " cells x " + width + " values";
        long have = available.getAsLong();
        if (need > have) {
            System.gc(); // "used" counts garbage too: measure once more before refusing
            have = available.getAsLong();
        }
        if (need > have) {
            long xmxGiB = (long) Math.ceil(need / HEAP_SHARE / (1L << 30)) + 1;
            throw new FerromapException(MessageKey.TOO_LARGE, "the map grid " + grid + " needs " + bytes(need)
                    + " of memory but " + bytes(have) + " is available (" + Math.round(HEAP_SHARE * 100)
                    + " % of the free heap); use fewer steps on the axes, or raise the heap, e.g. FERROMAP_JAVA_OPTS=-Xmx"
                    + xmxGiB + "g");
        }
        if (satMul(request.cells(), width) > Integer.MAX_VALUE - 16) {
            throw new FerromapException(MessageKey.TOO_LARGE, "the map grid " + grid + " holds "
                    + satMul(request.cells(), width) + " values, more than one array can (" + (Integer.MAX_VALUE - 16)
                    + ") and needs " + bytes(need) + "; use fewer steps on the axes");
        }
    }

    /**
     * The hash naming a run's resume tiles: SHA-256 (64 hex digits) of the cell fingerprint and
     * width, the exact axes, the tile size and the refinement scheme (on/off, stride). Tiles of
     * another study, grid or scheme land in another folder and are never mixed up.
     */
    public static String runKey(MapRequest request, CellFunction cell, RefinementSettings refinement) {
        RefinementSettings r = refinement == null ? RefinementSettings.OFF : refinement;
        StringBuilder s = new StringBuilder("ferromap map tiles v1\n");
        s.append("cell ").append(cell.fingerprint()).append('\n');
        s.append("width ").append(cell.width()).append('\n');
        axis(s, "x", request.x());
        axis(s, "y", request.y());
        s.append("tile ").append(request.tileSize()).append('\n');
        s.append("refine ").append(r.enabled()).append(' ').append(r.enabled() ? r.coarseStride() : 0).append('\n');
        try {
            byte[] h = MessageDigest.getInstance("SHA-256").digest(s.toString().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(h);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    private static void axis(StringBuilder s, String which, Axis a) {
        s.append(which).append(' ').append(a.name()).append(" [").append(a.unit()).append("] ")
                .append(Long.toHexString(Double.doubleToLongBits(a.from()))).append(' ')
                .append(Long.toHexString(Double.doubleToLongBits(a.to()))).append(' ')
                .append(a.steps()).append(' ').append(a.scale()).append('\n');
    }

    private static long satMul(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        return (hi != 0 || lo < 0) ? Long.MAX_VALUE : lo;
    }

    static String bytes(long b) {
        String[] units = {"bytes", "KB", "MB", "GB", "TB", "PB"};
        double v = b;
        int u = 0;
        while (v >= 1000 && u < units.length - 1) {
            v /= 1000;
            u++;
        }
        return u == 0 ? b + " bytes" : String.format(Locale.ROOT, "%.3g %s (%d bytes)", v, units[u], b);
    }

    /** The state of one map computation. */
    private static final class Run {
        final MapRequest request;
        final CellFunction cell;
        final CellExecutor executor;
        final TileStore store;
        final ProgressListener progress;
        final int width;
        final String key;
        final int nx;
        final int ny;
        final int tile;
        final int tilesX;
        final int tilesY;
        final double[] xs;
        final double[] ys;
        final double[] data;
        final byte[] flags;
        final AtomicLong computed = new AtomicLong();
        /** PENDING cells per tile, so assembling a pass visits only tiles with work. */
        final int[] pendingInTile;
        long reused;
        int passes;

        Run(MapRequest request, CellFunction cell, CellExecutor executor, TileStore store, ProgressListener progress,
                int width, String key) {
            this.request = request;
            this.cell = cell;
            this.executor = executor;
            this.store = store;
            this.progress = progress;
            this.width = width;
            this.key = key;
            this.nx = request.nx();
            this.ny = request.ny();
            this.tile = request.tileSize();
            this.tilesX = (nx + tile - 1) / tile;
            this.tilesY = (ny + tile - 1) / tile;
            this.xs = request.x().values();
            this.ys = request.y().values();
            this.data = new double[nx * ny * width];
            this.flags = new byte[nx * ny];
            this.pendingInTile = new int[tilesX * tilesY];
        }

        /** Every cell, tile by tile. */
        void full() {
            List<WorkUnit> units = new ArrayList<>(tilesX * tilesY);
            for (int ty = 0; ty < tilesY; ty++) {
                for (int tx = 0; tx < tilesX; tx++) {
                    units.add(new WorkUnit(0, tx, ty, tx * tile, ty * tile, Math.min(nx, (tx + 1) * tile),
                            Math.min(ny, (ty + 1) * tile), nx, null));
                }
            }
            pass(0, "all cells", units);
        }

        /** Coarse lattice, then level after level of halved blocks where corners disagree. */
        void refined(RefinementSettings settings) {
            int stride = settings.coarseStride();
            CellComparator same = settings.comparator();
            int[] lx = lattice(nx, stride);
            int[] ly = lattice(ny, stride);
            for (int iy : ly) {
                for (int ix : lx) {
                    need(ix, iy);
                }
            }
            pendingPass(0, "coarse lattice (stride " + stride + ")");

            // blocks as (xa, ya, xb, yb), corners inclusive
            IntList blocks = new IntList();
            for (int j = 0; j + 1 < ly.length; j++) {
                for (int i = 0; i + 1 < lx.length; i++) {
                    blocks.add4(lx[i], ly[j], lx[i + 1], ly[j + 1]);
                }
            }
            int level = 0;
            int blockSide = stride;
            while (blocks.size() > 0) {
                level++;
                blockSide = Math.max(1, blockSide / 2);
                IntList next = new IntList();
                int[] b = blocks.array();
                for (int p = 0; p < blocks.size(); p += 4) {
                    int xa = b[p];
                    int ya = b[p + 1];
                    int xb = b[p + 2];
                    int yb = b[p + 3];
                    boolean splitX = xb - xa > 1;
                    boolean splitY = yb - ya > 1;
                    if (!splitX && !splitY) {
                        continue; // every cell of the block is one of its corners: all computed
                    }
                    if (cornersAgree(same, xa, ya, xb, yb)) {
                        fill(xa, ya, xb, yb);
                        continue;
                    }
                    int mx = splitX ? (xa + xb) >>> 1 : -1;
                    int my = splitY ? (ya + yb) >>> 1 : -1;
                    if (splitX) {
                        need(mx, ya);
                        need(mx, yb);
                    }
                    if (splitY) {
                        need(xa, my);
                        need(xb, my);
                    }
                    if (splitX && splitY) {
                        need(mx, my);
                        next.add4(xa, ya, mx, my);
                        next.add4(mx, ya, xb, my);
                        next.add4(xa, my, mx, yb);
                        next.add4(mx, my, xb, yb);
                    } else if (splitX) {
                        next.add4(xa, ya, mx, yb);
                        next.add4(mx, ya, xb, yb);
                    } else {
                        next.add4(xa, ya, xb, my);
                        next.add4(xa, my, xb, yb);
                    }
                }
                pendingPass(level, "refinement level " + level + " (blocks of " + blockSide + ")");
                blocks = next;
            }
        }

        private boolean cornersAgree(CellComparator same, int xa, int ya, int xb, int yb) {
            int c00 = (ya * nx + xa) * width;
            int c10 = (ya * nx + xb) * width;
            int c01 = (yb * nx + xa) * width;
            int c11 = (yb * nx + xb) * width;
            // every pair: a tolerance is not transitive
            return same.agree(data, c00, c10, width) && same.agree(data, c00, c01, width)
                    && same.agree(data, c00, c11, width) && same.agree(data, c10, c01, width)
                    && same.agree(data, c10, c11, width) && same.agree(data, c01, c11, width);
        }

        /**
         * Fills the not-yet-known cells of an agreeing block with the nearest corner's values
         * (ties to the lower index). A border cell a neighbour later needs as a corner is computed
         * then and keeps the computed value; cells on a border shared by two agreeing blocks get
         * the same value from either (their nearest corners are the shared ones).
         */
        private void fill(int xa, int ya, int xb, int yb) {
            for (int iy = ya; iy <= yb; iy++) {
                int cy = (iy - ya <= yb - iy) ? ya : yb;
                for (int ix = xa; ix <= xb; ix++) {
                    int c = iy * nx + ix;
                    if (flags[c] != UNKNOWN) {
                        continue;
                    }
                    int cx = (ix - xa <= xb - ix) ? xa : xb;
                    int from = (cy * nx + cx) * width;
                    int to = c * width;
                    for (int k = 0; k < width; k++) {
                        data[to + k] = data[from + k];
                    }
                    flags[c] = MapGrid.INFERRED;
                }
            }
        }

        private void need(int ix, int iy) {
            int c = iy * nx + ix;
            if (flags[c] != MapGrid.COMPUTED && flags[c] != PENDING) {
                flags[c] = PENDING;
                pendingInTile[(iy / tile) * tilesX + ix / tile]++;
            }
        }

        /** Groups the PENDING cells by tile (tiles row by row, cells ascending) and runs them as one pass. */
        private void pendingPass(int pass, String label) {
            List<WorkUnit> units = new ArrayList<>();
            int[] buffer = new int[tile * tile];
            for (int ty = 0; ty < tilesY; ty++) {
                int y0 = ty * tile;
                int y1 = Math.min(ny, y0 + tile);
                for (int tx = 0; tx < tilesX; tx++) {
                    if (pendingInTile[ty * tilesX + tx] == 0) {
                        continue;
                    }
                    pendingInTile[ty * tilesX + tx] = 0;
                    int x0 = tx * tile;
                    int x1 = Math.min(nx, x0 + tile);
                    int n = 0;
                    for (int iy = y0; iy < y1; iy++) {
                        for (int ix = x0; ix < x1; ix++) {
                            int c = iy * nx + ix;
                            if (flags[c] == PENDING) {
                                buffer[n++] = c;
                            }
                        }
                    }
                    if (n > 0) {
                        units.add(new WorkUnit(pass, tx, ty, x0, y0, x1, y1, nx, Arrays.copyOf(buffer, n)));
                    }
                }
            }
            if (!units.isEmpty()) {
                pass(pass, label, units);
            }
        }

        /** Loads what the store has, evaluates the rest, writes every value into its own slots. */
        private void pass(int pass, String label, List<WorkUnit> units) {
            passes++;
            List<WorkUnit> todo = new ArrayList<>(units.size());
            long reusedHere = 0;
            long toCompute = 0;
            double[] buffer = null;
            for (WorkUnit u : units) {
                if (store != null) {
                    if (buffer == null) {
                        buffer = new double[tile * tile * width];
                    }
                    if (store.load(key, u, width, buffer)) {
                        write(u, buffer);
                        reusedHere += u.cellCount();
                        continue;
                    }
                }
                todo.add(u);
                toCompute += u.cellCount();
            }
            reused += reusedHere;
            progress.passStarted(pass, label, toCompute, reusedHere);
            executor.execute(xs, ys, todo, cell, new UnitSink() {
                @Override
                public void accept(WorkUnit u, double[] values) {
                    write(u, values);
                    if (store != null) {
                        store.save(key, u, width, values);
                    }
                    computed.addAndGet(u.cellCount());
                    progress.cellsDone(u.cellCount());
                }

                @Override
                public void stopping(int inProgress) {
                    progress.stopping(inProgress);
                }
            });
            progress.passFinished(pass);
        }

        /** Copies a unit's values to its cells' slots; units of a pass never share a cell. */
        private void write(WorkUnit u, double[] values) {
            int[] cells = u.cells();
            if (cells == null) {
                int from = 0;
                for (int iy = u.iy0(); iy < u.iy1(); iy++) {
                    int to = (iy * nx + u.ix0()) * width;
                    int n = (u.ix1() - u.ix0()) * width;
                    System.arraycopy(values, from, data, to, n); // a row of the tile is contiguous
                    Arrays.fill(flags, iy * nx + u.ix0(), iy * nx + u.ix1(), MapGrid.COMPUTED);
                    from += n;
                }
                return;
            }
            for (int k = 0; k < cells.length; k++) {
                int c = cells[k];
                int from = k * width;
                int to = c * width;
                for (int j = 0; j < width; j++) { // a loop beats arraycopy for a handful of values
                    data[to + j] = values[from + j];
                }
                flags[c] = MapGrid.COMPUTED;
            }
        }
    }

    /** Lattice indices 0, stride, 2 stride, ... and the last index. */
    static int[] lattice(int n, int stride) {
        int count = (n - 2) / stride + 2;
        int[] v = new int[count];
        for (int i = 0; i < count - 1; i++) {
            v[i] = i * stride;
        }
        v[count - 1] = n - 1;
        return v;
    }

    /** A growable int array for block lists, to avoid boxing. */
    private static final class IntList {
        private int[] a = new int[64];
        private int size;

        void add4(int p, int q, int r, int s) {
            if (size + 4 > a.length) {
                a = Arrays.copyOf(a, Math.max(a.length * 2, size + 4));
            }
            a[size] = p;
            a[size + 1] = q;
            a[size + 2] = r;
            a[size + 3] = s;
            size += 4;
        }

        int size() {
            return size;
        }

        int[] array() {
            return a;
        }
    }
}
