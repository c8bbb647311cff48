package org.ferromap.dynamics;

import java.util.Arrays;
import org.ferromap.circuit.NetworkResult;
import org.ferromap.circuit.Reduction;
import org.ferromap.circuit.StateLayout;
import org.ferromap.circuit.ThreePhaseNetwork;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Classifies the settled state of a recorded three-phase run ({@link NetworkResult}) by the rules
 * the single-phase simulation uses ({@link ModeRules}), from what the run recorded: the
 * stroboscopic samples of every state component and the waveforms of the last periods.
 *
 * <p>What differs from {@link Simulator}, and why:
 * <ul>
 * <li>No certification: Newton on the period map and the Floquet multipliers need the network's
 * variational equations, which are not integrated. A state is periodic of period p when all
 * stroboscopic samples (every flux and node voltage, per unit) repeat after p periods within
 * {@link #RECURRENCE_TOLERANCE} over the last {@link Simulator#RECURRENCE_SPAN} periods.</li>
 * <li>No Lyapunov exponent, for the same reason: a state that does not repeat is told apart by the
 * 0-1 test on the open phase's stroboscopic voltage, the line share of its spectrum, and whether
 * the samples are still closing in on a periodic state.</li>
 * <li>Normal or fundamental at period 1: the loop voltage W of the reduction's table
 * ({@link Reduction#loopSourceWeights}), formed from the recorded node voltage and the supply,
 * against the loop's source: in phase on the normal branch, in antiphase on the ferroresonant
 * one (the same rule as the single-phase circuit's terminal voltage), or above the peak threshold.</li>
 * </ul>
 * The open phase observed is a (the first to open, as {@link OpenPhaseCase} names them); its
 * winding's flux linkage is the first winding of the layout (lambda_a, or lambda_ab for delta).
 * Stateless.
 */
public final class NetworkClassifier {

    /**
     * Relative closeness, per unit, of stroboscopic samples p periods apart for a periodic verdict
     * on the network: 1e-4. The runs are integrated to about 1e-8 but not certified, and settle
     * at the rate of their least damped mode; distinct states of the open phase differ by a tenth
     * of a per unit or more, so 1e-4 over ten periods separates them by three orders of
     * magnitude. A modelling choice, no source.
     */
    public static final double RECURRENCE_TOLERANCE = 1e-4;

    /**
     * Relative distance, per unit, that every smaller order must keep for a subharmonic verdict:
     * ten times the recurrence tolerance (see {@link ModeRules#recurrence(double[][], int, int, int,
     * double, int, double)}). A modelling choice, no source.
     */
    public static final double DISTINCT = 10 * RECURRENCE_TOLERANCE;

    /** The words that say which indicators decide, for reports. */
    public static final String METHOD_PERIODIC = "recurrence of the stroboscopic samples of every state (relative "
            + "tolerance " + RECURRENCE_TOLERANCE + " over the last " + Simulator.RECURRENCE_SPAN
            + " periods); period 1 told normal or fundamental by the loop voltage's phase and the peak threshold; "
            + "not certified by Newton (single-phase only)";

    /** The words for a state that does not repeat. */
    public static final String METHOD_NOT_PERIODIC = "0-1 test on the open phase's stroboscopic voltage, line share "
            + "of the spectrum and contraction of the stroboscopic samples (no Lyapunov exponent: the network's "
            + "variational equations are not integrated)";

    private NetworkClassifier() {
    }

    /**
     * Classifies a run.
     *
     * @param r the recorded run; its recorded window should lie after the opening and the transient
     * @param network the network that ran
     * @param open the open-phase case (phase a open; a and b when two are open)
     * @param s classification settings: transient periods (after the last opening), max order,
     *        peak threshold, 0-1 threshold, Lyapunov zero band (unused: no exponent)
     * @param ratedPeak the voltage that is 1 per unit, V peak (the rated phase-to-neutral peak)
     * @return the settled state
     */
    public static SettledState classify(NetworkResult r, ThreePhaseNetwork network, OpenPhaseCase open,
            SimulationSettings s, double ratedPeak) {
        if (!(ratedPeak > 0) || Double.isInfinite(ratedPeak)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "rated peak = " + ratedPeak + " V; expected > 0");
        }
        double period = r.period();
        double lastOpening = Double.NaN;
        for (int k = 0; k < 3; k++) {
            if (r.isOpen(k)) {
                lastOpening = Double.isNaN(lastOpening) ? r.openingTimes()[k] : Math.max(lastOpening, r.openingTimes()[k]);
            }
        }
        Waveform emptyWindow = Waveform.empty();
        if (Double.isNaN(lastOpening)) {
            return new SettledState(SteadyMode.UNDETERMINED, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, Double.NaN, Spectrum.empty(), emptyWindow, emptyWindow, METHOD_NOT_PERIODIC,
                    "no pole opened within the run: nothing to classify");
        }
        double[][] pu = perUnitStrobes(r);
        int newest = pu[0].length - 1;
        int from = (int) Math.ceil(lastOpening / period - 1e-9) + s.transientPeriods();
        ModeRules.Recurrence rec = ModeRules.recurrence(pu, from, newest, s.maxOrder(), RECURRENCE_TOLERANCE,
                Simulator.RECURRENCE_SPAN, DISTINCT);

        double[] time = r.time();
        int samples = time.length - 1;     // whole periods: the last sample closes the window
        if (samples < 2) {
            return undetermined(rec, "the run recorded no window to analyse");
        }
        double dt = time[1] - time[0];
        int perPeriod = (int) Math.round(period / dt);
        int recordedPeriods = samples / perPeriod;
        if (time[0] < lastOpening - 1e-9 * period) {
            return undetermined(rec, "the recorded window starts before the last pole opened; simulate more periods");
        }
        double[] va = r.waveforms()[3];
        double[] flux = r.waveforms()[0];
        int[] openNodes = openNodes(r);

        if (rec.periodic()) {
            int p = rec.period();
            // Only the periods over which the samples were seen to repeat: the whole orbits within
            // the recurrence span (earlier periods of the window may still carry the transient).
            int whole = Math.min(recordedPeriods, p * Math.max(1, Simulator.RECURRENCE_SPAN / p));
            int n = whole * perPeriod;
            int start = samples - n;
            Spectrum spectrum = Spectrum.ofWholePeriods(Arrays.copyOfRange(va, start, samples), n * dt, 1.0);
            double peak = peak(r, openNodes, start, samples);
            Waveform window = new Waveform(Arrays.copyOfRange(time, start, samples),
                    Arrays.copyOfRange(flux, start, samples), Arrays.copyOfRange(va, start, samples));
            double phase = Double.NaN;
            String reason;
            SteadyMode mode;
            if (p == 1) {
                phase = loopPhase(r, network, open, start, samples);
                ModeRules.Verdict v = ModeRules.periodOne(phase, peak / ratedPeak, s.peakThreshold());
                mode = v.mode();
                reason = v.reason().replace("the source", "the loop source");
            } else {
                mode = SteadyMode.SUBHARMONIC;
                reason = "periodic at " + p + " source periods";
            }
            reason += String.format("; stroboscopic samples repeat within %.1e (tolerance %.0e), not certified by Newton",
                    rec.residual(), RECURRENCE_TOLERANCE);
            return new SettledState(mode, p, peak, peak / ratedPeak, Double.NaN, Double.NaN, rec.residual(), phase,
                    spectrum, window, section(r, newest - p + 1, newest), METHOD_PERIODIC, reason);
        }

        int n = Integer.highestOneBit(samples);
        int start = samples - n;
        double[] record = Arrays.copyOfRange(va, start, samples);
        Spectrum spectrum = Spectrum.ofRecord(record, n * dt, 1.0);
        double share = ModeRules.lineShare(spectrum);
        double peak = peak(r, openNodes, start, samples);
        double[] series = Arrays.copyOfRange(pu[3], Math.max(0, from), newest + 1);
        double k = ZeroOneTest.k(series, Simulator.ZERO_ONE_FREQUENCIES);
        boolean contracting = rec.closest() > 0
                && ModeRules.contracting(pu, from, newest, rec.closest(), Simulator.RECURRENCE_SPAN);
        ModeRules.Verdict v = ModeRules.notPeriodic(
                new ModeRules.Indicators(Double.NaN, k, share, contracting, Math.max(0, newest - from + 1)),
                s.lyapunovZeroBand(), s.zeroOneThreshold(), s.maxOrder(), newest);
        Waveform window = new Waveform(Arrays.copyOfRange(time, start, samples), Arrays.copyOfRange(flux, start, samples),
                record);
        int sectionFrom = Math.max(Math.max(0, Math.min(from, newest)), newest + 1 - SimulationResult.SECTION_LIMIT);
        return new SettledState(v.mode(), 0, peak, peak / ratedPeak, k, share, rec.residual(), Double.NaN, spectrum,
                window, section(r, sectionFrom, newest), METHOD_NOT_PERIODIC, v.reason());
    }

    /** The stroboscopic samples of every state component in per unit of its base, [component][k]. */
    static double[][] perUnitStrobes(NetworkResult r) {
        StateLayout layout = r.layout();
        double[][] pu = new double[layout.dimension()][];
        for (int i = 0; i < pu.length; i++) {
            pu[i] = r.strobes()[i].clone();
            for (int k = 0; k < pu[i].length; k++) {
                pu[i][k] /= layout.scale(i);
            }
        }
        return pu;
    }

    private static SettledState undetermined(ModeRules.Recurrence rec, String reason) {
        return new SettledState(SteadyMode.UNDETERMINED, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                rec.residual(), Double.NaN, Spectrum.empty(), Waveform.empty(), Waveform.empty(), METHOD_NOT_PERIODIC,
                reason);
    }

    /** Layout indices (3 + k) of the node voltages of the open phases. */
    private static int[] openNodes(NetworkResult r) {
        return java.util.stream.IntStream.range(0, 3).filter(r::isOpen).map(k -> 3 + k).toArray();
    }

    /** Largest |v| among the open phases' node voltages over samples [start, end), refined between samples. */
    private static double peak(NetworkResult r, int[] openNodes, int start, int end) {
        double m = 0;
        for (int node : openNodes) {
            m = Math.max(m, Simulator.refinedPeak(Arrays.copyOfRange(r.waveforms()[node], start, end)));
        }
        return m;
    }

    /**
     * Phase of the fundamental of the loop voltage W = v_a + sum w_k e_k against the loop source
     * sin(omega t + phi + shift), over samples [start, end) spanning whole periods, rad in (-pi, pi].
     */
    private static double loopPhase(NetworkResult r, ThreePhaseNetwork network, OpenPhaseCase open, int start, int end) {
        double[] w = Reduction.loopSourceWeights(network.connection(), open);
        double shift = open.loop(network.connection(), network.coreToSheathCapacitance(),
                network.coreToCoreCapacitance()).sourceAngleShift();
        double omega = network.omega();
        double phi = network.sourceAngle();
        double e = network.sourcePeak();
        double[] t = r.time();
        double[] va = r.waveforms()[3];
        double inPhase = 0;
        double quadrature = 0;
        for (int j = start; j < end; j++) {
            double wt = omega * t[j] + phi;
            double loop = va[j];
            for (int k = 0; k < 3; k++) {
                loop += w[k] * e * Math.sin(wt - 2 * Math.PI * k / 3);
            }
            inPhase += loop * Math.sin(wt + shift);
            quadrature += loop * Math.cos(wt + shift);
        }
        return Simulator.wrap(Math.atan2(quadrature, inPhase));
    }

    /** Stroboscopic samples [from, to] of the first winding's flux and phase a's node voltage, SI. */
    private static Waveform section(NetworkResult r, int from, int to) {
        if (to < from || from < 0) {
            return Waveform.empty();
        }
        return new Waveform(Arrays.copyOfRange(r.strobeTimes(), from, to + 1),
                Arrays.copyOfRange(r.strobes()[0], from, to + 1), Arrays.copyOfRange(r.strobes()[3], from, to + 1));
    }
}
