package org.ferromap.balance;

import java.util.List;
import org.ferromap.continuation.StopReason;

/**
 * A balance branch in one parameter, traced both ways from its start value across the requested
 * range (the runs joined in order of the branch: the decreasing run reversed, then the
 * increasing run). Everything in SI; the parameter in its own unit ({@link #unit()}); a source
 * parameter is the peak source voltage.
 *
 * @param parameter the parameter's name, such as "series-capacitance"
 * @param unit SI unit of the parameter values
 * @param harmonics harmonics H of the balance (1: single-harmonic)
 * @param stability how stability was assessed: "slow flow" (H = 1) or "Hill" (H &gt; 1)
 * @param from lower end of the range, parameter unit
 * @param to upper end of the range, parameter unit
 * @param requestedStart the value asked to start from (the study's own value), parameter unit;
 *        may lie outside the range or be infinite
 * @param start the value the branch started from: the requested one clamped into the range
 * @param startState which steady state the branch was asked to start on
 * @param startKind what the start point is by the single-harmonic balance ("normal",
 *        "ferroresonant", "unstable"): the only stable state there when the one asked for does
 *        not exist at the start value
 * @param startFlux fundamental flux amplitude at the start, Wb-turn peak
 * @param points every accepted point in branch order
 * @param folds located folds (limit points in the parameter) in branch order
 * @param branchPoints located simple branch points in branch order
 * @param increasingStop why the run with the parameter increasing from the start ended
 * @param increasingDetail where and why, in words
 * @param decreasingStop why the run with the parameter decreasing from the start ended
 * @param decreasingDetail where and why, in words
 * @param rejectedSteps steps the engine refused and retried with a shorter step, both runs
 */
public record BranchResult(
        String parameter,
        String unit,
        int harmonics,
        String stability,
        double from,
        double to,
        double requestedStart,
        double start,
        StartState startState,
        String startKind,
        double startFlux,
        List<Point> points,
        List<Special> folds,
        List<Special> branchPoints,
        StopReason increasingStop,
        String increasingDetail,
        StopReason decreasingStop,
        String decreasingDetail,
        int rejectedSteps) {

    public BranchResult {
        points = List.copyOf(points);
        folds = List.copyOf(folds);
        branchPoints = List.copyOf(branchPoints);
    }

    /**
     * One point of the branch.
     *
     * @param parameter parameter value, its unit
     * @param flux fundamental flux-linkage amplitude, Wb-turn peak
     * @param voltage peak magnetizing-branch voltage, V (the fundamental's for H = 1, the
     *        waveform's largest |dlambda/dt| for H &gt; 1)
     * @param peakFlux largest |lambda(t)| over the period, Wb-turn (the fundamental's for H = 1)
     * @param stable whether the steady state is stable (no unstable direction)
     * @param unstableDirections unstable directions (0 stable, -1 undecided)
     */
    public record Point(double parameter, double flux, double voltage, double peakFlux, boolean stable, int unstableDirections) { }

    /**
     * A located fold or branch point.
     *
     * @param parameter parameter value, its unit
     * @param flux fundamental flux-linkage amplitude, Wb-turn peak
     * @param voltage peak magnetizing-branch voltage, V (as for {@link Point#voltage()})
     * @param afterIndex index in {@link BranchResult#points()} of the last point before it
     * @param located whether the location converged (false: interpolated estimate)
     */
    public record Special(double parameter, double flux, double voltage, int afterIndex, boolean located) { }
}
