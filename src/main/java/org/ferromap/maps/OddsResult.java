package org.ferromap.maps;

import java.util.List;
import java.util.Map;

/**
 * The probability of ferroresonance over random switching instants and residual flux.
 *
 * @param study                the study's title
 * @param length               cable length, m (NaN for circuit studies)
 * @param voltage              supply line-to-line voltage, V rms (equipment) or source peak, V (circuit)
 * @param seed                 the seed
 * @param runs                 runs in all
 * @param firstBatch           runs of the first batch (before any added for the precision)
 * @param ferroresonant        runs counted as ferroresonance: fundamental, subharmonic, quasi-periodic,
 *                             chaotic, and undetermined (counted with them, the conservative side)
 * @param undetermined         of which undetermined
 * @param counts               runs per settled mode
 * @param probability          ferroresonant / runs
 * @param interval             the confidence interval of the probability
 * @param precision            the half-width asked for (NaN for none)
 * @param precisionReached     whether the interval's half-width is at most the precision (null when none asked)
 * @param planningProbability  p used in the runs-needed formula: the point of the interval nearest 1/2
 *                             (the conservative choice; p(1-p) is largest there)
 * @param z                    the two-sided normal quantile of the confidence level
 * @param needed               runs needed for common half-widths (and the one asked for)
 * @param residualFlux         largest residual flux drawn, pu of rated peak flux
 * @param runList              every run
 * @param running              the estimate and its interval as runs accumulate (for charts)
 * @param notes                what the figures assume
 */
public record OddsResult(String study, double length, double voltage, long seed, int runs, int firstBatch, int ferroresonant,
                         int undetermined, Map<String, Integer> counts, double probability, BinomialInterval.Interval interval,
                         double precision, Boolean precisionReached, double planningProbability, double z,
                         List<Needed> needed, double residualFlux, List<Run> runList, List<Checkpoint> running,
                         List<String> notes) {

    public OddsResult {
        needed = List.copyOf(needed);
        runList = List.copyOf(runList);
        running = List.copyOf(running);
        notes = List.copyOf(notes);
    }

    /**
     * One run.
     *
     * @param index         run index (its draws come from the seed and this index only)
     * @param angle         source angle at switching, rad in [0, 2 pi)
     * @param residualFlux  residual flux at switching, pu of rated peak flux
     * @param mode          settled mode
     * @param period        period in source periods (0 if not periodic)
     * @param peakPerUnit   peak terminal voltage settled, pu of the loop's rated peak
     */
    public record Run(int index, double angle, double residualFlux, String mode, int period, double peakPerUnit) { }

    /** The estimate after {@code runs} runs, with its interval. */
    public record Checkpoint(int runs, double probability, double lower, double upper) { }

    /** Runs needed for a half-width at the planning probability (normal approximation). */
    public record Needed(double halfWidth, long runs) { }
}
