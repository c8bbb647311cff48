package org.ferromap.circuit;

import java.util.function.DoubleUnaryOperator;
import org.ferromap.equipment.SaturationCurve;

/**
 * Test-local current of a composite branch lambda_eq(I) = lambda(p I) + lambda(q I) (DOMAIN.md
 * §1.2, the floating-wye composite is p = 1, q = 1/2): solves for I by Newton on the monotone
 * lambda_eq, with bisection safeguarding, to 1e-14 relative.
 */
final class CompositeInverse implements DoubleUnaryOperator {

    private final SaturationCurve curve;
    private final double p;
    private final double q;

    CompositeInverse(SaturationCurve curve, double p, double q) {
        this.curve = curve;
        this.p = p;
        this.q = q;
    }

    /** Flux linkage of the composite at current I. */
    double flux(double current) {
        return (p > 0 ? curve.fluxLinkage(p * current) : 0) + (q > 0 ? curve.fluxLinkage(q * current) : 0);
    }

    @Override
    public double applyAsDouble(double lambda) {
        if (lambda == 0) {
            return 0;
        }
        double target = Math.abs(lambda);
        double lo = 0;
        double hi = 1;
        while (flux(hi) < target) {
            hi *= 2;
        }
        double x = 0.5 * (lo + hi);
        for (int it = 0; it < 200; it++) {
            double f = flux(x) - target;
            if (f > 0) {
                hi = x;
            } else {
                lo = x;
            }
            double slope = (p > 0 ? p / curve.currentSlope(curve.fluxLinkage(p * x)) : 0)
                    + (q > 0 ? q / curve.currentSlope(curve.fluxLinkage(q * x)) : 0);
            double next = x - f / slope;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) <= 1e-14 * x || hi - lo <= 1e-15 * hi) {
                x = next;
                break;
            }
            x = next;
        }
        return Math.signum(lambda) * x;
    }
}
