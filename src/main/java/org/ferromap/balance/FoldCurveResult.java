package org.ferromap.balance;

import java.util.List;
import org.ferromap.continuation.StopReason;

/**
 * Fold curves of the single-harmonic balance in a plane of two parameters (P1 the parameter the
 * folds are in, P2 the second one), the cusps on them, and the regions they cut the window
 * into, each labelled by the steady states at a probe point inside it. SI; each parameter in its
 * own unit (a source parameter is the peak source voltage).
 *
 * @param p1 name of the first parameter
 * @param p1Unit its SI unit
 * @param p2 name of the second parameter
 * @param p2Unit its SI unit
 * @param p1From lower end of the P1 window
 * @param p1To upper end of the P1 window
 * @param p2From lower end of the P2 window
 * @param p2To upper end of the P2 window
 * @param p1Start P1 value the fold-finding branch started from (the study's value clamped)
 * @param p2Start P2 value at which the start folds were found
 * @param curve every point of every fold curve, in order along each segment
 * @param cusps located cusps
 * @param segments one entry per traced fold curve: where it started and why its runs ended
 * @param regions the regions of the window with their labels
 */
public record FoldCurveResult(
        String p1,
        String p1Unit,
        String p2,
        String p2Unit,
        double p1From,
        double p1To,
        double p2From,
        double p2To,
        double p1Start,
        double p2Start,
        List<CurvePoint> curve,
        List<Cusp> cusps,
        List<Segment> segments,
        List<Region> regions) {

    public FoldCurveResult {
        curve = List.copyOf(curve);
        cusps = List.copyOf(cusps);
        segments = List.copyOf(segments);
        regions = List.copyOf(regions);
    }

    /** Region labels. */
    public static final String ONE_STATE = "one state";
    /** Two stable states coexist. */
    public static final String BISTABLE = "bistable";
    /** The only stable state is the ferroresonant one. */
    public static final String FERRORESONANT_ONLY = "ferroresonant-only";

    /**
     * A point of a fold curve.
     *
     * @param p1 first parameter, its unit
     * @param p2 second parameter, its unit
     * @param flux fundamental flux amplitude at the fold, Wb-turn peak
     * @param segment index of the curve in {@link FoldCurveResult#segments()}
     */
    public record CurvePoint(double p1, double p2, double flux, int segment) { }

    /**
     * A cusp: two folds meet and bistability ends.
     *
     * @param p1 first parameter, its unit
     * @param p2 second parameter, its unit
     * @param flux fundamental flux amplitude, Wb-turn peak
     * @param segment index of the curve it lies on
     * @param located whether its location converged
     */
    public record Cusp(double p1, double p2, double flux, int segment, boolean located) { }

    /**
     * One traced fold curve.
     *
     * @param startP1 P1 of the fold it started from
     * @param startP2 P2 of that fold
     * @param startFlux fundamental flux amplitude there, Wb-turn peak
     * @param points number of points
     * @param increasingStop why the run with P2 increasing ended
     * @param increasingDetail in words
     * @param decreasingStop why the run with P2 decreasing ended
     * @param decreasingDetail in words
     * @param rejectedSteps refused steps of both runs
     */
    public record Segment(double startP1, double startP2, double startFlux, int points, StopReason increasingStop,
                          String increasingDetail, StopReason decreasingStop, String decreasingDetail, int rejectedSteps) { }

    /**
     * A connected region of the window between the fold curves.
     *
     * @param label {@link #ONE_STATE}, {@link #BISTABLE} or {@link #FERRORESONANT_ONLY}
     * @param p1 P1 of the probe point, its unit
     * @param p2 P2 of the probe point, its unit
     * @param stableStates stable single-harmonic steady states at the probe point
     * @param share fraction of the window's area as drawn (logarithmic axes where a range spans a factor of 20)
     */
    public record Region(String label, double p1, double p2, int stableStates, double share) { }
}
