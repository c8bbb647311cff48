package org.ferromap.equipment;

/**
 * A curve that knows the fluxes where it is not smooth (a slope or curvature jump) or where its
 * curvature is concentrated, so quadrature can split there instead of resolving a kink blindly.
 */
interface KinkedCurve {

    /** Positive, strictly increasing fluxes, Wb-turn, empty when smooth everywhere; a fresh array the caller may change. */
    double[] kinkFluxes();
}
