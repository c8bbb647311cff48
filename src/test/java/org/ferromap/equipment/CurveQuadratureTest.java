package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class CurveQuadratureTest {

    /**
     * An n-point Gauss-Legendre rule integrates polynomials up to degree 2n - 1 exactly [pub: any
     * numerical analysis text, e.g. Abramowitz and Stegun 25.4.29]; int_0^1 x^k dx = 1 / (k + 1).
     * Tolerance 1e-14 relative: round-off of 20 weighted terms; a wrong node or weight shows far
     * above it at the higher degrees.
     */
    @Test
    void twentyPointRuleIsExactToDegreeThirtyNine() {
        for (int k = 0; k <= 2 * CurveQuadrature.ORDER - 1; k++) {
            int p = k;
            double q = CurveQuadrature.gaussLegendre(x -> Math.pow(x, p), 0, 1);
            assertEquals(1.0 / (k + 1), q, 1e-14 / (k + 1), "degree " + k);
        }
    }

    /**
     * A dead zone of width b (i = sign(lambda) max(|lambda| - b, 0)) has the closed-form fundamental
     * A (2 t - sin 2 t) / pi, cos t = b / A [der, DOMAIN.md §3 definition integrated by hand]. The
     * adaptive rule, told where the kink is, must reach 1e-12 relative (its target is 1e-13).
     */
    @Test
    void adaptiveRuleResolvesADeadZone() {
        PiecewiseLinearCurve deadZone = new PiecewiseLinearCurve(new double[] {1.0}, new double[] {1e-12}, 1.0);
        for (double amp : new double[] {1.001, 1.5, 3.0, 40.0}) {
            double t = Math.acos(1.0 / amp);
            double expected = amp * (2 * t - Math.sin(2 * t)) / Math.PI + 1e-12 * amp * (1 - (2 * t - Math.sin(2 * t)) / Math.PI);
            double got = CurveQuadrature.fundamental(deadZone, amp, new double[] {1.0});
            assertEquals(expected, got, 1e-12 * expected, "amplitude " + amp);
        }
    }
}
