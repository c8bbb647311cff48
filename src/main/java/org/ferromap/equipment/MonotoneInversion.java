package org.ferromap.equipment;

/**
 * Inverts a strictly increasing function on a bracket by Newton steps that fall back to
 * bisection whenever a step would leave the bracket (the safeguarded Newton of common practice).
 * Allocation-free, so the curves can use it in their hot methods.
 */
final class MonotoneInversion {

    /** A strictly increasing function with its derivative, both cheap to evaluate. */
    interface Increasing {
        double value(double x);

        double derivative(double x);
    }

    /** Iteration cap; bisection alone halves a double bracket to one ulp well within it. */
    private static final int MAX_ITERATIONS = 2000;

    private MonotoneInversion() { }

    /**
     * Solves f(x) = target for x in [lo, hi], where f(lo) &lt;= target &lt;= f(hi), to about one ulp.
     *
     * @param start first iterate, clamped into the bracket
     */
    static double solve(Increasing f, double target, double lo, double hi, double start) {
        double x = Math.min(Math.max(start, lo), hi);
        double previousStep = hi - lo;
        double previousResidual = Double.NaN;
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            double r = f.value(x) - target;
            if (r == 0) {
                return x;
            }
            if (r < 0) {
                lo = x;
            } else {
                hi = x;
            }
            double step = r / f.derivative(x);
            double next = x - step;
            // Converged: a Newton step of a few ulps. Stopping here, before any safeguard, keeps
            // round-off in the residual from triggering a bisection of the whole bracket.
            if (Math.abs(step) <= 4 * Math.ulp(x)) {
                return next >= lo && next <= hi ? next : x;
            }
            // Bisect when Newton leaves the bracket, or when it has jumped across the root and its
            // step fails to halve (cycling around a kink). Steps that stay on one side converge
            // monotonically (a convex or concave stretch) and are left alone.
            boolean crossed = previousResidual * r < 0;
            if (!(next > lo && next < hi) || (crossed && Math.abs(next - x) > 0.5 * previousStep)) {
                next = 0.5 * (lo + hi);
            }
            previousStep = Math.abs(next - x);
            previousResidual = r;
            if (!(hi - lo > 2 * Math.ulp(hi))) {
                return next;
            }
            x = next;
        }
        return x;
    }
}
