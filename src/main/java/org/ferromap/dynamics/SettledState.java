package org.ferromap.dynamics;

/**
 * What a recorded three-phase run settled into, classified by {@link NetworkClassifier}: the
 * open-phase terminal voltage and the flux of its winding, as a plain value for reports and JSON.
 *
 * @param mode the classified state
 * @param period period of the settled state in source periods; 0 when not periodic
 * @param peakVoltage largest |v| from an open phase's node to ground over the analysed window, V
 *        (NaN when nothing was analysed)
 * @param peakPerUnit the same in per unit of the rated phase-to-neutral peak given to the classifier
 * @param zeroOneK K of the 0-1 test on the open phase's stroboscopic voltage after the transient;
 *        NaN when the state repeats or too few samples were left
 * @param lineShare share of the AC power of the analysed window's spectrum in its strongest lines
 *        ({@link ModeRules#lineShare}); NaN when the state repeats
 * @param recurrenceResidual the worst relative distance between stroboscopic samples p periods
 *        apart over the last periods, per unit (for the period found, or the closest order tried)
 * @param fundamentalPhase phase of the loop voltage's fundamental relative to the loop source,
 *        rad in (-pi, pi] (near 0 normal, near pi ferroresonant); NaN unless period 1
 * @param spectrum amplitude spectrum of the open phase's node voltage over the analysed window, Hz and V
 * @param window the analysed window of the first open phase: node voltage (V) and the flux
 *        linkage of its winding (Wb-turn); for a periodic state the whole orbits within the last
 *        periods over which the samples were seen to repeat
 * @param section stroboscopic samples of the same two quantities: the last p samples of a
 *        periodic state, the samples after the transient otherwise (at most
 *        {@link SimulationResult#SECTION_LIMIT})
 * @param method which indicators decided, in words
 * @param reason how the mode was decided, or why it is undetermined
 */
public record SettledState(
        SteadyMode mode,
        int period,
        double peakVoltage,
        double peakPerUnit,
        double zeroOneK,
        double lineShare,
        double recurrenceResidual,
        double fundamentalPhase,
        Spectrum spectrum,
        Waveform window,
        Waveform section,
        String method,
        String reason) {
}
