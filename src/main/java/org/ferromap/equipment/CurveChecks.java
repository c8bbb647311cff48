package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Construction-time checks shared by the curve classes, so that every curve words the same
 * failure the same way: the index (counting from 0, as in the arrays), the value, the unit and
 * what is allowed.
 */
final class CurveChecks {

    private CurveChecks() { }

    /** A finite, strictly positive scalar; OUT_OF_RANGE otherwise. */
    static double positive(double value, String name, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    name + " = " + value + " " + unit + " must be finite and > 0");
        }
        return value;
    }

    /** An air-core inductance: NaN (meaning "use the default") or finite and positive. */
    static double airCoreOrNaN(double value) {
        if (Double.isNaN(value)) {
            return value;
        }
        return positive(value, "air-core inductance", "H");
    }

    /** Two point arrays of equal, non-zero length, each finite, positive and strictly increasing. */
    static void points(double[] flux, String fluxName, String fluxUnit,
                       double[] current, String currentName, String currentUnit) {
        if (flux == null || current == null) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    (flux == null ? fluxName : currentName) + " points are missing");
        }
        if (flux.length != current.length) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    flux.length + " " + fluxName + " points but " + current.length + " " + currentName
                    + " points; the two lists must have the same length");
        }
        if (flux.length == 0) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "a curve needs at least one point besides the origin");
        }
        increasing(flux, fluxName, fluxUnit);
        increasing(current, currentName, currentUnit);
    }

    /** Finite, positive and strictly increasing values; OUT_OF_RANGE or NOT_MONOTONE otherwise. */
    static void increasing(double[] v, String name, String unit) {
        for (int k = 0; k < v.length; k++) {
            if (!(v[k] > 0) || Double.isInfinite(v[k])) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "point " + k + ": " + name + " " + v[k] + " " + unit + " must be finite and > 0");
            }
            if (k > 0 && !(v[k] > v[k - 1])) {
                throw new FerromapException(MessageKey.NOT_MONOTONE,
                        "point " + k + ": " + name + " " + v[k] + " " + unit + " is not above point " + (k - 1)
                        + "'s " + v[k - 1] + "; points must be strictly increasing");
            }
        }
    }
}
