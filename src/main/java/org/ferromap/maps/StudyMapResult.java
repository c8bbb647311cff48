package org.ferromap.maps;

import java.util.List;
import java.util.Set;

/**
 * A computed study map: the grids of the layers asked for and the boundaries drawn over them.
 *
 * @param plane    the plane mapped
 * @param settings what was asked for
 * @param balance  the balance grid ({@link BalanceCell}: category, peak pu); null when only the
 *                 time-domain layer was asked for
 * @param time     the time-domain grid ({@link TimeDomainCell}: ferro fraction, worst mode code,
 *                 undetermined fraction, max peak pu); null without the time layer
 * @param folds    fold curves and cusps; null without the folds layer
 * @param runKeys  the resume keys of the grids computed (to delete their tiles once the output is saved)
 */
public record StudyMapResult(StudyPlane plane, StudyMapSettings settings, MapGrid balance, MapGrid time,
        FoldBoundaries.Result folds, List<String> runKeys) {

    public StudyMapResult {
        runKeys = List.copyOf(runKeys);
    }

    /** The layers asked for. */
    public Set<MapLayer> layers() {
        return settings.layers();
    }

    /** Number of columns. */
    public int nx() {
        return plane.x().axis().steps();
    }

    /** Number of rows. */
    public int ny() {
        return plane.y().axis().steps();
    }
}
