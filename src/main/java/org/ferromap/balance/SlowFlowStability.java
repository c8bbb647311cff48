package org.ferromap.balance;

import org.ferromap.continuation.StabilityCriterion;

/**
 * Stability of a single-harmonic point from the averaged (slow-flow) equations, as in
 * {@link SingleHarmonicBalance}. With y = Re(Y e^{j tau}) and Y slowly varying,
 * 2 j gC Y' = -F(Y), F the balance residual; in the (a1, b1) coordinates of {@link LoopResidual}
 * the slow-flow Jacobian is A = [[J10, J11], [-J00, -J01]] / (2 gC), J = dF/dx. So
 * det A = det J / (4 gC^2) and trace A = (J10 - J01) / (2 gC) = -gG/gC: a point is a saddle
 * where det J &lt; 0 (between a fold pair), stable where det J &gt; 0 and the loop is damped, a
 * centre (counted stable, as the balance does) without loss. Entries within 1e-10 of the
 * largest count as zero, so a point on a fold is not called unstable by round-off.
 */
final class SlowFlowStability implements StabilityCriterion {

    static final SlowFlowStability INSTANCE = new SlowFlowStability();

    private static final double ZERO_RATIO = 1e-10;

    private SlowFlowStability() {
    }

    @Override
    public int unstableCount(double[] x, double p, double[][] j) {
        double largest = Math.max(Math.max(Math.abs(j[0][0]), Math.abs(j[0][1])), Math.max(Math.abs(j[1][0]), Math.abs(j[1][1])));
        if (!Double.isFinite(largest)) {
            return -1;
        }
        if (largest == 0) {
            return 0;
        }
        double det = j[0][0] * j[1][1] - j[0][1] * j[1][0];
        double trace = j[1][0] - j[0][1];
        double zero = ZERO_RATIO * largest;
        if (det < -zero * largest) {
            return 1;
        }
        if (det > zero * largest) {
            return trace > zero ? 2 : 0;
        }
        return trace > zero ? 1 : 0;
    }
}
