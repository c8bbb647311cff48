package org.ferromap.continuation;

/** The criterion that assesses nothing; the tracer skips the Jacobian it would need. */
final class NoStability implements StabilityCriterion {

    static final NoStability INSTANCE = new NoStability();

    private NoStability() {
    }

    @Override
    public int unstableCount(double[] x, double p, double[][] dFdx) {
        return -1;
    }
}
