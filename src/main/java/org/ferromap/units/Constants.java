package org.ferromap.units;

/** Physical constants and numeric shorthands, SI, each with its source. */
public final class Constants {

    private Constants() {
    }

    /**
     * Vacuum magnetic permeability mu0, H/m. Since the SI revision of 2019 it is measured, not
     * defined; value CODATA 2018 recommended, 1.25663706212(19)e-6 [pub: CODATA 2018, NIST].
     */
    public static final double MU0 = 1.25663706212e-6;

    /**
     * Vacuum electric permittivity eps0, F/m, CODATA 2018 recommended 8.8541878128(13)e-12
     * [pub: CODATA 2018, NIST]; consistent with 1/(mu0 c^2), c exact by definition (SI 2019).
     */
    public static final double EPS0 = 8.8541878128e-12;

    /** Speed of light in vacuum, m/s, exact by definition of the metre [pub: SI brochure, 9th ed., 2019]. */
    public static final double SPEED_OF_LIGHT = 299_792_458.0;

    /** sqrt(2): peak over rms of a sinusoid. */
    public static final double SQRT2 = Math.sqrt(2.0);

    /** sqrt(3): line over phase voltage of a balanced three-phase set. */
    public static final double SQRT3 = Math.sqrt(3.0);

    /** Angular frequency, rad/s, of a frequency in Hz. */
    public static double omega(double hertz) {
        return 2.0 * Math.PI * hertz;
    }
}
