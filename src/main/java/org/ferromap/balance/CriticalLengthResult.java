package org.ferromap.balance;

/**
 * Cable lengths at which the single-harmonic balance changes character, in the unit of the
 * length function's argument (metres in studies). NaN where the change does not happen inside
 * the searched range; {@link #note} says why.
 *
 * <p>For polynomial curves the jump-up fold voltage rises with capacitance once the fold pair
 * exists, so the normal state is typically lost right at the cusp (when the fold pair is born
 * below the source) and regained at {@code jumpUpExitLength}, where the rising jump-up fold
 * passes the source again.
 *
 * @param cuspLength the shortest length with a fold pair (bistability begins)
 * @param jumpDownLength the shortest length at which the jump-down fold is at or below the source
 *        voltage: from here a ferroresonant steady state exists at the source
 * @param jumpUpLength the shortest length at which the jump-up fold is at or below the source
 *        voltage: from here the normal steady state is gone (DOMAIN.md §4, the tool's own answer)
 * @param jumpUpExitLength the next length beyond {@code jumpUpLength} at which the jump-up fold is
 *        above the source again (or the fold pair vanishes): the normal state is back
 * @param sourcePeak the source peak compared with the folds, V (NaN when each circuit's own was used)
 * @param note one line on what was found
 */
public record CriticalLengthResult(double cuspLength, double jumpDownLength, double jumpUpLength, double jumpUpExitLength,
                                   double sourcePeak, String note) {

    /** Whether the jump-up fold reaches the source inside the range. */
    public boolean found() {
        return !Double.isNaN(jumpUpLength);
    }
}
