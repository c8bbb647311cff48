package org.ferromap.circuit;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * What {@link NetworkSimulation} recorded: waveforms of every state component over the last
 * periods of the run, one stroboscopic sample per source period over the whole run (phase-locked
 * to the source: t = k T), the switching instants and the peak open-phase voltage. SI throughout;
 * the layout names each row. Arrays belong to the result: read them, do not change them.
 *
 * @param layout names, SI units and per-unit bases of the state components (the rows below)
 * @param period source period T, s
 * @param openingTimes instant each pole opened, s; NaN for a pole that stayed closed
 * @param time sample instants of the recorded window, s
 * @param waveforms [component][sample], SI (Wb-turn for flux linkages, V for voltages)
 * @param windingVoltages [winding][sample], V: the voltage across each winding (its flux
 *        linkage's derivative), in the windings' order of the layout
 * @param strobeTimes k T for k = 0 .. periods, s
 * @param strobes [component][k], SI: the state once per period
 * @param strobeWindingVoltages [winding][k], V: the winding voltages once per period
 * @param peakOpenPhaseVoltage largest |v| from node to ground over the recorded window among the
 *        phases whose pole is open at the end, V; NaN when every pole stayed closed
 * @param finalState the SI state at the end of the run
 * @param evaluations right-hand-side evaluations the integrator spent (a cost figure)
 * @param eventTime sample instants of the record around the switching event, s (empty when none
 *        was asked for): from one period before the earliest opening command, or the start
 * @param eventWaveforms [component][sample], SI, over the event record
 * @param eventWindingVoltages [winding][sample], V, over the event record
 */
public record NetworkResult(
        StateLayout layout,
        double period,
        double[] openingTimes,
        double[] time,
        double[][] waveforms,
        double[][] windingVoltages,
        double[] strobeTimes,
        double[][] strobes,
        double[][] strobeWindingVoltages,
        double peakOpenPhaseVoltage,
        double[] finalState,
        int evaluations,
        double[] eventTime,
        double[][] eventWaveforms,
        double[][] eventWindingVoltages) {

    /** A result without an event record. */
    public NetworkResult(StateLayout layout, double period, double[] openingTimes, double[] time,
            double[][] waveforms, double[][] windingVoltages, double[] strobeTimes, double[][] strobes,
            double[][] strobeWindingVoltages, double peakOpenPhaseVoltage, double[] finalState, int evaluations) {
        this(layout, period, openingTimes, time, waveforms, windingVoltages, strobeTimes, strobes,
                strobeWindingVoltages, peakOpenPhaseVoltage, finalState, evaluations, new double[0],
                new double[layout.dimension()][0], new double[3][0]);
    }

    /** The event record of the named component ("v_a", "lambda_ab", ...), SI. */
    public double[] eventWaveform(String name) {
        return eventWaveforms[index(name)];
    }

    /** The recorded waveform of the named component ("v_a", "lambda_ab", ...), SI. */
    public double[] waveform(String name) {
        return waveforms[index(name)];
    }

    /** The stroboscopic samples of the named component, SI. */
    public double[] strobe(String name) {
        return strobes[index(name)];
    }

    /** Largest |value| of the named component over the recorded window, SI. */
    public double peak(String name) {
        double m = 0;
        for (double x : waveform(name)) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    /**
     * Largest |voltage| across winding w (0, 1, 2 in layout order) over the recorded window, V.
     * For an ungrounded wye this is what saturates the core, not the node's voltage to ground.
     */
    public double peakWindingVoltage(int w) {
        double m = 0;
        for (double x : windingVoltages[w]) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }

    /** Whether pole {@code phase} is open at the end of the run. */
    public boolean isOpen(int phase) {
        return !Double.isNaN(openingTimes[phase]);
    }

    /** The peak open-phase voltage in per unit of the source's phase-to-neutral peak. */
    public double peakOpenPhaseVoltagePerUnit() {
        return peakOpenPhaseVoltage / layout.scale(3);
    }

    private int index(String name) {
        int i = layout.indexOf(name);
        if (i < 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "no state component named " + name
                    + "; the layout has " + layout.components().stream().map(StateLayout.Component::name).toList());
        }
        return i;
    }
}
