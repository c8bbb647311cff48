package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Converts rms open-circuit test data to a peak lambda-i curve by the point-by-point method
 * (DOMAIN.md §2, from memory: Neves and Dommel, IEEE Trans. Power Systems 8(2), 1993).
 *
 * <p>Each test point k gives the peak flux lambda_k = sqrt(2) V_k / omega of a sinusoidal voltage.
 * The curve is taken odd and piecewise linear through the points found so far; with
 * lambda = lambda_k sin(theta), the measured rms magnetizing current satisfies
 * I_k^2 = (2/pi) * integral over 0..pi/2 of i(lambda_k sin theta)^2 dtheta. Only the slope s of the
 * newest segment is unknown, and the integral is quadratic in it:
 * (pi/2) I_k^2 = K + i_(k-1)^2 U0 + 2 i_(k-1) U1 s + U2 s^2, with K the part over the known segments
 * and U_j the integrals of u^j, u = lambda_k sin(theta) - lambda_(k-1), over the newest one. The
 * pieces are integrated by 20-point Gauss-Legendre, exact to round-off for these trigonometric
 * polynomials of degree two.
 */
public final class RmsTestConversion {
    private RmsTestConversion() { }

    /**
     * @param omega angular frequency of the test, rad/s
     * @param voltageRms test voltages, V rms, strictly increasing
     * @param currentRms measured currents, A rms, strictly increasing
     * @param lossWatts no-load loss per point, W, or null when the loss current is not removed
     * @param airCoreInductance slope past the last point, H; NaN = last segment slope
     * @return the piecewise-linear peak curve with one breakpoint per test point
     */
    public static PiecewiseLinearCurve convert(double omega, double[] voltageRms, double[] currentRms,
                                               double[] lossWatts, double airCoreInductance) {
        CurveChecks.positive(omega, "angular frequency", "rad/s");
        CurveChecks.points(voltageRms, "voltage", "V rms", currentRms, "current", "A rms");
        CurveChecks.airCoreOrNaN(airCoreInductance);
        int n = voltageRms.length;
        if (lossWatts != null && lossWatts.length != n) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, n + " test points but " + lossWatts.length
                    + " loss values; give one loss per point or none");
        }
        double[] flux = new double[n];
        double[] magnetizing = new double[n];
        for (int k = 0; k < n; k++) {
            flux[k] = Math.sqrt(2) * voltageRms[k] / omega;
            magnetizing[k] = magnetizingCurrent(k, voltageRms[k], currentRms[k], lossWatts == null ? 0 : lossWatts[k]);
        }
        double[] peak = new double[n];
        // A sinusoidal flux in the linear first segment draws a sinusoidal current.
        peak[0] = Math.sqrt(2) * magnetizing[0];
        for (int k = 1; k < n; k++) {
            peak[k] = nextPeak(k, flux, peak, magnetizing[k]);
        }
        return new PiecewiseLinearCurve(flux, peak, airCoreInductance);
    }

    /** I_mag = sqrt(I^2 - (P/V)^2): the loss current is in phase with the voltage, the rest lags it. */
    private static double magnetizingCurrent(int k, double v, double i, double p) {
        if (!(p >= 0) || Double.isInfinite(p)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "point " + k + ": loss " + p + " W must be finite and >= 0");
        }
        double loss = p / v;
        if (!(loss < i)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, String.format("point %d: the loss current P/V = %.6g A"
                    + " is not below the measured %.6g A rms, so no magnetizing current is left", k, loss, i));
        }
        return Math.sqrt((i - loss) * (i + loss));
    }

    /** Peak current at point k from the rms magnetizing current, given the breakpoints below it. */
    private static double nextPeak(int k, double[] flux, double[] peak, double rms) {
        double top = flux[k];
        // Known part: the segments up to point k-1, each over its own range of theta.
        double known = 0;
        double from = 0;
        for (int j = 0; j < k; j++) {
            double x0 = j == 0 ? 0 : flux[j - 1];
            double y0 = j == 0 ? 0 : peak[j - 1];
            double s = (peak[j] - y0) / (flux[j] - x0);
            double to = Math.asin(flux[j] / top);
            known += CurveQuadrature.gaussLegendre(t -> {
                double i = y0 + s * (top * Math.sin(t) - x0);
                return i * i;
            }, from, to);
            from = to;
        }
        double last = flux[k - 1];
        double u0 = 0.5 * Math.PI - from;
        double u1 = CurveQuadrature.gaussLegendre(t -> top * Math.sin(t) - last, from, 0.5 * Math.PI);
        double u2 = CurveQuadrature.gaussLegendre(t -> {
            double u = top * Math.sin(t) - last;
            return u * u;
        }, from, 0.5 * Math.PI);
        double y = peak[k - 1];
        double a = u2;
        double b = 2 * y * u1;
        double c = known + y * y * u0 - 0.5 * Math.PI * rms * rms;
        if (!(c < 0)) {
            double floor = Math.sqrt((known + y * y * u0) / (0.5 * Math.PI));
            throw new FerromapException(MessageKey.NOT_MONOTONE, String.format("point %d: rms magnetizing current"
                    + " %.6g A implies a non-positive slope; at that voltage it must exceed %.6g A, what the curve"
                    + " through the lower points already draws", k, rms, floor));
        }
        // Positive root of a s^2 + b s + c = 0 with b >= 0, c < 0, in the form free of cancellation.
        double s = -2 * c / (b + Math.sqrt(b * b - 4 * a * c));
        return y + s * (top - last);
    }
}
