package org.ferromap.maps;

import java.util.Objects;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Which plane to map: the two axes and the size of the tiles the work is cut into.
 *
 * @param x        the horizontal axis (grid columns)
 * @param y        the vertical axis (grid rows)
 * @param tileSize side of a square tile, in cells (1 to 1024); default {@value #DEFAULT_TILE_SIZE}.
 *                 A tile is the grain of scheduling, progress and resume: make it smaller for slow
 *                 cells (a time-domain ensemble) so Ctrl-C and resume lose little work.
 */
public record MapRequest(Axis x, Axis y, int tileSize) {

    /** Default tile side: 256 cells per tile, enough to hide scheduling cost for cheap cells. */
    public static final int DEFAULT_TILE_SIZE = 16;

    public MapRequest {
        Objects.requireNonNull(x, "x axis");
        Objects.requireNonNull(y, "y axis");
        if (tileSize < 1 || tileSize > 1024) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "tile size " + tileSize + " cells; allowed 1 to 1024");
        }
    }

    /** A request with the default tile size. */
    public static MapRequest of(Axis x, Axis y) {
        return new MapRequest(x, y, DEFAULT_TILE_SIZE);
    }

    /** A copy with another tile size. */
    public MapRequest withTileSize(int size) {
        return new MapRequest(x, y, size);
    }

    /** Number of columns. */
    public int nx() {
        return x.steps();
    }

    /** Number of rows. */
    public int ny() {
        return y.steps();
    }

    /** Number of cells, as a long (it may not fit an array). */
    public long cells() {
        return (long) x.steps() * y.steps();
    }
}
