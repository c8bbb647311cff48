package org.ferromap.maps;

/**
 * How a map was obtained.
 *
 * @param cells          cells in the grid
 * @param computed       cells evaluated by this run
 * @param reused         cells loaded from resume tiles saved by an earlier run
 * @param inferred       cells filled by refinement from agreeing neighbours, never evaluated
 * @param passes         passes run (1 without refinement; coarse + levels with it)
 * @param tilesRejected  resume tiles found but not trusted (mismatched or damaged) and recomputed
 * @param seconds        wall-clock time of the run, in seconds
 */
public record MapStats(long cells, long computed, long reused, long inferred, int passes, int tilesRejected,
        double seconds) {

    /** Cells whose values come from the cell function (now or in an earlier run). */
    public long evaluated() {
        return computed + reused;
    }
}
