package org.ferromap.maps;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The fold curves and cusps of a balance map, located exactly rather than drawn along cell edges
 * (DOMAIN.md §3). Two facts per point of the plane decide its category: whether a stable normal
 * state exists (N) and whether a stable ferroresonant one does (F). N ends at a jump-up fold, F
 * begins at a jump-down fold; below the cusp (no fold pair) the single branch turns capacitive
 * and N and F change together, with no jump.
 *
 * <p>Method: for every pair of neighbouring cells whose N (or F) differs, bisect along the segment
 * between the two samples (in the axes' own scales, linear or log) with the balance itself,
 * {@value #BISECTIONS} halvings, so each boundary point lies within 2^-{@value #BISECTIONS} of a
 * cell of the true boundary. Each point is a fold when the circuit there has a fold pair, and a
 * capacitive turn otherwise. Points are joined square by square (marching squares) into
 * polylines. A cusp is where the boundary of N changes from fold to capacitive turn (or the
 * boundary of F does): the line where the fold pair is born is followed (by bisections across it)
 * to the point where the merging folds' source equals the circuit's own, and the cusp is bisected
 * there to the same precision as the curves.
 *
 * <p>Features thinner than a cell that the grid does not see (or that refinement painted over)
 * are not found. Deterministic: points are computed independently, in parallel, into fixed slots.
 */
public final class FoldBoundaries {

    /** Halvings of each boundary segment: 2^-24 of a cell, far below anything a chart shows. */
    public static final int BISECTIONS = 24;

    /** What a boundary curve is. */
    public enum Kind {
        /** The normal state ends as the parameters pass it: the state must jump up. */
        JUMP_UP("jump-up fold"),
        /** The ferroresonant state ends (or is born) here. */
        JUMP_DOWN("jump-down fold"),
        /** No fold pair: the single branch turns capacitive, normal becomes ferroresonant without a jump. */
        CAPACITIVE_TURN("capacitive turn"),
        /**
         * The fold pair is born here (the cusp condition, C = C_min for a capacitance axis): past
         * the cusp the upper branch is named ferroresonant while the single branch before it is
         * still called normal, so the category changes here although the state does not jump.
         */
        FOLD_PAIR_BORN("fold pair born");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        /** Legend text. */
        public String label() {
            return label;
        }
    }

    /**
     * One boundary polyline in the axes' display units.
     *
     * @param kind what the boundary is
     * @param x    x of each point, in the x axis's unit
     * @param y    y of each point, in the y axis's unit
     */
    public record Curve(Kind kind, double[] x, double[] y) {
        public Curve {
            x = x.clone();
            y = y.clone();
        }
    }

    /** A cusp, where the two folds meet, in the axes' display units. */
    public record Cusp(double x, double y) { }

    /**
     * Every boundary found.
     *
     * @param curves polylines, jump-up first, then jump-down, then capacitive turns and fold-pair births
     * @param cusps  cusp points
     */
    public record Result(List<Curve> curves, List<Cusp> cusps) {
        public Result {
            curves = List.copyOf(curves);
            cusps = List.copyOf(cusps);
        }

        /** The curves of one kind. */
        public List<Curve> of(Kind k) {
            return curves.stream().filter(c -> c.kind() == k).toList();
        }
    }

    private static final int FIELD_N = 0;
    private static final int FIELD_F = 1;

    private final BalanceCell cell;
    private final Axis xa;
    private final Axis ya;
    private final int nx;
    private final int ny;
    private final double[] us;
    private final double[] vs;
    private final boolean[][] field;
    private final boolean[] valid;

    private FoldBoundaries(BalanceCell cell, MapGrid grid) {
        this.cell = cell;
        this.xa = grid.x();
        this.ya = grid.y();
        this.nx = grid.nx();
        this.ny = grid.ny();
        this.us = scaled(xa);
        this.vs = scaled(ya);
        double[] cat = grid.layer(0);
        valid = new boolean[cat.length];
        field = new boolean[2][cat.length];
        for (int c = 0; c < cat.length; c++) {
            valid[c] = !Double.isNaN(cat[c]);
            field[FIELD_N][c] = BalanceCell.hasNormal(cat[c]);
            field[FIELD_F][c] = BalanceCell.hasFerro(cat[c]);
        }
    }

    /**
     * Locates the boundaries of a balance map.
     *
     * @param cell    the balance cell the grid was computed with (evaluated again along boundaries)
     * @param grid    the balance grid (component 0: category)
     * @param threads threads for the bisections, at least 1
     */
    public static Result trace(BalanceCell cell, MapGrid grid, int threads) {
        if (grid.width() != cell.width()) {
            throw new IllegalArgumentException("grid of width " + grid.width() + " is not a balance grid");
        }
        return new FoldBoundaries(cell, grid).run(Math.max(1, threads));
    }

    private Result run(int threads) {
        int hEdges = (nx - 1) * ny;
        int edges = hEdges + nx * (ny - 1);
        // crossing points per field and edge: index into the point arrays, -1 where none
        int[][] pointOf = new int[2][edges];
        List<int[]> tasks = new ArrayList<>(); // {field, edge}
        for (int f = 0; f < 2; f++) {
            Arrays.fill(pointOf[f], -1);
            for (int e = 0; e < edges; e++) {
                int a = edgeStart(e);
                int b = edgeEnd(e);
                if (valid[a] && valid[b] && field[f][a] != field[f][b]) {
                    pointOf[f][e] = tasks.size();
                    tasks.add(new int[] {f, e});
                }
            }
        }
        double[][] located = new double[tasks.size()][];
        runAll(threads, tasks.size(), i -> located[i] = locate(tasks.get(i)[0], tasks.get(i)[1]));

        List<Curve> upCurves = new ArrayList<>();
        List<Curve> downCurves = new ArrayList<>();
        List<Curve> turnCurves = new ArrayList<>();
        List<double[]> cuspChords = new ArrayList<>(); // {u0, v0, u1, v1}: fold point then turn point
        for (int f = 0; f < 2; f++) {
            for (int[] line : polylines(f, pointOf[f])) {
                split(f, line, pointOf[f], located, f == FIELD_N ? upCurves : downCurves, f == FIELD_N ? turnCurves : null,
                        cuspChords);
            }
        }
        double[][] cuspAt = new double[cuspChords.size()][];
        runAll(threads, cuspChords.size(), i -> cuspAt[i] = cusp(cuspChords.get(i)));
        List<Cusp> cusps = new ArrayList<>();
        List<double[]> kept = new ArrayList<>();
        for (double[] c : cuspAt) {
            if (c == null || near(kept, c)) {
                continue;
            }
            kept.add(c);
            cusps.add(new Cusp(unscale(xa, c[0]), unscale(ya, c[1])));
        }
        List<Curve> all = new ArrayList<>(upCurves);
        all.addAll(downCurves);
        all.addAll(turnCurves);
        return new Result(all, cusps);
    }

    /** Bisects field f along edge e; returns {u, v, kind ordinal}. */
    private double[] locate(int f, int e) {
        int a = edgeStart(e);
        int b = edgeEnd(e);
        double u0 = us[a % nx];
        double v0 = vs[a / nx];
        double u1 = us[b % nx];
        double v1 = vs[b / nx];
        boolean start = field[f][a];
        double lo = 0;
        double hi = 1;
        double[] out = new double[2];
        for (int k = 0; k < BISECTIONS; k++) {
            double t = 0.5 * (lo + hi);
            cell.evaluate(unscale(xa, u0 + t * (u1 - u0)), unscale(ya, v0 + t * (v1 - v0)), out, 0);
            if (Double.isNaN(out[0])) {
                break; // the balance failed inside the segment: keep the bracket found so far
            }
            boolean here = f == FIELD_N ? BalanceCell.hasNormal(out[0]) : BalanceCell.hasFerro(out[0]);
            if (here == start) {
                lo = t;
            } else {
                hi = t;
            }
        }
        double t = 0.5 * (lo + hi);
        double u = u0 + t * (u1 - u0);
        double v = v0 + t * (v1 - v0);
        boolean bLo = bistable(u0 + lo * (u1 - u0), v0 + lo * (v1 - v0));
        boolean bHi = bistable(u0 + hi * (u1 - u0), v0 + hi * (v1 - v0));
        Kind kind = bLo != bHi ? Kind.FOLD_PAIR_BORN
                : bLo ? (f == FIELD_N ? Kind.JUMP_UP : Kind.JUMP_DOWN) : Kind.CAPACITIVE_TURN;
        return new double[] {u, v, kind.ordinal()};
    }

    /** Whether the circuit at scaled point (u, v) has a fold pair. */
    private boolean bistable(double u, double v) {
        try {
            return cell.balance().folds(cell.plane().balanceCircuit(unscale(xa, u), unscale(ya, v))).size() >= 2;
        } catch (FerromapException e) {
            return false;
        }
    }

    /**
     * The cusp near the chord from the last fold point to the first point of another kind. The
     * chord crosses the line where the fold pair is born (found by bisecting "has a fold pair");
     * the cusp is the point of that line where the merging folds' source equals the circuit's own
     * source. So step along the line (each step projected back onto it by bisection across it)
     * until h = E_fold / E - 1 changes sign, then bisect h along the line. Falls back to the chord's
     * crossing when the line or the sign change cannot be followed.
     */
    private double[] cusp(double[] chord) {
        double du = spacing(us);
        double dv = spacing(vs);
        // normalised coordinates: one cell is one unit in both directions
        double[] p = {chord[0] / du, chord[1] / dv};
        double[] q = {chord[2] / du, chord[3] / dv};
        double[] across = unit(q[0] - p[0], q[1] - p[1]);
        if (across == null) {
            return new double[] {chord[0], chord[1]};
        }
        double[] c0 = crossing(p, q);
        if (c0 == null) {
            return new double[] {0.5 * (chord[0] + chord[2]), 0.5 * (chord[1] + chord[3])};
        }
        double h0 = h(c0, du, dv);
        double[] best = {c0[0] * du, c0[1] * dv};
        if (Double.isNaN(h0)) {
            return best;
        }
        for (int dir = -1; dir <= 1; dir += 2) {
            double[] tangent = {-across[1] * dir, across[0] * dir};
            double[] prev = c0;
            double prevH = h0;
            for (int k = 0; k < 16; k++) {
                double[] x = project(prev[0] + 0.5 * tangent[0], prev[1] + 0.5 * tangent[1], tangent);
                if (x == null) {
                    break;
                }
                double hx = h(x, du, dv);
                if (Double.isNaN(hx)) {
                    break;
                }
                if ((hx > 0) != (prevH > 0)) {
                    double[] a = prev;
                    double[] b = x;
                    double ha = prevH;
                    for (int i = 0; i < BISECTIONS; i++) {
                        double[] m = project(0.5 * (a[0] + b[0]), 0.5 * (a[1] + b[1]), tangent);
                        double hm = m == null ? Double.NaN : h(m, du, dv);
                        if (Double.isNaN(hm)) {
                            break;
                        }
                        if ((hm > 0) == (ha > 0)) {
                            a = m;
                            ha = hm;
                        } else {
                            b = m;
                        }
                    }
                    return new double[] {0.5 * (a[0] + b[0]) * du, 0.5 * (a[1] + b[1]) * dv};
                }
                double[] t = unit(x[0] - prev[0], x[1] - prev[1]);
                if (t != null) {
                    tangent = t;
                }
                prev = x;
                prevH = hx;
            }
        }
        return best;
    }

    /**
     * Where "has a fold pair" changes on the segment a-b (normalised coordinates):
     * {s, t, sB, tB}, the crossing and its end on the side with a fold pair; null when both ends agree.
     */
    private double[] crossing(double[] a, double[] b) {
        double du = spacing(us);
        double dv = spacing(vs);
        boolean start = bistable(a[0] * du, a[1] * dv);
        if (start == bistable(b[0] * du, b[1] * dv)) {
            return null;
        }
        double lo = 0;
        double hi = 1;
        for (int k = 0; k < BISECTIONS; k++) {
            double t = 0.5 * (lo + hi);
            if (bistable((a[0] + t * (b[0] - a[0])) * du, (a[1] + t * (b[1] - a[1])) * dv) == start) {
                lo = t;
            } else {
                hi = t;
            }
        }
        double t = 0.5 * (lo + hi);
        double tb = start ? lo : hi;
        return new double[] {a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1]), a[0] + tb * (b[0] - a[0]),
            a[1] + tb * (b[1] - a[1])};
    }

    /** The point where the line of fold-pair births crosses the normal to {@code tangent} through (s, t). */
    private double[] project(double s, double t, double[] tangent) {
        double ns = -tangent[1];
        double nt = tangent[0];
        for (double r = 0.5; r <= 4; r *= 2) {
            double[] c = crossing(new double[] {s - r * ns, t - r * nt}, new double[] {s + r * ns, t + r * nt});
            if (c != null) {
                return c;
            }
        }
        return null;
    }

    /** E_fold / E - 1 at a line point, from the folds on its side with a fold pair; NaN when unavailable. */
    private double h(double[] linePoint, double du, double dv) {
        try {
            var c = cell.plane().balanceCircuit(unscale(xa, linePoint[2] * du), unscale(ya, linePoint[3] * dv));
            var folds = cell.balance().folds(c);
            if (folds.size() < 2 || !(c.sourcePeak() > 0)) {
                return Double.NaN;
            }
            return 0.5 * (folds.get(0).sourcePeak() + folds.get(1).sourcePeak()) / c.sourcePeak() - 1;
        } catch (FerromapException e) {
            return Double.NaN;
        }
    }

    private static double[] unit(double a, double b) {
        double n = Math.hypot(a, b);
        return n > 0 && Double.isFinite(n) ? new double[] {a / n, b / n} : null;
    }

    /** Cuts a polyline of field f into runs of one kind; records the chords where a cusp lies. */
    private void split(int f, int[] line, int[] pointOf, double[][] located, List<Curve> folds, List<Curve> turns,
            List<double[]> cuspChords) {
        List<double[]> run = new ArrayList<>();
        int runKind = -1;
        double[] prev = null;
        for (int e : line) {
            double[] p = located[pointOf[e]];
            int kind = (int) p[2];
            if (prev != null && kind != runKind) {
                boolean wasFold = isFold(runKind);
                if (wasFold != isFold(kind)) {
                    double[] fold = wasFold ? prev : p;
                    double[] other = wasFold ? p : prev;
                    cuspChords.add(new double[] {fold[0], fold[1], other[0], other[1]});
                }
                // close the run at the midpoint so consecutive runs meet
                double[] mid = {0.5 * (prev[0] + p[0]), 0.5 * (prev[1] + p[1])};
                run.add(mid);
                emit(runKind, run, folds, turns);
                run = new ArrayList<>();
                run.add(mid);
            }
            run.add(p);
            runKind = kind;
            prev = p;
        }
        emit(runKind, run, folds, turns);
    }

    private static boolean isFold(int kind) {
        return kind == Kind.JUMP_UP.ordinal() || kind == Kind.JUMP_DOWN.ordinal();
    }

    private void emit(int kind, List<double[]> run, List<Curve> folds, List<Curve> turns) {
        if (run.size() < 2 || kind < 0) {
            return;
        }
        List<Curve> target = isFold(kind) ? folds : turns;
        if (target == null) {
            return; // the F field's turns and seams coincide with the N field's: drawn once
        }
        double[] x = new double[run.size()];
        double[] y = new double[run.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = unscale(xa, run.get(i)[0]);
            y[i] = unscale(ya, run.get(i)[1]);
        }
        target.add(new Curve(Kind.values()[kind], x, y));
    }

    /**
     * Marching squares on field f: the crossing edges of each square are joined (two crossings:
     * one segment; four: the square is a saddle and the corners holding the state are cut off),
     * then segments are chained through shared edges into polylines (open ones first).
     */
    private List<int[]> polylines(int f, int[] pointOf) {
        boolean[] v = field[f];
        List<int[]> segments = new ArrayList<>();
        for (int iy = 0; iy + 1 < ny; iy++) {
            for (int ix = 0; ix + 1 < nx; ix++) {
                int c00 = iy * nx + ix;
                int c10 = c00 + 1;
                int c01 = c00 + nx;
                int c11 = c01 + 1;
                if (!valid[c00] || !valid[c10] || !valid[c01] || !valid[c11]) {
                    continue;
                }
                int bottom = hEdge(ix, iy);
                int top = hEdge(ix, iy + 1);
                int left = vEdge(ix, iy);
                int right = vEdge(ix + 1, iy);
                int[] crossing = new int[4];
                int n = 0;
                for (int e : new int[] {bottom, right, top, left}) {
                    if (pointOf[e] >= 0) {
                        crossing[n++] = e;
                    }
                }
                if (n == 2) {
                    segments.add(new int[] {crossing[0], crossing[1]});
                } else if (n == 4) {
                    if (v[c00]) { // cut off c00 and c11
                        segments.add(new int[] {left, bottom});
                        segments.add(new int[] {right, top});
                    } else { // cut off c10 and c01
                        segments.add(new int[] {bottom, right});
                        segments.add(new int[] {top, left});
                    }
                }
            }
        }
        int edges = pointOf.length;
        int[] first = new int[edges];
        int[] second = new int[edges];
        Arrays.fill(first, -1);
        Arrays.fill(second, -1);
        for (int s = 0; s < segments.size(); s++) {
            for (int e : segments.get(s)) {
                if (first[e] < 0) {
                    first[e] = s;
                } else {
                    second[e] = s;
                }
            }
        }
        boolean[] used = new boolean[segments.size()];
        List<int[]> lines = new ArrayList<>();
        for (int pass = 0; pass < 2; pass++) {
            for (int s = 0; s < segments.size(); s++) {
                if (used[s]) {
                    continue;
                }
                int[] seg = segments.get(s);
                boolean open0 = second[seg[0]] < 0;
                boolean open1 = second[seg[1]] < 0;
                if (pass == 0 && !open0 && !open1) {
                    continue; // start open polylines at an end; closed loops in the second pass
                }
                int startEdge = pass == 0 && !open0 ? seg[1] : seg[0];
                lines.add(walk(s, startEdge, segments, first, second, used));
            }
        }
        return lines;
    }

    private static int[] walk(int s, int startEdge, List<int[]> segments, int[] first, int[] second, boolean[] used) {
        List<Integer> out = new ArrayList<>();
        out.add(startEdge);
        int edge = startEdge;
        int seg = s;
        while (seg >= 0 && !used[seg]) {
            used[seg] = true;
            int[] ends = segments.get(seg);
            int next = ends[0] == edge ? ends[1] : ends[0];
            out.add(next);
            edge = next;
            int other = first[edge] == seg ? second[edge] : first[edge];
            seg = other;
        }
        return out.stream().mapToInt(Integer::intValue).toArray();
    }

    private boolean near(List<double[]> kept, double[] c) {
        double du = spacing(us);
        double dv = spacing(vs);
        for (double[] k : kept) {
            if (Math.abs(k[0] - c[0]) <= 1.5 * du && Math.abs(k[1] - c[1]) <= 1.5 * dv) {
                return true;
            }
        }
        return false;
    }

    private static double spacing(double[] s) {
        return Math.abs(s[s.length - 1] - s[0]) / (s.length - 1);
    }

    private int hEdge(int ix, int iy) {
        return iy * (nx - 1) + ix;
    }

    private int vEdge(int ix, int iy) {
        return (nx - 1) * ny + iy * nx + ix;
    }

    private int edgeStart(int e) {
        int h = (nx - 1) * ny;
        if (e < h) {
            return (e / (nx - 1)) * nx + e % (nx - 1);
        }
        return e - h;
    }

    private int edgeEnd(int e) {
        int h = (nx - 1) * ny;
        return e < h ? edgeStart(e) + 1 : edgeStart(e) + nx;
    }

    /** Samples in the axis's own scale: log of the value on a log axis. */
    private static double[] scaled(Axis a) {
        double[] v = a.values();
        if (a.scale() == Axis.Scale.LOG) {
            for (int i = 0; i < v.length; i++) {
                v[i] = Math.log(v[i]);
            }
        }
        return v;
    }

    private static double unscale(Axis a, double s) {
        return a.scale() == Axis.Scale.LOG ? Math.exp(s) : s;
    }

    private interface IndexTask {
        void run(int i);
    }

    /** Runs task(0 .. n-1) on a fixed pool; each writes its own slot. */
    private static void runAll(int threads, int n, IndexTask task) {
        if (n == 0) {
            return;
        }
        if (threads == 1 || n < 8) {
            for (int i = 0; i < n; i++) {
                task.run(i);
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, n), r -> {
            Thread t = new Thread(r, "ferromap-folds");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> fs = new ArrayList<>();
            int chunks = Math.min(n, threads * 8);
            for (int c = 0; c < chunks; c++) {
                int from = (int) ((long) n * c / chunks);
                int to = (int) ((long) n * (c + 1) / chunks);
                fs.add(pool.submit(() -> {
                    for (int i = from; i < to; i++) {
                        task.run(i);
                    }
                }));
            }
            for (Future<?> f : fs) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new FerromapException(MessageKey.INTERRUPTED, "fold curves stopped on request");
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException("locating a fold curve failed", c);
        } finally {
            pool.shutdownNow();
        }
    }
}
