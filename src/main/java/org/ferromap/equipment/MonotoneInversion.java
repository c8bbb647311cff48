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
            double next = x - r / f.derivative(x);
            // Bisect when Newton leaves the bracket or fails to halve the step (kinks, flat parts).
            if (!(next > lo && next < hi) || Math.abs(next - x) > 0.5 * previousStep) {
                next = 0.5 * (lo + hi);
            }
            previousStep = Math.abs(next - x);
            if (Math.abs(next - x) <= 2 * Math.ulp(next) || !(hi - lo > 2 * Math.ulp(hi))) {
                return next;
            }
            x = next;
        }
        return x;
    }
}
