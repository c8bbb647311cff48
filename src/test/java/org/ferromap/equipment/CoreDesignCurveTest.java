package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/** Steel points shaped like grain-oriented steel (DOMAIN.md §2: saturating near 2 T), made up for the test. */
class CoreDesignCurveTest extends SaturationCurveContract {

    static final double[] B = {0.5, 1.0, 1.5, 1.7, 1.8, 1.9, 2.0};
    static final double[] H = {10, 20, 40, 100, 300, 1500, 8000};
    static final double AREA = 0.02;
    static final double PATH = 1.2;
    static final int TURNS = 500;

    @Override
    protected SaturationCurve create() {
        return CoreDesignCurve.fromSteel(B, H, AREA, PATH, TURNS, Double.NaN);
    }

    /**
     * Default air core mu0 N^2 A / l (DOMAIN.md §2), checked with mu0 = 4 pi 1e-7 H/m, its defined
     * value before the 2019 SI revision [pub: SI Brochure, 8th ed., 2006]. The measured value in use
     * since differs by about 5e-10 relative [mem: CODATA 2018], hence 1e-9.
     */
    @Test
    void defaultAirCoreIsTheCoreVolumeWithoutSteel() {
        double expected = 4e-7 * Math.PI * TURNS * TURNS * AREA / PATH;
        assertEquals(expected, create().airCoreInductance(), 1e-9 * expected);
    }

    /** lambda = N A B and i = H l / N at every point [der: Faraday and Ampere for a uniform core]; round-off. */
    @Test
    void pointsAreTheScaledSteelPoints() {
        List<SaturationCurve.CurvePoint> pts = create().definingPoints();
        assertEquals(B.length, pts.size());
        for (int k = 0; k < B.length; k++) {
            assertEquals(TURNS * AREA * B[k], pts.get(k).flux(), 1e-15 * pts.get(k).flux());
            assertEquals(H[k] * PATH / TURNS, pts.get(k).current(), 1e-15 * pts.get(k).current());
        }
    }

    @Test
    void givenAirCoreIsKept() {
        assertEquals(0.37, CoreDesignCurve.fromSteel(B, H, AREA, PATH, TURNS, 0.37).airCoreInductance(), 1e-16);
    }

    @Test
    void badDesignDataAreRefusedWithTheirKey() {
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CoreDesignCurve.fromSteel(B, H, AREA, PATH, 0, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CoreDesignCurve.fromSteel(B, H, -AREA, PATH, TURNS, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CoreDesignCurve.fromSteel(B, H, AREA, Double.NaN, TURNS, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CoreDesignCurve.fromSteel(B, new double[] {1, 2}, AREA, PATH, TURNS, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.NOT_MONOTONE,
                () -> CoreDesignCurve.fromSteel(new double[] {1.0, 1.6, 1.5}, new double[] {10, 20, 30}, AREA, PATH, TURNS, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> CoreDesignCurve.fromSteel(B, H, AREA, PATH, TURNS, 0));
    }
}
