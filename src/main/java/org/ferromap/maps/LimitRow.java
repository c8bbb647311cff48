package org.ferromap.maps;

import java.util.List;

/**
 * One row of a cable-length limit table. Lengths in m, infinite where there is no limit up to the
 * longest length searched (or no drive at all), NaN where the balance failed.
 *
 * @param rating                 three-phase rating, VA
 * @param voltage                voltage class: rated primary line-to-line voltage, V rms
 * @param connection             primary connection as studies write it
 * @param cable                  cable type name
 * @param openPhases             1 or 2
 * @param excitingCurrent        exciting current used, fraction of rated current
 * @param excitingCurrentSource  where it came from
 * @param noLoadLoss             no-load loss used, W
 * @param noLoadLossSource       where it came from
 * @param exactness              how faithful the single-phase loop is (exact, linear-only, core-coupling-ignored)
 * @param driven                 whether the open phase is driven at all
 * @param cuspLength             shortest length with a fold pair (bistability at some voltage), m
 * @param limits                 the fold-based limit per supply margin
 * @param linearLength           the linear criterion's critical length with the table's K, m
 * @param linearK                that K
 * @param linearResonanceLength  the linear criterion with K = L_eq/Lm (the loop's linear resonance), m
 * @param check                  the time-domain check just below the rated-voltage limit, or null
 * @param note                   one line on the row
 */
public record LimitRow(
        double rating,
        double voltage,
        String connection,
        String cable,
        int openPhases,
        double excitingCurrent,
        String excitingCurrentSource,
        double noLoadLoss,
        String noLoadLossSource,
        String exactness,
        boolean driven,
        double cuspLength,
        List<MarginLimit> limits,
        double linearLength,
        double linearK,
        double linearResonanceLength,
        Check check,
        String note) {

    public LimitRow {
        limits = List.copyOf(limits);
    }

    /**
     * The limit at one supply margin.
     *
     * @param margin     supply voltage, pu of the voltage class
     * @param sourcePeak supply phase-to-neutral peak compared with the folds, V
     * @param length     the limit, m
     */
    public record MarginLimit(double margin, double sourcePeak, double length) { }

    /**
     * A time-domain spot check of the rated-voltage limit.
     *
     * @param length        length simulated, m
     * @param margin        supply voltage simulated, pu
     * @param events        switching events simulated (mirror images counted)
     * @param offBranch     events that did not settle on the single steady state the balance predicts there
     *                      (period 1, its phase, below the peak threshold)
     * @param undetermined  events with no verdict
     * @param predicted     the kind of the balance's single stable state there (normal, or ferroresonant for
     *                      a single branch on its saturated side past the loop's linear resonance)
     * @param worstMode     the highest-peak event's mode
     * @param worstPeakPu   its peak, pu of the loop's rated peak
     * @param confirmed     whether every event settled on the predicted state
     * @param note          one line on the outcome
     */
    public record Check(double length, double margin, int events, int offBranch, int undetermined, String predicted,
                        String worstMode, double worstPeakPu, boolean confirmed, String note) { }

    /** The limit at the margin nearest 1 pu (the rated-voltage column). */
    public MarginLimit ratedLimit() {
        MarginLimit best = limits.get(0);
        for (MarginLimit m : limits) {
            if (Math.abs(m.margin() - 1) < Math.abs(best.margin() - 1)) {
                best = m;
            }
        }
        return best;
    }

    /** A copy with a time-domain check. */
    public LimitRow withCheck(Check c) {
        return new LimitRow(rating, voltage, connection, cable, openPhases, excitingCurrent, excitingCurrentSource, noLoadLoss,
                noLoadLossSource, exactness, driven, cuspLength, limits, linearLength, linearK, linearResonanceLength, c, note);
    }
}
