package org.ferromap.maps;

import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;

/**
 * A metal-oxide surge arrester as a power-law conductance, i = I_ref (v / V_ref)^alpha with the
 * sign of v (DOMAIN.md §7 [cp]), and its rated energy. Immutable; change with the {@code withX}
 * copies.
 *
 * @param ratedVoltage     rated (duty-cycle) voltage Ur, V rms, &gt; 0; required
 * @param referenceVoltage V_ref, the peak voltage at which the arrester conducts I_ref, V;
 *                         default sqrt(2) Ur (see {@link #REFERENCE_VOLTAGE_SOURCE})
 * @param referenceCurrent I_ref, A; default 1 mA (see {@link #REFERENCE_CURRENT_SOURCE})
 * @param alpha            nonlinearity exponent; default 30, inside the 20 to 50 of DOMAIN.md §7 [cp]
 * @param energyRating     rated energy per volt of Ur, J/V (numerically kJ/kV), from the arrester's
 *                         data; NaN when not given (then the energy is reported without a verdict)
 */
public record ArresterModel(double ratedVoltage, double referenceVoltage, double referenceCurrent, double alpha,
                            double energyRating) {

    /** Default exponent, inside the 20 to 50 range [cp, DOMAIN.md §7]. */
    public static final double DEFAULT_ALPHA = 30;
    /** Default reference current, A. */
    public static final double DEFAULT_REFERENCE_CURRENT = 1e-3;
    /** Where the default reference current comes from. */
    public static final String REFERENCE_CURRENT_SOURCE =
            "1 mA [cp, from memory: the usual reference current of distribution-class arresters; take it from the datasheet]";
    /** Where the default reference voltage comes from. */
    public static final String REFERENCE_VOLTAGE_SOURCE =
            "sqrt(2) Ur [cp, from memory: the reference voltage sits near the peak of the rated voltage; take it from the datasheet]";
    /** Where the default exponent comes from. */
    public static final String ALPHA_SOURCE = "alpha = 30 [cp: DOMAIN.md §7 gives 20 to 50]";

    public ArresterModel {
        positive("arrester rated voltage", ratedVoltage, "V rms");
        positive("arrester reference voltage", referenceVoltage, "V peak");
        positive("arrester reference current", referenceCurrent, "A");
        if (!(alpha >= 2 && alpha <= 100)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "arrester exponent alpha = " + alpha
                    + " is not allowed; expected 2 to 100 (metal-oxide arresters: about 20 to 50)");
        }
        if (!Double.isNaN(energyRating) && !(energyRating > 0 && Double.isFinite(energyRating))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "arrester energy rating = " + energyRating
                    + " kJ/kV is not allowed; expected a value > 0 from the arrester's data");
        }
    }

    /** An arrester of rated voltage Ur (V rms) with the documented defaults and no energy rating. */
    public static ArresterModel ofRating(double ratedVoltage) {
        return new ArresterModel(ratedVoltage, Constants.SQRT2 * ratedVoltage, DEFAULT_REFERENCE_CURRENT, DEFAULT_ALPHA,
                Double.NaN);
    }

    public ArresterModel withReferenceVoltage(double v) {
        return new ArresterModel(ratedVoltage, v, referenceCurrent, alpha, energyRating);
    }

    public ArresterModel withReferenceCurrent(double a) {
        return new ArresterModel(ratedVoltage, referenceVoltage, a, alpha, energyRating);
    }

    public ArresterModel withAlpha(double a) {
        return new ArresterModel(ratedVoltage, referenceVoltage, referenceCurrent, a, energyRating);
    }

    /** A copy with an energy rating in kJ per kV of Ur (equal to J/V). */
    public ArresterModel withEnergyRating(double kilojoulesPerKilovolt) {
        return new ArresterModel(ratedVoltage, referenceVoltage, referenceCurrent, alpha, kilojoulesPerKilovolt);
    }

    /**
     * The arrester's current at voltage v, A (odd in v). The voltage ratio is capped at
     * {@link #RATIO_CAP} so that an integrator's trial step far outside the physical range gives a
     * large finite current (and a rejected step) rather than infinity.
     */
    public double current(double v) {
        double r = Math.min(Math.abs(v) / referenceVoltage, RATIO_CAP);
        return Math.copySign(referenceCurrent * Math.pow(r, alpha), v);
    }

    /** Largest voltage ratio v / V_ref evaluated: 4 x V_ref drives 1e18 A at alpha = 30, far beyond any arrester. */
    public static final double RATIO_CAP = 4.0;

    /** Rated energy capability, J (NaN when no rating was given). */
    public double capability() {
        return energyRating * ratedVoltage;
    }

    private static final Pattern PER_KV = Pattern.compile("^\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*kJ\\s*/\\s*kV\\s*$");

    /** Parses an energy rating written "4.5 kJ/kV" (energy per kV of rated voltage); kJ/kV, BAD_QUANTITY otherwise. */
    public static double parseEnergyRating(String text) {
        Matcher m = text == null ? null : PER_KV.matcher(text);
        if (m == null || !m.matches()) {
            throw new FerromapException(MessageKey.BAD_QUANTITY, "'" + text
                    + "' is not an energy rating; write it per kV of the arrester's rated voltage, e.g. 4.5 kJ/kV");
        }
        return Double.parseDouble(m.group(1));
    }

    private static void positive(String what, double v, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, what + " = " + v + " " + unit + " is not allowed; expected > 0");
        }
    }
}
