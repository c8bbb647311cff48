package org.ferromap.orbits;

import java.util.Arrays;
import java.util.function.DoubleFunction;
import org.ferromap.continuation.ContinuationProblem;
import org.ferromap.dynamics.DormandPrince853;

/**
 * The shooting residual G(z, p) = S(z; p) - z of a return map S as a continuation problem: the
 * analytic Jacobian dG/dz = M - I from the variational equations, dG/dp by central differences in
 * the parameter (step 1e-6 relative: the map is smooth in p and integrated to ~1e-11, so the
 * difference quotient is good to about 1e-5 relative, ample for a corrector). A failed
 * integration gives a NaN residual, which the engine treats as a failed step. Not thread-safe.
 */
final class ShootingProblem implements ContinuationProblem {

    private final DoubleFunction<? extends PeriodicSystem> family;
    private final Section section;
    private final PeriodMap map;
    private final int n;
    private final double pTypical;
    private final double[] image;
    private final double[] jac;
    private final double[] plus;
    private final double[] minus;

    ShootingProblem(DoubleFunction<? extends PeriodicSystem> family, Section section, PeriodMap map, double pTypical) {
        this.family = family;
        this.section = section;
        this.map = map;
        this.n = map.dimension();
        this.pTypical = pTypical;
        this.image = new double[n];
        this.jac = new double[n * n];
        this.plus = new double[n];
        this.minus = new double[n];
    }

    @Override
    public int dimension() {
        return n;
    }

    @Override
    public void residual(double[] x, double p, double[] out) {
        if (!apply(p, x, image, null)) {
            Arrays.fill(out, Double.NaN);
            return;
        }
        for (int i = 0; i < n; i++) {
            out[i] = image[i] - x[i];
        }
    }

    @Override
    public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
        if (!apply(p, x, image, jac)) {
            fillNaN(dFdx, dFdp);
            return;
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                dFdx[i][j] = jac[i * n + j] - (i == j ? 1.0 : 0.0);
            }
        }
        double h = 1e-6 * Math.max(Math.abs(p), pTypical);
        if (!apply(p + h, x, plus, null)
                || !apply(p - h, x, minus, null)) {
            fillNaN(dFdx, dFdp);
            return;
        }
        for (int i = 0; i < n; i++) {
            dFdp[i] = (plus[i] - minus[i]) / (2 * h);
        }
    }

    /**
     * One map evaluation; false when the integration fails or the parameter is not allowed for the
     * system (the corrector may try values outside the physical range, e.g. a negative capacitance).
     */
    private boolean apply(double p, double[] x, double[] out, double[] jacobian) {
        try {
            return section.apply(map, family.apply(p), x, out, jacobian) == DormandPrince853.Status.OK;
        } catch (org.ferromap.errors.FerromapException e) {
            if (e.key() == org.ferromap.errors.MessageKey.OUT_OF_RANGE) {
                return false;
            }
            throw e;
        }
    }

    private void fillNaN(double[][] dFdx, double[] dFdp) {
        for (double[] row : dFdx) {
            Arrays.fill(row, Double.NaN);
        }
        Arrays.fill(dFdp, Double.NaN);
    }
}
