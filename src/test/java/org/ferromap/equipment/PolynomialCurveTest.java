package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class PolynomialCurveTest {

    /**
     * Source: DOMAIN.md §3 [der] k_n = C(n,(n-1)/2)/2^(n-1); the listed values are exact binary
     * fractions, so the tolerance is a few ulps.
     */
    @ParameterizedTest
    @CsvSource({"3,0.75", "5,0.625", "7,0.546875", "9,0.4921875", "11,0.451171875"})
    void describingCoefficientsMatchTheBinomialFormula(int n, double expected) {
        assertEquals(expected, PolynomialCurve.describingCoefficient(n), 1e-15);
    }

    /**
     * Cross-check of the closed form against direct quadrature of (2/pi) int_0^pi i(L cos t) cos t dt
     * with Commons Math's Romberg integrator (independent algorithm). Tolerance 1e-10 relative: the
     * integrand is a smooth polynomial in cos t, Romberg reaches near round-off.
     */
    @Test
    void describingFunctionMatchesQuadrature() {
        PolynomialCurve c = new PolynomialCurve(1.5e-3, 1.33e-17, 9);
        double amp = 60.0;
        var integrator = new org.apache.commons.math3.analysis.integration.RombergIntegrator(1e-14, 1e-14, 3, 30);
        double q = 2 / Math.PI * integrator.integrate(1_000_000, t -> c.current(amp * Math.cos(t)) * Math.cos(t), 0, Math.PI);
        assertEquals(q, c.fundamentalCurrent(amp), 1e-10 * Math.abs(q));
    }

    @Test
    void inverseRoundTrips() {
        PolynomialCurve c = new PolynomialCurve(1.5e-3, 1.33e-17, 9);
        for (double lam : new double[] {-80, -10, 0.5, 30, 75}) {
            assertEquals(lam, c.fluxLinkage(c.current(lam)), 1e-12 * Math.abs(lam));
        }
    }

    @Test
    void evenExponentIsRefused() {
        FerromapException e = assertThrows(FerromapException.class, () -> new PolynomialCurve(1, 1, 8));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
    }
}
