package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/**
 * Round trips through the point-by-point method (DOMAIN.md §2, [mem] Neves and Dommel 1993): a known
 * peak curve (made up for the test) gives rms currents by the definition of rms, integrated with
 * Commons Math; converting them back must return the curve.
 */
class RmsTestConversionTest {

    static final double OMEGA = 2 * Math.PI * 50;
    static final double[] PEAK_FLUX = {0.6, 0.9, 1.1, 1.2, 1.3, 1.4};
    static final double[] PEAK_CURRENT = {0.05, 0.09, 0.2, 0.6, 2.5, 8.0};

    /**
     * I_rms^2 = (2/pi) int_0^(pi/2) i(lambda_k sin t)^2 dt for a sinusoidal flux of peak lambda_k
     * (quarter-wave symmetry of an odd curve), split where lambda_k sin t crosses a breakpoint.
     */
    static double rmsCurrent(SaturationCurve c, double peakFlux) {
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(16, 1e-14, 1e-300, 2, 10_000);
        double sum = 0;
        double from = 0;
        for (SaturationCurve.CurvePoint p : c.definingPoints()) {
            if (p.flux() < peakFlux) {
                double to = Math.asin(p.flux() / peakFlux);
                sum += gauss.integrate(10_000_000, t -> sq(c.current(peakFlux * Math.sin(t))), from, to);
                from = to;
            }
        }
        sum += gauss.integrate(10_000_000, t -> sq(c.current(peakFlux * Math.sin(t))), from, 0.5 * Math.PI);
        return Math.sqrt(2 / Math.PI * sum);
    }

    private static double sq(double v) {
        return v * v;
    }

    /**
     * The work item asks for the breakpoints back to 1e-6 relative; the forward rms values are
     * converged to about 1e-14, so the error that error-propagation through six points can add stays
     * far below that.
     */
    @Test
    void recoversAKnownPeakCurve() {
        PiecewiseLinearCurve truth = new PiecewiseLinearCurve(PEAK_FLUX, PEAK_CURRENT, 0.02);
        double[] v = new double[PEAK_FLUX.length];
        double[] i = new double[PEAK_FLUX.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = OMEGA * PEAK_FLUX[k] / Math.sqrt(2);
            i[k] = rmsCurrent(truth, PEAK_FLUX[k]);
        }
        assertRecovered(RmsTestConversion.convert(OMEGA, v, i, null, 0.02));
    }

    /**
     * With a loss current in phase with the voltage, the meter reads I = sqrt(I_mag^2 + (P/V)^2)
     * (DOMAIN.md §2); removing it must give the same curve, to the same 1e-6.
     */
    @Test
    void recoversAKnownPeakCurveWithLossesRemoved() {
        PiecewiseLinearCurve truth = new PiecewiseLinearCurve(PEAK_FLUX, PEAK_CURRENT, 0.02);
        double[] v = new double[PEAK_FLUX.length];
        double[] i = new double[PEAK_FLUX.length];
        double[] p = new double[PEAK_FLUX.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = OMEGA * PEAK_FLUX[k] / Math.sqrt(2);
            double mag = rmsCurrent(truth, PEAK_FLUX[k]);
            p[k] = 3.0 + 4.0 * k;
            i[k] = Math.sqrt(mag * mag + sq(p[k] / v[k]));
        }
        assertRecovered(RmsTestConversion.convert(OMEGA, v, i, p, 0.02));
    }

    private static void assertRecovered(PiecewiseLinearCurve got) {
        List<SaturationCurve.CurvePoint> pts = got.definingPoints();
        assertEquals(PEAK_FLUX.length, pts.size(), "one breakpoint per test point");
        for (int k = 0; k < pts.size(); k++) {
            assertEquals(PEAK_FLUX[k], pts.get(k).flux(), 1e-14 * PEAK_FLUX[k], "flux " + k);
            assertEquals(PEAK_CURRENT[k], pts.get(k).current(), 1e-6 * PEAK_CURRENT[k], "current " + k);
        }
        assertEquals(0.02, got.airCoreInductance(), 1e-17);
    }

    /** In the linear first segment a sinusoidal flux draws a sinusoidal current: peak = sqrt(2) rms [der]. */
    @Test
    void firstPointIsTheSinusoidalPeak() {
        PiecewiseLinearCurve c = RmsTestConversion.convert(OMEGA, new double[] {230}, new double[] {0.4}, null, Double.NaN);
        SaturationCurve.CurvePoint p = c.definingPoints().get(0);
        assertEquals(Math.sqrt(2) * 230 / OMEGA, p.flux(), 1e-15 * p.flux());
        assertEquals(Math.sqrt(2) * 0.4, p.current(), 1e-15 * p.current());
    }

    @Test
    void badTestDataAreRefusedWithTheirKey() {
        double[] v = {100, 200};
        // Out of order.
        PiecewiseLinearCurveTest.expect(MessageKey.NOT_MONOTONE,
                () -> RmsTestConversion.convert(OMEGA, new double[] {100, 90}, new double[] {1, 2}, null, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.NOT_MONOTONE,
                () -> RmsTestConversion.convert(OMEGA, v, new double[] {2, 1}, null, Double.NaN));
        // Doubling the voltage with a flat segment beyond the first point already draws about 1.25 A
        // [der: (2/pi)(2 pi/3 - sqrt(3)/2) * 2 = 1.563 A^2]; 1.0001 A implies a falling curve.
        PiecewiseLinearCurveTest.expect(MessageKey.NOT_MONOTONE,
                () -> RmsTestConversion.convert(OMEGA, v, new double[] {1, 1.0001}, null, Double.NaN));
        // The loss current P/V = 1.5 A exceeds the 1 A measured.
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE,
                () -> RmsTestConversion.convert(OMEGA, v, new double[] {1, 2}, new double[] {150, 1}, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE,
                () -> RmsTestConversion.convert(OMEGA, v, new double[] {1, 2}, new double[] {-1, 1}, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE,
                () -> RmsTestConversion.convert(OMEGA, v, new double[] {1, 2}, new double[] {1}, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE,
                () -> RmsTestConversion.convert(0, v, new double[] {1, 2}, null, Double.NaN));
        PiecewiseLinearCurveTest.expect(MessageKey.OUT_OF_RANGE,
                () -> RmsTestConversion.convert(OMEGA, v, new double[] {1}, null, Double.NaN));
    }
}
