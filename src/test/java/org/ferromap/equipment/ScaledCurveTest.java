package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class ScaledCurveTest extends SaturationCurveContract {

    static SaturationCurve base() {
        return new TabulatedCurve(TabulatedCurveTest.FLUX, TabulatedCurveTest.CURRENT, TabulatedCurveTest.LAIR);
    }

    @Override
    protected SaturationCurve create() {
        return new ScaledCurve(base(), 1.5, 0.8);
    }

    /** Definition (class Javadoc): i_s(lambda) = 0.8 i(lambda / 1.5), and so lambda_s(i) = 1.5 lambda(i / 0.8); round-off. */
    @Test
    void matchesItsDefinition() {
        SaturationCurve b = base();
        SaturationCurve c = create();
        for (double lam : new double[] {0.3, 1.2, 2.4, 2.55, 4.0}) {
            assertEquals(0.8 * b.current(lam / 1.5), c.current(lam), 1e-15 * c.current(lam));
            assertEquals(1.5 * b.fluxLinkage(c.current(lam) / 0.8), c.fluxLinkage(c.current(lam)), 1e-14 * lam);
        }
        // Air core: lambda = 1.5 lambda_b, i = 0.8 i_b, so dlambda/di = (1.5 / 0.8) L_air [der].
        assertEquals(1.5 / 0.8 * TabulatedCurveTest.LAIR, c.airCoreInductance(), 1e-17);
    }

    /**
     * Inductance factor k (L_eq = k L_m, DOMAIN.md §1.2 table): a line of inductance 2 H scaled by
     * k = 1.5 in flux is a line of 3 H, fundamental A / 3 [der]; round-off only.
     */
    @Test
    void fluxScaleMultipliesTheInductance() {
        SaturationCurve c = new ScaledCurve(new PiecewiseLinearCurve(new double[] {1.0}, new double[] {0.5}, Double.NaN), 1.5, 1.0);
        for (double lam : new double[] {0.2, 1.0, 4.0}) {
            assertEquals(lam / 3.0, c.current(lam), 1e-15 * lam);
            assertEquals(lam / 3.0, c.fundamentalCurrent(lam), 1e-15 * lam);
        }
        assertEquals(3.0, c.airCoreInductance(), 1e-15);
    }

    @Test
    void badScalesAreRefusedWithTheirKey() {
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new ScaledCurve(null, 1, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new ScaledCurve(base(), 0, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new ScaledCurve(base(), 1, -2));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new ScaledCurve(base(), Double.POSITIVE_INFINITY, 1));
    }
}
