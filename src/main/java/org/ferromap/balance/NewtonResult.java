package org.ferromap.balance;

/**
 * Outcome of a Newton solve.
 *
 * @param x the last iterate (per unit, the system's own variables)
 * @param converged whether the largest residual component fell below the tolerance
 * @param iterations Newton steps taken
 * @param residualNorm largest residual component at x, per unit
 */
public record NewtonResult(double[] x, boolean converged, int iterations, double residualNorm) {

    public NewtonResult {
        x = x.clone();
    }

    @Override
    public double[] x() {
        return x.clone();
    }
}
