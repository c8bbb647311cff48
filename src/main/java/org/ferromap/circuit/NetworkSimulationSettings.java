package org.ferromap.circuit;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Settings of {@link NetworkSimulation}. Immutable; {@code withX} methods return changed copies.
 * Per-unit times are radians of the source angle (tau = omega t).
 *
 * @param periods source periods simulated from t = 0, &gt;= 1 (default 100)
 * @param relativeTolerance relative error tolerance of the integrator, in (0, 1e-2] (default 1e-8)
 * @param absoluteTolerance absolute error tolerance, per unit of each state's base (default 1e-8)
 * @param samplesPerPeriod waveform samples per source period in the recorded window, &gt;= 16
 *        (default 256: a sinusoid's peak read from the samples is low by at most
 *        1 - cos(pi/256) = 7.5e-5 relative)
 * @param recordedPeriods periods at the end of the run kept as waveforms and searched for the
 *        peak, &gt;= 1 and &lt;= periods (default 5)
 * @param eventThreshold convergence threshold of switching instants, per-unit time (default 1e-10,
 *        about 0.3 ns at 50 Hz: a current-zero opening then leaves a current of 1e-10 of its
 *        slope's per-unit value)
 * @param maxCheckInterval longest interval between checks of a pole current's sign, per-unit time
 *        (default 2 pi / 128: current zeros closer than 1/128 period may be missed)
 * @param eventPeriods periods recorded around the switching event, &gt;= 0 (default 4): from one
 *        period before the earliest opening command (or the start) to {@code eventPeriods} periods
 *        after it, at {@code samplesPerPeriod}; 0 records nothing
 */
public record NetworkSimulationSettings(
        int periods,
        double relativeTolerance,
        double absoluteTolerance,
        int samplesPerPeriod,
        int recordedPeriods,
        double eventThreshold,
        double maxCheckInterval,
        int eventPeriods) {

    public NetworkSimulationSettings {
        if (periods < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "periods = " + periods + "; expected >= 1");
        }
        if (!(relativeTolerance > 0 && relativeTolerance <= 1e-2)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "relative tolerance = " + relativeTolerance + "; expected a value in (0, 1e-2]");
        }
        if (!(absoluteTolerance > 0 && absoluteTolerance <= 1e-2)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "absolute tolerance = " + absoluteTolerance + " pu; expected a value in (0, 1e-2]");
        }
        if (samplesPerPeriod < 16) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "samples per period = " + samplesPerPeriod + "; expected >= 16");
        }
        if (recordedPeriods < 1 || recordedPeriods > periods) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "recorded periods = " + recordedPeriods + "; expected between 1 and the " + periods + " periods simulated");
        }
        if (!(eventThreshold > 0 && eventThreshold <= 1e-3)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "event threshold = " + eventThreshold + " pu time; expected a value in (0, 1e-3]");
        }
        if (!(maxCheckInterval > 0 && maxCheckInterval <= Math.PI)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "max check interval = " + maxCheckInterval + " pu time; expected a value in (0, pi]");
        }
        if (eventPeriods < 0 || eventPeriods > 1000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "event periods = " + eventPeriods + "; expected between 0 and 1000");
        }
    }

    /** Default of {@code eventPeriods}. */
    public static final int DEFAULT_EVENT_PERIODS = 4;

    /** Settings without an event record's length: {@code eventPeriods} takes its default. */
    public NetworkSimulationSettings(int periods, double relativeTolerance, double absoluteTolerance,
            int samplesPerPeriod, int recordedPeriods, double eventThreshold, double maxCheckInterval) {
        this(periods, relativeTolerance, absoluteTolerance, samplesPerPeriod, recordedPeriods, eventThreshold,
                maxCheckInterval, DEFAULT_EVENT_PERIODS);
    }

    /** The documented defaults. */
    public static NetworkSimulationSettings defaults() {
        return new NetworkSimulationSettings(100, 1e-8, 1e-8, 256, 5, 1e-10, 2 * Math.PI / 128, DEFAULT_EVENT_PERIODS);
    }

    /** Sets the periods, pulling the recorded window down to fit when needed. */
    public NetworkSimulationSettings withPeriods(int n) {
        return new NetworkSimulationSettings(n, relativeTolerance, absoluteTolerance, samplesPerPeriod,
                Math.min(recordedPeriods, Math.max(n, 1)), eventThreshold, maxCheckInterval, eventPeriods);
    }

    public NetworkSimulationSettings withRelativeTolerance(double v) {
        return new NetworkSimulationSettings(periods, v, absoluteTolerance, samplesPerPeriod, recordedPeriods,
                eventThreshold, maxCheckInterval, eventPeriods);
    }

    public NetworkSimulationSettings withAbsoluteTolerance(double v) {
        return new NetworkSimulationSettings(periods, relativeTolerance, v, samplesPerPeriod, recordedPeriods,
                eventThreshold, maxCheckInterval, eventPeriods);
    }

    public NetworkSimulationSettings withSamplesPerPeriod(int n) {
        return new NetworkSimulationSettings(periods, relativeTolerance, absoluteTolerance, n, recordedPeriods,
                eventThreshold, maxCheckInterval, eventPeriods);
    }

    public NetworkSimulationSettings withRecordedPeriods(int n) {
        return new NetworkSimulationSettings(periods, relativeTolerance, absoluteTolerance, samplesPerPeriod, n,
                eventThreshold, maxCheckInterval, eventPeriods);
    }

    public NetworkSimulationSettings withEventThreshold(double v) {
        return new NetworkSimulationSettings(periods, relativeTolerance, absoluteTolerance, samplesPerPeriod,
                recordedPeriods, v, maxCheckInterval, eventPeriods);
    }

    public NetworkSimulationSettings withEventPeriods(int n) {
        return new NetworkSimulationSettings(periods, relativeTolerance, absoluteTolerance, samplesPerPeriod,
                recordedPeriods, eventThreshold, maxCheckInterval, n);
    }

    public NetworkSimulationSettings withMaxCheckInterval(double v) {
        return new NetworkSimulationSettings(periods, relativeTolerance, absoluteTolerance, samplesPerPeriod,
                recordedPeriods, eventThreshold, v, eventPeriods);
    }
}
