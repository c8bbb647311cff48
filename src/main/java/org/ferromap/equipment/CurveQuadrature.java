package org.ferromap.equipment;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * The describing-function quadrature every curve without a closed form shares: adaptive
 * Gauss-Legendre in the angle, split where the flux A cos(theta) crosses a kink of the curve.
 *
 * <p>With lambda = A cos(theta) and an odd curve, I1(A) = (4/pi) * integral over 0..pi/2 of
 * i(A cos theta) cos theta dtheta (DOMAIN.md §3). Between kinks the integrand is analytic in theta,
 * where Gauss-Legendre converges geometrically; each piece is halved until a 20-point rule and the
 * sum of its two halves agree to 1e-13 of the whole, which leaves the accepted (finer) sum well
 * inside the 1e-10 relative accuracy the {@link SaturationCurve} contract promises.
 */
final class CurveQuadrature {

    /** Points of the Gauss-Legendre rule; exact for polynomials of degree 39 in theta. */
    static final int ORDER = 20;

    /** Agreement asked of the coarse and fine estimates, relative to the whole integral. */
    private static final double RELATIVE_TOLERANCE = 1e-13;

    /** Halvings allowed per piece: 2^-40 of pi/2 is far below any physical feature. */
    private static final int MAX_DEPTH = 40;

    private static final double[] NODE = new double[ORDER];
    private static final double[] WEIGHT = new double[ORDER];

    static {
        // Nodes and weights on [-1, 1] from Hipparchus' high-precision (BigDecimal) Legendre rule.
        GaussIntegrator rule = new GaussIntegratorFactory().legendreHighPrecision(ORDER);
        for (int j = 0; j < ORDER; j++) {
            NODE[j] = rule.getPoint(j);
            WEIGHT[j] = rule.getWeight(j);
        }
    }

    private CurveQuadrature() { }

    /**
     * Fundamental of i(A cos theta) for an odd curve, A.
     *
     * @param curve the curve, odd in flux
     * @param amplitude flux amplitude A, Wb-turn, any sign
     * @param kinks positive increasing fluxes where the curve is not smooth (may be empty)
     */
    static double fundamental(SaturationCurve curve, double amplitude, double[] kinks) {
        if (amplitude == 0) {
            return 0;
        }
        if (amplitude < 0) {
            return -fundamental(curve, -amplitude, kinks);
        }
        if (!Double.isFinite(amplitude)) {
            return amplitude > 0 ? Double.POSITIVE_INFINITY : Double.NaN;
        }
        // Angles where A cos(theta) equals a kink below A, increasing in theta (kinks decreasing).
        int below = 0;
        while (below < kinks.length && kinks[below] < amplitude) {
            below++;
        }
        double[] cut = new double[below + 2];
        cut[0] = 0;
        for (int j = 0; j < below; j++) {
            double b = kinks[below - 1 - j];
            // atan2 form keeps the angle accurate when b is just below A, where acos(b/A) is not.
            cut[j + 1] = Math.atan2(Math.sqrt((amplitude - b) * (amplitude + b)), b);
        }
        cut[below + 1] = 0.5 * Math.PI;

        double[] coarse = new double[below + 1];
        double estimate = 0;
        for (int j = 0; j <= below; j++) {
            coarse[j] = rule(curve, amplitude, cut[j], cut[j + 1]);
            estimate += coarse[j];
        }
        double tolerance = Math.max(RELATIVE_TOLERANCE * Math.abs(estimate), Double.MIN_NORMAL);
        double sum = 0;
        for (int j = 0; j <= below; j++) {
            double share = tolerance * (cut[j + 1] - cut[j]) / (0.5 * Math.PI);
            sum += refine(curve, amplitude, cut[j], cut[j + 1], coarse[j], share, 0);
        }
        return 4 / Math.PI * sum;
    }

    /** Integral of f over [a, b] by one 20-point Gauss-Legendre rule (for smooth integrands). */
    static double gaussLegendre(DoubleUnaryOperator f, double a, double b) {
        double half = 0.5 * (b - a);
        double mid = 0.5 * (a + b);
        double s = 0;
        for (int j = 0; j < ORDER; j++) {
            s += WEIGHT[j] * f.applyAsDouble(mid + half * NODE[j]);
        }
        return half * s;
    }

    private static double refine(SaturationCurve curve, double amp, double a, double b, double whole,
                                 double tolerance, int depth) {
        double mid = 0.5 * (a + b);
        double left = rule(curve, amp, a, mid);
        double right = rule(curve, amp, mid, b);
        double fine = left + right;
        if (Math.abs(fine - whole) <= tolerance || depth >= MAX_DEPTH || !(mid > a && mid < b)) {
            return fine;
        }
        return refine(curve, amp, a, mid, left, 0.5 * tolerance, depth + 1)
                + refine(curve, amp, mid, b, right, 0.5 * tolerance, depth + 1);
    }

    /** 20-point rule for i(A cos t) cos t over [a, b]. */
    private static double rule(SaturationCurve curve, double amp, double a, double b) {
        double half = 0.5 * (b - a);
        double mid = 0.5 * (a + b);
        double s = 0;
        for (int j = 0; j < ORDER; j++) {
            double c = Math.cos(mid + half * NODE[j]);
            s += WEIGHT[j] * curve.current(amp * c) * c;
        }
        return half * s;
    }
}
