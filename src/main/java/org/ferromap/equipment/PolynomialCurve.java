package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Two-term polynomial i = a lambda + b lambda^n, n odd (DOMAIN.md §2, common practice).
 * Has no air-core slope, so deep-saturation currents are too large; kept because its balance
 * has closed forms that the rest of the code is tested against.
 *
 * @param a linear coefficient, A per Wb-turn (1/H), at least zero
 * @param b saturation coefficient, A per (Wb-turn)^n, positive
 * @param n odd exponent, at least 3
 */
public record PolynomialCurve(double a, double b, int n) implements SaturationCurve {

    public PolynomialCurve {
        if (!(a >= 0) || Double.isInfinite(a)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "coefficient a = " + a + " must be finite and >= 0");
        }
        if (!(b > 0) || Double.isInfinite(b)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "coefficient b = " + b + " must be finite and > 0");
        }
        if (n < 3 || n % 2 == 0) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "exponent n = " + n + " must be an odd integer >= 3");
        }
    }

    /**
     * Fundamental coefficient k_n of lambda^n: I1 = k_n Lambda^n, k_n = C(n,(n-1)/2)/2^(n-1)
     * (DOMAIN.md §3, derived; k3 = 0.75).
     */
    public static double describingCoefficient(int n) {
        double c = 1.0;
        int k = (n - 1) / 2;
        for (int j = 1; j <= k; j++) {
            c = c * (n - k + j) / j;
        }
        return c / Math.pow(2.0, n - 1);
    }

    @Override
    public double current(double lambda) {
        return a * lambda + b * powN(lambda);
    }

    @Override
    public double currentSlope(double lambda) {
        return a + n * b * pow(lambda, n - 1);
    }

    @Override
    public double fundamentalCurrent(double amplitude) {
        return a * amplitude + describingCoefficient(n) * b * powN(amplitude);
    }

    @Override
    public double fluxLinkage(double current) {
        if (current == 0) {
            return 0;
        }
        double s = Math.signum(current);
        double target = Math.abs(current);
        // Start from the larger of the two single-term inverses; Newton on a convex increasing
        // function from the right converges monotonically.
        double x = Math.max(a > 0 ? target / a : 0, Math.pow(target / b, 1.0 / n));
        for (int it = 0; it < 200; it++) {
            double f = current(x) - target;
            double dx = f / currentSlope(x);
            x -= dx;
            if (Math.abs(dx) <= 1e-15 * x) {
                break;
            }
        }
        return s * x;
    }

    @Override
    public List<CurvePoint> definingPoints() {
        // A sample of the closed form up to the flux where the saturation term is 100x the linear one.
        double top = a > 0 ? Math.pow(100 * a / b, 1.0 / (n - 1)) : Math.pow(1.0 / b, 1.0 / n);
        List<CurvePoint> pts = new ArrayList<>();
        for (int k = 1; k <= 40; k++) {
            double x = top * k / 40.0;
            pts.add(new CurvePoint(x, current(x)));
        }
        return List.copyOf(pts);
    }

    @Override
    public double airCoreInductance() {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public String describe() {
        return String.format("polynomial i = %.4g*lambda + %.4g*lambda^%d", a, b, n);
    }

    private double powN(double x) {
        return pow(x, n);
    }

    /** x^m by repeated multiplication: exact sign for odd m and faster than Math.pow in hot loops. */
    private static double pow(double x, int m) {
        double r = 1.0;
        for (int j = 0; j < m; j++) {
            r *= x;
        }
        return r;
    }
}
