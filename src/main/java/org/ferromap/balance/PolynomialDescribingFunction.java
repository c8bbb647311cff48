package org.ferromap.balance;

import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;

/** Closed-form describing function of i = a lambda + b lambda^n: I1 = a L + k_n b L^n (DOMAIN.md §3, derived). */
final class PolynomialDescribingFunction implements DescribingFunction {

    private final PolynomialCurve curve;
    /** n k_n b, A per (Wb-turn)^n. */
    private final double slopeCoefficient;

    PolynomialDescribingFunction(PolynomialCurve curve) {
        this.curve = curve;
        this.slopeCoefficient = curve.n() * PolynomialCurve.describingCoefficient(curve.n()) * curve.b();
    }

    @Override
    public double value(double amplitude) {
        return curve.fundamentalCurrent(amplitude);
    }

    @Override
    public double slope(double amplitude) {
        double p = 1.0;
        for (int j = 1; j < curve.n(); j++) {
            p *= amplitude;
        }
        return curve.a() + slopeCoefficient * p;
    }

    @Override
    public SaturationCurve curve() {
        return curve;
    }
}
