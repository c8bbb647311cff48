package org.ferromap.circuit;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Runs a {@link ThreePhaseNetwork} through a {@link SwitchPlan}: starts at t = 0 from the
 * energized bank ({@link ThreePhaseNetwork#energizedState}), opens the poles as planned through
 * event detectors, and records the waveforms and stroboscopic samples ({@link NetworkResult}).
 * Integration in per unit with Hipparchus' Dormand-Prince 8(5,3); classification of the settled
 * state is left to the caller.
 */
public final class NetworkSimulation {

    /** Longest integration step, per-unit time: a sixteenth of a period keeps the dense output local. */
    private static final double MAX_STEP = 2 * Math.PI / 16;
    /** Shortest step before the run is declared failed, per-unit time (about 3 fs at 50 Hz). */
    private static final double MIN_STEP = 1e-12;

    private NetworkSimulation() {
    }

    /**
     * Runs {@code periods} source periods with relative tolerance {@code rtol} and the same value
     * as absolute tolerance in per unit (every state is of order one there), other settings at
     * their defaults.
     */
    public static NetworkResult run(ThreePhaseNetwork network, SwitchPlan plan, int periods, double rtol) {
        return run(network, plan, NetworkSimulationSettings.defaults().withPeriods(periods).withRelativeTolerance(rtol)
                .withAbsoluteTolerance(rtol));
    }

    /** Runs with the given settings from the energized bank at t = 0. */
    public static NetworkResult run(ThreePhaseNetwork network, SwitchPlan plan, NetworkSimulationSettings settings) {
        NetworkEquations eq = network.equations();
        return run(eq, plan, eq.energizedState(0.0), settings);
    }

    /**
     * Runs given equations (whose poles may already be open) from a per-unit state at tau = 0.
     * Poles already open stay open whatever the plan says.
     */
    public static NetworkResult run(NetworkEquations eq, SwitchPlan plan, double[] initialPerUnit,
            NetworkSimulationSettings settings) {
        if (initialPerUnit.length != eq.getDimension()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "initial state has " + initialPerUnit.length
                    + " components; the network has " + eq.getDimension());
        }
        ThreePhaseNetwork network = eq.network();
        double omega = network.omega();
        int dim = eq.getDimension();
        double[] y0 = initialPerUnit.clone();
        double[] openedAt = new double[3];

        DormandPrince853Integrator integrator = new DormandPrince853Integrator(MIN_STEP, MAX_STEP,
                uniform(dim, settings.absoluteTolerance()), uniform(dim, settings.relativeTolerance()));
        List<PoleOpener> openers = new ArrayList<>(3);
        for (int k = 0; k < 3; k++) {
            openedAt[k] = Double.NaN;
            if (!eq.isClosed(k)) {
                openedAt[k] = 0.0;
                continue;
            }
            SwitchPlan.PoleCommand c = plan.pole(k);
            if (!c.opens()) {
                continue;
            }
            double tau = omega * c.commandTime();
            if (c.opening() == SwitchPlan.Opening.AT_COMMAND) {
                if (tau <= 0) {
                    // commanded at the start: open before integrating
                    eq.openPole(k);
                        openedAt[k] = 0.0;
                    y0 = eq.withNodeOnSource(k, 0.0, y0);
                    continue;
                }
                PoleCommandInstant d = new PoleCommandInstant(eq, k, tau, settings.eventThreshold());
                integrator.addEventDetector(d);
                openers.add(d.opener());
            } else {
                PoleCurrentZero d = new PoleCurrentZero(eq, k, tau, settings.eventThreshold(), settings.maxCheckInterval());
                integrator.addEventDetector(d);
                openers.add(d.opener());
            }
        }
        // The event record starts one period before the earliest opening command (or at the start).
        double firstCommand = Double.POSITIVE_INFINITY;
        for (int k = 0; k < 3; k++) {
            if (eq.isClosed(k) && plan.pole(k).opens()) {
                firstCommand = Math.min(firstCommand, omega * plan.pole(k).commandTime());
            }
        }
        double eventStart = Double.isInfinite(firstCommand) ? 0.0 : Math.max(0.0, firstCommand - 2 * Math.PI);
        double eventEnd = (Double.isInfinite(firstCommand) ? 0.0 : firstCommand) + 2 * Math.PI * settings.eventPeriods();
        int eventSamples = settings.eventPeriods() == 0 ? 0
                : (int) Math.floor((eventEnd - eventStart) * settings.samplesPerPeriod() / (2 * Math.PI) + 1e-9) + 1;
        NetworkRecorder recorder = new NetworkRecorder(dim, settings.periods(), settings.samplesPerPeriod(),
                settings.recordedPeriods(), eventStart, eventSamples);
        integrator.addStepHandler(recorder);

        double tauEnd = 2 * Math.PI * settings.periods();
        ODEStateAndDerivative end;
        try {
            end = integrator.integrate(eq, new ODEState(0.0, y0), tauEnd);
        } catch (MathRuntimeException ex) {
            throw new FerromapException(MessageKey.INTEGRATION_FAILED,
                    "the three-phase simulation failed: " + ex.getMessage()
                    + "; try a looser tolerance or check the saturation curve's range", ex);
        }
        for (PoleOpener o : openers) {
            if (!Double.isNaN(o.openedAt())) {
                openedAt[o.phase()] = o.openedAt() / omega;
            }
        }

        StateLayout layout = eq.layout();
        double[][] samples = recorder.samples();
        int n = samples[0].length;
        double[] time = new double[n];
        for (int j = 0; j < n; j++) {
            time[j] = recorder.sampleTau(j) / omega;
        }
        double[][] waveforms = toSi(layout, samples);
        double[][] strobesPu = recorder.strobes();
        double[] strobeTimes = new double[strobesPu[0].length];
        for (int k = 0; k < strobeTimes.length; k++) {
            strobeTimes[k] = 2 * Math.PI * k / omega;
        }
        double[][] strobes = toSi(layout, strobesPu);
        double peak = Double.NaN;
        for (int k = 0; k < 3; k++) {
            if (!Double.isNaN(openedAt[k])) {
                double m = 0;
                for (double x : waveforms[3 + k]) {
                    m = Math.max(m, Math.abs(x));
                }
                peak = Double.isNaN(peak) ? m : Math.max(peak, m);
            }
        }
        double vBase = network.perUnit().voltage();
        double[] eventTime = new double[recorder.event()[0].length];
        for (int j = 0; j < eventTime.length; j++) {
            eventTime[j] = recorder.eventTau(j) / omega;
        }
        return new NetworkResult(layout, network.period(), openedAt, time, waveforms,
                scale(recorder.sampleWindingVoltages(), vBase), strobeTimes, strobes,
                scale(recorder.strobeWindingVoltages(), vBase), peak,
                layout.toSi(end.getPrimaryState()), integrator.getEvaluations(), eventTime,
                toSi(layout, recorder.event()), scale(recorder.eventWindingVoltages(), vBase));
    }

    private static double[][] toSi(StateLayout layout, double[][] rows) {
        double[][] out = new double[rows.length][];
        for (int i = 0; i < rows.length; i++) {
            double s = layout.scale(i);
            out[i] = new double[rows[i].length];
            for (int j = 0; j < rows[i].length; j++) {
                out[i][j] = rows[i][j] * s;
            }
        }
        return out;
    }

    private static double[][] scale(double[][] rows, double s) {
        double[][] out = new double[rows.length][];
        for (int i = 0; i < rows.length; i++) {
            out[i] = new double[rows[i].length];
            for (int j = 0; j < rows[i].length; j++) {
                out[i][j] = rows[i][j] * s;
            }
        }
        return out;
    }

    private static double[] uniform(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }
}
