package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class DescribingFunctionTest {

    /**
     * The 7-15 Gauss-Kronrod constants: the Kronrod rule integrates x^k exactly for k &lt;= 22
     * and the Gauss rule for k &lt;= 13 (exactness degrees of the pair, [der]); the exact integral
     * over [0, 1] is 1/(k+1). 1e-15: a few ulps of the sum.
     */
    @Test
    void kronrodConstantsAreExactOnPolynomials() {
        double[] ke = new double[2];
        for (int k = 0; k <= 22; k++) {
            final int p = k;
            GaussKronrod.rule(x -> Math.pow(x, p), 0, 1, ke);
            assertEquals(1.0 / (k + 1), ke[0], 1e-15, "Kronrod, degree " + k);
            if (k <= 13) {
                assertEquals(1.0 / (k + 1), ke[1], 1e-15, "Gauss, degree " + k);
            }
        }
    }

    /**
     * Quadrature slope of the describing function against the closed form
     * dI1/dL = a + n k_n b L^(n-1) (DOMAIN.md §3 [der]), n = 3..11, SI-scale coefficients.
     * 1e-11 relative: the quadrature is asked for 1e-12 on a polynomial integrand.
     */
    @ParameterizedTest
    @ValueSource(ints = {3, 5, 7, 9, 11})
    void quadratureSlopeMatchesClosedForm(int n) {
        PolynomialCurve p = new PolynomialCurve(1.5e-3, 1.33e-17 * Math.pow(75.0, 9 - n), n);
        DescribingFunction exact = DescribingFunction.of(p);
        DescribingFunction numeric = DescribingFunction.numerical(p);
        for (double lam : new double[] {1e-3, 10, 60, 75, 90, 150}) {
            double ref = p.a() + n * PolynomialCurve.describingCoefficient(n) * p.b() * Math.pow(lam, n - 1);
            assertEquals(ref, exact.slope(lam), 1e-14 * ref);
            assertEquals(ref, numeric.slope(lam), 1e-11 * ref);
        }
    }

    /**
     * Slope of a smooth non-polynomial curve against Commons Math Gauss-Legendre quadrature of
     * (4/pi) int i'(L cos t) cos^2 t dt (an independent algorithm; 64 panels of 32 points, converged to
     * ~1e-15 here, where 8 panels were found to leave 3e-8 at the sharpest knee).
     * 1e-11 relative: both sides converge to ~1e-13 on this analytic integrand.
     */
    @Test
    void quadratureSlopeOfSmoothCurve() {
        ArctanKneeCurve c = new ArctanKneeCurve(400.0, 0.4, 40.0);
        DescribingFunction df = DescribingFunction.of(c);
        GaussIntegratorFactory f = new GaussIntegratorFactory();
        for (double lam : new double[] {1, 30, 45, 60, 120}) {
            double ref = 0;
            for (int k = 0; k < 64; k++) {
                GaussIntegrator g = f.legendre(32, 0.5 * Math.PI * k / 64, 0.5 * Math.PI * (k + 1) / 64);
                ref += g.integrate(t -> c.currentSlope(lam * Math.cos(t)) * Math.cos(t) * Math.cos(t));
            }
            ref *= 4 / Math.PI;
            assertEquals(ref, df.slope(lam), 1e-11 * ref);
        }
    }
}
