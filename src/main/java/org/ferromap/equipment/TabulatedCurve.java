package org.ferromap.equipment;

import java.util.List;

/**
 * Tabulated (flux, current) points joined by monotone cubic (Fritsch-Carlson) interpolation, continued past the last point with the air-core slope.
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class TabulatedCurve implements SaturationCurve {

    /**
     * @param flux positive, strictly increasing, Wb-turn (origin implied)
     * @param current positive, strictly increasing, A
     * @param airCoreInductance slope dlambda/di past the last point, H; NaN = last secant slope
     */
    public TabulatedCurve(double[] flux, double[] current, double airCoreInductance) { }

    @Override public double current(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double currentSlope(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double fundamentalCurrent(double fluxAmplitude) { throw new UnsupportedOperationException("pending"); }
    @Override public double fluxLinkage(double current) { throw new UnsupportedOperationException("pending"); }
    @Override public List<CurvePoint> definingPoints() { throw new UnsupportedOperationException("pending"); }
    @Override public double airCoreInductance() { throw new UnsupportedOperationException("pending"); }
    @Override public String describe() { throw new UnsupportedOperationException("pending"); }
}
