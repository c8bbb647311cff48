package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class CompositeCurveTest extends SaturationCurveContract {

    static SaturationCurve phase() {
        return new PiecewiseLinearCurve(PiecewiseLinearCurveTest.FLUX, PiecewiseLinearCurveTest.CURRENT, 0.01);
    }

    @Override
    protected SaturationCurve create() {
        return CompositeCurve.floatingWye(phase());
    }

    /** Floating wye of a smooth knee: the knee marks must survive the mapping. */
    @Nested
    class OfSmoothKnee extends SaturationCurveContract {
        @Override
        protected SaturationCurve create() {
            return CompositeCurve.floatingWye(new SmoothKneeCurve(SmoothKneeCurveTest.LU, SmoothKneeCurveTest.LAIR,
                    SmoothKneeCurveTest.LAMBDA_S));
        }
    }

    /** The general sum: a piecewise-linear and a tabulated branch at different current ratios. */
    @Nested
    class GeneralSum extends SaturationCurveContract {
        @Override
        protected SaturationCurve create() {
            return CompositeCurve.sum(List.of(phase(), new TabulatedCurve(TabulatedCurveTest.FLUX,
                    TabulatedCurveTest.CURRENT, TabulatedCurveTest.LAIR)), 1.0, 0.3);
        }
    }

    /**
     * Definition [der, DOMAIN.md §1.2]: lambda_eq(i) = lambda(i) + lambda(i/2), and current() is its
     * inverse. Tolerances: the flux is the same sum (round-off); the inverse converges to about an
     * ulp, 1e-12 relative leaves room for the slope ratio.
     */
    @Test
    void floatingWyeMatchesItsDefinition() {
        SaturationCurve p = phase();
        SaturationCurve c = create();
        for (double i : new double[] {1e-3, 0.03, 0.05, 0.2, 1.0, 3.9, 4.0, 50.0}) {
            double expected = p.fluxLinkage(i) + p.fluxLinkage(i / 2);
            assertEquals(expected, c.fluxLinkage(i), 1e-15 * expected, "i = " + i);
            assertEquals(i, c.current(expected), 1e-12 * i, "i = " + i);
        }
    }

    /**
     * A linear phase of inductance L gives the floating-wye 1.5 L of DOMAIN.md §1.2 [der]: current
     * lambda / 1.5 L, fundamental A / 1.5 L, air-core 1.5 L. Round-off and the inversion's ulp, and
     * the quadrature's 1e-10 promise for I1.
     */
    @Test
    void linearPhaseGivesOneAndAHalfTimesItsInductance() {
        SaturationCurve c = CompositeCurve.floatingWye(new PiecewiseLinearCurve(new double[] {1.0}, new double[] {0.5}, Double.NaN));
        assertEquals(3.0, c.airCoreInductance(), 1e-15);
        for (double lam : new double[] {0.2, 1.0, 4.0}) {
            assertEquals(lam / 3.0, c.current(lam), 1e-14 * lam);
            assertEquals(1 / 3.0, c.currentSlope(lam), 1e-14);
            assertEquals(lam / 3.0, c.fundamentalCurrent(lam), 1e-10 * lam);
        }
    }

    /** Each branch sees r_k i, so the deep-saturation inductance is sum r_k L_air,k [der]. */
    @Test
    void airCoreInductanceAddsWithTheRatios() {
        assertEquals(1.5 * 0.01, create().airCoreInductance(), 1e-17);
    }

    @Test
    void badPartsAreRefusedWithTheirKey() {
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CompositeCurve.floatingWye(null));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CompositeCurve.sum(List.of(phase()), 0.0));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CompositeCurve.sum(List.of(phase()), Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CompositeCurve.sum(List.of(phase(), phase()), 1.0));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CompositeCurve.sum(List.of()));
    }
}
