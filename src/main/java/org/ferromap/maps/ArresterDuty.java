package org.ferromap.maps;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.PerUnitCircuit;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * The energy a metal-oxide arrester on the open phase absorbs during sustained ferroresonance
 * (DOMAIN.md §7): the switching event is simulated again with the arrester in the circuit, so
 * its own clamping is part of the answer (a waveform simulated without it would drive a power-law
 * current of thousands of amperes through it).
 *
 * <h2>Where the arrester sits</h2>
 * Phase to ground at the open terminal, whose voltage is the loop voltage W less a share of the
 * loop source e(t) (from the loop-voltage column of the reduction's table, circuit.Reduction
 * [der]): V_a = W - e/2 for one open phase of an ungrounded primary (W = V_a + E_a/2, e = E_a),
 * V_a = W - e for two (W = V_a - E_c, e = -E_c), V_a = W for a grounded wye; a circuit-form
 * study's terminal is taken as the arrester's. The arrester current enters the loop as one more
 * shunt current at the terminal (it flows from the same node as the winding current):
 * <pre>
 *   C dv/dt = Cs de/dt - G v - i(lambda) - i_a(v - c e(t)),   i_a(u) = I_ref sign(u) (|u|/V_ref)^alpha
 *   dEnergy/dt = (v - c e) i_a
 * </pre>
 * integrated in the per-unit time of {@link PerUnitCircuit} with Hipparchus' Dormand-Prince 8(5,3)
 * (relative and absolute tolerance 1e-8 in per unit, the energy under relative control only; it
 * has no stiffness cut-off, and the arrester makes the loop stiff while it conducts).
 */
public final class ArresterDuty {

    /** Periods simulated before the energy is measured, by default. */
    public static final int DEFAULT_TRANSIENT_PERIODS = 150;
    /** Periods over which the energy per cycle is averaged (divisible by 1, 2, 3, 4, 6, 8 and 12, the usual subharmonic orders). */
    public static final int DEFAULT_MEASURED_PERIODS = 24;
    /** Samples kept per source period of the last measured period, for charts. */
    static final int SAMPLES = 400;

    private ArresterDuty() {
    }

    /**
     * Share c of the loop source to subtract from the loop voltage to get the open terminal's
     * voltage to ground (see the class notes) [der from the reduction's table].
     */
    public static double terminalOffset(Connection connection, OpenPhaseCase open) {
        if (!connection.isUngrounded()) {
            return 0.0;
        }
        return open.openPhases() == 1 ? 0.5 : 1.0;
    }

    /**
     * What the arrester absorbed.
     *
     * @param energyPerCycle   mean energy per source period once settled, J
     * @param meanPower        the same per second, W
     * @param peakVoltage      largest |voltage| across the arrester in the measured periods, V
     * @param peakCurrent      largest |current| through it, A
     * @param eventDuration    duration of the event assessed, s
     * @param eventEnergy      energy over the event, J (energy per cycle x cycles in the event)
     * @param capability       rated energy Ur x rating, J; NaN when no rating was given
     * @param ratio            eventEnergy / capability; NaN when no rating
     * @param withinRating     whether the event energy stays within the rating; null when no rating
     * @param time             one source period of the settled state, s from its start
     * @param voltage          arrester voltage over that period, V
     * @param current          arrester current over that period, A
     * @param note             one line on the verdict and what is not checked
     */
    public record Result(double energyPerCycle, double meanPower, double peakVoltage, double peakCurrent, double eventDuration,
                         double eventEnergy, double capability, double ratio, Boolean withinRating, double[] time,
                         double[] voltage, double[] current, String note) { }

    /**
     * Simulates the switching event with the arrester and measures its duty.
     *
     * @param circuit        the loop, with the switching instant as its source angle
     * @param offset         c of {@link #terminalOffset}
     * @param initialFlux    residual flux at switching, Wb-turn
     * @param arrester       the arrester
     * @param eventDuration  duration of the event assessed, s, &gt; 0
     * @param settle         periods before measuring
     * @param measured       periods measured
     */
    public static Result simulate(EquivalentCircuit circuit, double offset, double initialFlux, ArresterModel arrester,
                                  double eventDuration, int settle, int measured) {
        if (!(eventDuration > 0) || Double.isInfinite(eventDuration)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "event duration = " + eventDuration + " s; expected > 0");
        }
        if (settle < 0 || measured < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "arrester simulation periods " + settle + " + " + measured
                    + " are not allowed; expected >= 0 and >= 1");
        }
        PerUnitCircuit m = PerUnitCircuit.of(circuit);
        double vb = m.voltageBase();
        double omega = m.omega();
        double cap = circuit.totalCapacitance();
        double currentScale = 1.0 / (omega * cap * vb);
        double energyBase = cap * vb * vb;
        double e = offset * circuit.sourcePeak() / vb;
        double phi = m.phase();
        double g = m.damping();
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public double[] computeDerivatives(double tau, double[] z) {
                double ya = z[1] - e * Math.sin(tau + phi);
                double is = arrester.current(ya * vb) * currentScale;
                return new double[] {z[1], m.drive(tau) - g * z[1] - m.restoring(z[0]) - is, ya * is};
            }
        };
        // Energy: relative control only (it grows from zero and may be tiny against C V_b^2).
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 0.1, new double[] {1e-8, 1e-8, 1e-300},
                new double[] {1e-8, 1e-8, 1e-8});
        integrator.setMaxEvaluations(Integer.MAX_VALUE);
        // the automatic first step divides by the energy's (zero) scale: start small and let the control grow it
        integrator.setInitialStepSize(1e-3);
        double period = PerUnitCircuit.PERIOD;
        double[] z = {initialFlux / m.fluxBase(), 0.0, 0.0};
        double t = 0;
        try {
            if (settle > 0) {
                z = integrator.integrate(ode, new ODEState(0, z), settle * period).getPrimaryState();
                t = settle * period;
            }
            z[2] = 0.0;
            double[] peaks = new double[2];
            double[] tt = new double[SAMPLES];
            double[] vv = new double[SAMPLES];
            double[] ii = new double[SAMPLES];
            double lastStart = t + (measured - 1) * period;
            double start = t;
            integrator.clearStepHandlers();
            integrator.addStepHandler(new ODEStepHandler() {
                private int next;

                @Override
                public void handleStep(ODEStateInterpolator in) {
                    double t0 = in.getPreviousState().getTime();
                    double t1 = in.getCurrentState().getTime();
                    // peaks on a fine grid inside the step, and the samples of the last period
                    int n = 8;
                    for (int k = 1; k <= n; k++) {
                        double tk = t0 + (t1 - t0) * k / n;
                        double[] s = in.getInterpolatedState(tk).getPrimaryState();
                        double ua = (s[1] - e * Math.sin(tk + phi)) * vb;
                        peaks[0] = Math.max(peaks[0], Math.abs(ua));
                        peaks[1] = Math.max(peaks[1], Math.abs(arrester.current(ua)));
                    }
                    while (next < SAMPLES) {
                        double ts = lastStart + period * next / SAMPLES;
                        if (ts > t1) {
                            break;
                        }
                        double[] s = in.getInterpolatedState(ts).getPrimaryState();
                        double ua = (s[1] - e * Math.sin(ts + phi)) * vb;
                        tt[next] = (ts - lastStart) / omega;
                        vv[next] = ua;
                        ii[next] = arrester.current(ua);
                        next++;
                    }
                }
            });
            z = integrator.integrate(ode, new ODEState(start, z), start + measured * period).getPrimaryState();
            integrator.clearStepHandlers();
            double perCycle = z[2] * energyBase / measured;
            double f = omega / (2 * Math.PI);
            double eventEnergy = perCycle * f * eventDuration;
            double capability = arrester.capability();
            double ratio = eventEnergy / capability;
            Boolean ok = Double.isNaN(capability) ? null : eventEnergy <= capability;
            String note = Double.isNaN(capability)
                    ? "no energy rating given (analyses.damping.arrester.energy-rating, kJ/kV): energy reported without a verdict"
                    : ok ? String.format("within the rated energy (%.3g of it over %.3g s)", ratio, eventDuration)
                    : String.format("EXCEEDS the rated energy (%.3g times it over %.3g s): the arrester would fail", ratio,
                    eventDuration);
            note += "; a single-event energy check: temporary-overvoltage curves and repeated events (IEEE C62.22 [mem]) "
                    + "are not checked";
            return new Result(perCycle, perCycle * f, peaks[0], peaks[1], eventDuration, eventEnergy, capability, ratio, ok,
                    tt, vv, ii, note);
        } catch (MathRuntimeException ex) {
            throw new FerromapException(MessageKey.INTEGRATION_FAILED, "the arrester simulation failed: " + ex.getMessage(), ex);
        }
    }
}
