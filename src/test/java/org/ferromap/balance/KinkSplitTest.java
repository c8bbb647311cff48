package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.ferromap.equipment.CompositeCurve;
import org.ferromap.equipment.PiecewiseLinearCurve;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.ScaledCurve;
import org.ferromap.equipment.SmoothKneeCurve;
import org.ferromap.equipment.TabulatedCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The describing-function slope split at the curve's kinks, also through scaled and composite curves. */
class KinkSplitTest {

    /** Knee points of realistic scale (common practice, no source). */
    private static final double[] FLUX = {60, 70, 80, 90};
    private static final double[] CURRENT = {0.02, 0.05, 0.2, 1.0};
    private static final PiecewiseLinearCurve PWL = new PiecewiseLinearCurve(FLUX, CURRENT, 0.26);

    static Stream<Arguments> curves() {
        return Stream.of(
                Arguments.of("piecewise linear", PWL),
                Arguments.of("scaled piecewise linear", new ScaledCurve(PWL, 1.5, 0.7)),
                Arguments.of("tabulated", new TabulatedCurve(FLUX, CURRENT, 0.26)),
                Arguments.of("scaled tabulated", new ScaledCurve(new TabulatedCurve(FLUX, CURRENT, 0.26), 0.8, 2.0)),
                Arguments.of("smooth knee", new SmoothKneeCurve(500, 0.26, 80)),
                Arguments.of("floating wye of piecewise linear", CompositeCurve.floatingWye(PWL)));
    }

    /**
     * The slope against a fourth-order central difference of the curve's own fundamental current
     * [der: definition of the derivative, Richardson's five-point formula]. With h = 1e-3 relative
     * the truncation error is of order h^4 = 1e-12 relative and the fundamental's own 1e-10
     * accuracy amplifies to about 1e-7 relative, hence 1e-6; amplitudes within 1 % of a kink are
     * skipped because the slope is not smooth there. The unsplit quadrature misses kinks seen
     * through a scaled curve by up to 3e-5 relative, so this also shows the split is in force.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("curves")
    void slopeMatchesDifferenceOfFundamental(String name, SaturationCurve curve) {
        QuadratureDescribingFunction df = new QuadratureDescribingFunction(curve);
        double[] kinks = curve.kinks();
        assertTrue(kinks.length > 0, name);
        int checked = 0;
        for (double a = 10.3; a < 600; a *= 1.031) {
            boolean nearKink = false;
            for (double k : kinks) {
                nearKink |= Math.abs(a / k - 1) < 0.01;
            }
            if (nearKink) {
                continue;
            }
            double h = 1e-3 * a;
            double fd = (8 * (curve.fundamentalCurrent(a + h) - curve.fundamentalCurrent(a - h))
                    - (curve.fundamentalCurrent(a + 2 * h) - curve.fundamentalCurrent(a - 2 * h))) / (12 * h);
            assertEquals(fd, df.slope(a), 1e-6 * Math.abs(fd), name + " at " + a);
            checked++;
        }
        assertTrue(checked > 50, name);
    }

    /**
     * For i(lambda) = c i0(lambda/f) the fundamental is c I1_0(Lambda/f), so its slope is
     * (c/f) I1_0'(Lambda/f) [der: chain rule]; the scaled curve's split path reproduces the bare
     * curve's to 1e-10 relative (both at 1e-11 tolerance on the same panels, rescaled).
     */
    @Test
    void scaledSlopeIsRescaledBareSlope() {
        double f = 1.5;
        double c = 0.7;
        QuadratureDescribingFunction bare = new QuadratureDescribingFunction(PWL);
        QuadratureDescribingFunction scaled = new QuadratureDescribingFunction(new ScaledCurve(PWL, f, c));
        for (double a = 10; a < 600; a *= 1.07) {
            double expected = c / f * bare.slope(a / f);
            assertEquals(expected, scaled.slope(a), 1e-10 * expected, "at " + a);
        }
    }
}
