package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;

class DormandPrince853Test {

    @Test
    void weightsSatisfyTheQuadratureOrderConditionsUpToEight() {
        // Order conditions sum_i b_i c_i^(q-1) = 1/q, q = 1..8, and the row sums c_i = sum_j a_ij
        // [der: Runge-Kutta order conditions, Hairer, Norsett, Wanner, Solving ODEs I, II.2].
        // 1e-13: 16-digit coefficients of magnitude up to ~40 summed over 12 terms.
        double[] b = DormandPrince853.weights();
        double[] c = DormandPrince853.nodes();
        for (int q = 1; q <= 8; q++) {
            double sum = 0;
            for (int i = 0; i < b.length; i++) {
                sum += b[i] * Math.pow(c[i], q - 1);
            }
            assertEquals(1.0 / q, sum, 1e-13, "quadrature condition of order " + q);
        }
        double[][] a = DormandPrince853.matrix();
        for (int i = 0; i < a.length; i++) {
            double row = 0;
            for (double v : a[i]) {
                row += v;
            }
            assertEquals(c[i + 1], row, 1e-13, "row sum of stage " + (i + 2));
        }
    }

    @Test
    void tableauMatchesHipparchusCopy() {
        // Copy check against Hipparchus's DOP853 tableau (an independent copy of the same
        // published coefficients); identical doubles expected, 1 ulp allowed.
        DormandPrince853Integrator h = new DormandPrince853Integrator(1e-3, 1, 1e-6, 1e-6);
        double[] c = DormandPrince853.nodes();
        double[][] a = DormandPrince853.matrix();
        double[] b = DormandPrince853.weights();
        for (int i = 0; i < 11; i++) {
            assertEquals(h.getC()[i], c[i + 1], Math.ulp(c[i + 1]));
            for (int j = 0; j < a[i].length; j++) {
                assertEquals(h.getA()[i][j], a[i][j], Math.ulp(a[i][j]));
            }
        }
        for (int i = 0; i < 12; i++) {
            assertEquals(h.getB()[i], b[i], Math.ulp(b[i]));
        }
    }

    @Test
    void harmonicOscillatorAndDenseOutputMatchTheClosedForm() {
        // y'' = -y, y(0) = 1, y'(0) = 0: y = cos t [der]. Dense output checked at 1000 points.
        DormandPrince853 integ = DormandPrince853.uniform(2, 1e-12, 1e-12, 1e-10, 1.0);
        double[] y = {1, 0};
        double[] out = new double[2];
        double[] worst = {0};
        DormandPrince853.Status st = integ.integrate((t, z, d) -> {
            d[0] = z[1];
            d[1] = -z[0];
        }, 0, y, 20, 100_000, (t0, t1) -> {
            for (int k = 0; k <= 1000; k++) {
                double t = 0.02 * k;
                if (t >= t0 && t <= t1) {
                    integ.interpolate(t, out);
                    worst[0] = Math.max(worst[0], Math.abs(out[0] - Math.cos(t)) + Math.abs(out[1] + Math.sin(t)));
                }
            }
        });
        assertEquals(DormandPrince853.Status.OK, st);
        // 1e-9: local tolerance 1e-12 accumulated over a few hundred steps, plus the order-7
        // interpolant error at this tolerance.
        assertEquals(Math.cos(20), y[0], 1e-9);
        assertEquals(-Math.sin(20), y[1], 1e-9);
        assertTrue(worst[0] < 1e-9, "dense output error " + worst[0]);
    }

    @Test
    void nonFiniteRightHandSideIsReportedNotThrown() {
        DormandPrince853 integ = DormandPrince853.uniform(1, 1e-8, 1e-8, 1e-12, 1.0);
        double[] y = {1};
        // y' = y^3 blows up at t = 0.5 [der]; the integrator must stop with a status.
        DormandPrince853.Status st = integ.integrate((t, z, d) -> d[0] = z[0] * z[0] * z[0], 0, y, 2, 1_000_000, null);
        assertTrue(st != DormandPrince853.Status.OK, "status " + st);
    }

    @Test
    void stiffDecayIsDetected() {
        // y' = -1e7 (y - cos t): stiff, the step is limited by stability (|h lambda| ~ 6) [der].
        DormandPrince853 integ = DormandPrince853.uniform(1, 1e-6, 1e-6, 1e-14, 1.0);
        double[] y = {0};
        DormandPrince853.Status st = integ.integrate((t, z, d) -> d[0] = -1e7 * (z[0] - Math.cos(t)), 0, y, 10,
                1_000_000, null);
        assertEquals(DormandPrince853.Status.STIFF, st);
    }
}
