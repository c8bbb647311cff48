package org.ferromap.maps;

import java.util.Arrays;
import java.util.Objects;

/**
 * A computed map: {@code width} doubles per cell over the grid of two axes, stored row-major in
 * one array (cell {@code (ix, iy)} starts at {@code (iy * nx + ix) * width}), and one flag per cell
 * saying whether it was evaluated or inferred by refinement. The arrays are shared, not copied:
 * treat them as read-only.
 *
 * @param x     the horizontal axis (columns {@code ix})
 * @param y     the vertical axis (rows {@code iy})
 * @param width components per cell
 * @param data  {@code nx * ny * width} values, in the units the cell function documents
 * @param flags {@code nx * ny} flags: {@link #COMPUTED} or {@link #INFERRED}
 * @param stats how the values were obtained
 */
public record MapGrid(Axis x, Axis y, int width, double[] data, byte[] flags, MapStats stats) {

    /** Flag of a cell whose value the cell function produced (in this run or a resumed one). */
    public static final byte COMPUTED = 1;
    /** Flag of a cell filled by refinement from agreeing corners. */
    public static final byte INFERRED = 2;

    public MapGrid {
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        long n = (long) x.steps() * y.steps();
        if (width < 1 || data.length != n * width || flags.length != n) {
            throw new IllegalArgumentException("grid " + x.steps() + " x " + y.steps() + " x " + width
                    + " does not match data[" + data.length + "] and flags[" + flags.length + "]");
        }
    }

    /** Number of columns. */
    public int nx() {
        return x.steps();
    }

    /** Number of rows. */
    public int ny() {
        return y.steps();
    }

    /** Flat cell index {@code iy * nx + ix}. */
    public int index(int ix, int iy) {
        if (ix < 0 || ix >= nx() || iy < 0 || iy >= ny()) {
            throw new IndexOutOfBoundsException("cell (" + ix + ", " + iy + ") outside " + nx() + " x " + ny());
        }
        return iy * nx() + ix;
    }

    /** Component {@code k} of cell {@code (ix, iy)}. */
    public double value(int ix, int iy, int k) {
        if (k < 0 || k >= width) {
            throw new IndexOutOfBoundsException("component " + k + " of " + width);
        }
        return data[index(ix, iy) * width + k];
    }

    /** Whether cell {@code (ix, iy)} was filled by refinement rather than evaluated. */
    public boolean isInferred(int ix, int iy) {
        return flags[index(ix, iy)] == INFERRED;
    }

    /** Component {@code k} of every cell as a fresh row-major array of {@code nx * ny} values. */
    public double[] layer(int k) {
        if (k < 0 || k >= width) {
            throw new IndexOutOfBoundsException("component " + k + " of " + width);
        }
        int n = flags.length;
        double[] out = new double[n];
        for (int c = 0; c < n; c++) {
            out[c] = data[c * width + k];
        }
        return out;
    }

    /** Component {@code k} as {@code [iy][ix]}, the shape heat-map charts take. */
    public double[][] layerRows(int k) {
        double[] flat = layer(k);
        double[][] rows = new double[ny()][];
        for (int iy = 0; iy < ny(); iy++) {
            rows[iy] = Arrays.copyOfRange(flat, iy * nx(), (iy + 1) * nx());
        }
        return rows;
    }

    /** Number of cells flagged {@link #INFERRED}. */
    public long inferredCount() {
        long n = 0;
        for (byte f : flags) {
            if (f == INFERRED) {
                n++;
            }
        }
        return n;
    }

    /** Whether another grid has the same axes, width, values (bit for bit) and flags. */
    public boolean sameAs(MapGrid o) {
        return x.equals(o.x) && y.equals(o.y) && width == o.width && Arrays.equals(data, o.data)
                && Arrays.equals(flags, o.flags);
    }
}
