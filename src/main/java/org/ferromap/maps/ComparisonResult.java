package org.ferromap.maps;

import java.util.List;

/**
 * Core designs side by side.
 *
 * @param designs     one summary per study, in the order given
 * @param ranking     titles from best to worst, with the reasons
 * @param x           the maps' horizontal axis (SI)
 * @param y           the maps' vertical axis (SI)
 * @param scaleMin    bottom of the shared colour scale, pu
 * @param scaleMax    top of the shared colour scale, pu
 * @param criteria    the ranking criteria, in order
 * @param notes       what the figures assume
 */
public record ComparisonResult(List<Design> designs, List<Ranked> ranking, Axis x, Axis y, double scaleMin, double scaleMax,
                               List<String> criteria, List<String> notes) {

    public ComparisonResult {
        designs = List.copyOf(designs);
        ranking = List.copyOf(ranking);
        criteria = List.copyOf(criteria);
        notes = List.copyOf(notes);
    }

    /**
     * One core design.
     *
     * @param study              the study's title
     * @param name               the study file's short name
     * @param rating             VA
     * @param excitingCurrent    fraction of rated current
     * @param noLoadLoss         W
     * @param curve              the winding's magnetizing curve, described
     * @param curveFluxPu        curve samples: flux, pu of the winding's rated peak flux
     * @param curveCurrentPu     curve samples: peak current, pu of the winding's rated peak current
     * @param length             installed cable length, m
     * @param lineVoltage        supply line-to-line voltage, V rms
     * @param category           at the installed length and voltage: safe, at-risk or ferroresonant-only
     * @param worstPeakPu        worst stable state there, pu of the loop's rated peak
     * @param jumpUpSourcePeak   the jump-up fold there, V peak (NaN when no fold pair)
     * @param jumpUpMargin       jump-up fold over the source: above 1 the normal state survives
     * @param jumpDownSourcePeak the jump-down fold there, V peak (NaN when none)
     * @param cuspLength         shortest cable with a fold pair, m
     * @param limits             fold-based limits at the comparison's margins
     * @param cuspConductance    G_min at the installed length, S
     * @param dampingLoad        three-phase load at rated voltage that reaches G_min, W (0 when none is needed)
     * @param riskShare          share of the map's cells with a ferroresonant state (at-risk or ferroresonant-only)
     * @param mapCategory        per map cell, row-major (x fastest): 0 safe, 1 at-risk, 2 ferroresonant-only, NaN none
     * @param mapPeakPu          per map cell: worst stable state, pu
     * @param exactness          how faithful the loop is
     * @param rank               1 for the best
     */
    public record Design(String study, String name, double rating, double excitingCurrent, double noLoadLoss, String curve,
                         double[] curveFluxPu, double[] curveCurrentPu, double length, double lineVoltage, String category,
                         double worstPeakPu, double jumpUpSourcePeak, double jumpUpMargin, double jumpDownSourcePeak,
                         double cuspLength, List<LimitRow.MarginLimit> limits, double cuspConductance, double dampingLoad,
                         double riskShare, List<Double> mapCategory, List<Double> mapPeakPu, String exactness, int rank) {

        /** The fold-based limit nearest 1 pu, m. */
        public double ratedLimit() {
            LimitRow.MarginLimit best = limits.get(0);
            for (LimitRow.MarginLimit m : limits) {
                if (Math.abs(m.margin() - 1) < Math.abs(best.margin() - 1)) {
                    best = m;
                }
            }
            return best.length();
        }

        Design withRank(int r) {
            return new Design(study, name, rating, excitingCurrent, noLoadLoss, curve, curveFluxPu, curveCurrentPu, length,
                    lineVoltage, category, worstPeakPu, jumpUpSourcePeak, jumpUpMargin, jumpDownSourcePeak, cuspLength, limits,
                    cuspConductance, dampingLoad, riskShare, mapCategory, mapPeakPu, exactness, r);
        }
    }

    /** A place in the ranking and why. */
    public record Ranked(int rank, String study, List<String> reasons) { }
}
