package org.ferromap.balance;

import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealVector;

/**
 * A small dense Newton solver with backtracking for square systems in per unit (Hipparchus has
 * no multivariate Newton). Each step solves J dx = -F by LU with a singularity threshold relative
 * to the largest Jacobian entry (Hipparchus's default is absolute); a step that does not lower
 * the largest residual component is halved up to 20 times. Convergence is the largest residual
 * component below tolerance times {@link SquareSystem#scale}, or a full step below 1e-13 of the
 * iterate when no further descent is possible (the round-off floor). One polishing step follows
 * convergence so that answers sit at round-off, not merely under the tolerance.
 */
public final class DenseNewton {

    /** A square system F(x) = 0 with its Jacobian. */
    public interface SquareSystem {
        int dimension();

        void residual(double[] x, double[] f);

        void jacobian(double[] x, double[][] j);

        /**
         * Size of the terms that make up the residual at x (for example the largest nonlinear
         * current), so that the tolerance is relative to what round-off can reach; default 1.
         */
        default double scale(double[] x) {
            return 1.0;
        }
    }

    private DenseNewton() { }

    /**
     * @param system the equations
     * @param start first iterate (not modified)
     * @param tolerance target for the largest residual component
     * @param maxIterations step limit
     */
    public static NewtonResult solve(SquareSystem system, double[] start, double tolerance, int maxIterations) {
        int d = system.dimension();
        double[] x = start.clone();
        if (d == 0) {
            return new NewtonResult(x, true, 0, 0.0);
        }
        double[] f = new double[d];
        double[] trial = new double[d];
        double[] ft = new double[d];
        double[][] j = new double[d][d];
        system.residual(x, f);
        double norm = maxAbs(f);
        int it = 0;
        boolean polished = false;
        while (it < maxIterations) {
            boolean converged = norm <= tolerance * system.scale(x);
            if (converged && polished) {
                break;
            }
            system.jacobian(x, j);
            double[] dx = step(j, f);
            if (dx == null) {
                return new NewtonResult(x, converged, it, norm);
            }
            it++;
            double t = 1.0;
            double newNorm = Double.POSITIVE_INFINITY;
            for (int half = 0; half <= 20; half++) {
                for (int k = 0; k < d; k++) {
                    trial[k] = x[k] + t * dx[k];
                }
                system.residual(trial, ft);
                newNorm = maxAbs(ft);
                if (newNorm < norm || (converged && newNorm <= norm)) {
                    break;
                }
                t *= 0.5;
            }
            if (!(newNorm < norm) && !(converged && newNorm <= norm)) {
                // No descent: converged already, at the round-off floor (tiny full step), or stuck.
                boolean floor = maxAbs(dx) <= 1e-13 * Math.max(maxAbs(x), Double.MIN_NORMAL);
                return new NewtonResult(x, converged || floor, it, norm);
            }
            System.arraycopy(trial, 0, x, 0, d);
            System.arraycopy(ft, 0, f, 0, d);
            norm = newNorm;
            if (converged) {
                polished = true;
            }
        }
        return new NewtonResult(x, norm <= tolerance * system.scale(x), it, norm);
    }

    private static double[] step(double[][] j, double[] f) {
        double scale = 0;
        for (double[] row : j) {
            for (double v : row) {
                scale = Math.max(scale, Math.abs(v));
            }
        }
        if (!(scale > 0) || Double.isInfinite(scale)) {
            return null;
        }
        try {
            DecompositionSolver s = new LUDecomposition(new Array2DRowRealMatrix(j, true), 1e-14 * scale).getSolver();
            if (!s.isNonSingular()) {
                return null;
            }
            RealVector dx = s.solve(new ArrayRealVector(f, true));
            double[] out = dx.toArray();
            for (int k = 0; k < out.length; k++) {
                out[k] = -out[k];
            }
            return out;
        } catch (MathRuntimeException e) {
            return null;
        }
    }

    static double maxAbs(double[] v) {
        double m = 0;
        for (double a : v) {
            m = Math.max(m, Math.abs(a));
        }
        return m;
    }
}
