package org.ferromap.orbits;

import java.util.Optional;
import org.ferromap.dynamics.DormandPrince853;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Finds periodic orbits as fixed points of a return map ({@link Section}: P^k or the half-period
 * map) by Newton's method, with the monodromy from the variational equations as the Jacobian
 * (M - I), and reports the Floquet multipliers with two accuracy figures: Liouville's identity
 * and the change of the multipliers under a 100 times tighter tolerance.
 *
 * <p>Not thread-safe: it owns integrator work areas. One instance per thread.
 */
public final class Shooting {

    private final ShootingSettings settings;
    private PeriodMap map;
    private PeriodMap tightMap;
    private String lastFailure = "";

    public Shooting(ShootingSettings settings) {
        if (settings == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "shooting settings must be given");
        }
        this.settings = settings;
    }

    public ShootingSettings settings() {
        return settings;
    }

    /** Why the last {@link #trySolve} returned empty, in words. */
    public String lastFailure() {
        return lastFailure;
    }

    /**
     * Solves S(z) = z from a seed.
     *
     * @param sys the system
     * @param seed state on the section near the orbit, system units (not modified)
     * @param section P^k or the half-period map
     * @return the orbit with the least period found
     * @throws FerromapException NO_CONVERGENCE or INTEGRATION_FAILED when Newton fails, saying why
     */
    public Orbit solve(PeriodicSystem sys, double[] seed, Section section) {
        Optional<Orbit> o = trySolve(sys, seed, section);
        if (o.isEmpty()) {
            MessageKey key = lastFailure.startsWith("integration") ? MessageKey.INTEGRATION_FAILED : MessageKey.NO_CONVERGENCE;
            throw new FerromapException(key, "no periodic orbit of " + section + " from the seed "
                    + java.util.Arrays.toString(seed) + ": " + lastFailure);
        }
        return o.get();
    }

    /** As {@link #solve}, but empty on failure ({@link #lastFailure()} says why). */
    public Optional<Orbit> trySolve(PeriodicSystem sys, double[] seed, Section section) {
        int n = sys.dimension();
        if (seed.length != n) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "seed has " + seed.length + " components; the system has " + n);
        }
        double[] z = seed.clone();
        int iterations = newton(sys, section, z);
        if (iterations < 0) {
            return Optional.empty();
        }
        return Optional.ofNullable(finish(sys, section, z, iterations));
    }

    /**
     * Newton on S(z) - z in place. Returns the iteration count, or -1 on failure (reason in
     * {@link #lastFailure}).
     */
    int newton(PeriodicSystem sys, Section section, double[] z) {
        int n = sys.dimension();
        PeriodMap m = map(n);
        double[] image = new double[n];
        double[] jac = new double[n * n];
        double[] rhs = new double[n];
        for (int it = 0; it <= settings.maxIterations(); it++) {
            DormandPrince853.Status status = section.apply(m, sys, z, image, jac);
            if (status != DormandPrince853.Status.OK) {
                lastFailure = "integration failed: " + status.explanation();
                return -1;
            }
            for (int i = 0; i < n; i++) {
                rhs[i] = -(image[i] - z[i]);
            }
            double r = SmallLinear.norm(rhs, n);
            if (!Double.isFinite(r)) {
                lastFailure = "integration failed: the state became infinite or NaN";
                return -1;
            }
            if (r <= settings.newtonTolerance() * (1 + SmallLinear.norm(z, n))) {
                return it;
            }
            if (it == settings.maxIterations()) {
                break;
            }
            for (int i = 0; i < n; i++) {
                jac[i * n + i] -= 1.0;
            }
            if (!SmallLinear.solve(jac, rhs, n)) {
                lastFailure = "M - I is singular (a multiplier at +1) at " + java.util.Arrays.toString(z);
                return -1;
            }
            double step = SmallLinear.norm(rhs, n);
            double f = step > settings.maxNewtonStep() ? settings.maxNewtonStep() / step : 1.0;
            for (int i = 0; i < n; i++) {
                z[i] += f * rhs[i];
            }
        }
        lastFailure = "Newton did not converge in " + settings.maxIterations() + " iterations";
        return -1;
    }

    /** Least period, monodromy, multipliers and accuracy figures at a converged state. */
    private Orbit finish(PeriodicSystem sys, Section section, double[] z, int iterations) {
        int n = sys.dimension();
        PeriodMap m = map(n);
        double[] image = new double[n];
        Section s = section;
        if (!section.half()) {
            int k = section.periods();
            double[] p = z.clone();
            double tol = 10 * settings.newtonTolerance() * (1 + SmallLinear.norm(z, n));
            for (int j = 1; j < k; j++) {
                if (m.apply(sys, p, 1, p, null) != DormandPrince853.Status.OK) {
                    lastFailure = "integration failed while checking the least period";
                    return null;
                }
                if (k % j == 0 && distance(p, z, n) <= tol) {
                    s = Section.periods(j);
                    break;
                }
            }
        }
        double[] jac = new double[n * n];
        if (s.apply(m, sys, z, image, jac) != DormandPrince853.Status.OK) {
            lastFailure = "integration failed at the converged orbit";
            return null;
        }
        double residual = distance(image, z, n);
        double traceHalfOrFull = m.traceIntegral();
        FloquetMultipliers sectionMu = FloquetMultipliers.of(jac, n);
        double[] monodromy = s.half() ? SmallLinear.multiply(jac, jac, n) : jac;
        double trace = s.half() ? 2 * traceHalfOrFull : traceHalfOrFull;
        FloquetMultipliers mu = s.half() ? sectionMu.squared() : sectionMu;
        double expected = Math.exp(trace);
        double liouville = Math.abs(SmallLinear.determinant(monodromy, n) - expected) / expected;
        double change = Double.NaN;
        if (settings.checkAccuracy()) {
            double[] tightJac = new double[n * n];
            if (s.apply(tightMap(n), sys, z, image, tightJac) == DormandPrince853.Status.OK) {
                FloquetMultipliers t = FloquetMultipliers.of(tightJac, n);
                change = (s.half() ? t.squared() : t).distance(mu);
            }
        }
        return new Orbit(z, s.orbitPeriod(), s.half(), monodromy, mu, sectionMu, residual, trace, liouville, change,
                iterations);
    }

    /** The work area at the settings' tolerance, for callers in this package. */
    PeriodMap map(int n) {
        if (map == null || map.dimension() != n) {
            map = new PeriodMap(n, settings.tolerance(), settings.maxStepsPerPeriod());
        }
        return map;
    }

    private PeriodMap tightMap(int n) {
        if (tightMap == null || tightMap.dimension() != n) {
            tightMap = new PeriodMap(n, Math.max(1e-14, settings.tolerance() * 0.01), settings.maxStepsPerPeriod());
        }
        return tightMap;
    }

    static double distance(double[] a, double[] b, int n) {
        double s = 0;
        for (int i = 0; i < n; i++) {
            double d = a[i] - b[i];
            s += d * d;
        }
        return Math.sqrt(s);
    }
}
