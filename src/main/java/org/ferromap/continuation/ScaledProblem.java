package org.ferromap.continuation;

import java.util.Arrays;

/**
 * The user's problem in scaled variables z = (x / xScale, p / pScale [, q / qScale]) with each
 * residual row divided by its own scale, so every quantity the engine compares is of order one.
 * With {@code parameters == 1} it is a curve (n equations, n + 1 unknowns); with 2 it is the
 * state part of the fold-curve system (n equations, n + 2 unknowns). Not thread-safe: work arrays.
 */
final class ScaledProblem implements CurveSystem {

    final RawSystem raw;
    final int n;
    final int parameters;
    /** Per-state scale, units of each state. */
    final double[] xScale;
    /** Scale of p, units of p. */
    final double pScale;
    /** Scale of q, units of q (1 for one-parameter problems). */
    final double qScale;
    /** Fixed q for one-parameter use, units of q (unused by one-parameter problems). */
    final double qFixed;
    /** Per-row residual scale, units of each residual row; set once by {@link #scaleRows}. */
    final double[] fScale;

    private final double[] x;
    private final double[] f;
    private final double[] fPlus;
    private final double[] fMinus;
    private final double[] zWork;
    private final double[][] jx;
    private final double[] jp;
    private final double[] jq;

    ScaledProblem(RawSystem raw, int parameters, double[] xScale, double pScale, double qScale, double qFixed) {
        this.raw = raw;
        this.n = raw.n;
        this.parameters = parameters;
        this.xScale = xScale.clone();
        this.pScale = pScale;
        this.qScale = qScale;
        this.qFixed = qFixed;
        this.fScale = new double[n];
        Arrays.fill(fScale, 1.0);
        this.x = new double[n];
        this.f = new double[n];
        this.fPlus = new double[n];
        this.fMinus = new double[n];
        this.zWork = new double[n + 2];
        this.jx = new double[n][n];
        this.jp = new double[n];
        this.jq = new double[n];
    }

    @Override
    public int unknowns() {
        return n + parameters;
    }

    @Override
    public int equations() {
        return n;
    }

    double p(double[] z) {
        return z[n] * pScale;
    }

    double q(double[] z) {
        return parameters == 2 ? z[n + 1] * qScale : qFixed;
    }

    void state(double[] z, double[] out) {
        for (int j = 0; j < n; j++) {
            out[j] = z[j] * xScale[j];
        }
    }

    /** Sets the row scales to the largest entry of each row of the column-scaled Jacobian at z. */
    void scaleRows(double[] z, double[][] work) {
        Arrays.fill(fScale, 1.0);
        jacobian(z, work);
        int cols = unknowns();
        double largest = 0;
        for (int i = 0; i < n; i++) {
            double m = 0;
            for (int j = 0; j < cols; j++) {
                m = Math.max(m, Math.abs(work[i][j]));
            }
            fScale[i] = m;
            if (Double.isFinite(m)) {
                largest = Math.max(largest, m);
            }
        }
        // A row that vanishes at the start (a trivial solution) borrows the largest row's scale.
        double fallback = largest > 0 ? largest : 1.0;
        for (int i = 0; i < n; i++) {
            if (!(fScale[i] > 0) || !Double.isFinite(fScale[i])) {
                fScale[i] = fallback;
            }
        }
    }

    @Override
    public void value(double[] z, double[] out) {
        state(z, x);
        raw.residual(x, z[n] * pScale, q(z), f);
        for (int i = 0; i < n; i++) {
            out[i] = f[i] / fScale[i];
        }
    }

    @Override
    public void jacobian(double[] z, double[][] out) {
        if (raw.analytic()) {
            state(z, x);
            raw.jacobian(x, z[n] * pScale, q(z), jx, jp, jq);
            for (int i = 0; i < n; i++) {
                double[] row = out[i];
                double[] src = jx[i];
                double inv = 1.0 / fScale[i];
                for (int j = 0; j < n; j++) {
                    row[j] = src[j] * xScale[j] * inv;
                }
                row[n] = jp[i] * pScale * inv;
                if (parameters == 2) {
                    row[n + 1] = jq[i] * qScale * inv;
                }
            }
            return;
        }
        int cols = unknowns();
        System.arraycopy(z, 0, zWork, 0, cols);
        for (int j = 0; j < cols; j++) {
            double base = z[j];
            double h = FiniteDifferences.CENTRAL_STEP * Math.max(Math.abs(base), 1.0);
            double up = base + h;
            double down = base - h;
            zWork[j] = up;
            value(zWork, fPlus);
            zWork[j] = down;
            value(zWork, fMinus);
            zWork[j] = base;
            double inv = 1.0 / (up - down);
            for (int i = 0; i < n; i++) {
                out[i][j] = (fPlus[i] - fMinus[i]) * inv;
            }
        }
    }

    /** The Jacobian dF/dx in the problem's own units at z, for stability criteria. */
    void physicalStateJacobian(double[] z, double[][] scaledWork, double[][] out) {
        jacobian(z, scaledWork);
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                out[i][j] = scaledWork[i][j] * fScale[i] / xScale[j];
            }
        }
    }
}
