package org.ferromap.orbits;

import org.ferromap.dynamics.DormandPrince853;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Which return map a periodic orbit is a fixed point of: P^k (k forcing periods) or, for
 * half-period symmetric systems, the half-period map Q(z) = -P_{T/2}(z) whose fixed points are
 * the symmetric period-1 orbits.
 *
 * @param periods k, forcing periods of P^k, 1 to 64; 1 for the half-period map
 * @param half whether this is the half-period map Q
 */
public record Section(int periods, boolean half) {

    public Section {
        if (periods < 1 || periods > 64) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "period k = " + periods + " is not allowed; expected 1 to 64 source periods");
        }
        if (half && periods != 1) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the half-period map describes period-1 orbits only, not k = " + periods);
        }
    }

    /** P^k. */
    public static Section periods(int k) {
        return new Section(k, false);
    }

    /** The half-period map Q. */
    public static Section halfPeriod() {
        return new Section(1, true);
    }

    /** The orbit's period in forcing periods (1 for the half map: Q^2 = P). */
    public int orbitPeriod() {
        return periods;
    }

    /** Applies the map with its Jacobian (or without, when {@code jac} is null). */
    DormandPrince853.Status apply(PeriodMap map, PeriodicSystem sys, double[] z, double[] image, double[] jac) {
        if (half) {
            if (!sys.halfPeriodSymmetric()) {
                throw new FerromapException(MessageKey.BAD_REQUEST,
                        "the half-period map needs a half-period symmetric system (odd curve, pure sine source)");
            }
            return map.applyHalf(sys, z, image, jac);
        }
        return map.apply(sys, z, periods, image, jac);
    }

    @Override
    public String toString() {
        return half ? "half-period map" : "P^" + periods;
    }
}
