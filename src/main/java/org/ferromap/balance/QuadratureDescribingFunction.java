package org.ferromap.balance;

import java.util.Arrays;
import org.ferromap.equipment.SaturationCurve;

/**
 * Describing function of a general curve: value from the curve, slope by adaptive Gauss-Kronrod
 * quadrature over the quarter period, split where Lambda cos t crosses one of the curve's
 * {@link SaturationCurve#kinks() kinks} (piecewise-linear and tabulated breakpoints, also seen
 * through scaled and composite curves), so each panel has a smooth integrand.
 */
final class QuadratureDescribingFunction implements DescribingFunction {

    /** Relative accuracy of the slope (the error estimate of the 7-15 pair is pessimistic, so the result is usually far better); the curve's own value is accurate to 1e-10 relative. */
    private static final double RELATIVE_TOLERANCE = 1e-11;

    private final SaturationCurve curve;
    /** Positive breakpoint fluxes, ascending, Wb-turn; empty for smooth curves. */
    private final double[] breakpoints;

    QuadratureDescribingFunction(SaturationCurve curve) {
        this(curve, curve.kinks());
    }

    /** With the given split fluxes (Wb-turn, any order, signs ignored); an empty array gives the unsplit quadrature. */
    QuadratureDescribingFunction(SaturationCurve curve, double[] splits) {
        this.curve = curve;
        double[] b = new double[splits.length];
        for (int k = 0; k < b.length; k++) {
            b[k] = Math.abs(splits[k]);
        }
        Arrays.sort(b);
        this.breakpoints = b;
    }

    @Override
    public double value(double amplitude) {
        return amplitude == 0 ? 0.0 : curve.fundamentalCurrent(amplitude);
    }

    @Override
    public double slope(double amplitude) {
        if (amplitude == 0) {
            return curve.currentSlope(0.0);
        }
        final double amp = Math.abs(amplitude);
        double total = 0;
        double lo = 0;   // panels in t, from t = 0 (peak flux) towards pi/2 (zero flux)
        for (int k = breakpoints.length - 1; k >= 0; k--) {
            if (breakpoints[k] < amp) {
                double t = Math.acos(breakpoints[k] / amp);
                total += panel(amp, lo, t);
                lo = t;
            }
        }
        total += panel(amp, lo, 0.5 * Math.PI);
        return 4.0 / Math.PI * total;
    }

    private double panel(double amp, double t0, double t1) {
        if (t1 <= t0) {
            return 0.0;
        }
        return GaussKronrod.integrate(t -> {
            double c = Math.cos(t);
            return curve.currentSlope(amp * c) * c * c;
        }, t0, t1, RELATIVE_TOLERANCE, 0.0);
    }

    @Override
    public SaturationCurve curve() {
        return curve;
    }
}
