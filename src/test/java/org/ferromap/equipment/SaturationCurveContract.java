package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.util.List;
import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;

/**
 * The contract every {@link SaturationCurve} keeps; each implementation's test only supplies
 * {@link #create()} (STYLE.md habit 10). Expectations come from the definitions in the interface
 * and DOMAIN.md §3, evaluated independently: finite differences for the slope, Commons Math
 * quadrature (a different code base from the engine's Hipparchus) for the describing function.
 */
abstract class SaturationCurveContract {

    /** The curve under test. */
    protected abstract SaturationCurve create();

    /**
     * Fluxes where the curve may be non-smooth, Wb-turn: by default its defining points and the
     * kinks it reports. Any split is valid for the reference; good ones only make it converge sooner.
     */
    protected double[] breakFluxes(SaturationCurve c) {
        double[] pts = c.definingPoints().stream().mapToDouble(SaturationCurve.CurvePoint::flux).toArray();
        double[] kinks = c instanceof KinkedCurve k ? k.kinkFluxes() : new double[0];
        return java.util.stream.DoubleStream.concat(java.util.Arrays.stream(pts), java.util.Arrays.stream(kinks))
                .sorted().distinct().toArray();
    }

    /** Flux scale of the curve, Wb-turn: the largest defining flux. */
    protected static double scale(SaturationCurve c) {
        List<SaturationCurve.CurvePoint> pts = c.definingPoints();
        return pts.get(pts.size() - 1).flux();
    }

    /** Sample fluxes as fractions of the scale: below, around and past the defining points. */
    private static final double[] FRACTIONS = {0.0137, 0.1, 0.377, 0.5013, 0.55, 0.7131, 0.8329, 0.9717,
        1.0, 1.0911, 1.3, 2.5, 10};

    /**
     * Oddness is part of the interface's definition; the implementations mirror by sign, so it holds
     * exactly (tolerance zero).
     */
    @Test
    void currentAndDescribingFunctionAreOdd() {
        SaturationCurve c = create();
        double s = scale(c);
        assertEquals(0.0, c.current(0.0), 0.0);
        assertEquals(0.0, c.fundamentalCurrent(0.0), 0.0);
        for (double f : FRACTIONS) {
            double lam = f * s;
            assertEquals(-c.current(lam), c.current(-lam), 0.0, "i(-lambda) at " + lam);
            assertEquals(-c.fundamentalCurrent(lam), c.fundamentalCurrent(-lam), 0.0, "I1(-A) at " + lam);
            assertEquals(-c.fluxLinkage(c.current(lam)), c.fluxLinkage(-c.current(lam)), 0.0, "lambda(-i)");
        }
    }

    /** Interface: strictly increasing with strictly positive slope, checked on a dense grid. */
    @Test
    void strictlyIncreasingWithPositiveSlope() {
        SaturationCurve c = create();
        double s = scale(c);
        double previous = Double.NEGATIVE_INFINITY;
        for (int k = -4000; k <= 4000; k++) {
            double lam = 3 * s * k / 4000.0;
            double i = c.current(lam);
            assertTrue(i > previous, "current not increasing at " + lam);
            assertTrue(c.currentSlope(lam) > 0, "slope not positive at " + lam);
            previous = i;
        }
    }

    /**
     * Slope against a Richardson-extrapolated central difference (error O(h^4), h = 1e-6 of the
     * scale). Tolerance 1e-6 relative: truncation stays below it for knee widths down to 1e-4 of the
     * scale, round-off is about 1e-16 / 1e-6 = 1e-10. Points within 10 h of a break are skipped,
     * where a difference quotient straddles the kink.
     */
    @Test
    void slopeMatchesFiniteDifference() {
        SaturationCurve c = create();
        double s = scale(c);
        double h = 1e-6 * s;
        double[] breaks = breakFluxes(c);
        int checked = 0;
        for (double f : FRACTIONS) {
            double lam = f * s;
            if (nearBreak(lam, breaks, 10 * h)) {
                continue;
            }
            double d1 = (c.current(lam + h) - c.current(lam - h)) / (2 * h);
            double d2 = (c.current(lam + h / 2) - c.current(lam - h / 2)) / h;
            double fd = (4 * d2 - d1) / 3;
            double slope = c.currentSlope(lam);
            assertEquals(fd, slope, 1e-6 * slope, "slope at " + lam);
            assertEquals(1 / slope, c.differentialInductance(lam), 1e-15 / slope, "inductance at " + lam);
            checked++;
        }
        assertTrue(checked >= 5, "too few points away from the breaks: " + checked);
    }

    /**
     * fluxLinkage is the inverse of current. Tolerance 1e-12 relative: the inversions converge to
     * about an ulp; the error that stays is that of the forward formula, amplified by the ratio of
     * the steepest to the mean slope.
     */
    @Test
    void inverseRoundTrips() {
        SaturationCurve c = create();
        double s = scale(c);
        for (double f : FRACTIONS) {
            double lam = f * s;
            assertEquals(lam, c.fluxLinkage(c.current(lam)), 1e-12 * lam, "lambda(i(lambda)) at " + lam);
            double i = c.current(lam);
            assertEquals(i, c.current(c.fluxLinkage(i)), 1e-12 * i, "i(lambda(i)) at " + i);
        }
    }

    /**
     * Describing function against its definition (DOMAIN.md §3), I1(A) = (2/pi) int_0^pi
     * i(A cos t) cos t dt = (4/pi) int_0^(pi/2) ... for an odd curve, integrated by Commons Math's
     * iterative Legendre-Gauss rule split where A cos t crosses a break. Tolerance 1e-10 relative:
     * what the interface promises; the reference is converged to about 1e-13.
     */
    @Test
    void describingFunctionMatchesIndependentQuadrature() {
        SaturationCurve c = create();
        double s = scale(c);
        double[] breaks = breakFluxes(c);
        double[] amps = {0.05 * s, breaks[0], 0.4 * s, 0.7 * s, 0.9 * s, breaks[breaks.length / 2], s,
            1.0000001 * s, 1.05 * s, 1.5 * s, 4 * s};
        for (double amp : amps) {
            double expected = referenceFundamental(c, amp, breaks);
            assertEquals(expected, c.fundamentalCurrent(amp), 1e-10 * expected, "I1 at amplitude " + amp);
        }
    }

    /** Interface: defining points have positive, increasing flux and lie on the curve (1e-12: round-off). */
    @Test
    void definingPointsLieOnTheCurve() {
        SaturationCurve c = create();
        List<SaturationCurve.CurvePoint> pts = c.definingPoints();
        assertFalse(pts.isEmpty());
        double previous = 0;
        for (SaturationCurve.CurvePoint p : pts) {
            assertTrue(p.flux() > previous, "defining fluxes must increase: " + p);
            assertEquals(p.current(), c.current(p.flux()), 1e-12 * p.current(), "point " + p);
            previous = p.flux();
        }
    }

    /**
     * Far past the knee the slope is 1 / L_air (interface: the inductance approached in deep
     * saturation). At 1e4 times the scale the knee's share of the slope is below 1e-9 for every curve
     * tested; tolerance 1e-9 relative for that reason.
     */
    @Test
    void deepSaturationSlopeIsTheAirCore() {
        SaturationCurve c = create();
        double lair = c.airCoreInductance();
        assumeTrue(Double.isFinite(lair), "curve has no air-core slope");
        assertTrue(lair > 0);
        assertEquals(1.0, c.currentSlope(1e4 * scale(c)) * lair, 1e-9);
    }

    /** Interface: a short human description, one line. */
    @Test
    void describeIsOneShortLine() {
        String d = create().describe();
        assertFalse(d.isBlank());
        assertFalse(d.contains("\n"));
        assertTrue(d.length() <= 240, d);
    }

    /** (4/pi) int_0^(pi/2) i(A cos t) cos t dt with Commons Math, split at the breaks below A. */
    static double referenceFundamental(SaturationCurve c, double amp, double[] breaks) {
        // Per piece: 1e-13 relative, or 1e-16 of the peak current times the range (absolute), so
        // that tiny pieces do not chase round-off.
        double absolute = 1e-16 * Math.abs(c.current(amp));
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(16, 1e-13, absolute, 2, 100_000);
        double top = 0.5 * Math.PI;
        double sum = 0;
        double to = top;
        for (double b : breaks) {
            // Pieces narrower than 1e-12 rad are merged into the next: their share is below 1e-12
            // of the total, and Commons Math's rule cannot place distinct nodes in them.
            if (b < amp && Math.acos(b / amp) < to - 1e-12) {
                double at = Math.acos(b / amp);
                sum += gauss.integrate(50_000_000, t -> c.current(amp * Math.cos(t)) * Math.cos(t), at, to);
                to = at;
            }
        }
        if (to > 0) {
            sum += gauss.integrate(50_000_000, t -> c.current(amp * Math.cos(t)) * Math.cos(t), 0, to);
        }
        return 4 / Math.PI * sum;
    }

    private static boolean nearBreak(double lam, double[] breaks, double distance) {
        for (double b : breaks) {
            if (Math.abs(Math.abs(lam) - b) < distance) {
                return true;
            }
        }
        return false;
    }
}
