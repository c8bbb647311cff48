package org.ferromap.balance;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.LUDecomposition;

/**
 * A small pseudo-arclength tracer of the multi-harmonic branch in the source voltage, used only
 * to locate folds (the general continuation engine lives elsewhere). Unknowns u = (x, q): the
 * per-unit harmonic coefficients and q = E / V_rated. A fold is where dq/ds changes sign along
 * the branch; it is refined by Brent's method on dq/ds over the arclength of the step that
 * crossed it. Not thread-safe.
 */
final class SourceBranchTracer {

    private final MultiHarmonicResidual r;
    private final double ratedPeak;
    private final HarmonicSettings settings;
    private final int d;
    private final double[] f;
    private final double[][] fx;
    private final double[] fp;

    /** One traced point: state, unit tangent and the step length that led to it. */
    record Point(double[] u, double[] tangent) { }

    /** A located fold: the state there and whether q was rising before it (a jump-up fold). */
    record FoldPoint(double[] u, boolean jumpUp) { }

    SourceBranchTracer(MultiHarmonicResidual residual, double ratedPeak, HarmonicSettings settings) {
        this.r = residual;
        this.ratedPeak = ratedPeak;
        this.settings = settings;
        this.d = residual.dimension();
        this.f = new double[d];
        this.fx = new double[d][d];
        this.fp = new double[d];
    }

    /**
     * Traces from a converged point (x0 at q0), q increasing at first, until q leaves (0, qMax),
     * the flux exceeds xMax (largest coefficient, per unit) or maxSteps is reached; returns the
     * folds found in order.
     */
    List<FoldPoint> folds(double[] x0, double q0, double qMax, double xMax, int maxSteps) {
        double[] u = new double[d + 1];
        System.arraycopy(x0, 0, u, 0, d);
        u[d] = q0;
        double[] e = new double[d + 1];
        e[d] = 1;
        double[] t = tangent(u, e);
        double h = 0.02 * (1 + norm(u));
        double hMax = 0.1 * (1 + norm(u));
        List<FoldPoint> out = new ArrayList<>();
        for (int step = 0; step < maxSteps; step++) {
            double[] next = null;
            int iterations = 0;
            for (int tries = 0; tries < 30; tries++) {
                NewtonResult nr = correct(u, t, h);
                if (nr != null && nr.converged()) {
                    next = nr.x();
                    iterations = nr.iterations();
                    break;
                }
                h *= 0.5;
            }
            if (next == null) {
                throw new FerromapException(MessageKey.NO_CONVERGENCE,
                        "multi-harmonic branch could not be followed past q = " + u[d] + " pu (step " + h + ")");
            }
            double[] tn = tangent(next, t);
            if ((t[d] > 0) != (tn[d] > 0)) {
                out.add(refine(u, t, h, t[d] > 0));
            }
            u = next;
            t = tn;
            if (u[d] <= 0 || u[d] > qMax || maxAbs(u, d) > xMax) {
                break;
            }
            h = iterations <= 3 ? Math.min(1.5 * h, hMax) : (iterations > 6 ? 0.5 * h : h);
        }
        return out;
    }

    /** Newton corrector on F = 0, t.(v - u) = h from the predictor u + h t; null on a singular step. */
    private NewtonResult correct(double[] u, double[] t, double h) {
        double[] pred = new double[d + 1];
        for (int k = 0; k <= d; k++) {
            pred[k] = u[k] + h * t[k];
        }
        return DenseNewton.solve(new DenseNewton.SquareSystem() {
            @Override
            public int dimension() {
                return d + 1;
            }

            @Override
            public void residual(double[] v, double[] g) {
                r.residual(v, v[d] * ratedPeak, f);
                System.arraycopy(f, 0, g, 0, d);
                double s = 0;
                for (int k = 0; k <= d; k++) {
                    s += t[k] * (v[k] - u[k]);
                }
                g[d] = s - h;
            }

            @Override
            public void jacobian(double[] v, double[][] j) {
                r.jacobian(v, v[d] * ratedPeak, fx, fp);
                for (int row = 0; row < d; row++) {
                    System.arraycopy(fx[row], 0, j[row], 0, d);
                    j[row][d] = fp[row] * ratedPeak;
                }
                System.arraycopy(t, 0, j[d], 0, d + 1);
            }

            @Override
            public double scale(double[] v) {
                return r.scale(v, v[d] * ratedPeak);
            }
        }, pred, settings.tolerance(), settings.maxIterations());
    }

    /** Unit tangent at u oriented along the reference direction ref. */
    private double[] tangent(double[] u, double[] ref) {
        r.jacobian(u, u[d] * ratedPeak, fx, fp);
        double[][] a = new double[d + 1][d + 1];
        for (int row = 0; row < d; row++) {
            System.arraycopy(fx[row], 0, a[row], 0, d);
            a[row][d] = fp[row] * ratedPeak;
        }
        System.arraycopy(ref, 0, a[d], 0, d + 1);
        double[] rhs = new double[d + 1];
        rhs[d] = 1;
        double[] v;
        try {
            DecompositionSolver s = new LUDecomposition(new Array2DRowRealMatrix(a, false), 1e-300).getSolver();
            v = s.solve(new ArrayRealVector(rhs, false)).toArray();
        } catch (MathRuntimeException e) {
            throw new FerromapException(MessageKey.SINGULAR, "branch tangent undefined (a branch point?) at q = " + u[d] + " pu", e);
        }
        double n = norm(v);
        for (int k = 0; k <= d; k++) {
            v[k] /= n;
        }
        return v;
    }

    private FoldPoint refine(double[] u, double[] t, double hStep, boolean rising) {
        double[][] hold = new double[1][];
        try {
            double s = new BrentSolver(1e-12, 1e-14 * hStep, Double.MIN_NORMAL).solve(200, hh -> {
                NewtonResult nr = correct(u, t, hh);
                if (nr == null || !nr.converged()) {
                    throw new FerromapException(MessageKey.NO_CONVERGENCE, "corrector failed while refining a fold");
                }
                hold[0] = nr.x();
                return tangent(hold[0], t)[d];
            }, 0.0, hStep);
            NewtonResult nr = correct(u, t, s);
            return new FoldPoint(nr.x(), rising);
        } catch (MathRuntimeException e) {
            throw new FerromapException(MessageKey.NO_CONVERGENCE, "multi-harmonic fold not refined: " + e.getMessage(), e);
        }
    }

    private static double norm(double[] v) {
        double s = 0;
        for (double a : v) {
            s += a * a;
        }
        return Math.sqrt(s);
    }

    private static double maxAbs(double[] v, int n) {
        double m = 0;
        for (int k = 0; k < n; k++) {
            m = Math.max(m, Math.abs(v[k]));
        }
        return m;
    }
}
