package org.ferromap.dynamics;

/**
 * A periodic orbit of the scaled circuit found on the stroboscopic map.
 *
 * @param x scaled flux of the fixed point at tau = 0 (mod 2 pi), per unit of lambda_b
 * @param y scaled voltage of the fixed point, per unit of V_b
 * @param period the least k with P^k(z) = z, source periods
 * @param monodromy dP^period/dz at the fixed point, row-major (m00, m01, m10, m11)
 * @param residual |P^period(z) - z| at the returned point, per unit
 */
public record PeriodicOrbit(double x, double y, int period, double[] monodromy, double residual) {

    public PeriodicOrbit {
        monodromy = monodromy.clone();
    }

    /** Real parts of the two Floquet multipliers (eigenvalues of the monodromy matrix). */
    public double[] multiplierReal() {
        double tr = monodromy[0] + monodromy[3];
        double det = determinant();
        double disc = tr * tr / 4 - det;
        if (disc >= 0) {
            double s = Math.sqrt(disc);
            return new double[] {tr / 2 + s, tr / 2 - s};
        }
        return new double[] {tr / 2, tr / 2};
    }

    /** Imaginary parts of the two Floquet multipliers. */
    public double[] multiplierImag() {
        double tr = monodromy[0] + monodromy[3];
        double disc = tr * tr / 4 - determinant();
        if (disc >= 0) {
            return new double[] {0, 0};
        }
        double s = Math.sqrt(-disc);
        return new double[] {s, -s};
    }

    /** Largest modulus of the Floquet multipliers. */
    public double largestModulus() {
        double[] re = multiplierReal();
        double[] im = multiplierImag();
        return Math.max(Math.hypot(re[0], im[0]), Math.hypot(re[1], im[1]));
    }

    /** Determinant of the monodromy matrix. */
    public double determinant() {
        return monodromy[0] * monodromy[3] - monodromy[1] * monodromy[2];
    }

    /** Whether every multiplier lies strictly inside the unit circle. */
    public boolean isStable() {
        return largestModulus() < 1.0;
    }
}
