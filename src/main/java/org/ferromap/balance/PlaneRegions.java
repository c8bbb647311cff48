package org.ferromap.balance;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The regions a set of curves cuts the unit square into, found on a raster: cells the curves
 * cross are walls (drawn 4-connected so no region leaks diagonally through a curve), the other
 * cells are grouped by flood fill, and each region gets a probe point as far from walls and
 * edges as the raster allows. Regions smaller than {@link #MIN_SHARE} of the square are slivers
 * of the raster near where curves meet and are left out.
 */
final class PlaneRegions {

    /** Raster size per side: 1/160 of the window is finer than any chart shows. */
    static final int GRID = 160;
    /** Smallest region kept, as a share of the square. */
    static final double MIN_SHARE = 0.002;
    /**
     * Spacing, in cells, of the lattice of extra sample cells checked for a mixed one-state region
     * (10 by 10 inside, and every 8 cells along the window's edges, where a region wrapping round a
     * cusp shows its other kind of state).
     */
    static final int SAMPLE_SPACING = 16;

    /** A region in raster terms: its probe point and sample points on a coarse lattice and the edges, unit-square coordinates. */
    record Raw(double u, double v, double share, double[][] samples) { }

    private PlaneRegions() {
    }

    /**
     * @param polylines curves in unit-square coordinates, each [point][2] = (u, v)
     */
    static List<Raw> find(List<double[][]> polylines) {
        int g = GRID;
        boolean[] wall = new boolean[g * g];
        for (double[][] line : polylines) {
            for (int k = 0; k + 1 < line.length; k++) {
                mark(wall, line[k][0], line[k][1], line[k + 1][0], line[k + 1][1]);
            }
            if (line.length == 1) {
                wall[cell(line[0][0]) * g + cell(line[0][1])] = true;
            }
        }
        int[] dist = distances(wall);
        int[] region = new int[g * g];
        Arrays.fill(region, -1);
        int[] queue = new int[g * g];
        List<Raw> out = new ArrayList<>();
        int next = 0;
        for (int start = 0; start < g * g; start++) {
            if (wall[start] || region[start] >= 0) {
                continue;
            }
            int head = 0;
            int tail = 0;
            queue[tail++] = start;
            region[start] = next;
            int best = start;
            while (head < tail) {
                int c = queue[head++];
                if (dist[c] > dist[best]) {
                    best = c;
                }
                int i = c / g;
                int j = c % g;
                if (i > 0) {
                    tail = visit(c - g, next, wall, region, queue, tail);
                }
                if (i < g - 1) {
                    tail = visit(c + g, next, wall, region, queue, tail);
                }
                if (j > 0) {
                    tail = visit(c - 1, next, wall, region, queue, tail);
                }
                if (j < g - 1) {
                    tail = visit(c + 1, next, wall, region, queue, tail);
                }
            }
            double share = (double) tail / (g * g);
            if (share >= MIN_SHARE) {
                List<double[]> samples = new ArrayList<>();
                for (int e = 0; e < tail; e++) {
                    int c = queue[e];
                    int h = SAMPLE_SPACING / 2;
                    int i = c / g;
                    int j = c % g;
                    boolean lattice = i % SAMPLE_SPACING == h && j % SAMPLE_SPACING == h;
                    boolean edge = (i == 0 || i == g - 1 || j == 0 || j == g - 1) && (i + j) % h == 0;
                    if ((lattice || edge) && !nearWall(wall, i, j)) {
                        samples.add(new double[] {(c / g + 0.5) / g, (c % g + 0.5) / g});
                    }
                }
                out.add(new Raw((best / g + 0.5) / g, (best % g + 0.5) / g, share, samples.toArray(new double[0][])));
            }
            next++;
        }
        return out;
    }

    private static boolean nearWall(boolean[] wall, int i, int j) {
        int g = GRID;
        for (int di = -1; di <= 1; di++) {
            for (int dj = -1; dj <= 1; dj++) {
                int a = i + di;
                int b = j + dj;
                if (a >= 0 && a < g && b >= 0 && b < g && wall[a * g + b]) {
                    return true;
                }
            }
        }
        return false;
    }

    private static int visit(int c, int id, boolean[] wall, int[] region, int[] queue, int tail) {
        if (!wall[c] && region[c] < 0) {
            region[c] = id;
            queue[tail++] = c;
        }
        return tail;
    }

    /** Distance of each cell to the nearest wall (4-neighbour steps) or beyond the edge. */
    private static int[] distances(boolean[] wall) {
        int g = GRID;
        int[] d = new int[g * g];
        int[] queue = new int[g * g];
        int head = 0;
        int tail = 0;
        for (int c = 0; c < g * g; c++) {
            int i = c / g;
            int j = c % g;
            d[c] = Math.min(Math.min(i + 1, j + 1), Math.min(g - i, g - j));
            if (wall[c]) {
                d[c] = 0;
                queue[tail++] = c;
            }
        }
        while (head < tail) {
            int c = queue[head++];
            int i = c / g;
            int j = c % g;
            int[] nb = {i > 0 ? c - g : -1, i < g - 1 ? c + g : -1, j > 0 ? c - 1 : -1, j < g - 1 ? c + 1 : -1};
            for (int n : nb) {
                if (n >= 0 && d[n] > d[c] + 1) {
                    d[n] = d[c] + 1;
                    queue[tail++] = n;
                }
            }
        }
        return d;
    }

    private static int cell(double u) {
        return Math.max(0, Math.min(GRID - 1, (int) Math.floor(u * GRID)));
    }

    /** Marks the cells a segment crosses, adding a corner cell at every diagonal move. */
    private static void mark(boolean[] wall, double u0, double v0, double u1, double v1) {
        int g = GRID;
        int n = (int) Math.ceil(Math.max(Math.abs(u1 - u0), Math.abs(v1 - v0)) * g * 4) + 1;
        int pi = cell(u0);
        int pj = cell(v0);
        wall[pi * g + pj] = true;
        for (int s = 1; s <= n; s++) {
            double t = (double) s / n;
            int i = cell(u0 + t * (u1 - u0));
            int j = cell(v0 + t * (v1 - v0));
            if (i != pi && j != pj) {
                wall[pi * g + j] = true;
            }
            wall[i * g + j] = true;
            pi = i;
            pj = j;
        }
    }
}
