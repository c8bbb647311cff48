package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Piecewise-linear odd curve through the origin and the given breakpoints; past the last point
 * it continues with the air-core inductance (or the last segment's slope when NaN). Common
 * practice (DOMAIN.md §2); the describing function has a closed form, so no quadrature is needed.
 */
public final class PiecewiseLinearCurve implements SaturationCurve, KinkedCurve {

    /** Knot fluxes, Wb-turn, origin first: x[0] = 0, x[k] = flux[k-1]. */
    private final double[] x;
    /** Knot currents, A, origin first. */
    private final double[] y;
    /** slope[k] = di/dlambda on [x[k], x[k+1]), 1/H; slope[n] holds past the last point. */
    private final double[] slope;

    /**
     * @param flux breakpoint flux linkages, Wb-turn, positive and strictly increasing (origin implied)
     * @param current breakpoint currents, A, positive and strictly increasing
     * @param airCoreInductance final slope dlambda/di past the last point, H; NaN = keep the last segment slope
     */
    public PiecewiseLinearCurve(double[] flux, double[] current, double airCoreInductance) {
        CurveChecks.points(flux, "flux", "Wb-turn", current, "current", "A");
        CurveChecks.airCoreOrNaN(airCoreInductance);
        int n = flux.length;
        x = new double[n + 1];
        y = new double[n + 1];
        slope = new double[n + 1];
        System.arraycopy(flux, 0, x, 1, n);
        System.arraycopy(current, 0, y, 1, n);
        for (int k = 0; k < n; k++) {
            slope[k] = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
        }
        slope[n] = Double.isNaN(airCoreInductance) ? slope[n - 1] : 1.0 / airCoreInductance;
    }

    @Override
    public double current(double fluxLinkage) {
        double a = Math.abs(fluxLinkage);
        int k = segment(x, a);
        return Math.copySign(y[k] + slope[k] * (a - x[k]), fluxLinkage);
    }

    /** At a breakpoint, the slope of the segment that starts there. */
    @Override
    public double currentSlope(double fluxLinkage) {
        return slope[segment(x, Math.abs(fluxLinkage))];
    }

    /**
     * Closed form. Writing i = s0 lambda + sum_k (s_k - s_(k-1)) ramp(|lambda| - x_k) sign(lambda),
     * each ramp (a dead zone of width x_k) has fundamental A (2 theta_k - sin 2 theta_k) / pi with
     * cos theta_k = x_k / A for x_k &lt; A [der: (4/pi) int_0^theta_k (A cos t - x_k) cos t dt].
     */
    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        double a = Math.abs(fluxAmplitude);
        double sum = slope[0] * a;
        for (int k = 1; k < x.length && x[k] < a; k++) {
            double b = x[k];
            double theta = Math.atan2(Math.sqrt((a - b) * (a + b)), b);
            sum += (slope[k] - slope[k - 1]) * a * uMinusSinU(2 * theta) / Math.PI;
        }
        return Math.copySign(sum, fluxAmplitude);
    }

    @Override
    public double fluxLinkage(double current) {
        double a = Math.abs(current);
        int k = segment(y, a);
        return Math.copySign(x[k] + (a - y[k]) / slope[k], current);
    }

    @Override
    public List<CurvePoint> definingPoints() {
        List<CurvePoint> pts = new ArrayList<>(x.length - 1);
        for (int k = 1; k < x.length; k++) {
            pts.add(new CurvePoint(x[k], y[k]));
        }
        return List.copyOf(pts);
    }

    @Override
    public double airCoreInductance() {
        return 1.0 / slope[slope.length - 1];
    }

    @Override
    public String describe() {
        int n = x.length - 1;
        return String.format("piecewise linear, %d point%s to %.4g Wb-turn / %.4g A, air-core %.4g H",
                n, n == 1 ? "" : "s", x[n], y[n], airCoreInductance());
    }

    @Override
    public double[] kinkFluxes() {
        return Arrays.copyOfRange(x, 1, x.length);
    }

    /** Index k of the knot interval [v[k], v[k+1]) holding a &gt;= 0 (the last knot for a beyond it). */
    static int segment(double[] v, double a) {
        int r = Arrays.binarySearch(v, a);
        return r >= 0 ? r : -r - 2;
    }

    /**
     * u - sin(u) for 0 &lt;= u &lt;= 2 pi, accurate to a few ulps also for small u, where the direct
     * difference would lose up to all digits (the series is the Taylor series of sin).
     */
    static double uMinusSinU(double u) {
        if (u > 1) {
            return u - Math.sin(u);
        }
        double u2 = u * u;
        double term = u * u2 / 6;
        double sum = term;
        for (int j = 4; Math.abs(term) > 1e-18 * sum; j += 2) {
            term *= -u2 / (j * (j + 1));
            sum += term;
        }
        return sum;
    }
}
