package org.ferromap.dynamics;

import java.util.Arrays;
import java.util.Optional;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;

/**
 * Simulates the open-phase event on the single-phase circuit and classifies the state it
 * settles into (DOMAIN.md §6).
 *
 * <p>The run integrates period by period and keeps a stroboscopic sample at every source period.
 * After the transient it carries a tangent vector along (Benettin's method, renormalised every
 * period) and, every {@code certifyEvery} periods, asks {@link OrbitCertifier} whether the
 * trajectory has reached a stable periodic orbit; if so it stops at once. This is what makes
 * lightly damped cases, which close in on their orbit over hundreds of periods, affordable.
 *
 * <p>Classification rules (the shared ones live in {@link ModeRules}, which the three-phase
 * {@link NetworkClassifier} applies too):
 * <ul>
 * <li>A certified orbit (or, without certification, stroboscopic samples that repeat after p
 * periods to 1e-6 per unit over the last 10 periods) of period p &gt; 1 is subharmonic.</li>
 * <li>Period 1 is <b>fundamental</b> ferroresonance when the fundamental of the terminal voltage
 * is in antiphase with the source (|phase| &gt; pi/2: the terminal branch is net inductive, the
 * state lies on the capacitive side of the LC balance, DOMAIN.md §3) or when the peak exceeds
 * the peak threshold (1.25 pu by default, common practice); otherwise it is <b>normal</b>.</li>
 * <li>Not periodic: <b>chaotic</b> when the largest Lyapunov exponent exceeds the zero band and
 * the 0-1 test K exceeds its threshold; <b>quasi-periodic</b> when the exponent lies within the
 * zero band and K is below the threshold; otherwise <b>undetermined</b>, saying which indicators
 * disagree.</li>
 * <li>Any integration failure (stiffness, step collapse, non-finite state) or failure inside the
 * saturation curve ends as <b>undetermined</b> with the reason; nothing is thrown for it.</li>
 * </ul>
 * Stateless and thread-safe: each call owns its work areas.
 */
public final class Simulator {

    /** Relative closeness of repeating stroboscopic samples for an uncertified periodic verdict. */
    static final double RECURRENCE_TOLERANCE = 1e-6;
    static final int RECURRENCE_SPAN = 10;
    static final int ZERO_ONE_FREQUENCIES = 32;

    private Simulator() {
    }

    /**
     * Simulates and classifies.
     *
     * @param circuit the equivalent circuit (SI)
     * @param settings how to simulate
     * @return the classified result; an integration failure gives mode undetermined with a reason
     * @throws FerromapException only for invalid input (settings are checked when built)
     */
    public static SimulationResult simulate(EquivalentCircuit circuit, SimulationSettings settings) {
        EquivalentCircuit c = Double.isNaN(settings.sourceAngle()) ? circuit : circuit.withSourceAngle(settings.sourceAngle());
        PerUnitCircuit model = PerUnitCircuit.of(c);
        Run run = new Run(model, settings);
        // Below the knee, v/e = w^2 Cs / (w^2 C - a): when the magnetizing slope a exceeds w^2 C
        // (kappa < 0, DOMAIN.md §3) even the normal, unsaturated state is in antiphase.
        run.antiphaseWhenLinear = c.omega() * c.omega() * c.totalCapacitance() < c.magnetizing().currentSlope(0.0);
        try {
            return run.execute();
        } catch (FerromapException e) {
            if (e.key().isInputError()) {
                throw e;
            }
            return run.undetermined("solver failure: " + e.getMessage());
        } catch (RuntimeException e) {
            // A saturation curve or a library routine failed mid-run: report it as the outcome.
            return run.undetermined("failure during the simulation: " + e);
        }
    }

    /** The mutable state of one simulation. */
    private static final class Run {
        private final PerUnitCircuit model;
        /** Whether the unsaturated loop already puts the terminal in antiphase with the source. */
        private boolean antiphaseWhenLinear;
        private final SimulationSettings s;
        private final DormandPrince853 plain;
        private final DormandPrince853 tangent;
        private final StroboscopicMap map;
        private final OrbitCertifier certifier;
        private final double[] xs;
        private final double[] ys;
        private int newest;
        private double lyapunovSum;
        private int lyapunovPeriods;
        private final int windowPeriods;
        private final int windowSamplesPerPeriod;
        private final double[] windowX;
        private final double[] windowY;
        private int windowFilled;
        private final double[] eventX;
        private final double[] eventY;
        private int eventFilled;

        Run(PerUnitCircuit model, SimulationSettings s) {
            this.model = model;
            this.s = s;
            double tol = s.tolerance();
            plain = DormandPrince853.uniform(2, tol, tol, 1e-10, PerUnitCircuit.PERIOD);
            tangent = DormandPrince853.uniform(4, tol, tol, 1e-10, PerUnitCircuit.PERIOD);
            map = new StroboscopicMap(model, tol, s.maxStepsPerPeriod());
            certifier = new OrbitCertifier(map, tol);
            xs = new double[s.maxPeriods() + 1];
            ys = new double[s.maxPeriods() + 1];
            int available = s.maxPeriods() - s.transientPeriods();
            windowPeriods = Integer.highestOneBit(Math.max(1, Math.min(s.spectrumPeriods(), available)));
            windowSamplesPerPeriod = nextPowerOfTwo(s.samplesPerPeriod());
            windowX = new double[windowPeriods * windowSamplesPerPeriod];
            windowY = new double[windowX.length];
            int eventSamples = s.eventPeriods() == 0 ? 0
                    : Math.min(s.eventPeriods(), s.maxPeriods()) * s.samplesPerPeriod() + 1;
            eventX = new double[eventSamples];
            eventY = new double[eventSamples];
        }

        /**
         * A listener that samples the event record from {@code source}'s dense output (the first
         * periods, uniform at samplesPerPeriod) and then calls {@code next}; null when neither is wanted.
         */
        private DormandPrince853.StepListener withEvent(DormandPrince853 source, DormandPrince853.StepListener next) {
            if (eventFilled >= eventX.length) {
                return next;
            }
            double dt = PerUnitCircuit.PERIOD / s.samplesPerPeriod();
            // a sample that rounding puts a hair past the end of a period still belongs to it
            double slack = 1e-9 * dt;
            return (a, b) -> {
                while (eventFilled < eventX.length) {
                    double tj = eventFilled * dt;
                    if (tj > b + slack) {
                        break;
                    }
                    eventX[eventFilled] = source.interpolate(Math.min(tj, b), 0);
                    eventY[eventFilled] = source.interpolate(Math.min(tj, b), 1);
                    eventFilled++;
                }
                if (next != null) {
                    next.stepAccepted(a, b);
                }
            };
        }

        SimulationResult execute() {
            double[] z = {s.initialFlux() / model.fluxBase(), s.initialVoltage() / model.voltageBase(), 1.0, 0.0};
            xs[0] = z[0];
            ys[0] = z[1];
            DormandPrince853.Rhs rhs2 = model::derivatives;
            DormandPrince853.Rhs rhs4 = model::derivativesWithTangent;
            double[] z2 = {z[0], z[1]};
            if (eventX.length > 0) {
                eventX[0] = z[0];
                eventY[0] = z[1];
                eventFilled = 1;
            }
            int windowStart = s.maxPeriods() - windowPeriods + 1;
            double dtWindow = PerUnitCircuit.PERIOD / windowSamplesPerPeriod;
            for (int k = 1; k <= s.maxPeriods(); k++) {
                double t0 = (k - 1) * PerUnitCircuit.PERIOD;
                double t1 = k * PerUnitCircuit.PERIOD;
                DormandPrince853.Status status;
                if (k <= s.transientPeriods()) {
                    status = plain.integrate(rhs2, t0, z2, t1, s.maxStepsPerPeriod(), withEvent(plain, null));
                    z[0] = z2[0];
                    z[1] = z2[1];
                } else {
                    DormandPrince853.StepListener recorder = null;
                    if (k >= windowStart) {
                        final int base = (k - windowStart) * windowSamplesPerPeriod;
                        recorder = (a, b) -> {
                            while (windowFilled < windowX.length) {
                                int j = windowFilled - base;
                                double tj = t0 + j * dtWindow;
                                if (j >= windowSamplesPerPeriod || tj > b) {
                                    break;
                                }
                                windowX[windowFilled] = tangent.interpolate(tj, 0);
                                windowY[windowFilled] = tangent.interpolate(tj, 1);
                                windowFilled++;
                            }
                        };
                    }
                    status = tangent.integrate(rhs4, t0, z, t1, s.maxStepsPerPeriod(), withEvent(tangent, recorder));
                    double norm = Math.hypot(z[2], z[3]);
                    if (status == DormandPrince853.Status.OK && norm > 0 && Double.isFinite(norm)) {
                        lyapunovSum += Math.log(norm);
                        lyapunovPeriods++;
                        z[2] /= norm;
                        z[3] /= norm;
                    }
                }
                if (status != DormandPrince853.Status.OK) {
                    newest = k - 1;
                    return undetermined("integration failed in source period " + k + ": " + status.explanation());
                }
                xs[k] = z[0];
                ys[k] = z[1];
                newest = k;
                if (s.certify() && k > s.transientPeriods() && (k - s.transientPeriods()) % s.certifyEvery() == 0) {
                    Optional<PeriodicOrbit> orbit = certifier.certify(xs, ys, k, s.transientPeriods(), s.maxOrder());
                    if (orbit.isPresent()) {
                        return periodic(orbit.get(), true);
                    }
                }
            }
            return unsettled();
        }

        /** Classification of a periodic state: the window is one orbit, integrated afresh with dense samples. */
        private SimulationResult periodic(PeriodicOrbit orbit, boolean certified) {
            int p = orbit.period();
            int n = nextPowerOfTwo(p * s.samplesPerPeriod());
            double[] wx = new double[n];
            double[] wy = new double[n];
            DormandPrince853 dense = DormandPrince853.uniform(2, s.tolerance(), s.tolerance(), 1e-10, PerUnitCircuit.PERIOD);
            double span = p * PerUnitCircuit.PERIOD;
            double dt = span / n;
            int[] filled = {0};
            double[] zz = {orbit.x(), orbit.y()};
            wx[0] = zz[0];
            wy[0] = zz[1];
            filled[0] = 1;
            // The section: the orbit's points at whole periods, read from the same dense output.
            double[] ox = new double[p];
            double[] oy = new double[p];
            ox[0] = zz[0];
            oy[0] = zz[1];
            int[] points = {1};
            DormandPrince853.Status st = dense.integrate(model::derivatives, 0.0, zz, span,
                    (long) p * s.maxStepsPerPeriod(), (a, b) -> {
                        while (filled[0] < n && filled[0] * dt <= b) {
                            wx[filled[0]] = dense.interpolate(filled[0] * dt, 0);
                            wy[filled[0]] = dense.interpolate(filled[0] * dt, 1);
                            filled[0]++;
                        }
                        while (points[0] < p && points[0] * PerUnitCircuit.PERIOD <= b) {
                            ox[points[0]] = dense.interpolate(points[0] * PerUnitCircuit.PERIOD, 0);
                            oy[points[0]] = dense.interpolate(points[0] * PerUnitCircuit.PERIOD, 1);
                            points[0]++;
                        }
                    });
            if (st != DormandPrince853.Status.OK) {
                return undetermined("integration of the settled orbit failed: " + st.explanation());
            }
            double omega = model.omega();
            double startTime = newest * PerUnitCircuit.PERIOD / omega;
            Waveform window = toWaveform(wx, wy, startTime, dt / omega);
            double peak = refinedPeak(wy);
            Spectrum spectrum = Spectrum.ofPeriodic(wy, span / omega, model.voltageBase());
            double phase = Double.NaN;
            SteadyMode mode;
            String note;
            if (p == 1) {
                // Line 1 is the fundamental; its phase is that of a cosine at tau = 0. The source
                // e = E sin(tau + phi) is a cosine of phase phi - pi/2.
                phase = wrap(spectrum.phase()[1] - (model.phase() - Math.PI / 2));
                ModeRules.Verdict v = ModeRules.periodOne(phase, peak, s.peakThreshold(), antiphaseWhenLinear);
                mode = v.mode();
                note = v.reason();
            } else {
                mode = SteadyMode.SUBHARMONIC;
                note = "periodic at " + p + " source periods";
            }
            if (!certified) {
                note += "; recurrence of the stroboscopic samples, not certified by Newton";
            }
            double lyap = Math.log(orbit.largestModulus()) / p;
            double[] ot = new double[p];
            for (int j = 0; j < p; j++) {
                ot[j] = startTime + j * PerUnitCircuit.PERIOD / omega;
            }
            Waveform section = new Waveform(ot, scaled(ox, model.fluxBase()), scaled(oy, model.voltageBase()));
            return new SimulationResult(mode, p, peak * model.voltageBase(), peak, lyap, Double.NaN, certified,
                    orbit.multiplierReal(), orbit.multiplierImag(), phase, spectrum, window, strobeFlux(),
                    strobeVoltage(), newest, evaluations(), note, event(), section);
        }

        /** Classification when the run used all its periods without certifying an orbit. */
        private SimulationResult unsettled() {
            int from = s.transientPeriods() + 1;
            // Samples that repeat after p periods, checked over the last periods, mean a periodic
            // state that the certifier could not confirm (certification off, or Newton failed).
            ModeRules.Recurrence rec = ModeRules.recurrence(new double[][] {xs, ys}, from, newest, s.maxOrder(),
                    RECURRENCE_TOLERANCE, RECURRENCE_SPAN);
            if (rec.periodic()) {
                Optional<PeriodicOrbit> orbit = certifier.newton(xs[newest], ys[newest], rec.period());
                if (orbit.isPresent()) {
                    return periodic(orbit.get(), false);
                }
            }
            double lyap = lyapunovPeriods > 0 ? lyapunovSum / lyapunovPeriods : Double.NaN;
            double[] series = Arrays.copyOfRange(ys, from, newest + 1);
            double k = ZeroOneTest.k(series, ZERO_ONE_FREQUENCIES);
            double dt = PerUnitCircuit.PERIOD / windowSamplesPerPeriod;
            double startTime = (s.maxPeriods() - windowPeriods) * PerUnitCircuit.PERIOD / model.omega();
            Waveform window = windowFilled == windowX.length
                    ? toWaveform(windowX, windowY, startTime, dt / model.omega()) : Waveform.empty();
            double peak = windowFilled == windowX.length ? refinedPeak(windowY) : Double.NaN;
            Spectrum spectrum = windowFilled == windowX.length
                    ? Spectrum.ofRecord(windowY, windowPeriods * PerUnitCircuit.PERIOD / model.omega(), model.voltageBase())
                    : Spectrum.empty();
            ModeRules.Verdict v = ModeRules.notPeriodic(
                    new ModeRules.Indicators(lyap, k, Double.NaN, false, newest - s.transientPeriods()),
                    s.lyapunovZeroBand(), s.zeroOneThreshold(), s.maxOrder(), s.maxPeriods());
            return new SimulationResult(v.mode(), 0, peak * model.voltageBase(), peak, lyap, k, false, new double[0],
                    new double[0], Double.NaN, spectrum, window, strobeFlux(), strobeVoltage(), newest,
                    evaluations(), v.reason(), event(), section());
        }

        SimulationResult undetermined(String reason) {
            return new SimulationResult(SteadyMode.UNDETERMINED, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    false, new double[0], new double[0], Double.NaN, Spectrum.empty(), Waveform.empty(),
                    strobeFlux(), strobeVoltage(), newest, evaluations(), reason, event(), section());
        }

        private long evaluations() {
            return plain.evaluations() + tangent.evaluations() + map.evaluations();
        }

        /** The event record as far as it was filled. */
        private Waveform event() {
            int n = eventFilled;
            double dt = PerUnitCircuit.PERIOD / s.samplesPerPeriod() / model.omega();
            return toWaveform(Arrays.copyOf(eventX, n), Arrays.copyOf(eventY, n), 0.0, dt);
        }

        /** Stroboscopic samples after the transient (all of them when the run ended in it), at most the last SECTION_LIMIT. */
        private Waveform section() {
            int first = newest > s.transientPeriods() ? s.transientPeriods() + 1 : 0;
            first = Math.max(first, newest + 1 - SimulationResult.SECTION_LIMIT);
            int n = newest + 1 - first;
            double[] t = new double[n];
            for (int j = 0; j < n; j++) {
                t[j] = (first + j) * PerUnitCircuit.PERIOD / model.omega();
            }
            return new Waveform(t, scaled(Arrays.copyOfRange(xs, first, newest + 1), model.fluxBase()),
                    scaled(Arrays.copyOfRange(ys, first, newest + 1), model.voltageBase()));
        }

        private double[] strobeFlux() {
            double[] out = Arrays.copyOf(xs, newest + 1);
            for (int i = 0; i < out.length; i++) {
                out[i] *= model.fluxBase();
            }
            return out;
        }

        private double[] strobeVoltage() {
            double[] out = Arrays.copyOf(ys, newest + 1);
            for (int i = 0; i < out.length; i++) {
                out[i] *= model.voltageBase();
            }
            return out;
        }

        private Waveform toWaveform(double[] wx, double[] wy, double startTime, double step) {
            int n = wx.length;
            double[] t = new double[n];
            double[] f = new double[n];
            double[] v = new double[n];
            for (int j = 0; j < n; j++) {
                t[j] = startTime + j * step;
                f[j] = wx[j] * model.fluxBase();
                v[j] = wy[j] * model.voltageBase();
            }
            return new Waveform(t, f, v);
        }
    }

    private static double[] scaled(double[] v, double factor) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] * factor;
        }
        return out;
    }

    /**
     * Largest |sample| refined by a parabola through the largest sample and its neighbours
     * (cyclic for a periodic record): the peak of a smooth wave between samples.
     */
    static double refinedPeak(double[] w) {
        int n = w.length;
        int best = 0;
        for (int j = 1; j < n; j++) {
            if (Math.abs(w[j]) > Math.abs(w[best])) {
                best = j;
            }
        }
        double ym = Math.abs(w[(best - 1 + n) % n]);
        double y0 = Math.abs(w[best]);
        double yp = Math.abs(w[(best + 1) % n]);
        double den = ym - 2 * y0 + yp;
        if (den < 0) {
            double shift = 0.5 * (ym - yp) / den;
            if (Math.abs(shift) <= 1) {
                return y0 - 0.25 * (ym - yp) * shift;
            }
        }
        return y0;
    }

    static int nextPowerOfTwo(int v) {
        int p = Integer.highestOneBit(Math.max(1, v));
        return p == v ? p : 2 * p;
    }

    static double wrap(double a) {
        double r = Math.IEEEremainder(a, 2 * Math.PI);
        return r <= -Math.PI ? r + 2 * Math.PI : r;
    }
}
