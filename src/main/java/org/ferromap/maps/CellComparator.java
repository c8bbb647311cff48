package org.ferromap.maps;

import java.util.Arrays;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Decides whether two evaluated cells "agree", i.e. whether the refinement may fill the cells
 * between them without computing them. Must be deterministic and symmetric.
 */
@FunctionalInterface
public interface CellComparator {

    /**
     * Whether the cells whose first components are at {@code data[a]} and {@code data[b]} agree;
     * each cell has {@code width} consecutive components.
     */
    boolean agree(double[] data, int a, int b, int width);

    /** Throws {@code BAD_REQUEST} when this comparator cannot judge cells of the given width. */
    default void checkWidth(int width) {
    }

    /** Every component equal (NaN agrees with NaN): right for category-only cells. */
    static CellComparator exact() {
        return (data, a, b, width) -> {
            for (int k = 0; k < width; k++) {
                if (!same(data[a + k], data[b + k], 0.0)) {
                    return false;
                }
            }
            return true;
        };
    }

    /**
     * Component {@code k} agrees when the two values differ by at most {@code tolerances[k]}, an
     * absolute tolerance in that component's unit. A tolerance of 0 compares exactly (use it for
     * category components); {@code +Infinity} ignores the component. NaN agrees only with NaN.
     */
    static CellComparator withinTolerances(double... tolerances) {
        double[] tol = tolerances.clone();
        for (int k = 0; k < tol.length; k++) {
            if (!(tol[k] >= 0)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "refinement tolerance of component " + k
                        + " is " + tol[k] + "; it must be 0 (exact), positive, or infinite (ignore)");
            }
        }
        return new CellComparator() {
            @Override
            public boolean agree(double[] data, int a, int b, int width) {
                for (int k = 0; k < width; k++) {
                    if (!same(data[a + k], data[b + k], tol[k])) {
                        return false;
                    }
                }
                return true;
            }

            @Override
            public void checkWidth(int width) {
                if (width != tol.length) {
                    throw new FerromapException(MessageKey.BAD_REQUEST, "the refinement has " + tol.length
                            + " tolerances " + Arrays.toString(tol) + " but the cell writes " + width
                            + " components; give one tolerance per component");
                }
            }
        };
    }

    /** Whether two values agree within an absolute tolerance; NaN agrees only with NaN. */
    static boolean same(double u, double v, double tolerance) {
        if (u == v) {
            return true;
        }
        if (Double.isNaN(u) || Double.isNaN(v)) {
            return Double.isNaN(u) && Double.isNaN(v);
        }
        return Math.abs(u - v) <= tolerance;
    }
}
