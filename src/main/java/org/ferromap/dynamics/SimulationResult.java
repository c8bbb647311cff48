package org.ferromap.dynamics;

/**
 * What a simulation settled into, as a plain value for reports and JSON.
 *
 * @param mode the classified state
 * @param period period of the settled state in source periods; 0 when not periodic
 * @param peakVoltage largest |v| over the settled window, V (NaN when nothing settled)
 * @param peakPerUnit the same in per unit of the circuit's rated peak
 * @param lyapunovPerPeriod largest Lyapunov exponent per source period: from the Floquet
 *        multipliers for a certified orbit (ln max|mu| / p), otherwise Benettin's estimate over
 *        the periods after the transient; NaN when not computed
 * @param zeroOneK K of the 0-1 test on the stroboscopic voltage after the transient; NaN when
 *        the state was certified periodic or too few samples were left
 * @param certified whether a periodic orbit was certified by Newton on the stroboscopic map with
 *        all Floquet multipliers inside the unit circle
 * @param multiplierReal real parts of the Floquet multipliers over one period of the orbit (empty if none)
 * @param multiplierImag imaginary parts of the same
 * @param fundamentalPhase phase of the fundamental of v relative to the source e, rad in
 *        (-pi, pi] (near 0 on the normal branch, near pi on the ferroresonant branch); NaN unless period 1
 * @param spectrum amplitude spectrum of the settled voltage, Hz and V
 * @param window the settled window: one orbit for a periodic state, the last periods otherwise
 * @param strobeFlux flux linkage once a source period from the switching instant, Wb-turn
 * @param strobeVoltage terminal voltage once a source period, V
 * @param periodsSimulated source periods integrated along the trajectory
 * @param rhsEvaluations right-hand-side evaluations spent, certification included
 * @param reason why the mode is undetermined, or a note on how it was decided
 * @param event the first {@link SimulationSettings#eventPeriods()} periods from the switching
 *        instant (t = 0), at the settings' samples a period; shorter when the run failed sooner
 * @param section the stroboscopic section of the settled state, times from the switching
 *        instant: the p points of the orbit for a periodic state (exact fixed points of P^j), the
 *        samples after the transient (at most the last {@link #SECTION_LIMIT}) otherwise
 */
public record SimulationResult(
        SteadyMode mode,
        int period,
        double peakVoltage,
        double peakPerUnit,
        double lyapunovPerPeriod,
        double zeroOneK,
        boolean certified,
        double[] multiplierReal,
        double[] multiplierImag,
        double fundamentalPhase,
        Spectrum spectrum,
        Waveform window,
        double[] strobeFlux,
        double[] strobeVoltage,
        int periodsSimulated,
        long rhsEvaluations,
        String reason,
        Waveform event,
        Waveform section) {

    /** Most samples kept in {@code section} for a state that is not periodic. */
    public static final int SECTION_LIMIT = 1024;

    /** A result without event record or section (both empty). */
    public SimulationResult(SteadyMode mode, int period, double peakVoltage, double peakPerUnit,
            double lyapunovPerPeriod, double zeroOneK, boolean certified, double[] multiplierReal,
            double[] multiplierImag, double fundamentalPhase, Spectrum spectrum, Waveform window, double[] strobeFlux,
            double[] strobeVoltage, int periodsSimulated, long rhsEvaluations, String reason) {
        this(mode, period, peakVoltage, peakPerUnit, lyapunovPerPeriod, zeroOneK, certified, multiplierReal,
                multiplierImag, fundamentalPhase, spectrum, window, strobeFlux, strobeVoltage, periodsSimulated,
                rhsEvaluations, reason, Waveform.empty(), Waveform.empty());
    }

    public SimulationResult {
        event = event == null ? Waveform.empty() : event;
        section = section == null ? Waveform.empty() : section;
        multiplierReal = multiplierReal.clone();
        multiplierImag = multiplierImag.clone();
        strobeFlux = strobeFlux.clone();
        strobeVoltage = strobeVoltage.clone();
    }

    /** Largest modulus of the Floquet multipliers, NaN if there are none. */
    public double largestMultiplierModulus() {
        double m = Double.NaN;
        for (int i = 0; i < multiplierReal.length; i++) {
            double a = Math.hypot(multiplierReal[i], multiplierImag[i]);
            m = Double.isNaN(m) ? a : Math.max(m, a);
        }
        return m;
    }
}
