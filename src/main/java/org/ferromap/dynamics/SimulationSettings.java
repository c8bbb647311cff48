package org.ferromap.dynamics;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * How to simulate the open-phase event and classify what it settles into. Immutable; change
 * with the {@code withX} copies. Deterministic: no random seed anywhere.
 *
 * @param maxPeriods most source periods to simulate; default 2000
 * @param transientPeriods source periods discarded before certification, Lyapunov and 0-1
 *        statistics start; default 20
 * @param tolerance relative tolerance of the integration, also the absolute tolerance in per unit
 *        of the rated peak voltage and flux; default 1e-9
 * @param samplesPerPeriod output samples per source period of the settled window (rounded up so
 *        the window holds a power of two for the FFT); default 100
 * @param initialFlux residual flux linkage at switching, Wb-turn; default 0
 * @param initialVoltage terminal voltage at switching, V; default 0
 * @param sourceAngle source angle phi at switching, rad; NaN (default) keeps the circuit's
 * @param certify whether to try to certify a periodic state (Newton on P^k) and stop early; default true
 * @param certifyEvery periods between certification attempts; default 10
 * @param maxOrder largest subharmonic order k tried; default 8
 * @param peakThreshold peak voltage above which a fundamental-period state counts as
 *        ferroresonant whatever its phase, per unit of rated peak; default 1.25 (common practice)
 * @param lyapunovZeroBand |largest exponent| below which it counts as zero, per source period; default 0.01
 * @param zeroOneThreshold K above which the 0-1 test says chaos; default 0.5
 * @param maxStepsPerPeriod integrator steps per source period beyond which the problem is
 *        reported stiff; default 20000
 * @param spectrumPeriods source periods of the window analysed when the state is not periodic,
 *        a power of two; default 64
 * @param eventPeriods source periods recorded from the switching instant as the event waveform,
 *        at {@code samplesPerPeriod} samples a period, in [0, 1000]; default 4 (0 records nothing)
 */
public record SimulationSettings(
        int maxPeriods,
        int transientPeriods,
        double tolerance,
        int samplesPerPeriod,
        double initialFlux,
        double initialVoltage,
        double sourceAngle,
        boolean certify,
        int certifyEvery,
        int maxOrder,
        double peakThreshold,
        double lyapunovZeroBand,
        double zeroOneThreshold,
        int maxStepsPerPeriod,
        int spectrumPeriods,
        int eventPeriods) {

    public SimulationSettings {
        require(maxPeriods >= 1, "max periods", maxPeriods, ">= 1");
        require(transientPeriods >= 0 && transientPeriods < maxPeriods, "transient periods", transientPeriods,
                ">= 0 and < max periods (" + maxPeriods + ")");
        require(tolerance >= 1e-14 && tolerance <= 1e-3, "tolerance", tolerance, "in [1e-14, 1e-3]");
        require(samplesPerPeriod >= 8 && samplesPerPeriod <= 100_000, "samples per period", samplesPerPeriod,
                "in [8, 100000]");
        require(Double.isFinite(initialFlux), "initial flux", initialFlux, "finite (Wb-turn)");
        require(Double.isFinite(initialVoltage), "initial voltage", initialVoltage, "finite (V)");
        require(Double.isNaN(sourceAngle) || Double.isFinite(sourceAngle), "source angle", sourceAngle,
                "finite (rad), or NaN for the circuit's own");
        require(certifyEvery >= 1, "certify every", certifyEvery, ">= 1 period");
        require(maxOrder >= 1 && maxOrder <= 64, "max order", maxOrder, "in [1, 64]");
        require(peakThreshold > 0 && Double.isFinite(peakThreshold), "peak threshold", peakThreshold, "> 0 pu");
        require(lyapunovZeroBand > 0 && Double.isFinite(lyapunovZeroBand), "Lyapunov zero band", lyapunovZeroBand,
                "> 0 per period");
        require(zeroOneThreshold > 0 && zeroOneThreshold < 1, "0-1 threshold", zeroOneThreshold, "in (0, 1)");
        require(maxStepsPerPeriod >= 10, "max steps per period", maxStepsPerPeriod, ">= 10");
        require(spectrumPeriods >= 1 && Integer.bitCount(spectrumPeriods) == 1 && spectrumPeriods <= 4096,
                "spectrum periods", spectrumPeriods, "a power of two in [1, 4096]");
        require(eventPeriods >= 0 && eventPeriods <= 1000, "event periods", eventPeriods, "in [0, 1000]");
    }

    /** The settings without an event record's length: {@code eventPeriods} takes its default, 4. */
    public SimulationSettings(int maxPeriods, int transientPeriods, double tolerance, int samplesPerPeriod,
            double initialFlux, double initialVoltage, double sourceAngle, boolean certify, int certifyEvery,
            int maxOrder, double peakThreshold, double lyapunovZeroBand, double zeroOneThreshold,
            int maxStepsPerPeriod, int spectrumPeriods) {
        this(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux, initialVoltage, sourceAngle,
                certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand, zeroOneThreshold, maxStepsPerPeriod,
                spectrumPeriods, DEFAULT_EVENT_PERIODS);
    }

    /** Default of {@code eventPeriods}. */
    public static final int DEFAULT_EVENT_PERIODS = 4;

    /** The documented defaults. */
    public static SimulationSettings defaults() {
        return new SimulationSettings(2000, 20, 1e-9, 100, 0, 0, Double.NaN, true, 10, 8, 1.25, 0.01, 0.5,
                20000, 64, DEFAULT_EVENT_PERIODS);
    }

    public SimulationSettings withMaxPeriods(int v) {
        return new SimulationSettings(v, transientPeriods, tolerance, samplesPerPeriod, initialFlux, initialVoltage,
                sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand, zeroOneThreshold,
                maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withTransientPeriods(int v) {
        return new SimulationSettings(maxPeriods, v, tolerance, samplesPerPeriod, initialFlux, initialVoltage,
                sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand, zeroOneThreshold,
                maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withTolerance(double v) {
        return new SimulationSettings(maxPeriods, transientPeriods, v, samplesPerPeriod, initialFlux, initialVoltage,
                sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand, zeroOneThreshold,
                maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withSamplesPerPeriod(int v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, v, initialFlux, initialVoltage,
                sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand, zeroOneThreshold,
                maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    /** Initial flux linkage (Wb-turn) and terminal voltage (V) at switching. */
    public SimulationSettings withInitialState(double flux, double voltage) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, flux, voltage,
                sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand, zeroOneThreshold,
                maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withSourceAngle(double rad) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, rad, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withCertify(boolean v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, v, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withCertifyEvery(int v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, v, maxOrder, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withMaxOrder(int v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, v, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withPeakThreshold(double pu) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, maxOrder, pu, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withLyapunovZeroBand(double v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, v,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withZeroOneThreshold(double v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand,
                v, maxStepsPerPeriod, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withMaxStepsPerPeriod(int v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, v, spectrumPeriods, eventPeriods);
    }

    public SimulationSettings withSpectrumPeriods(int v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, v, eventPeriods);
    }

    public SimulationSettings withEventPeriods(int v) {
        return new SimulationSettings(maxPeriods, transientPeriods, tolerance, samplesPerPeriod, initialFlux,
                initialVoltage, sourceAngle, certify, certifyEvery, maxOrder, peakThreshold, lyapunovZeroBand,
                zeroOneThreshold, maxStepsPerPeriod, spectrumPeriods, v);
    }

    private static void require(boolean ok, String what, double value, String allowed) {
        if (!ok) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "simulation setting " + what + " = " + value + " is not allowed; expected " + allowed);
        }
    }
}
