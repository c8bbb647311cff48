package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/** Points made up for the test: a sharp knee, the case where plain cubic splines ring. */
class TabulatedCurveTest extends SaturationCurveContract {

    static final double[] FLUX = {0.5, 1.0, 1.5, 1.6, 1.7};
    static final double[] CURRENT = {0.01, 0.02, 0.04, 0.4, 4.0};
    static final double LAIR = 0.01;

    @Override
    protected SaturationCurve create() {
        return new TabulatedCurve(FLUX, CURRENT, LAIR);
    }

    /** One point only, continued with its secant (NaN air core): the degenerate table. */
    @Nested
    class SinglePoint extends SaturationCurveContract {
        @Override
        protected SaturationCurve create() {
            return new TabulatedCurve(new double[] {1.3}, new double[] {0.7}, Double.NaN);
        }
    }

    /** An air-core slope far steeper than the last secant: the limiter leaves a slope jump there. */
    @Nested
    class SteepAirCore extends SaturationCurveContract {
        @Override
        protected SaturationCurve create() {
            return new TabulatedCurve(FLUX, CURRENT, 1e-4);
        }
    }

    /** Hermite interpolation returns the stored value at each knot (t = 0): exact. */
    @Test
    void passesThroughThePointsExactly() {
        SaturationCurve c = create();
        for (int k = 0; k < FLUX.length; k++) {
            assertEquals(CURRENT[k], c.current(FLUX[k]), 0.0, "point " + k);
            assertEquals(FLUX[k], c.fluxLinkage(CURRENT[k]), 0.0, "point " + k);
        }
    }

    /**
     * On these points a natural cubic spline (Commons Math SplineInterpolator, through the origin
     * too) overshoots and runs downhill somewhere; the Fritsch-Carlson interpolant stays strictly
     * increasing and inside each interval's current range [mem: Fritsch and Carlson, SIAM J. Numer.
     * Anal. 17(2), 1980, the alpha^2 + beta^2 &lt;= 9 sufficient condition]. The first assertion
     * shows the data do provoke the overshoot, so the second is not idle.
     */
    @Test
    void monotoneWhereANaturalSplineOvershoots() {
        double[] x = new double[FLUX.length + 1];
        double[] y = new double[FLUX.length + 1];
        System.arraycopy(FLUX, 0, x, 1, FLUX.length);
        System.arraycopy(CURRENT, 0, y, 1, CURRENT.length);
        PolynomialSplineFunction spline = new SplineInterpolator().interpolate(x, y);
        SaturationCurve c = create();
        double splineLowest = Double.POSITIVE_INFINITY;
        double previous = -1;
        for (int k = 0; k <= 17_000; k++) {
            double lam = FLUX[FLUX.length - 1] * k / 17_000.0;
            splineLowest = Math.min(splineLowest, spline.derivative().value(lam));
            double i = c.current(lam);
            assertTrue(i > previous, "not increasing at " + lam);
            int seg = 0;
            while (seg < x.length - 1 && x[seg + 1] < lam) {
                seg++;
            }
            assertTrue(i >= y[seg] && i <= y[Math.min(seg + 1, y.length - 1)], "outside its interval's range at " + lam);
            previous = i;
        }
        assertTrue(splineLowest < 0, "the natural spline should overshoot on these points: " + splineLowest);
    }

    /**
     * Collinear points through the origin give secants all equal, so every knot slope equals them and
     * the cubic is the straight line; its fundamental is slope * A [der]. Tolerances: round-off for
     * the values, the 1e-10 quadrature promise for I1.
     */
    @Test
    void collinearPointsGiveTheLine() {
        TabulatedCurve c = new TabulatedCurve(new double[] {1, 2, 3}, new double[] {2, 4, 6}, Double.NaN);
        assertEquals(0.5, c.airCoreInductance(), 1e-15);
        for (double lam : new double[] {0.25, 1.5, 2.9, 5}) {
            assertEquals(2 * lam, c.current(lam), 1e-14 * lam);
            assertEquals(2.0, c.currentSlope(lam), 1e-14);
            assertEquals(2 * lam, c.fundamentalCurrent(lam), 1e-10 * lam);
        }
    }

    /**
     * The interpolant is C1: at interior knots the slope from the left equals the slope from the right
     * (both are the knot slope m_k). Approached within 1e-12 relative, the left slope may differ by
     * the curvature times that step; tolerance 1e-9 relative.
     */
    @Test
    void slopeIsContinuousAtInteriorKnotsAndTheOrigin() {
        SaturationCurve c = create();
        for (int k = 0; k < FLUX.length - 1; k++) {
            double left = c.currentSlope(FLUX[k] * (1 - 1e-12));
            double right = c.currentSlope(FLUX[k]);
            assertEquals(right, left, 1e-9 * right, "knot " + k);
        }
        assertEquals(c.currentSlope(1e-15), c.currentSlope(-1e-15), 0.0, "origin");
    }

    /**
     * Past the last point: the straight continuation with slope 1 / L_air. Tolerance: the rounding
     * of the flux (1e-16 relative) times the slope, with margin.
     */
    @Test
    void continuesWithTheAirCoreSlope() {
        SaturationCurve c = create();
        double last = FLUX[FLUX.length - 1];
        for (double d : new double[] {1e-3, 0.5, 20}) {
            assertEquals(CURRENT[CURRENT.length - 1] + d / LAIR, c.current(last + d), 1e-14 * (last + d) / LAIR);
        }
    }

    @Test
    void badPointsAreRefusedWithTheirKey() {
        PiecewiseLinearCurveTest.expect(MessageKey.NOT_MONOTONE, () -> new TabulatedCurve(new double[] {1, 3, 2}, new double[] {1, 2, 3}, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.NOT_MONOTONE, () -> new TabulatedCurve(new double[] {1, 2, 3}, new double[] {1, 3, 2}, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new TabulatedCurve(new double[] {0, 2}, new double[] {1, 3}, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new TabulatedCurve(new double[] {1, 2}, new double[] {1, 3, 4}, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new TabulatedCurve(new double[] {1, 2}, new double[] {1, 3}, -1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new TabulatedCurve(new double[0], new double[0], 1));
    }
}
