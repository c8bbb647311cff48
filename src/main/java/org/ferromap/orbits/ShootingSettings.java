package org.ferromap.orbits;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * How to find periodic orbits by shooting. Immutable; change with the {@code withX} copies.
 *
 * @param tolerance relative tolerance of the integration of state and variations, also the
 *        absolute one in the system's units (per unit for the circuit); default 1e-11
 * @param newtonTolerance Newton stops when |P^k(z) - z| &lt;= newtonTolerance * (1 + |z|), system
 *        units; default 1e-9 (a hundred times the integration tolerance: the map's own error over a
 *        few periods sits well below it)
 * @param maxIterations Newton iterations before giving up; default 30
 * @param maxNewtonStep largest Newton update, system units (per unit for the circuit); longer
 *        updates are shortened to it; default 0.5
 * @param maxStepsPerPeriod integrator steps per forcing period beyond which the map fails; default 100000
 * @param checkAccuracy whether to recompute the multipliers with a tolerance 100 times tighter and
 *        report the change (one more integration per orbit); default true
 */
public record ShootingSettings(double tolerance, double newtonTolerance, int maxIterations, double maxNewtonStep,
        int maxStepsPerPeriod, boolean checkAccuracy) {

    /** The documented defaults. */
    public static final ShootingSettings DEFAULTS = new ShootingSettings(1e-11, 1e-9, 30, 0.5, 100_000, true);

    public ShootingSettings {
        check(tolerance >= 1e-14 && tolerance <= 1e-4, "integration tolerance", tolerance, "in [1e-14, 1e-4]");
        check(newtonTolerance > 0 && newtonTolerance < 1, "Newton tolerance", newtonTolerance, "in (0, 1)");
        check(maxIterations >= 1 && maxIterations <= 1000, "Newton iterations", maxIterations, "in [1, 1000]");
        check(maxNewtonStep > 0 && Double.isFinite(maxNewtonStep), "largest Newton step", maxNewtonStep, "finite and > 0");
        check(maxStepsPerPeriod >= 10, "steps per period", maxStepsPerPeriod, ">= 10");
    }

    public ShootingSettings withTolerance(double integration, double newton) {
        return new ShootingSettings(integration, newton, maxIterations, maxNewtonStep, maxStepsPerPeriod, checkAccuracy);
    }

    public ShootingSettings withMaxIterations(int v) {
        return new ShootingSettings(tolerance, newtonTolerance, v, maxNewtonStep, maxStepsPerPeriod, checkAccuracy);
    }

    public ShootingSettings withMaxNewtonStep(double v) {
        return new ShootingSettings(tolerance, newtonTolerance, maxIterations, v, maxStepsPerPeriod, checkAccuracy);
    }

    public ShootingSettings withMaxStepsPerPeriod(int v) {
        return new ShootingSettings(tolerance, newtonTolerance, maxIterations, maxNewtonStep, v, checkAccuracy);
    }

    public ShootingSettings withCheckAccuracy(boolean v) {
        return new ShootingSettings(tolerance, newtonTolerance, maxIterations, maxNewtonStep, maxStepsPerPeriod, v);
    }

    private static void check(boolean ok, String what, double v, String allowed) {
        if (!ok) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, what + " = " + v + " is not allowed; expected " + allowed);
        }
    }
}
