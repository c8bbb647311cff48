package org.ferromap.continuation;

/**
 * Decides the stability of each point of a branch. The engine passes the Jacobian dF/dx in the
 * problem's own units; what it means is the caller's: the default {@link #steadyState()} reads
 * F as the right-hand side of an ODE x' = F(x, p); a harmonic balance supplies its own criterion
 * (its residual's Jacobian says nothing directly about the stability of the periodic solution).
 */
public interface StabilityCriterion {

    /**
     * Number of unstable directions at a point (0 = stable), or -1 when it cannot be decided.
     *
     * @param x state, units of the problem (do not modify)
     * @param p parameter, units of p
     * @param dFdx Jacobian dF/dx in the problem's units, n by n (may be modified)
     */
    int unstableCount(double[] x, double p, double[][] dFdx);

    /** Counts eigenvalues of dF/dx with positive real part: stability of x as an equilibrium of x' = F(x, p). */
    static StabilityCriterion steadyState() {
        return SteadyStateStability.INSTANCE;
    }

    /** Assesses nothing (every point gets -1) and costs nothing. */
    static StabilityCriterion none() {
        return NoStability.INSTANCE;
    }
}
