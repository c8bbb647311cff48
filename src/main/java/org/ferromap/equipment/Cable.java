package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;

/**
 * The capacitances per length of a three-phase cable run (one screened single-core cable per
 * phase, or one belted three-core cable). Its series impedance is neglected: the open-phase
 * loop is a capacitive one at power frequency.
 *
 * @param kind screened (no core-to-core capacitance) or belted
 * @param coreToSheath C'cs, capacitance of one core to the sheath (ground), F/m, &gt; 0
 * @param coreToCore C'cc, capacitance between two cores, F/m: 0 for screened, &gt; 0 for belted
 * @param origin how the values were obtained, for reports
 */
public record Cable(Kind kind, double coreToSheath, double coreToCore, String origin) {

    /** Cable construction. */
    public enum Kind {
        /** Screened single-core cables (or a three-core cable with each core screened): r = 0. */
        SCREENED,
        /** Belted three-core cable: the cores see each other, r = C'cc / C'cs &gt; 0. */
        BELTED
    }

    public Cable {
        if (kind == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "a cable needs its kind (screened or belted)");
        }
        if (!(coreToSheath > 0) || Double.isInfinite(coreToSheath)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "core-to-sheath capacitance = " + coreToSheath
                    + " F/m is not allowed; expected a finite value > 0");
        }
        if (kind == Kind.SCREENED && coreToCore != 0) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "a screened cable has no core-to-core capacitance (got "
                    + coreToCore + " F/m); use a belted cable");
        }
        if (kind == Kind.BELTED && (!(coreToCore > 0) || Double.isInfinite(coreToCore))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "core-to-core capacitance = " + coreToCore
                    + " F/m is not allowed for a belted cable; expected a finite value > 0");
        }
        origin = origin == null ? "" : origin;
    }

    /** Screened single-core cable with a known capacitance per length, F/m. */
    public static Cable screened(double capacitancePerMetre) {
        return new Cable(Kind.SCREENED, capacitancePerMetre, 0.0, "given capacitance");
    }

    /**
     * Screened single-core cable from its insulation: the coaxial formula C' = 2 pi eps0 eps_r /
     * ln(D_i / d_c) [mem: IEC 60287-1-1] (in practical units about eps_r / (18 ln(D_i/d_c)) uF/km;
     * the exact constant 2 pi eps0 is used here).
     *
     * @param insulation material
     * @param conductorScreenDiameter d_c, over the conductor screen, m
     * @param insulationDiameter D_i, over the insulation, m, &gt; d_c
     */
    public static Cable screened(Insulation insulation, double conductorScreenDiameter, double insulationDiameter) {
        double c = coaxialCapacitance(insulation.permittivity(), conductorScreenDiameter, insulationDiameter);
        return new Cable(Kind.SCREENED, c, 0.0, String.format("%s, d_c %.4g mm, D_i %.4g mm, coaxial formula (IEC 60287-1-1)",
                insulation.studyName(), conductorScreenDiameter * 1e3, insulationDiameter * 1e3));
    }

    /** Belted three-core cable with known C'cs and C'cc, F/m. */
    public static Cable belted(double coreToSheath, double coreToCore) {
        return new Cable(Kind.BELTED, coreToSheath, coreToCore, "given capacitances");
    }

    /**
     * Belted three-core cable from two measurements per length (DOMAIN.md §5 [der]):
     * C1, one core against the other two and the sheath (= C'cs + 2 C'cc), and C2, the three cores
     * bunched against the sheath (= 3 C'cs). So C'cs = C2/3 and C'cc = (C1 - C2/3)/2.
     *
     * @param c1 F/m
     * @param c2 F/m, with C2/3 &lt; C1
     */
    public static Cable beltedFromMeasurements(double c1, double c2) {
        if (!(c1 > 0) || !(c2 > 0) || !(c1 > c2 / 3.0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "belted-cable measurements C1 = " + c1 + " F/m, C2 = "
                    + c2 + " F/m are not consistent; expected both > 0 and C1 > C2/3 (C1 = C'cs + 2 C'cc, C2 = 3 C'cs)");
        }
        return new Cable(Kind.BELTED, c2 / 3.0, (c1 - c2 / 3.0) / 2.0, "from measurements C1 and C2");
    }

    /**
     * Coaxial capacitance per length, F/m: 2 pi eps0 eps_r / ln(D_i / d_c) [mem: IEC 60287-1-1].
     *
     * @param relativePermittivity eps_r &gt;= 1
     * @param conductorScreenDiameter d_c, m, &gt; 0
     * @param insulationDiameter D_i, m, &gt; d_c
     */
    public static double coaxialCapacitance(double relativePermittivity, double conductorScreenDiameter, double insulationDiameter) {
        if (!(relativePermittivity >= 1) || Double.isInfinite(relativePermittivity)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "relative permittivity = " + relativePermittivity
                    + " is not allowed; expected a finite value >= 1");
        }
        if (!(conductorScreenDiameter > 0) || !(insulationDiameter > conductorScreenDiameter)
                || Double.isInfinite(insulationDiameter)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "diameters d_c = " + conductorScreenDiameter
                    + " m, D_i = " + insulationDiameter + " m are not allowed; expected 0 < d_c < D_i");
        }
        return 2.0 * Math.PI * Constants.EPS0 * relativePermittivity / Math.log(insulationDiameter / conductorScreenDiameter);
    }

    /** r = C'cc / C'cs, dimensionless (0 for screened cable). */
    public double ratio() {
        return coreToCore / coreToSheath;
    }

    /** Positive-sequence (operating) capacitance per length C'cs + 3 C'cc, F/m (DOMAIN.md §5 [der]). */
    public double operatingCapacitance() {
        return coreToSheath + 3.0 * coreToCore;
    }
}
