package org.ferromap.equipment;

import java.util.function.DoubleUnaryOperator;

/**
 * The describing-function quadrature every curve without a closed form shares: adaptive
 * Gauss-Legendre in the angle, split where the flux A cos(theta) crosses a kink of the curve.
 *
 * <p>With lambda = A cos(theta) and an odd curve, I1(A) = (4/pi) * integral over 0..pi/2 of
 * i(A cos theta) cos theta dtheta (DOMAIN.md §3). Between kinks the integrand is analytic in theta,
 * where Gauss-Legendre converges geometrically; each piece is halved until a 20-point rule and the
 * sum of its two halves agree to 1e-13 of the whole, which leaves the accepted (finer) sum well
 * inside the 1e-10 relative accuracy the {@link SaturationCurve} contract promises.
 *
 * <p>Like every rule that samples, it cannot see a feature narrower than its node spacing: curves
 * with sharp but smooth knees must mark them ({@link KinkedCurve}), as {@link SmoothKneeCurve} does.
 */
final class CurveQuadrature {

    /** Points of the Gauss-Legendre rule; exact for polynomials of degree 39 in theta. */
    static final int ORDER = 20;

    /** Agreement asked of the coarse and fine estimates, relative to the whole integral. */
    private static final double RELATIVE_TOLERANCE = 1e-13;

    /** Halvings allowed per piece: 2^-40 of pi/2 is far below any physical feature. */
    private static final int MAX_DEPTH = 40;

    /**
     * How far above the tolerance a stalled difference may sit and still be taken as round-off:
     * 100 x 1e-13 keeps the promise of 1e-10 with a margin.
     */
    private static final double NOISE_FACTOR = 100;

    /** Curve evaluations allowed per describing-function value, a guard against a noisy curve. */
    private static final int MAX_EVALUATIONS = 400_000;

    private static final double[] NODE = new double[ORDER];
    private static final double[] WEIGHT = new double[ORDER];

    static {
        // Nodes on [-1, 1] as roots of P_n by Newton from the Chebyshev-like guess cos(pi (j + 3/4) / (n + 1/2)),
        // weights 2 / ((1 - x^2) P_n'(x)^2) (the textbook construction, common practice). Computed
        // in microseconds; Hipparchus' own factories take about a second on first use.
        for (int j = 0; j < (ORDER + 1) / 2; j++) {
            double x = Math.cos(Math.PI * (j + 0.75) / (ORDER + 0.5));
            double dp = 0;
            for (int it = 0; it < 100; it++) {
                double p0 = 1;
                double p1 = x;
                for (int k = 2; k <= ORDER; k++) {
                    double p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                dp = ORDER * (x * p1 - p0) / (x * x - 1);
                double dx = p1 / dp;
                x -= dx;
                if (Math.abs(dx) <= 1e-17) {
                    break;
                }
            }
            NODE[j] = -x;
            NODE[ORDER - 1 - j] = x;
            WEIGHT[j] = 2 / ((1 - x * x) * dp * dp);
            WEIGHT[ORDER - 1 - j] = WEIGHT[j];
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
        int[] budget = {MAX_EVALUATIONS};
        for (int j = 0; j <= below; j++) {
            double share = tolerance * (cut[j + 1] - cut[j]) / (0.5 * Math.PI);
            sum += refine(curve, amplitude, cut[j], cut[j + 1], coarse[j], share, Double.POSITIVE_INFINITY, 0, budget);
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
                                 double tolerance, double parentDiff, int depth, int[] budget) {
        double mid = 0.5 * (a + b);
        double left = rule(curve, amp, a, mid);
        double right = rule(curve, amp, mid, b);
        budget[0] -= 2 * ORDER;
        double fine = left + right;
        double diff = Math.abs(fine - whole);
        // Round-off floor: once halving stops shrinking the difference, it is noise of the
        // integrand (the current evaluated just past a kink cancels digits), not truncation error.
        boolean atNoise = depth >= 3 && diff >= 0.5 * parentDiff && diff <= NOISE_FACTOR * tolerance;
        if (diff <= tolerance || atNoise || depth >= MAX_DEPTH || budget[0] <= 0 || !(mid > a && mid < b)) {
            return fine;
        }
        return refine(curve, amp, a, mid, left, 0.5 * tolerance, diff, depth + 1, budget)
                + refine(curve, amp, mid, b, right, 0.5 * tolerance, diff, depth + 1, budget);
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
