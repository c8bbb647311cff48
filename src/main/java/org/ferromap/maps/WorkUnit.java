package org.ferromap.maps;

import java.util.Arrays;

/**
 * One tile of work: the cells of one pass that lie in one rectangular block of the grid. Either
 * every cell of the rectangle (row-major, {@code cells == null}) or an explicit, ascending list of
 * flat cell indices inside it (refinement passes). A unit is the grain of scheduling, of progress
 * and of the resume files.
 *
 * @param pass  0 for the full or coarse pass, 1, 2, ... for the refinement levels
 * @param tileX tile column, {@code ix0 / tileSize}
 * @param tileY tile row, {@code iy0 / tileSize}
 * @param ix0   first column of the rectangle (inclusive)
 * @param iy0   first row (inclusive)
 * @param ix1   end column (exclusive)
 * @param iy1   end row (exclusive)
 * @param nx    columns of the whole grid (to turn flat indices into columns and rows)
 * @param cells flat indices {@code iy * nx + ix} of the cells to compute, ascending, all inside the
 *              rectangle; {@code null} for every cell of the rectangle. Not copied: do not modify.
 */
public record WorkUnit(int pass, int tileX, int tileY, int ix0, int iy0, int ix1, int iy1, int nx, int[] cells) {

    public WorkUnit {
        if (ix0 < 0 || iy0 < 0 || ix1 <= ix0 || iy1 <= iy0 || ix1 > nx) {
            throw new IllegalArgumentException("bad tile bounds [" + ix0 + "," + ix1 + ")x[" + iy0 + "," + iy1 + ") in a grid "
                    + nx + " wide");
        }
        if (cells != null) {
            int prev = -1;
            for (int c : cells) {
                int ix = c % nx;
                int iy = c / nx;
                if (c <= prev || ix < ix0 || ix >= ix1 || iy < iy0 || iy >= iy1) {
                    throw new IllegalArgumentException("cell " + c + " is out of order or outside the tile [" + ix0 + ","
                            + ix1 + ")x[" + iy0 + "," + iy1 + ") of a grid " + nx + " wide");
                }
                prev = c;
            }
        }
    }

    /** Number of cells this unit computes. */
    public int cellCount() {
        return cells == null ? (ix1 - ix0) * (iy1 - iy0) : cells.length;
    }

    /** Flat grid index {@code iy * nx + ix} of the {@code k}-th cell of this unit. */
    public int cell(int k) {
        if (cells != null) {
            return cells[k];
        }
        int w = ix1 - ix0;
        return (iy0 + k / w) * nx + ix0 + k % w;
    }

    /**
     * Evaluates every cell of the unit into {@code out} (cell {@code k}'s components at
     * {@code k * width}). The one loop every executor uses, so results are the same whoever runs it.
     */
    public void evaluate(double[] xs, double[] ys, CellFunction f, int width, double[] out) {
        if (cells == null) {
            int offset = 0;
            for (int iy = iy0; iy < iy1; iy++) {
                double y = ys[iy];
                for (int ix = ix0; ix < ix1; ix++) {
                    f.evaluate(xs[ix], y, out, offset);
                    offset += width;
                }
            }
            return;
        }
        for (int k = 0; k < cells.length; k++) {
            int c = cells[k];
            int iy = c / nx;
            f.evaluate(xs[c - iy * nx], ys[iy], out, k * width);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WorkUnit u && u.pass == pass && u.tileX == tileX && u.tileY == tileY && u.ix0 == ix0
                && u.iy0 == iy0 && u.ix1 == ix1 && u.iy1 == iy1 && u.nx == nx && Arrays.equals(u.cells, cells);
    }

    @Override
    public int hashCode() {
        return ((pass * 31 + tileX) * 31 + tileY) * 31 + Arrays.hashCode(cells);
    }

    @Override
    public String toString() {
        return "WorkUnit[pass " + pass + ", tile " + tileX + "," + tileY + ", " + cellCount() + " cells]";
    }
}
