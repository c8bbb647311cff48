package org.ferromap.continuation;

/** A two-parameter problem with q held fixed; see {@link TwoParameterProblem#atFixedQ}. */
final class FixedSecondParameter implements ContinuationProblem {

    final TwoParameterProblem problem;
    /** Fixed second parameter, units of the problem. */
    final double q;

    FixedSecondParameter(TwoParameterProblem problem, double q) {
        this.problem = problem;
        this.q = q;
    }

    @Override
    public int dimension() {
        return problem.dimension();
    }

    @Override
    public void residual(double[] x, double p, double[] out) {
        problem.residual(x, p, q, out);
    }

    @Override
    public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
        // dF/dq is not needed here; a fresh array keeps this adapter immutable and thread-safe.
        problem.jacobian(x, p, q, dFdx, dFdp, new double[dFdp.length]);
    }
}
