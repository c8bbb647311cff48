package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Tabulated (flux, current) points joined by monotone cubic (Fritsch-Carlson) interpolation, continued past the last point with the air-core slope.
 *
 * <p>The interpolant of i(lambda) is a cubic Hermite spline through the origin and the points.
 * Knot slopes start as the mean of the neighbouring secants and are then scaled down on any
 * interval where (alpha, beta) = (m_k, m_k+1) / secant leaves the disc alpha^2 + beta^2 &lt;= 9, which
 * is enough for the cubic to be monotone [mem: F. N. Fritsch and R. E. Carlson, "Monotone piecewise
 * cubic interpolation", SIAM J. Numer. Anal. 17(2), 1980]. Hipparchus has no such interpolator.
 *
 * <p>Oddness: mirrored about the origin, the secants on both sides of 0 are equal, so the origin
 * slope is the first secant and the odd extension is C1 there. At the last point the slope aims
 * at the continuation slope 1/L_air; when the limiter has to lower it (an air-core slope more
 * than about three times the last secant), the curve keeps a slope jump there, as a piecewise
 * curve would.
 */
public final class TabulatedCurve implements SaturationCurve, KinkedCurve {

    /** Knot fluxes, Wb-turn, origin first. */
    private final double[] x;
    /** Knot currents, A, origin first. */
    private final double[] y;
    /** Knot slopes di/dlambda, 1/H. */
    private final double[] m;
    /** Slope past the last point, 1/H. */
    private final double endSlope;
    private final MonotoneInversion.Increasing forward;

    /**
     * @param flux positive, strictly increasing, Wb-turn (origin implied)
     * @param current positive, strictly increasing, A
     * @param airCoreInductance slope dlambda/di past the last point, H; NaN = last secant slope
     */
    public TabulatedCurve(double[] flux, double[] current, double airCoreInductance) {
        CurveChecks.points(flux, "flux", "Wb-turn", current, "current", "A");
        CurveChecks.airCoreOrNaN(airCoreInductance);
        int n = flux.length;
        x = new double[n + 1];
        y = new double[n + 1];
        m = new double[n + 1];
        System.arraycopy(flux, 0, x, 1, n);
        System.arraycopy(current, 0, y, 1, n);
        double[] secant = new double[n];
        for (int k = 0; k < n; k++) {
            secant[k] = (y[k + 1] - y[k]) / (x[k + 1] - x[k]);
        }
        endSlope = Double.isNaN(airCoreInductance) ? secant[n - 1] : 1.0 / airCoreInductance;
        m[0] = secant[0];
        for (int k = 1; k < n; k++) {
            m[k] = 0.5 * (secant[k - 1] + secant[k]);
        }
        m[n] = endSlope;
        for (int k = 0; k < n; k++) {
            double alpha = m[k] / secant[k];
            double beta = m[k + 1] / secant[k];
            double r2 = alpha * alpha + beta * beta;
            if (r2 > 9) {
                double tau = 3 / Math.sqrt(r2);
                m[k] = tau * alpha * secant[k];
                m[k + 1] = tau * beta * secant[k];
            }
        }
        for (int k = 0; k < n; k++) {
            checkPositiveSlope(k, secant[k]);
        }
        forward = new MonotoneInversion.Increasing() {
            @Override
            public double value(double v) {
                return current(v);
            }

            @Override
            public double derivative(double v) {
                return currentSlope(v);
            }
        };
    }

    @Override
    public double current(double fluxLinkage) {
        double a = Math.abs(fluxLinkage);
        int k = PiecewiseLinearCurve.segment(x, a);
        int n = x.length - 1;
        if (k >= n) {
            return Math.copySign(y[n] + endSlope * (a - x[n]), fluxLinkage);
        }
        double h = x[k + 1] - x[k];
        double t = (a - x[k]) / h;
        double u = 1 - t;
        double v = y[k] * (1 + 2 * t) * u * u + h * m[k] * t * u * u
                + y[k + 1] * t * t * (3 - 2 * t) - h * m[k + 1] * t * t * u;
        return Math.copySign(v, fluxLinkage);
    }

    @Override
    public double currentSlope(double fluxLinkage) {
        double a = Math.abs(fluxLinkage);
        int k = PiecewiseLinearCurve.segment(x, a);
        if (k >= x.length - 1) {
            return endSlope;
        }
        double h = x[k + 1] - x[k];
        double t = (a - x[k]) / h;
        double secant = (y[k + 1] - y[k]) / h;
        return slopeAt(m[k], m[k + 1], secant, t);
    }

    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        return CurveQuadrature.fundamental(this, fluxAmplitude, kinkFluxes());
    }

    @Override
    public double fluxLinkage(double current) {
        double a = Math.abs(current);
        int k = PiecewiseLinearCurve.segment(y, a);
        int n = x.length - 1;
        if (k >= n) {
            return Math.copySign(x[n] + (a - y[n]) / endSlope, current);
        }
        if (a == y[k]) {
            return Math.copySign(x[k], current);
        }
        double h = x[k + 1] - x[k];
        double start = x[k] + h * (a - y[k]) / (y[k + 1] - y[k]);
        return Math.copySign(MonotoneInversion.solve(forward, a, x[k], x[k + 1], start), current);
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
        return 1.0 / endSlope;
    }

    @Override
    public String describe() {
        int n = x.length - 1;
        return String.format("tabulated (monotone cubic), %d point%s to %.4g Wb-turn / %.4g A, air-core %.4g H",
                n, n == 1 ? "" : "s", x[n], y[n], airCoreInductance());
    }

    /** The knots: the second derivative jumps there (and the first at the last knot when limited). */
    @Override
    public double[] kinkFluxes() {
        return Arrays.copyOfRange(x, 1, x.length);
    }

    /** di/dlambda of the Hermite cubic at t in [0, 1] of an interval with the given secant. */
    private static double slopeAt(double m0, double m1, double secant, double t) {
        return m0 * (1 - t) * (1 - 3 * t) + m1 * t * (3 * t - 2) + 6 * secant * t * (1 - t);
    }

    /** The derivative is a quadratic in t: check its minimum over [0, 1]. */
    private void checkPositiveSlope(int k, double secant) {
        double a = 3 * (m[k] + m[k + 1]) - 6 * secant;
        double b = 6 * secant - 4 * m[k] - 2 * m[k + 1];
        double min = Math.min(m[k], m[k + 1]);
        if (a > 0) {
            double tv = -b / (2 * a);
            if (tv > 0 && tv < 1) {
                min = Math.min(min, slopeAt(m[k], m[k + 1], secant, tv));
            }
        }
        if (!(min > 0)) {
            throw new FerromapException(MessageKey.NOT_MONOTONE, "the interpolated slope is not positive between flux "
                    + x[k] + " and " + x[k + 1] + " Wb-turn; the points cannot be interpolated monotonically");
        }
    }
}
