package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apache.commons.math3.analysis.integration.RombergIntegrator;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Input curves here are made up for the test; every expectation comes from a closed form or quadrature. */
class PiecewiseLinearCurveTest extends SaturationCurveContract {

    static final double[] FLUX = {0.8, 1.0, 1.1, 1.2};
    static final double[] CURRENT = {0.02, 0.05, 0.3, 2.0};

    @Override
    protected SaturationCurve create() {
        return new PiecewiseLinearCurve(FLUX, CURRENT, 0.01);
    }

    /** Falling slopes after a steep start, continued with the last slope (NaN air core). */
    @Nested
    class WithFallingSlopes extends SaturationCurveContract {
        @Override
        protected SaturationCurve create() {
            return new PiecewiseLinearCurve(new double[] {0.1, 0.5, 2.0}, new double[] {1.0, 1.5, 1.6}, Double.NaN);
        }
    }

    /**
     * The closed form near each breakpoint, where its dead-zone term is (1 - x)^1.5 small and a naive
     * 1 - (2/pi)(asin x + x sqrt(1 - x^2)) loses digits, against Commons Math Romberg quadrature of
     * the definition (DOMAIN.md §3) split at the breaks. Tolerance 1e-11 relative: Romberg on a
     * smooth pieces converges to its 1e-14 setting.
     */
    @Test
    void closedFormMatchesQuadratureJustPastEachBreakpoint() {
        PiecewiseLinearCurve c = (PiecewiseLinearCurve) create();
        RombergIntegrator romberg = new RombergIntegrator(1e-14, 1e-300, 3, 32);
        for (double b : FLUX) {
            for (double excess : new double[] {1e-9, 1e-6, 1e-3, 0.3}) {
                double amp = b * (1 + excess);
                double sum = 0;
                double to = 0.5 * Math.PI;
                for (double k : FLUX) {
                    if (k < amp) {
                        double at = Math.acos(k / amp);
                        sum += romberg.integrate(10_000_000, t -> c.current(amp * Math.cos(t)) * Math.cos(t), at, to);
                        to = at;
                    }
                }
                sum += romberg.integrate(10_000_000, t -> c.current(amp * Math.cos(t)) * Math.cos(t), 0, to);
                double expected = 4 / Math.PI * sum;
                assertEquals(expected, c.fundamentalCurrent(amp), 1e-11 * expected, "amplitude " + amp);
            }
        }
    }

    /** A straight line i = lambda / L has fundamental A / L [der: the cos t Fourier coefficient of cos t]; a few ulps. */
    @Test
    void singleSegmentIsLinear() {
        PiecewiseLinearCurve c = new PiecewiseLinearCurve(new double[] {2.0}, new double[] {0.5}, Double.NaN);
        assertEquals(4.0, c.airCoreInductance(), 1e-15);
        for (double amp : new double[] {0.3, 2.0, 7.0}) {
            assertEquals(amp / 4.0, c.fundamentalCurrent(amp), 1e-15 * amp);
            assertEquals(amp / 4.0, c.current(amp), 1e-15 * amp);
        }
    }

    /** The curve passes through its breakpoints: interpolation at a knot returns the stored value. */
    @Test
    void passesThroughTheBreakpoints() {
        PiecewiseLinearCurve c = (PiecewiseLinearCurve) create();
        for (int k = 0; k < FLUX.length; k++) {
            assertEquals(CURRENT[k], c.current(FLUX[k]), 1e-16);
            assertEquals(FLUX[k], c.fluxLinkage(CURRENT[k]), 1e-16);
        }
        // Past the last point the slope is 1 / L_air: i = 2.0 + (1.5 - 1.2) / 0.01.
        assertEquals(32.0, c.current(1.5), 1e-12);
    }

    @Test
    void badPointsAreRefusedWithTheirKey() {
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[] {1, 2}, new double[] {1}, 1));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[0], new double[0], 1));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(null, new double[] {1}, 1));
        expect(MessageKey.NOT_MONOTONE, () -> new PiecewiseLinearCurve(new double[] {1, 1.4, 1.2}, new double[] {1, 2, 3}, 1));
        expect(MessageKey.NOT_MONOTONE, () -> new PiecewiseLinearCurve(new double[] {1, 2}, new double[] {1, 1}, 1));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[] {-1, 2}, new double[] {1, 2}, 1));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[] {1, Double.NaN}, new double[] {1, 2}, 1));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[] {1, Double.POSITIVE_INFINITY}, new double[] {1, 2}, 1));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[] {1, 2}, new double[] {1, 2}, 0));
        expect(MessageKey.OUT_OF_RANGE, () -> new PiecewiseLinearCurve(new double[] {1, 2}, new double[] {1, 2}, Double.POSITIVE_INFINITY));
    }

    static void expect(MessageKey key, Executable build) {
        assertEquals(key, assertThrows(FerromapException.class, build).key());
    }
}
