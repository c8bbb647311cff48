package org.ferromap.equipment;

import java.util.List;

/**
 * Piecewise-linear odd curve through the origin and the given breakpoints; past the last point it continues with the air-core inductance (or the last segment's slope when NaN).
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class PiecewiseLinearCurve implements SaturationCurve {

    /**
     * @param flux breakpoint flux linkages, Wb-turn, positive and strictly increasing (origin implied)
     * @param current breakpoint currents, A, positive and strictly increasing
     * @param airCoreInductance final slope dlambda/di past the last point, H; NaN = keep the last segment slope
     */
    public PiecewiseLinearCurve(double[] flux, double[] current, double airCoreInductance) { }

    @Override public double current(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double currentSlope(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double fundamentalCurrent(double fluxAmplitude) { throw new UnsupportedOperationException("pending"); }
    @Override public double fluxLinkage(double current) { throw new UnsupportedOperationException("pending"); }
    @Override public List<CurvePoint> definingPoints() { throw new UnsupportedOperationException("pending"); }
    @Override public double airCoreInductance() { throw new UnsupportedOperationException("pending"); }
    @Override public String describe() { throw new UnsupportedOperationException("pending"); }
}
