package org.ferromap.equipment;

import java.util.List;

/**
 * The magnetizing characteristic of a core: peak current as an odd, strictly increasing function
 * of flux linkage. SI throughout: flux linkage in Wb-turn (V s), current in A, inductance in H.
 *
 * <p>Implementations are immutable and check on construction that the curve is monotone with
 * positive slopes. They are shared between threads freely.
 */
public interface SaturationCurve {

    /** Magnetizing current i(lambda), A, for flux linkage lambda in Wb-turn. Odd in lambda. */
    double current(double fluxLinkage);

    /** Slope di/dlambda at lambda, 1/H. Strictly positive. Used by Jacobians and variational equations. */
    double currentSlope(double fluxLinkage);

    /** Differential inductance dlambda/di at lambda, H. */
    default double differentialInductance(double fluxLinkage) {
        return 1.0 / currentSlope(fluxLinkage);
    }

    /**
     * Fundamental-frequency describing function: the peak of the fundamental of i(Lambda cos theta),
     * I1(Lambda) = (2/pi) * integral over 0..pi of i(Lambda cos theta) cos theta dtheta, A.
     * Closed form where one exists, otherwise numerical to 1e-10 relative.
     */
    double fundamentalCurrent(double fluxAmplitude);

    /** Flux linkage at a given current, Wb-turn: the inverse of {@link #current(double)}. */
    double fluxLinkage(double current);

    /**
     * The points that define the curve, as (flux linkage Wb-turn, current A) pairs with positive
     * flux: the breakpoints given or derived (one per rms test point for test data), or a sample
     * of the closed form for analytic curves.
     */
    List<CurvePoint> definingPoints();

    /** Inductance approached in deep saturation, H; {@code Double.POSITIVE_INFINITY} if the curve has none (polynomials). */
    double airCoreInductance();

    /** A short human description, such as "polynomial a=1.5e-3 b=1.3e-17 n=9". */
    String describe();

    /**
     * Fluxes where the curve is not smooth (a slope or curvature jump) or where its curvature is
     * concentrated, Wb-turn, positive and strictly increasing; empty for smooth curves (the
     * default). Quadrature splits there. A fresh array the caller may change.
     */
    default double[] kinks() {
        return this instanceof KinkedCurve k ? k.kinkFluxes() : new double[0];
    }

    /** A (flux linkage, current) pair of a curve, SI. */
    record CurvePoint(double flux, double current) { }
}
