package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;

/**
 * Where a category changes on a map, and tests against analytic boundaries: charts draw the
 * edges, and tests check that a known boundary passes through every one of them.
 */
public final class Boundaries {

    private Boundaries() {
    }

    /**
     * Every pair of neighbouring cells (in a row or a column) whose component {@code k} differs,
     * rows first, in row-major order of the first cell. Values are compared exactly (NaN equals NaN):
     * meant for category components.
     */
    public static List<BoundaryEdge> edges(MapGrid grid, int k) {
        List<BoundaryEdge> out = new ArrayList<>();
        int nx = grid.nx();
        int ny = grid.ny();
        int w = grid.width();
        double[] d = grid.data();
        if (k < 0 || k >= w) {
            throw new IndexOutOfBoundsException("component " + k + " of " + w);
        }
        for (int iy = 0; iy < ny; iy++) {
            for (int ix = 0; ix < nx; ix++) {
                double v = d[(iy * nx + ix) * w + k];
                if (ix + 1 < nx) {
                    double r = d[(iy * nx + ix + 1) * w + k];
                    if (!CellComparator.same(v, r, 0.0)) {
                        out.add(edge(grid, ix, iy, ix + 1, iy, v, r));
                    }
                }
                if (iy + 1 < ny) {
                    double u = d[((iy + 1) * nx + ix) * w + k];
                    if (!CellComparator.same(v, u, 0.0)) {
                        out.add(edge(grid, ix, iy, ix, iy + 1, v, u));
                    }
                }
            }
        }
        return out;
    }

    private static BoundaryEdge edge(MapGrid g, int ixA, int iyA, int ixB, int iyB, double a, double b) {
        return new BoundaryEdge(ixA, iyA, ixB, iyB, g.x().value(ixA), g.y().value(iyA), g.x().value(ixB),
                g.y().value(iyB), a, b);
    }

    /**
     * Whether the region's boundary crosses the segment between the edge's two samples: the
     * region's membership differs somewhere among {@code samples + 1} evenly spaced points of the
     * segment (ends included). A boundary that enters and leaves between two of those points is not
     * seen; with {@code samples = 1} only the two samples are tested.
     */
    public static boolean crossesEdge(BoundaryEdge e, Region region, int samples) {
        return crossesSegment(region, e.xA(), e.yA(), e.xB(), e.yB(), samples);
    }

    /** As {@link #crossesEdge} for any segment from {@code (x0, y0)} to {@code (x1, y1)}. */
    public static boolean crossesSegment(Region region, double x0, double y0, double x1, double y1, int samples) {
        checkSamples(samples);
        boolean first = region.contains(x0, y0);
        for (int i = 1; i <= samples; i++) {
            double t = (double) i / samples;
            double x = i == samples ? x1 : x0 + (x1 - x0) * t;
            double y = i == samples ? y1 : y0 + (y1 - y0) * t;
            if (region.contains(x, y) != first) {
                return true;
            }
        }
        return false;
    }

    /**
     * Whether the region's boundary passes through the cell drawn around sample {@code (ix, iy)}
     * (its bounds from {@link Axis#cellLow} and {@link Axis#cellHigh}): membership differs among
     * a lattice of {@code (samples + 1)^2} points spanning the cell, corners included. For a curve
     * {@code y = g(x)} use {@link Region#above}.
     */
    public static boolean crossesCell(Axis x, Axis y, int ix, int iy, Region region, int samples) {
        checkSamples(samples);
        double xl = x.cellLow(ix);
        double xh = x.cellHigh(ix);
        double yl = y.cellLow(iy);
        double yh = y.cellHigh(iy);
        boolean first = region.contains(xl, yl);
        for (int j = 0; j <= samples; j++) {
            double py = j == samples ? yh : yl + (yh - yl) * j / samples;
            for (int i = 0; i <= samples; i++) {
                double px = i == samples ? xh : xl + (xh - xl) * i / samples;
                if (region.contains(px, py) != first) {
                    return true;
                }
            }
        }
        return false;
    }

    private static void checkSamples(int samples) {
        if (samples < 1) {
            throw new IllegalArgumentException("samples = " + samples + "; at least 1");
        }
    }
}
