package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.DoubleFunction;
import org.ferromap.continuation.Branch;
import org.ferromap.continuation.BranchTracer;
import org.ferromap.continuation.Direction;
import org.ferromap.continuation.StabilityCriterion;
import org.ferromap.dynamics.DormandPrince853;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Continuation of periodic orbits in one parameter: the shooting residual S(z; p) - z handed to the
 * generic pseudo-arclength engine ({@link BranchTracer}), the Floquet multipliers at every point,
 * and the bifurcations between points (fold, period doubling, torus, pitchfork) located by
 * {@link BifurcationLocator}. At a located period doubling or symmetry-breaking pitchfork,
 * {@link #switchBranch} starts the new branch (period 2k, or the asymmetric period-1 orbits) and
 * checks that it did not fall back onto the old orbit.
 *
 * <p>Not thread-safe (it owns the integrator work areas): one instance per thread.
 */
public final class OrbitContinuation {

    private final OrbitContinuationSettings settings;
    private final Shooting shooting;
    private String lastFailure = "";

    public OrbitContinuation(OrbitContinuationSettings settings) {
        if (settings == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "orbit continuation settings must be given");
        }
        this.settings = settings;
        this.shooting = new Shooting(settings.shooting());
    }

    public OrbitContinuationSettings settings() {
        return settings;
    }

    /** Why the last {@link #switchBranch} came back empty, in words. */
    public String lastFailure() {
        return lastFailure;
    }

    /**
     * Traces the branch of fixed points of {@code section} through (z0, p0).
     *
     * @param family the system at each parameter value
     * @param z0 state on the section near an orbit at p0, system units (corrected first)
     * @param p0 start parameter, inside the settings' window
     * @param section P^k or the half-period map
     * @param direction which way p goes at the start
     * @return the branch; a start that does not converge gives an empty branch with the reason
     */
    public OrbitBranch trace(DoubleFunction<? extends PeriodicSystem> family, double[] z0, double p0, Section section,
            Direction direction) {
        int n = family.apply(p0).dimension();
        if (z0.length != n) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "start state has " + z0.length + " components; the system has " + n);
        }
        double pTypical = Math.abs(p0) > 0 ? Math.abs(p0) : 1.0;
        // Correct the start by shooting first: the engine's corrector is a plain Newton without step
        // limits, the shooting one is damped.
        double[] start = z0.clone();
        if (shooting.newton(family.apply(p0), section, start) < 0) {
            return new OrbitBranch(section, section.orbitPeriod(), new double[0], new double[0][], List.of(), List.of(),
                    "START_FAILED", "no orbit of " + section + " near the start at p = " + p0 + ": " + shooting.lastFailure());
        }
        ShootingProblem problem = new ShootingProblem(family, section, shooting.map(n), pTypical);
        StabilityCriterion unstable = (x, p, dFdx) -> {
            double[] m = new double[n * n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    m[i * n + j] = dFdx[i][j] + (i == j ? 1.0 : 0.0);
                }
            }
            return FloquetMultipliers.of(m, n).unstableCount();
        };
        Branch branch = new BranchTracer(settings.continuation(), unstable).trace(problem, start, p0, direction);
        return assemble(family, section, branch, n);
    }

    private DoubleFunction<? extends PeriodicSystem> currentFamily;

    private PeriodicSystem familyOf(double p) {
        return currentFamily.apply(p);
    }

    private OrbitBranch assemble(DoubleFunction<? extends PeriodicSystem> family, Section section, Branch branch, int n) {
        currentFamily = family;
        double pScale = branch.pScale();
        double size = 0;
        for (double p : branch.p()) {
            size = Math.max(size, Math.abs(p));
        }
        BifurcationLocator locator = new BifurcationLocator(shooting, family, section, pScale, n,
                settings.locateTolerance() * Math.max(1.0, size / pScale));
        List<BifurcationLocator.Sample> samples = new ArrayList<>();
        List<FloquetMultipliers> mus = new ArrayList<>();
        double[][] x = branch.x();
        double[] tp = branch.tangentP();
        double[] ps = branch.p();
        int count = branch.size();
        String stop = branch.stopReason().name();
        String detail = branch.stopDetail();
        // A branch of period k > 1 ends where it meets an orbit of a divisor period (at the doubling
        // it was born from, or another one): past it the engine would follow the old orbit, which is
        // also a fixed point of P^k.
        int lower = lowerPeriodIndex(family, section, x, ps, n);
        if (lower > 0) {
            count = lower + 1;
            stop = "LOWER_PERIOD";
            detail = "the branch meets an orbit of lower period at p = " + ps[lower];
            x = java.util.Arrays.copyOf(x, count);
            ps = java.util.Arrays.copyOf(ps, count);
        }
        for (int i = 0; i < count; i++) {
            BifurcationLocator.Sample s = locator.sample(x[i], ps[i], Math.signum(tp[i]));
            samples.add(s);
            FloquetMultipliers mu = s == null ? new FloquetMultipliers(nan(n), nan(n)) : s.multipliers();
            mus.add(section.half() ? mu.squared() : mu);
        }
        List<LocatedBifurcation> found = new ArrayList<>(locator.scan(samples));
        addEvenCrossings(branch, section, count, n, found);
        return new OrbitBranch(section, section.orbitPeriod(), ps, x, mus, found, stop, detail);
    }

    /**
     * Adds the engine's folds and branch points that the multiplier test functions cannot see
     * because a multiplier touches +1 without crossing: the tip of a pitchfork seen from the
     * asymmetric orbits (both halves of the parabola have the same multipliers) and simple branch
     * points. A genuine fold has an odd crossing and is already found; these are pitchforks.
     */
    private void addEvenCrossings(Branch branch, Section section, int count, int n, List<LocatedBifurcation> found) {
        for (org.ferromap.continuation.SpecialPoint sp : branch.specialPoints()) {
            if (sp.afterIndex() >= count - 1) {
                continue;
            }
            double p = sp.p();
            boolean known = false;
            for (LocatedBifurcation b : found) {
                if (Math.abs(b.parameter() - p) <= 1e-6 * Math.max(Math.abs(p), branch.pScale())
                        && Math.abs(b.afterIndex() - sp.afterIndex()) <= 1) {
                    known = true;
                }
            }
            if (known) {
                continue;
            }
            double[] jac = new double[n * n];
            double[] image = new double[n];
            FloquetMultipliers mu;
            try {
                PeriodicSystem sys = familyOf(p);
                if (sys == null || section.apply(shooting.map(n), sys, sp.x(), image, jac) != DormandPrince853.Status.OK) {
                    continue;
                }
                mu = FloquetMultipliers.of(jac, n);
            } catch (FerromapException e) {
                continue;
            }
            int best = 0;
            for (int j = 1; j < n; j++) {
                if (Math.hypot(mu.re()[j] - 1, mu.im()[j]) < Math.hypot(mu.re()[best] - 1, mu.im()[best])) {
                    best = j;
                }
            }
            if (Math.hypot(mu.re()[best] - 1, mu.im()[best]) > 1e-4) {
                continue; // not a multiplier +1: a turning point of another kind is not ours to report
            }
            found.add(new LocatedBifurcation(BifurcationType.PITCHFORK, p, section.orbitPeriod(), section, sp.x(), mu,
                    new double[] {mu.re()[best], mu.im()[best]}, sp.afterIndex(), sp.located()));
        }
        found.sort((a, b) -> Integer.compare(a.afterIndex(), b.afterIndex()));
    }

    /** Index of the first point after the start whose least period is below k, or -1. */
    private int lowerPeriodIndex(DoubleFunction<? extends PeriodicSystem> family, Section section, double[][] x, double[] p,
            int n) {
        int k = section.periods();
        if (section.half() || k == 1) {
            return -1;
        }
        PeriodMap map = shooting.map(n);
        double[] z = new double[n];
        for (int i = 1; i < x.length; i++) {
            System.arraycopy(x[i], 0, z, 0, n);
            PeriodicSystem sys = family.apply(p[i]);
            double tol = 100 * settings.shooting().newtonTolerance() * (1 + SmallLinear.norm(x[i], n));
            for (int j = 1; j < k; j++) {
                if (map.apply(sys, z, 1, z, null) != DormandPrince853.Status.OK) {
                    break;
                }
                if (k % j == 0 && Shooting.distance(z, x[i], n) <= tol) {
                    return i;
                }
            }
        }
        return -1;
    }

    /**
     * Starts the branch born at a period doubling (orbits of twice the period) or a symmetry-breaking
     * pitchfork on the half-period map (asymmetric orbits of period 1, fixed points of P), and traces
     * it away from the bifurcation. The seed is the old orbit displaced along the critical
     * eigenvector (multiplier -1), tried at small parameter offsets on both sides; a converged seed
     * is accepted only when its least period is the new one and it is not the old orbit (for the
     * pitchfork: not symmetric).
     *
     * @param family the system at each parameter value
     * @param at a located period doubling or half-map pitchfork
     * @return the new branch, or empty when no seed converged ({@link #lastFailure()} says why)
     */
    public Optional<OrbitBranch> switchBranch(DoubleFunction<? extends PeriodicSystem> family, LocatedBifurcation at) {
        Section old = at.section();
        Section target;
        if (at.type() == BifurcationType.PERIOD_DOUBLING && !old.half()) {
            target = Section.periods(2 * old.periods());
        } else if (at.type() == BifurcationType.PITCHFORK && old.half()) {
            target = Section.periods(1);
        } else {
            lastFailure = "branch switching is done at period doublings and at pitchforks of the half-period map, not at a "
                    + at.type().label() + " of " + old;
            return Optional.empty();
        }
        int n = at.state().length;
        PeriodMap map = shooting.map(n);
        double[] jac = new double[n * n];
        double[] image = new double[n];
        if (old.apply(map, family.apply(at.parameter()), at.state(), image, jac) != DormandPrince853.Status.OK) {
            lastFailure = "integration failed at the bifurcation";
            return Optional.empty();
        }
        double[] v = eigenvector(jac, n, -1.0);
        if (v == null) {
            lastFailure = "no eigenvector for the multiplier -1";
            return Optional.empty();
        }
        double zSize = 1 + SmallLinear.norm(at.state(), n);
        double pSize = Math.abs(at.parameter()) > 0 ? Math.abs(at.parameter()) : 1.0;
        double tol = settings.shooting().newtonTolerance();
        for (double offset : new double[] {1e-4, 1e-3, 1e-2}) {
            for (int side : new int[] {1, -1}) {
                double p1 = at.parameter() + side * offset * pSize;
                if (p1 < settings.continuation().pMin() || p1 > settings.continuation().pMax()) {
                    continue;
                }
                PeriodicSystem sys = family.apply(p1);
                double[] base = at.state();
                if (shooting.newton(sys, old, base) < 0) {
                    continue;
                }
                for (double amplitude : new double[] {1e-2, 3e-2, 1e-1, 3e-1}) {
                    for (int sign : new int[] {1, -1}) {
                        double[] seed = new double[n];
                        for (int i = 0; i < n; i++) {
                            seed[i] = base[i] + sign * amplitude * zSize * v[i];
                        }
                        Optional<Orbit> o = shooting.trySolve(sys, seed, target);
                        if (o.isEmpty() || o.get().period() != target.orbitPeriod()) {
                            continue;
                        }
                        double[] z = o.get().state();
                        if (Shooting.distance(z, base, n) <= 1e3 * tol * zSize) {
                            continue; // fell back onto the old orbit
                        }
                        if (old.half()) {
                            if (old.apply(map, sys, z, image, null) != DormandPrince853.Status.OK
                                    || Shooting.distance(image, z, n) <= 1e3 * tol * zSize) {
                                continue; // a symmetric orbit, not one of the asymmetric pair
                            }
                        }
                        return Optional.of(trace(family, z, p1, target, side > 0 ? Direction.INCREASING : Direction.DECREASING));
                    }
                }
            }
        }
        lastFailure = "no orbit of " + target + " found next to the " + at.type().label() + " at p = " + at.parameter();
        return Optional.empty();
    }

    /** A real unit eigenvector of the row-major matrix m for the real eigenvalue nearest mu, by inverse iteration. */
    static double[] eigenvector(double[] m, int n, double mu) {
        FloquetMultipliers ev = FloquetMultipliers.of(m, n);
        int best = 0;
        for (int j = 1; j < n; j++) {
            if (Math.hypot(ev.re()[j] - mu, ev.im()[j]) < Math.hypot(ev.re()[best] - mu, ev.im()[best])) {
                best = j;
            }
        }
        double shift = ev.re()[best] + 1e-9 * (1 + Math.abs(ev.re()[best]));
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = 1.0 / Math.sqrt(n) * (1 + 0.1 * i);
        }
        for (int it = 0; it < 4; it++) {
            double[] a = new double[n * n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    a[i * n + j] = m[i * n + j] - (i == j ? shift : 0.0);
                }
            }
            if (!SmallLinear.solve(a, v, n)) {
                return null;
            }
            double norm = SmallLinear.norm(v, n);
            if (!(norm > 0) || !Double.isFinite(norm)) {
                return null;
            }
            for (int i = 0; i < n; i++) {
                v[i] /= norm;
            }
        }
        return v;
    }

    private static double[] nan(int n) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, Double.NaN);
        return a;
    }
}
