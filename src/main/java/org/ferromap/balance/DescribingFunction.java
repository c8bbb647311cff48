package org.ferromap.balance;

import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;

/**
 * The fundamental-frequency describing function of a magnetizing curve and its slope
 * (DOMAIN.md §3): I1(Lambda) = (2/pi) int_0^pi i(Lambda cos t) cos t dt, A, and
 * dI1/dLambda = (4/pi) int_0^{pi/2} i'(Lambda cos t) cos^2 t dt, 1/H.
 *
 * <p>The value always comes from the curve itself ({@link SaturationCurve#fundamentalCurrent});
 * the slope is closed form for {@link PolynomialCurve} and adaptive quadrature of
 * {@link SaturationCurve#currentSlope} otherwise. Implementations are immutable and thread-safe.
 */
public interface DescribingFunction {

    /** I1 at flux amplitude {@code amplitude} (Wb-turn, &gt;= 0), A. */
    double value(double amplitude);

    /** dI1/dLambda at flux amplitude {@code amplitude} (Wb-turn, &gt;= 0), 1/H. */
    double slope(double amplitude);

    /** The curve described. */
    SaturationCurve curve();

    /** Closed form where the curve has one, quadrature otherwise. */
    static DescribingFunction of(SaturationCurve curve) {
        if (curve instanceof PolynomialCurve p) {
            return new PolynomialDescribingFunction(p);
        }
        return new QuadratureDescribingFunction(curve);
    }

    /** Always by quadrature of the curve's slope, even for polynomials (used to test the general path). */
    static DescribingFunction numerical(SaturationCurve curve) {
        return new QuadratureDescribingFunction(curve);
    }
}
