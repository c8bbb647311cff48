package org.ferromap.continuation;

/**
 * The user's problem seen with two parameters, in its own units. One-parameter problems ignore q.
 * Knows whether the Jacobian is the user's own (analytic) or must be differenced by the engine.
 */
final class RawSystem {

    private final ContinuationProblem one;
    private final TwoParameterProblem two;
    /** Fixed q used when a one-parameter problem is asked for a two-parameter value. */
    private final boolean analytic;
    final int n;

    private RawSystem(ContinuationProblem one, TwoParameterProblem two, boolean analytic, int n) {
        this.one = one;
        this.two = two;
        this.analytic = analytic;
        this.n = n;
    }

    static RawSystem of(ContinuationProblem problem) {
        boolean analytic;
        if (problem instanceof FixedSecondParameter fixed) {
            analytic = overrides(fixed.problem.getClass(), TwoParameterProblem.class, "jacobian",
                    double[].class, double.class, double.class, double[][].class, double[].class, double[].class);
        } else {
            analytic = overrides(problem.getClass(), ContinuationProblem.class, "jacobian",
                    double[].class, double.class, double[][].class, double[].class);
        }
        return new RawSystem(problem, null, analytic, problem.dimension());
    }

    static RawSystem of(TwoParameterProblem problem) {
        boolean analytic = overrides(problem.getClass(), TwoParameterProblem.class, "jacobian",
                double[].class, double.class, double.class, double[][].class, double[].class, double[].class);
        return new RawSystem(null, problem, analytic, problem.dimension());
    }

    /** Whether the class supplies its own Jacobian rather than the interface's default. */
    private static boolean overrides(Class<?> type, Class<?> iface, String name, Class<?>... args) {
        try {
            return type.getMethod(name, args).getDeclaringClass() != iface;
        } catch (NoSuchMethodException e) {
            return false;
        }
    }

    boolean analytic() {
        return analytic;
    }

    void residual(double[] x, double p, double q, double[] out) {
        if (one != null) {
            one.residual(x, p, out);
        } else {
            two.residual(x, p, q, out);
        }
    }

    void jacobian(double[] x, double p, double q, double[][] dFdx, double[] dFdp, double[] dFdq) {
        if (one != null) {
            one.jacobian(x, p, dFdx, dFdp);
            java.util.Arrays.fill(dFdq, 0.0);
        } else {
            two.jacobian(x, p, q, dFdx, dFdp, dFdq);
        }
    }
}
