package org.ferromap.maps;

import java.util.Objects;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Adaptive refinement of a map: compute a coarse lattice (every {@code coarseStride}-th cell in
 * each direction, plus the last row and column), then look at each block between four lattice
 * cells. When the four corners agree (per the comparator) the cells inside are filled with the
 * value of the nearest corner and flagged as inferred; otherwise the block is halved in each
 * direction and the new corners are computed, down to single cells.
 *
 * <p><b>Risk:</b> a feature thinner than a block that lies entirely between agreeing corners (a
 * narrow tongue of ferroresonance, an island) is not seen and is painted with the corners'
 * value. Choose a stride smaller than the narrowest region worth finding, or switch refinement off
 * ({@link #OFF}, the command line's {@code --refine off}) to compute every cell.
 *
 * @param enabled      whether to refine; when false every cell is computed
 * @param coarseStride distance between coarse lattice cells, a power of two from 2 to 1024;
 *                     default {@value #DEFAULT_STRIDE}
 * @param comparator   when two cells agree; default {@link CellComparator#exact()} (every
 *                     component equal), which is safe but infers only where values are constant:
 *                     give tolerances with {@link #withTolerances} for smooth components
 */
public record RefinementSettings(boolean enabled, int coarseStride, CellComparator comparator) {

    /** Default stride: blocks of 8 x 8 cells, so refinement can skip up to 63 of 64 cells. */
    public static final int DEFAULT_STRIDE = 8;

    /** Refinement on, stride 8, exact comparison of every component. */
    public static final RefinementSettings DEFAULT = new RefinementSettings(true, DEFAULT_STRIDE, CellComparator.exact());

    /** Refinement off: every cell is computed. */
    public static final RefinementSettings OFF = DEFAULT.withEnabled(false);

    public RefinementSettings {
        Objects.requireNonNull(comparator, "comparator");
        if (coarseStride < 2 || coarseStride > 1024 || Integer.bitCount(coarseStride) != 1) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "refinement stride " + coarseStride
                    + "; it must be a power of two from 2 to 1024");
        }
    }

    /** A copy switched on or off. */
    public RefinementSettings withEnabled(boolean on) {
        return new RefinementSettings(on, coarseStride, comparator);
    }

    /** A copy with another coarse stride (a power of two, 2 to 1024). */
    public RefinementSettings withCoarseStride(int stride) {
        return new RefinementSettings(enabled, stride, comparator);
    }

    /** A copy with another comparator. */
    public RefinementSettings withComparator(CellComparator c) {
        return new RefinementSettings(enabled, coarseStride, c);
    }

    /**
     * A copy comparing component {@code k} within the absolute tolerance {@code tolerances[k]}
     * (its unit): 0 for categories (exact), {@code Double.POSITIVE_INFINITY} to ignore a component.
     */
    public RefinementSettings withTolerances(double... tolerances) {
        return withComparator(CellComparator.withinTolerances(tolerances));
    }
}
