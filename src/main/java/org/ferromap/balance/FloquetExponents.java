package org.ferromap.balance;

/**
 * Stability of a periodic steady state: its two Floquet exponents (the state is flux and
 * voltage), defined up to multiples of i w, and the multipliers exp(sigma T), T = 2 pi / w.
 *
 * @param real real parts of the exponents, 1/s
 * @param imaginary imaginary parts, principal representatives in [-w/2, w/2], rad/s
 * @param multiplierReal real parts of the multipliers
 * @param multiplierImaginary imaginary parts of the multipliers
 * @param stable whether both real parts are negative (beyond round-off); with zero loss a
 *        neutrally stable orbit is reported not stable
 * @param liouvilleMismatch distance, 1/s, between the second exponent implied by Liouville (the
 *        sum of the exponents equals the mean trace, -G/C) and the nearest Hill eigenvalue (mod i w):
 *        a measure of truncation error
 * @param truncation harmonics K of the Hill matrix actually used (one less after a retry)
 */
public record FloquetExponents(double[] real, double[] imaginary, double[] multiplierReal, double[] multiplierImaginary,
                               boolean stable, double liouvilleMismatch, int truncation) {

    public FloquetExponents {
        real = real.clone();
        imaginary = imaginary.clone();
        multiplierReal = multiplierReal.clone();
        multiplierImaginary = multiplierImaginary.clone();
    }

    @Override
    public double[] real() {
        return real.clone();
    }

    @Override
    public double[] imaginary() {
        return imaginary.clone();
    }

    @Override
    public double[] multiplierReal() {
        return multiplierReal.clone();
    }

    @Override
    public double[] multiplierImaginary() {
        return multiplierImaginary.clone();
    }

    /** Largest multiplier modulus: below 1 stable. */
    public double largestMultiplier() {
        return Math.max(Math.hypot(multiplierReal[0], multiplierImaginary[0]), Math.hypot(multiplierReal[1], multiplierImaginary[1]));
    }
}
