package org.ferromap.continuation;

import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;

/**
 * Stability of x as an equilibrium of x' = F(x, p): the number of eigenvalues of dF/dx with
 * positive real part (Hipparchus non-symmetric eigen-decomposition; closed forms for one and two
 * states). A real part within
 * 1e-10 times the matrix's largest entry counts as zero, so a point sitting on a fold is not
 * called unstable by round-off.
 */
final class SteadyStateStability implements StabilityCriterion {

    static final SteadyStateStability INSTANCE = new SteadyStateStability();

    private static final double ZERO_RATIO = 1e-10;

    private SteadyStateStability() {
    }

    @Override
    public int unstableCount(double[] x, double p, double[][] dFdx) {
        int n = dFdx.length;
        double largest = 0;
        for (double[] row : dFdx) {
            for (int j = 0; j < n; j++) {
                if (!Double.isFinite(row[j])) {
                    return -1;
                }
                largest = Math.max(largest, Math.abs(row[j]));
            }
        }
        if (largest == 0) {
            return 0;
        }
        double zero = ZERO_RATIO * largest;
        if (n == 1) {
            return dFdx[0][0] > zero ? 1 : 0;
        }
        if (n == 2) {
            // Closed form: eigenvalues tr/2 +- sqrt(tr^2/4 - det).
            double tr = dFdx[0][0] + dFdx[1][1];
            double det = dFdx[0][0] * dFdx[1][1] - dFdx[0][1] * dFdx[1][0];
            if (det < -zero * largest) {
                return 1;
            }
            if (det > zero * largest) {
                return tr > zero ? 2 : 0;
            }
            return tr > zero ? 1 : 0;
        }
        try {
            Complex[] eig = new EigenDecompositionNonSymmetric(new Array2DRowRealMatrix(dFdx, false)).getEigenvalues();
            int count = 0;
            for (Complex c : eig) {
                if (c.getReal() > zero) {
                    count++;
                }
            }
            return count;
        } catch (MathRuntimeException e) {
            return -1;
        }
    }
}
