package org.ferromap.orbits;

import org.ferromap.continuation.ContinuationSettings;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Settings of the continuation of periodic orbits. Immutable; change with the {@code withX} copies.
 *
 * @param continuation the pseudo-arclength engine's settings (steps in its scaled variables, the
 *        parameter window in the parameter's units); default {@link ContinuationSettings#DEFAULTS}
 *        with at most 400 steps and a largest step of 0.2 (orbit branches bend sharply near
 *        resonance)
 * @param shooting integration and Newton settings of the shooting; default {@link ShootingSettings#DEFAULTS}
 * @param locateTolerance accuracy of a located bifurcation, relative to the parameter's size;
 *        default 1e-10
 */
public record OrbitContinuationSettings(ContinuationSettings continuation, ShootingSettings shooting, double locateTolerance) {

    /** The documented defaults. */
    public static final OrbitContinuationSettings DEFAULTS = new OrbitContinuationSettings(
            ContinuationSettings.DEFAULTS.withMaxSteps(400).withSteps(0.01, 1e-8, 0.2), ShootingSettings.DEFAULTS, 1e-10);

    public OrbitContinuationSettings {
        if (continuation == null || shooting == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "continuation and shooting settings must be given");
        }
        if (!(locateTolerance > 0 && locateTolerance < 1e-2)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "locate tolerance = " + locateTolerance
                    + " is not allowed; expected a value in (0, 0.01)");
        }
    }

    public OrbitContinuationSettings withContinuation(ContinuationSettings v) {
        return new OrbitContinuationSettings(v, shooting, locateTolerance);
    }

    public OrbitContinuationSettings withShooting(ShootingSettings v) {
        return new OrbitContinuationSettings(continuation, v, locateTolerance);
    }

    public OrbitContinuationSettings withLocateTolerance(double v) {
        return new OrbitContinuationSettings(continuation, shooting, v);
    }

    /** A copy with the parameter window [min, max], units of the parameter. */
    public OrbitContinuationSettings withWindow(double min, double max) {
        return new OrbitContinuationSettings(continuation.withWindow(min, max), shooting, locateTolerance);
    }
}
