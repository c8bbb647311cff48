package org.ferromap.balance;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * One parameter a balance is continued in: its name and unit for reports, which values are
 * physical, and how the loop's per-unit coefficients change with it (dF/dp).
 *
 * <p>The circuit-level quantities (the five of {@link CircuitParameter} and the source
 * frequency) have exact rates: they enter the loop only through C, G, Cs E and w. Anything else
 * (cable length, supply voltage, no-load loss: quantities that change the installation, which is
 * then reduced again) is {@link Rate#DIFFERENCED}: its rate is a central difference of the loop
 * coefficients in a step scaled to the parameter's own size.
 *
 * @param name the name reports use, such as "series-capacitance"
 * @param unit SI unit symbol of the values ("V", "F", "ohm", "Hz", "m", "W")
 * @param rate how the rate of the loop coefficients is obtained
 * @param zeroAllowed whether 0 is a physical value (source, shunt capacitance, no-load loss);
 *        otherwise values must be strictly positive
 */
public record BalanceAxis(String name, String unit, Rate rate, boolean zeroAllowed) {

    /** How the loop coefficients change with the parameter. */
    public enum Rate {
        /** Source peak voltage E, V: the forcing is linear in E (negative E is a phase flip). */
        SOURCE,
        /** Series capacitance Cs, F: inertia and forcing. */
        SERIES_CAPACITANCE,
        /** Shunt capacitance Cg, F: inertia. */
        SHUNT_CAPACITANCE,
        /** Core-loss resistance, ohm: damping through G = 1/R. */
        CORE_LOSS_RESISTANCE,
        /** Load resistance, ohm: damping through G = 1/R. */
        LOAD_RESISTANCE,
        /** Source frequency f, Hz: inertia (w^2), damping (w) and forcing (w). */
        FREQUENCY,
        /** Anything else: a difference quotient of the loop coefficients. */
        DIFFERENCED
    }

    public BalanceAxis {
        if (name == null || name.isBlank() || unit == null || rate == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "an axis needs a name, a unit and a rate");
        }
    }

    /** The axis of a standard circuit quantity, with its exact rate. */
    public static BalanceAxis of(CircuitParameter p) {
        Rate r;
        if (p == CircuitParameter.SOURCE) {
            r = Rate.SOURCE;
        } else if (p == CircuitParameter.SERIES_CAPACITANCE) {
            r = Rate.SERIES_CAPACITANCE;
        } else if (p == CircuitParameter.SHUNT_CAPACITANCE) {
            r = Rate.SHUNT_CAPACITANCE;
        } else if (p == CircuitParameter.CORE_LOSS_RESISTANCE) {
            r = Rate.CORE_LOSS_RESISTANCE;
        } else if (p == CircuitParameter.LOAD_RESISTANCE) {
            r = Rate.LOAD_RESISTANCE;
        } else {
            throw new FerromapException(MessageKey.BAD_REQUEST, "no exact rate for the parameter " + p.name()
                    + "; use BalanceAxis.differenced");
        }
        boolean zero = r == Rate.SOURCE || r == Rate.SHUNT_CAPACITANCE;
        return new BalanceAxis(p.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'), p.unit(), r, zero);
    }

    /** The source frequency, Hz, with its exact rate. */
    public static BalanceAxis frequency() {
        return new BalanceAxis("frequency", "Hz", Rate.FREQUENCY, false);
    }

    /** A parameter whose rate is differenced. */
    public static BalanceAxis differenced(String name, String unit, boolean zeroAllowed) {
        return new BalanceAxis(name, unit, Rate.DIFFERENCED, zeroAllowed);
    }

    /** Whether {@code value} (SI) is a physical value of this parameter. */
    public boolean allows(double value) {
        return Double.isFinite(value) && (zeroAllowed ? value >= 0 : value > 0);
    }

    /**
     * Checks a requested range: finite, physical at both ends, not empty.
     *
     * @throws FerromapException BAD_REQUEST naming the values and what is allowed
     */
    public void checkRange(double from, double to) {
        String allowed = zeroAllowed ? ">= 0 " + unit : "> 0 " + unit;
        if (!allows(from) || !allows(to)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, name + " range [" + from + ", " + to + "] " + unit
                    + " crosses a physical limit; both ends must be finite and " + allowed);
        }
        if (from == to) {
            throw new FerromapException(MessageKey.BAD_REQUEST, name + " range is empty (from = to = " + from + " " + unit
                    + "); give two different values");
        }
    }
}
