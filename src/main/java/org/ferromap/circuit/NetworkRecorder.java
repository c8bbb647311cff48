package org.ferromap.circuit;

import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * Step handler that records a network run (kept apart from the solving): a stroboscopic sample at
 * every tau = 2 pi k from the run's start, and waveform samples at a fixed rate over the last
 * periods. Reads the dense output of each step only at the requested instants, so the cost does
 * not grow with the number of integration steps. Besides the state, each sample keeps the three
 * winding voltages, read from the dense output's derivative (d lambda_w / d tau is the winding
 * voltage in per unit), so the voltage across an ungrounded-wye winding is known even when the
 * neutral is not a state. Per-unit values are stored as they are; the simulation converts to SI
 * once at the end.
 */
final class NetworkRecorder implements ODEStepHandler {

    private final int dimension;
    private final double strobeStep;
    private final double[][] strobes;
    private final double[][] strobeWinding;
    private final double windowStart;
    private final double sampleStep;
    private final double[][] samples;
    private final double[][] sampleWinding;
    private final double eventStart;
    private final double[][] event;
    private final double[][] eventWinding;
    private int nextStrobe;
    private int nextSample;
    private int nextEvent;

    /**
     * @param dimension state dimension
     * @param periods periods in the run, which starts at tau = 0
     * @param samplesPerPeriod waveform samples per period
     * @param recordedPeriods periods recorded at the end
     */
    NetworkRecorder(int dimension, int periods, int samplesPerPeriod, int recordedPeriods) {
        this(dimension, periods, samplesPerPeriod, recordedPeriods, 0.0, 0);
    }

    /**
     * @param eventStart per-unit time at which the event record starts, &gt;= 0
     * @param eventSamples samples of the event record (0 for none), cut at the end of the run
     */
    NetworkRecorder(int dimension, int periods, int samplesPerPeriod, int recordedPeriods, double eventStart,
            int eventSamples) {
        this.dimension = dimension;
        this.strobeStep = 2 * Math.PI;
        this.strobes = new double[dimension][periods + 1];
        this.strobeWinding = new double[3][periods + 1];
        this.windowStart = 2 * Math.PI * (periods - recordedPeriods);
        this.sampleStep = 2 * Math.PI / samplesPerPeriod;
        this.samples = new double[dimension][samplesPerPeriod * recordedPeriods + 1];
        this.sampleWinding = new double[3][samples[0].length];
        this.eventStart = eventStart;
        int fit = eventSamples == 0 ? 0
                : (int) Math.min(eventSamples, Math.floor((2 * Math.PI * periods - eventStart) / sampleStep + 1e-9) + 1);
        this.event = new double[dimension][Math.max(0, fit)];
        this.eventWinding = new double[3][Math.max(0, fit)];
    }

    @Override
    public void init(ODEStateAndDerivative initialState, double finalTime) {
        nextStrobe = 0;
        nextSample = 0;
        nextEvent = 0;
    }

    @Override
    public void handleStep(ODEStateInterpolator interpolator) {
        double tEnd = interpolator.getCurrentState().getTime();
        // a sample that rounding puts a hair past the last step end still belongs to it
        double slack = 1e-9 * sampleStep;
        while (nextStrobe < strobes[0].length && nextStrobe * strobeStep <= tEnd + slack) {
            store(interpolator, Math.min(nextStrobe * strobeStep, tEnd), strobes, strobeWinding, nextStrobe++);
        }
        while (nextSample < samples[0].length && windowStart + nextSample * sampleStep <= tEnd + slack) {
            store(interpolator, Math.min(windowStart + nextSample * sampleStep, tEnd), samples, sampleWinding,
                    nextSample++);
        }
        while (nextEvent < event[0].length && eventStart + nextEvent * sampleStep <= tEnd + slack) {
            store(interpolator, Math.min(eventStart + nextEvent * sampleStep, tEnd), event, eventWinding, nextEvent++);
        }
    }

    private void store(ODEStateInterpolator interpolator, double tau, double[][] into, double[][] winding, int column) {
        ODEStateAndDerivative s = interpolator.getInterpolatedState(tau);
        double[] y = s.getPrimaryState();
        for (int i = 0; i < dimension; i++) {
            into[i][column] = y[i];
        }
        double[] yDot = s.getPrimaryDerivative();
        for (int w = 0; w < 3; w++) {
            winding[w][column] = yDot[w];
        }
    }

    /** Per-unit time of waveform sample j. */
    double sampleTau(int j) {
        return windowStart + j * sampleStep;
    }

    /** Per-unit time of event sample j. */
    double eventTau(int j) {
        return eventStart + j * sampleStep;
    }

    double[][] event() {
        return event;
    }

    double[][] eventWindingVoltages() {
        return eventWinding;
    }

    double[][] strobes() {
        return strobes;
    }

    double[][] samples() {
        return samples;
    }

    double[][] strobeWindingVoltages() {
        return strobeWinding;
    }

    double[][] sampleWindingVoltages() {
        return sampleWinding;
    }
}
