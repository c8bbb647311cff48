package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/** Knee parameters made up for the test (unsaturated over air-core 2000, within DOMAIN.md §2's 1e3..1e4). */
class SmoothKneeCurveTest extends SaturationCurveContract {

    static final double LU = 100.0;
    static final double LAIR = 0.05;
    static final double LAMBDA_S = 1.2;

    @Override
    protected SaturationCurve create() {
        return new SmoothKneeCurve(LU, LAIR, LAMBDA_S);
    }

    /**
     * The knee's curvature sits within a few rho = L_air / (L_u - L_air) of Lambda_s in relative flux;
     * the reference quadrature is split there as well, so it converges without millions of points.
     */
    @Override
    protected double[] breakFluxes(SaturationCurve c) {
        double rho = LAIR / (LU - LAIR);
        double[] rel = {-16, -8, -4, -2, -1, -0.5, 0.5, 1, 2, 4, 8, 16, 32};
        double[] base = super.breakFluxes(c);
        double[] all = java.util.Arrays.copyOf(base, base.length + rel.length);
        for (int k = 0; k < rel.length; k++) {
            all[base.length + k] = LAMBDA_S * (1 + rel[k] * rho);
        }
        java.util.Arrays.sort(all);
        return all;
    }

    /** lambda(i) from the formula of DOMAIN.md §2, written out here. */
    private static double flux(double i) {
        return LAIR * i + LAMBDA_S * Math.tanh((LU - LAIR) * i / LAMBDA_S);
    }

    /**
     * current(lambda) against Commons Math's Brent root finder applied to the formula (an
     * independent inversion). Tolerance 1e-12 relative: both converge to round-off; the flux
     * recomputed from our current must return to within 1e-14 (a few ulps of the formula).
     */
    @Test
    void inversionMatchesBrent() {
        SaturationCurve c = create();
        BrentSolver brent = new BrentSolver(1e-15, 1e-300, 1e-300);
        for (double lam : new double[] {1e-6, 0.3, 1.0, 1.19, 1.2, 1.21, 1.3, 2.0, 40.0}) {
            double i = brent.solve(10_000, x -> flux(x) - lam, 0, lam / LAIR);
            assertEquals(i, c.current(lam), 1e-12 * i, "lambda " + lam);
            assertEquals(lam, flux(c.current(lam)), 1e-14 * lam);
        }
    }

    /** dlambda/di at the origin is L_air + (L_u - L_air) = L_u [der]; round-off only. */
    @Test
    void originSlopeIsTheUnsaturatedInductance() {
        assertEquals(1 / LU, create().currentSlope(0), 1e-15 / LU);
    }

    /**
     * Well below the knee the curve is the line lambda = L_u i, so I1 = A / L_u [der]; the cubic
     * term of tanh changes it by about (A / Lambda_s)^2 / 4 = 2e-9 at A = 1e-4 Lambda_s, hence 1e-8.
     */
    @Test
    void smallAmplitudeFundamentalIsLinear() {
        double amp = 1e-4 * LAMBDA_S;
        assertEquals(amp / LU, create().fundamentalCurrent(amp), 1e-8 * amp / LU);
    }

    @Test
    void badParametersAreRefusedWithTheirKey() {
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new SmoothKneeCurve(1, 2, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new SmoothKneeCurve(1, 1, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new SmoothKneeCurve(1, 0, 1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new SmoothKneeCurve(1, 0.1, -1));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE, () -> new SmoothKneeCurve(Double.NaN, 0.1, 1));
    }
}
