package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import org.ferromap.circuit.EquivalentCircuit;
import org.junit.jupiter.api.Test;

/**
 * The continuation residual against the balance's own multi-harmonic residual (written
 * separately, with its own coefficient rates) and against difference quotients.
 */
class LoopResidualTest {

    private static final List<CircuitParameter> STANDARD = List.of(CircuitParameter.SOURCE, CircuitParameter.SERIES_CAPACITANCE,
            CircuitParameter.SHUNT_CAPACITANCE, CircuitParameter.CORE_LOSS_RESISTANCE, CircuitParameter.LOAD_RESISTANCE);

    private static EquivalentCircuit circuit() {
        return SingleHarmonicBalanceTest.siExample().withLoadResistance(5e5).withSourceAngle(0.7);
    }

    /**
     * Same residual, Jacobian and dF/dp as MultiHarmonicResidual for the five standard
     * parameters (H = 5, odd harmonics, 61 samples) at a random coefficient vector and a value
     * away from the reference. 1e-12 of the largest entry: the two evaluate the same sums in a
     * different order.
     */
    @Test
    void agreesWithTheMultiHarmonicResidual() {
        Random rnd = new Random(7L);
        EquivalentCircuit c = circuit();
        HarmonicBasis basis = new HarmonicBasis(5, true, 61);
        for (CircuitParameter par : STANDARD) {
            double p = 1.3 * par.valueOf(c);
            MultiHarmonicResidual other = new MultiHarmonicResidual(c, par, basis);
            LoopResidual mine = new LoopResidual(CircuitPlane.of(v -> par.apply(c, v)), c, BalanceAxis.of(par), p, null, 0, 5, 61);
            int d = basis.dimension();
            double[] x = new double[d];
            for (int k = 0; k < d; k++) {
                x[k] = (rnd.nextDouble() - 0.5) * (k < 2 ? 2.0 : 0.2);
            }
            double[] f1 = new double[d];
            double[] f2 = new double[d];
            other.residual(x, p, f1);
            mine.residual(x, p, Double.NaN, f2);
            compare(f1, f2, par + " residual");
            double[][] j1 = new double[d][d];
            double[][] j2 = new double[d][d];
            double[] p1 = new double[d];
            double[] p2 = new double[d];
            other.jacobian(x, p, j1, p1);
            mine.jacobian(x, p, Double.NaN, j2, p2, null);
            for (int r = 0; r < d; r++) {
                compare(j1[r], j2[r], par + " Jacobian row " + r);
            }
            compare(p1, p2, par + " dF/dp");
        }
    }

    /**
     * H = 1: the describing-function residual equals the H = 1 AFT residual of
     * MultiHarmonicResidual with alias-free samples (exact for a polynomial, DOMAIN.md §3 [der]),
     * and its analytic Jacobian and rates (frequency and a differenced series capacitance
     * included) match central differences [cp: derivative check]: step 1e-6 relative,
     * truncation ~1e-12, round-off ~1e-10; tolerance 1e-7 of the largest entry.
     */
    @Test
    void singleHarmonicMatchesAftAndDifferences() {
        EquivalentCircuit c = circuit();
        double[] x = {-0.83, 0.21};
        MultiHarmonicResidual aft = new MultiHarmonicResidual(c, CircuitParameter.SOURCE, new HarmonicBasis(1, true, 11));
        LoopResidual sh = new LoopResidual(CircuitPlane.of(c::withSourcePeak), c, BalanceAxis.of(CircuitParameter.SOURCE),
                1e4, null, 0, 1, 0);
        double[] f1 = new double[2];
        double[] f2 = new double[2];
        aft.residual(x, 20e3, f1);
        sh.residual(x, 20e3, Double.NaN, f2);
        compare(f1, f2, "H = 1 residual");

        double twoPi = 2 * Math.PI;
        List<Object[]> cases = List.of(
                new Object[] {BalanceAxis.frequency(), (java.util.function.DoubleFunction<EquivalentCircuit>) f -> c.withOmega(twoPi * f), 55.0},
                new Object[] {BalanceAxis.differenced("series-capacitance", "F", false),
                    (java.util.function.DoubleFunction<EquivalentCircuit>) c::withSeriesCapacitance, 0.3e-6},
                new Object[] {BalanceAxis.of(CircuitParameter.CORE_LOSS_RESISTANCE),
                    (java.util.function.DoubleFunction<EquivalentCircuit>) c::withCoreLossResistance, 2e6});
        for (Object[] cs : cases) {
            BalanceAxis axis = (BalanceAxis) cs[0];
            @SuppressWarnings("unchecked")
            java.util.function.DoubleFunction<EquivalentCircuit> fam = (java.util.function.DoubleFunction<EquivalentCircuit>) cs[1];
            double p = (double) cs[2];
            LoopResidual r = new LoopResidual(CircuitPlane.of(fam), c, axis, p, null, 0, 1, 0);
            double[][] j = new double[2][2];
            double[] dp = new double[2];
            r.jacobian(x, p, Double.NaN, j, dp, null);
            double[] up = new double[2];
            double[] down = new double[2];
            double h = 1e-6 * p;
            r.residual(x, p + h, Double.NaN, up);
            r.residual(x, p - h, Double.NaN, down);
            double[] fd = {(up[0] - down[0]) / (2 * h), (up[1] - down[1]) / (2 * h)};
            assertEquals(fd[0], dp[0], 1e-7 * Math.max(Math.abs(fd[0]), Math.abs(fd[1])), axis.name());
            assertEquals(fd[1], dp[1], 1e-7 * Math.max(Math.abs(fd[0]), Math.abs(fd[1])), axis.name());
            for (int col = 0; col < 2; col++) {
                double[] xu = x.clone();
                double[] xd = x.clone();
                xu[col] += 1e-6;
                xd[col] -= 1e-6;
                r.residual(xu, p, Double.NaN, up);
                r.residual(xd, p, Double.NaN, down);
                for (int row = 0; row < 2; row++) {
                    assertEquals((up[row] - down[row]) / 2e-6, j[row][col], 1e-7 * (Math.abs(j[0][0]) + Math.abs(j[1][1])),
                            axis.name() + " J" + row + col);
                }
            }
        }
    }

    private static void compare(double[] a, double[] b, String what) {
        double scale = 0;
        for (double v : a) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int k = 0; k < a.length; k++) {
            assertEquals(a[k], b[k], 1e-12 * scale, what + " entry " + k);
        }
    }
}
