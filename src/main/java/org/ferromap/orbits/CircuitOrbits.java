package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.balance.Fold;
import org.ferromap.balance.HarmonicSettings;
import org.ferromap.balance.MultiHarmonicBalance;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Direction;
import org.ferromap.dynamics.DormandPrince853;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Periodic orbits of the single-phase equivalent circuit in SI: seeds, shooting, continuation in a
 * {@link CircuitParameter}, the brute-force sweep, and the JSON records of the contract. The
 * computations run on the per-unit model ({@link CircuitSystem}); states cross this boundary in
 * Wb-turn and V, parameters in their SI units.
 */
public final class CircuitOrbits {

    /** Longest chain of branch switches {@link #explore} follows from one orbit. */
    private static final int MAX_BRANCHES = 12;

    private CircuitOrbits() {
    }

    /** The circuit at each value of a parameter, as a per-unit system. */
    public static DoubleFunction<CircuitSystem> family(EquivalentCircuit base, CircuitParameter parameter) {
        return v -> CircuitSystem.of(parameter.apply(base, v));
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
     * symmetry-breaking pitchfork while the period stays &lt;= maxPeriod.
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
        if (maxPeriod < 1 || maxPeriod > 8) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "largest period = " + maxPeriod + " is not allowed; expected 1 to 8");
        }
        DoubleFunction<CircuitSystem> family = family(base, parameter);
        double p0 = parameter.valueOf(base);
        CircuitSystem sys = family.apply(p0);
        OrbitContinuation oc = new OrbitContinuation(settings);
        Shooting shooting = new Shooting(settings.shooting().withCheckAccuracy(false));
        List<OrbitBranch> branches = new ArrayList<>();
        List<double[]> seen = new ArrayList<>();
        for (double[] init : initialStates) {
            double[] settled = settledState(base, init[0], init[1], 300, settings.shooting().tolerance());
            double[] z = sys.scaledState(settled[0], settled[1]);
            Optional<Orbit> orbit = shooting.trySolve(sys, z, Section.halfPeriod())
                    .filter(o -> Shooting.distance(o.state(), z, 2) < 0.05 * (1 + SmallLinear.norm(z, 2)));
            Section section = Section.halfPeriod();
            for (int k = 1; orbit.isEmpty() && k <= maxPeriod; k++) {
                section = Section.periods(k);
                orbit = shooting.trySolve(sys, z, section);
            }
            if (orbit.isEmpty() || isSeen(seen, orbit.get().state())) {
                continue;
            }
            Orbit o = orbit.get();
            seen.add(o.state());
            Section s = o.symmetric() ? Section.halfPeriod() : Section.periods(o.period());
            for (Direction d : Direction.values()) {
                OrbitBranch b = oc.trace(family, o.state(), p0, s, d);
                branches.add(b);
                switchAll(oc, family, b, maxPeriod, branches);
            }
        }
        return branches;
    }

    private static void switchAll(OrbitContinuation oc, DoubleFunction<CircuitSystem> family, OrbitBranch b, int maxPeriod,
            List<OrbitBranch> out) {
        for (LocatedBifurcation at : b.bifurcations()) {
            if (out.size() >= MAX_BRANCHES) {
                return;
            }
            boolean doubling = at.type() == BifurcationType.PERIOD_DOUBLING && 2 * at.period() <= maxPeriod;
            boolean pitchfork = at.type() == BifurcationType.PITCHFORK && at.section().half();
            if (!doubling && !pitchfork) {
                continue;
            }
            Optional<OrbitBranch> next = oc.switchBranch(family, at);
            if (next.isPresent() && next.get().size() > 0) {
                out.add(next.get());
                switchAll(oc, family, next.get(), maxPeriod, out);
            }
        }
    }

    private static boolean isSeen(List<double[]> seen, double[] z) {
        for (double[] s : seen) {
            if (Shooting.distance(s, z, 2) < 1e-6 * (1 + SmallLinear.norm(z, 2))) {
                return true;
            }
        }
        return false;
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
        return new OrbitsReport(parameter.name(), parameter.unit(), points, bifurcations);
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

    /** Sweep runs as the contract's {@code sweep} object, in SI; failed values are left out. */
    public static SweepReport sweepReport(EquivalentCircuit base, CircuitParameter parameter, List<SweepRun> runs) {
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
        return new SweepReport(parameter.name(), parameter.unit(), samples);
    }
}
