package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.balance.Fold;
import org.ferromap.balance.HarmonicSettings;
import org.ferromap.balance.MultiHarmonicBalance;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Direction;
import org.ferromap.dynamics.DormandPrince853;
import org.ferromap.dynamics.PerUnitCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Periodic orbits of the single-phase equivalent circuit in SI: seeds, shooting, continuation in a
 * {@link CircuitParameter}, the brute-force sweep, and the JSON records of the contract. The
 * computations run on the per-unit model ({@link CircuitSystem}); states cross this boundary in
 * Wb-turn and V, parameters in their SI units.
 */
public final class CircuitOrbits {

    /** Most branches {@link #explore} traces from one starting orbit (its own and those reached by switching). */
    private static final int MAX_BRANCHES = 12;

    private CircuitOrbits() {
    }

    /** The circuit at each value of a parameter, as a per-unit system. */
    public static DoubleFunction<CircuitSystem> family(EquivalentCircuit base, CircuitParameter parameter) {
        return v -> CircuitSystem.of(parameter.apply(base, v));
    }

    /**
     * A family of circuits as per-unit systems, refusing a member whose per-unit bases (frequency,
     * rated peak) differ from the base's: states in per unit are carried and compared from one
     * value to the next, which needs one scale for all.
     *
     * @throws FerromapException BAD_REQUEST (when a member is built) if the bases differ
     */
    public static DoubleFunction<CircuitSystem> family(DoubleFunction<EquivalentCircuit> circuits, EquivalentCircuit base) {
        double omega = base.omega();
        double ratedPeak = base.ratedPeak();
        return v -> {
            EquivalentCircuit c = circuits.apply(v);
            if (Math.abs(c.omega() - omega) > 1e-12 * omega || Math.abs(c.ratedPeak() - ratedPeak) > 1e-12 * ratedPeak) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "the parameter changes the frequency or the rated voltage "
                        + "(the per-unit bases) at " + v + "; orbits and sweeps need both fixed");
            }
            return CircuitSystem.of(c);
        };
    }

    /**
     * The state at t = 0 of the single-harmonic solution lambda(t) = Lambda cos(omega t + phase):
     * {flux Wb-turn, voltage V} = {Lambda cos(phase), -omega Lambda sin(phase)}.
     *
     * @param circuit the circuit (for omega)
     * @param fluxAmplitude Lambda, Wb-turn
     * @param phase rad
     */
    public static double[] balanceSeed(EquivalentCircuit circuit, double fluxAmplitude, double phase) {
        return new double[] {fluxAmplitude * Math.cos(phase), -circuit.omega() * fluxAmplitude * Math.sin(phase)};
    }

    /**
     * The state after simulating some source periods from an initial state: a seed on an attractor.
     *
     * @param circuit the circuit
     * @param flux initial flux linkage, Wb-turn
     * @param voltage initial voltage, V
     * @param periods source periods to simulate
     * @param tolerance integration tolerance
     * @return {flux Wb-turn, voltage V} at t = periods * T
     * @throws FerromapException INTEGRATION_FAILED when the integration fails
     */
    public static double[] settledState(EquivalentCircuit circuit, double flux, double voltage, int periods, double tolerance) {
        CircuitSystem sys = CircuitSystem.of(circuit);
        double[] z = sys.scaledState(flux, voltage);
        DormandPrince853.Status s = new PeriodMap(2, tolerance, 100_000).advance(sys, z, periods);
        if (s != DormandPrince853.Status.OK) {
            throw new FerromapException(MessageKey.INTEGRATION_FAILED, "simulating " + periods + " periods failed: " + s.explanation());
        }
        return new double[] {sys.flux(z[0]), sys.voltage(z[1])};
    }

    /** Dense-output samples per integrator step when looking for the peaks of an orbit (see {@link #extent}). */
    private static final int PEAK_SAMPLES_PER_STEP = 16;

    /**
     * Follows an orbit over its period: its states at t = jT, those of its mirror image, and its
     * peak flux and voltage. The peaks come from the dense output of the integrator sampled 16 times
     * a step, steps being at most T/64: samples at most 2 pi / 1024 apart in phase, so a crest is
     * caught to within (2 pi / 1024)^2 / 8 = 5e-6 of its height, far below what a chart shows.
     *
     * @param circuit the circuit
     * @param flux flux linkage on the section at t = 0, Wb-turn
     * @param voltage terminal voltage on the section at t = 0, V
     * @param periods the orbit's period k, source periods, 1 to 64
     * @param tolerance integration tolerance (relative, and absolute in per unit)
     * @return the k section states (and the mirror image's) and the peaks
     * @throws FerromapException INTEGRATION_FAILED when the integration fails
     */
    public static OrbitExtent extent(EquivalentCircuit circuit, double flux, double voltage, int periods, double tolerance) {
        if (periods < 1 || periods > 64) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "period k = " + periods + " is not allowed; expected 1 to 64");
        }
        CircuitSystem sys = CircuitSystem.of(circuit);
        double[] z = sys.scaledState(flux, voltage);
        double[] fx = new double[periods];
        double[] vx = new double[periods];
        double[] peak = {Math.abs(z[0]), Math.abs(z[1])};
        double[] tmp = new double[2];
        DormandPrince853 dp = DormandPrince853.uniform(2, tolerance, tolerance, 1e-12, PerUnitCircuit.PERIOD / 64);
        DormandPrince853.Rhs rhs = sys::derivatives;
        DormandPrince853.StepListener listener = (t0, t1) -> {
            for (int i = 1; i <= PEAK_SAMPLES_PER_STEP; i++) {
                dp.interpolate(t0 + (t1 - t0) * i / PEAK_SAMPLES_PER_STEP, tmp);
                peak[0] = Math.max(peak[0], Math.abs(tmp[0]));
                peak[1] = Math.max(peak[1], Math.abs(tmp[1]));
            }
        };
        double[] mfx = new double[periods];
        double[] mvx = new double[periods];
        double half = 0.5 * PerUnitCircuit.PERIOD;
        for (int j = 0; j < periods; j++) {
            fx[j] = sys.flux(z[0]);
            vx[j] = sys.voltage(z[1]);
            for (int h = 0; h < 2; h++) {
                double t0 = j * PerUnitCircuit.PERIOD + h * half;
                DormandPrince853.Status s = dp.integrate(rhs, t0, z, t0 + half, 100_000, listener);
                if (s != DormandPrince853.Status.OK) {
                    throw new FerromapException(MessageKey.INTEGRATION_FAILED, "following the orbit over period " + (j + 1)
                            + " failed: " + s.explanation());
                }
                if (h == 0) {
                    mfx[j] = -sys.flux(z[0]);
                    mvx[j] = -sys.voltage(z[1]);
                }
            }
        }
        return new OrbitExtent(fx, vx, mfx, mvx, sys.flux(peak[0]), sys.voltage(peak[1]));
    }

    /**
     * Finds the orbit of a return map from a seed in SI.
     *
     * @throws FerromapException NO_CONVERGENCE or INTEGRATION_FAILED when shooting fails
     */
    public static Orbit find(EquivalentCircuit circuit, double flux, double voltage, Section section, ShootingSettings settings) {
        CircuitSystem sys = CircuitSystem.of(circuit);
        return new Shooting(settings).solve(sys, sys.scaledState(flux, voltage), section);
    }

    /** An orbit as a contract record in SI. */
    public static OrbitPoint point(EquivalentCircuit circuit, double parameter, Orbit orbit) {
        CircuitSystem sys = CircuitSystem.of(circuit);
        return new OrbitPoint(parameter, orbit.period(), sys.flux(orbit.state(0)), sys.voltage(orbit.state(1)),
                orbit.multipliers().pairs(), orbit.stable());
    }

    /**
     * Continues the orbit through a seed in a circuit parameter.
     *
     * @param base the circuit; the parameter's start value is the one it holds
     * @param parameter what to vary
     * @param flux seed flux on the section, Wb-turn
     * @param voltage seed voltage on the section, V
     * @param section P^k, or the half-period map for symmetric orbits
     * @param direction which way the parameter goes first
     * @param settings continuation settings (the window in the parameter's SI unit)
     */
    public static OrbitBranch continueOrbit(EquivalentCircuit base, CircuitParameter parameter, double flux, double voltage,
            Section section, Direction direction, OrbitContinuationSettings settings) {
        DoubleFunction<CircuitSystem> family = family(base, parameter);
        double p0 = parameter.valueOf(base);
        return new OrbitContinuation(settings).trace(family, family.apply(p0).scaledState(flux, voltage), p0, section, direction);
    }

    /**
     * Explores the orbits of a circuit over a parameter window: settles from each initial state at
     * the base value, identifies the orbit (symmetric on the half-period map, else the least k
     * &lt;= maxPeriod), continues it both ways, and switches at every period doubling and
     * symmetry-breaking pitchfork while the period stays &lt;= maxPeriod. Same as
     * {@link #explore(DoubleFunction, double, List, int, int, OrbitContinuationSettings)} with the
     * family {@code v -> parameter.apply(base, v)} started at the base's value and periods 1 to maxPeriod.
     *
     * @param base the circuit; the parameter's value in it is the start, inside the window
     * @param parameter what to vary
     * @param initialStates {flux Wb-turn, voltage V} pairs to settle from
     * @param maxPeriod largest period followed, 1 to 8
     * @param settings continuation settings with the window in the parameter's SI unit
     * @return the branches traced, in the order traced
     */
    public static List<OrbitBranch> explore(EquivalentCircuit base, CircuitParameter parameter, List<double[]> initialStates,
            int maxPeriod, OrbitContinuationSettings settings) {
        return explore(v -> parameter.apply(base, v), parameter.valueOf(base), initialStates, 1, maxPeriod, settings);
    }

    /**
     * Explores the orbits of a family of circuits, one per value of a parameter that may be any
     * function of the value (an equipment-level quantity such as a cable length, re-reduced for each
     * value). The orbits continued start from two kinds of seed at {@code start}:
     * <ul>
     * <li>the initial states, each simulated 300 source periods; the orbit through the settled state
     * is identified (the half-period map first when minPeriod = 1, then P^k for k = minPeriod..maxPeriod,
     * the first whose least period lies in that range and which passes within 5 % of the settled
     * state; failing that, the first orbit of such a period that shooting reaches from it, which is
     * how unstable orbits inside a torus or a chaotic set are found).</li>
     * </ul>
     * Each new orbit is continued both ways (one way when the branch closes), and at every period
     * doubling and symmetry-breaking pitchfork the new branch is followed while its period stays
     * &lt;= maxPeriod. An orbit already met (any of its k states on the section, or those of its
     * mirror image x(t) -&gt; -x(t + T/2), which has the same multipliers and bifurcations, equal
     * to a start already made or lying on a branch of its period already traced) is not continued
     * again, and a bifurcation already switched at is not switched at again.
     *
     * @param circuits the circuit at each parameter value, SI; the frequency and rated peak (the
     *        per-unit bases) must not depend on the value
     * @param start the value at which the initial states settle, inside the window
     * @param initialStates {flux Wb-turn, voltage V} pairs to settle from
     * @param minPeriod least period of the orbits started from, 1 to maxPeriod
     * @param maxPeriod largest period followed, minPeriod to 8
     * @param settings continuation settings with the window in the parameter's SI unit
     * @return the branches traced, in the order traced
     * @throws FerromapException OUT_OF_RANGE for periods outside 1..8; BAD_REQUEST when the family
     *         changes the per-unit bases
     */
    public static List<OrbitBranch> explore(DoubleFunction<EquivalentCircuit> circuits, double start, List<double[]> initialStates,
            int minPeriod, int maxPeriod, OrbitContinuationSettings settings) {
        if (maxPeriod < 1 || maxPeriod > 8) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "largest period = " + maxPeriod + " is not allowed; expected 1 to 8");
        }
        if (minPeriod < 1 || minPeriod > maxPeriod) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "least period = " + minPeriod + " is not allowed; expected 1 to "
                    + maxPeriod);
        }
        EquivalentCircuit base = circuits.apply(start);
        DoubleFunction<CircuitSystem> family = family(circuits, base);
        CircuitSystem sys = family.apply(start);
        Shooting shooting = new Shooting(settings.shooting().withCheckAccuracy(false));
        Explorer ex = new Explorer(new OrbitContinuation(settings), family, maxPeriod, settings);
        if (minPeriod == 1) {
            // Harmonic-balance seeds at the start and at both ends of the window: the normal state may
            // exist only at one end and the ferroresonant one only at the other.
            List<Double> at = new ArrayList<>(List.of(start));
            for (double edge : new double[] {settings.continuation().pMin(), settings.continuation().pMax()}) {
                if (Double.isFinite(edge) && edge != start) {
                    at.add(edge);
                }
            }
            for (double p : at) {
                CircuitSystem sp = family.apply(p);
                for (double[] seed : balanceSeeds(circuits.apply(p))) {
                    shooting.trySolve(sp, sp.scaledState(seed[0], seed[1]), Section.halfPeriod())
                            .filter(o -> o.period() == 1).ifPresent(o -> ex.start(sp, o, p));
                }
            }
        }
        for (double[] init : initialStates) {
            double[] settled = settledState(base, init[0], init[1], 300, settings.shooting().tolerance());
            double[] z = sys.scaledState(settled[0], settled[1]);
            identify(shooting, sys, z, minPeriod, maxPeriod).ifPresent(o -> ex.start(sys, o, start));
        }
        return ex.branches;
    }

    /**
     * Section states (t = 0) of the harmonic-balance steady states of a circuit, SI: each
     * single-harmonic state refined by the multi-harmonic balance (nine odd harmonics: near the
     * exact orbit even on a steep curve, where the single-harmonic state is too far for Newton),
     * or the single-harmonic state itself when the refinement fails. None when the balance has none.
     */
    private static List<double[]> balanceSeeds(EquivalentCircuit c) {
        List<double[]> out = new ArrayList<>();
        List<OperatingPoint> points;
        try {
            points = new SingleHarmonicBalance().operatingPoints(c);
        } catch (FerromapException e) {
            return out; // no single-harmonic states (an undriven loop, a curve that never balances): settled states only
        }
        MultiHarmonicBalance multi = new MultiHarmonicBalance(c, HarmonicSettings.DEFAULTS);
        double fluxBase = c.ratedPeak() / c.omega();
        for (OperatingPoint op : points) {
            if (!(op.flux() > 0)) {
                continue;
            }
            try {
                double[] x = multi.solve(multi.seed(op)).perUnit();
                out.add(new double[] {multi.basis().evaluate(x, 0, 0) * fluxBase, multi.basis().evaluate(x, 0, 1) * c.ratedPeak()});
            } catch (FerromapException e) {
                // lambda = Lambda cos(w t + phi + voltagePhase - pi): the balance package's convention (MultiHarmonicBalance.seed)
                out.add(balanceSeed(c, op.flux(), c.sourceAngle() + op.voltagePhase() - Math.PI));
            }
        }
        return out;
    }

    /** The continuations of one exploration, with what has been met so far. Not thread-safe. */
    private static final class Explorer {
        private final OrbitContinuation oc;
        private final DoubleFunction<CircuitSystem> family;
        private final int maxPeriod;
        private final PeriodMap map;
        private final double pScale;
        private final List<OrbitBranch> branches = new ArrayList<>();
        /** {parameter, state...} of the orbits met: starts (all their states and mirrors) and branch ends. */
        private final List<double[]> seen = new ArrayList<>();
        private final List<LocatedBifurcation> switched = new ArrayList<>();
        private int firstOfStart;

        Explorer(OrbitContinuation oc, DoubleFunction<CircuitSystem> family, int maxPeriod, OrbitContinuationSettings settings) {
            this.oc = oc;
            this.family = family;
            this.maxPeriod = maxPeriod;
            this.map = new PeriodMap(2, settings.shooting().tolerance(), settings.shooting().maxStepsPerPeriod());
            double lo = settings.continuation().pMin();
            double hi = settings.continuation().pMax();
            this.pScale = Double.isFinite(hi - lo) ? hi - lo : 1.0;
        }

        /** Continues an orbit found at p0 unless it, or its mirror image, was met before. */
        void start(CircuitSystem sys, Orbit o, double p0) {
            List<double[]> states = states(sys, o);
            for (double[] z : states) {
                if (isSeen(p0, z) || onBranch(p0, z, o.period())) {
                    return;
                }
            }
            for (double[] z : states) {
                seen.add(new double[] {p0, z[0], z[1]});
            }
            firstOfStart = branches.size();
            Section s = o.symmetric() ? Section.halfPeriod() : Section.periods(o.period());
            for (Direction d : Direction.values()) {
                OrbitBranch b = oc.trace(family, o.state(), p0, s, d);
                add(b);
                switchAll(b);
                if (b.stopReason().equals("BRANCH_CLOSED") || b.stopReason().equals("START_FAILED")) {
                    break; // the other way round is the same loop, or starts from the same failed correction
                }
            }
        }

        /** Keeps a branch and remembers its end points (where later seeds at the window's ends meet it). */
        private void add(OrbitBranch b) {
            if (b.size() == 1 && b.stopReason().equals("WINDOW_LEFT")) {
                return; // started on the window's edge going out: its one point is the start of the other way
            }
            branches.add(b);
            if (b.size() > 0) {
                for (int i : new int[] {0, b.size() - 1}) {
                    seen.add(new double[] {b.parameter(i), b.state(i, 0), b.state(i, 1)});
                }
            }
        }

        /** Whether a state at p was met: the same parameter (to 1e-7 of the window), the same state (to 1e-5, per unit). */
        private boolean isSeen(double p, double[] z) {
            for (double[] e : seen) {
                if (Math.abs(e[0] - p) <= 1e-7 * pScale
                        && Math.hypot(e[1] - z[0], e[2] - z[1]) < 1e-5 * (1 + SmallLinear.norm(z, 2))) {
                    return true;
                }
            }
            return false;
        }

        /**
         * Whether a state at p lies on a branch of orbits of the same period already traced: within a
         * tenth of the segment between the two branch points around p (a chord strays from a branch
         * turning by at most the engine's largest tangent angle, 0.3 rad, by about 0.04 of its
         * length), or 1e-5 per unit.
         */
        private boolean onBranch(double p, double[] z, int period) {
            double floor = 1e-5 * (1 + SmallLinear.norm(z, 2));
            for (OrbitBranch b : branches) {
                if (b.period() != period) {
                    continue;
                }
                for (int i = 0; i + 1 < b.size(); i++) {
                    double p0 = b.parameter(i);
                    double p1 = b.parameter(i + 1);
                    if ((p - p0) * (p - p1) > 0 || p0 == p1) {
                        continue;
                    }
                    double t = (p - p0) / (p1 - p0);
                    double x = b.state(i, 0) + t * (b.state(i + 1, 0) - b.state(i, 0));
                    double y = b.state(i, 1) + t * (b.state(i + 1, 1) - b.state(i, 1));
                    double seg = Math.hypot(b.state(i + 1, 0) - b.state(i, 0), b.state(i + 1, 1) - b.state(i, 1));
                    if (Math.hypot(z[0] - x, z[1] - y) <= 0.1 * seg + floor) {
                        return true;
                    }
                }
            }
            return false;
        }

        /** The orbit's states on the section (z, P z, ..., P^(k-1) z) and those of its mirror image Q(z). */
        private List<double[]> states(CircuitSystem sys, Orbit o) {
            List<double[]> out = new ArrayList<>();
            double[] z = o.state();
            double[] m = new double[2];
            boolean mirror = !o.symmetric() && map.applyHalf(sys, z, m, null) == DormandPrince853.Status.OK;
            for (int j = 0; j < o.period(); j++) {
                out.add(z.clone());
                if (mirror) {
                    out.add(m.clone());
                }
                if (j + 1 < o.period() && (map.apply(sys, z, 1, z, null) != DormandPrince853.Status.OK
                        || mirror && map.apply(sys, m, 1, m, null) != DormandPrince853.Status.OK)) {
                    break;
                }
            }
            return out;
        }

        private void switchAll(OrbitBranch b) {
            for (LocatedBifurcation at : b.bifurcations()) {
                if (branches.size() - firstOfStart >= MAX_BRANCHES) {
                    return;
                }
                boolean doubling = at.type() == BifurcationType.PERIOD_DOUBLING && 2 * at.period() <= maxPeriod;
                boolean pitchfork = at.type() == BifurcationType.PITCHFORK && at.section().half();
                if (!doubling && !pitchfork || wasSwitched(at)) {
                    continue;
                }
                switched.add(at);
                Optional<OrbitBranch> next = oc.switchBranch(family, at);
                if (next.isPresent() && next.get().size() > 0) {
                    add(next.get());
                    switchAll(next.get());
                }
            }
        }

        /** A bifurcation of the same type and period at the same parameter (to 1e-7 of the window) was switched at already. */
        private boolean wasSwitched(LocatedBifurcation at) {
            for (LocatedBifurcation s : switched) {
                if (s.type() == at.type() && s.period() == at.period() && Math.abs(s.parameter() - at.parameter()) <= 1e-7 * pScale) {
                    return true;
                }
            }
            return false;
        }
    }

    /** The orbit through a settled state (see {@link #explore(DoubleFunction, double, List, int, int, OrbitContinuationSettings)}). */
    private static Optional<Orbit> identify(Shooting shooting, CircuitSystem sys, double[] z, int minPeriod, int maxPeriod) {
        List<Section> sections = new ArrayList<>();
        if (minPeriod == 1) {
            sections.add(Section.halfPeriod());
        }
        for (int k = minPeriod; k <= maxPeriod; k++) {
            sections.add(Section.periods(k));
        }
        double near = 0.05 * (1 + SmallLinear.norm(z, 2));
        Optional<Orbit> fallback = Optional.empty();
        for (Section section : sections) {
            Optional<Orbit> o = shooting.trySolve(sys, z, section)
                    .filter(x -> x.period() >= minPeriod && x.period() <= maxPeriod);
            if (o.isEmpty()) {
                continue;
            }
            if (Shooting.distance(o.get().state(), z, 2) < near) {
                return o;
            }
            if (fallback.isEmpty() && !section.half()) {
                fallback = o;
            }
        }
        return fallback;
    }

    /**
     * The folds in source peak located three ways for one circuit: single-harmonic balance,
     * multi-harmonic balance (balance package) and the exact periodic orbits, one comparison per
     * single-harmonic fold, each matched with the nearest fold of the other two methods.
     *
     * @param circuit the circuit
     * @param exactBranches orbit branches continued in {@link CircuitParameter#SOURCE} (for
     *        instance from {@link #explore}); their folds are the exact ones
     * @param harmonics harmonic-balance settings; null skips the multi-harmonic column (NaN)
     * @return one comparison per single-harmonic fold, in the balance's order (jump-up first)
     */
    public static List<FoldComparison> compareFolds(EquivalentCircuit circuit, List<OrbitBranch> exactBranches,
            HarmonicSettings harmonics) {
        SingleHarmonicBalance single = new SingleHarmonicBalance();
        List<Fold> sh = single.folds(circuit);
        List<Fold> mh = harmonics == null ? List.of() : new MultiHarmonicBalance(circuit, harmonics).folds(single);
        List<FoldComparison> out = new ArrayList<>();
        for (Fold f : sh) {
            double e = f.sourcePeak();
            double multi = Double.NaN;
            for (Fold m : mh) {
                if (Double.isNaN(multi) || Math.abs(m.sourcePeak() - e) < Math.abs(multi - e)) {
                    multi = m.sourcePeak();
                }
            }
            out.add(FoldComparison.of(CircuitParameter.SOURCE, e, multi, FoldComparison.nearestExactFold(exactBranches, e)));
        }
        return out;
    }

    /** Branches as the contract's {@code orbits} object, in SI. */
    public static OrbitsReport report(EquivalentCircuit base, CircuitParameter parameter, List<OrbitBranch> branches) {
        return report(base, parameter.name(), parameter.unit(), branches);
    }

    /**
     * Branches as the contract's {@code orbits} object, in SI, for a parameter given by name.
     *
     * @param base a circuit of the family (for the per-unit bases)
     * @param parameter the parameter's name
     * @param unit its SI unit
     */
    public static OrbitsReport report(EquivalentCircuit base, String parameter, String unit, List<OrbitBranch> branches) {
        List<OrbitPoint> points = new ArrayList<>();
        List<OrbitBifurcation> bifurcations = new ArrayList<>();
        CircuitSystem sys = CircuitSystem.of(base);
        for (OrbitBranch b : branches) {
            for (int i = 0; i < b.size(); i++) {
                FloquetMultipliers mu = b.multipliers().get(i);
                points.add(new OrbitPoint(b.parameter(i), b.period(), sys.flux(b.state(i, 0)), sys.voltage(b.state(i, 1)),
                        mu.pairs(), mu.stable()));
            }
            for (LocatedBifurcation at : b.bifurcations()) {
                bifurcations.add(at.toRecord());
            }
        }
        return new OrbitsReport(parameter, unit, points, bifurcations);
    }

    /**
     * The brute-force diagram in a circuit parameter.
     *
     * @param base the circuit
     * @param parameter what to vary
     * @param values strictly increasing values, SI
     * @param initialStates {flux Wb-turn, voltage V} pairs
     * @param settings sweep settings
     * @return the runs (states in per unit of the circuit's bases: use {@link #sweepReport} for SI)
     */
    public static List<SweepRun> sweep(EquivalentCircuit base, CircuitParameter parameter, double[] values,
            List<double[]> initialStates, SweepSettings settings) {
        CircuitSystem sys = CircuitSystem.of(base);
        List<double[]> scaled = new ArrayList<>();
        for (double[] s : initialStates) {
            scaled.add(sys.scaledState(s[0], s[1]));
        }
        return BruteForceSweep.sweep(family(base, parameter), values, scaled, settings);
    }

    /**
     * The brute-force diagram over a family of circuits, one per value of a parameter that may be
     * any function of the value (see {@link #family(DoubleFunction, EquivalentCircuit)}).
     *
     * @param circuits the circuit at each value, SI; frequency and rated peak must not depend on it
     * @param values strictly increasing values, SI
     * @param initialStates {flux Wb-turn, voltage V} pairs
     * @param settings sweep settings
     * @return the runs (states in per unit of the circuits' bases: use {@link #sweepReport} for SI)
     */
    public static List<SweepRun> sweep(DoubleFunction<EquivalentCircuit> circuits, double[] values, List<double[]> initialStates,
            SweepSettings settings) {
        if (values == null || values.length == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the sweep needs at least one parameter value");
        }
        EquivalentCircuit base = circuits.apply(values[0]);
        CircuitSystem sys = CircuitSystem.of(base);
        List<double[]> scaled = new ArrayList<>();
        for (double[] s : initialStates) {
            scaled.add(sys.scaledState(s[0], s[1]));
        }
        return BruteForceSweep.sweep(family(circuits, base), values, scaled, settings);
    }

    /** Sweep runs as the contract's {@code sweep} object, in SI; failed values are left out. */
    public static SweepReport sweepReport(EquivalentCircuit base, CircuitParameter parameter, List<SweepRun> runs) {
        return sweepReport(base, parameter.name(), parameter.unit(), runs);
    }

    /**
     * Sweep runs as the contract's {@code sweep} object, in SI, for a parameter given by name;
     * failed values are left out.
     *
     * @param base a circuit of the family (for the per-unit bases)
     * @param parameter the parameter's name
     * @param unit its SI unit
     */
    public static SweepReport sweepReport(EquivalentCircuit base, String parameter, String unit, List<SweepRun> runs) {
        CircuitSystem sys = CircuitSystem.of(base);
        List<SweepSample> samples = new ArrayList<>();
        for (SweepRun r : runs) {
            for (int i = 0; i < r.parameters().length; i++) {
                for (double[] z : r.samples()[i]) {
                    if (Double.isFinite(z[0]) && Double.isFinite(z[1])) {
                        samples.add(new SweepSample(r.parameters()[i], sys.flux(z[0]), sys.voltage(z[1])));
                    }
                }
            }
        }
        return new SweepReport(parameter, unit, samples);
    }
}
