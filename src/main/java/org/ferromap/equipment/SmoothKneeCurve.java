package org.ferromap.equipment;

import java.util.List;

/**
 * Smooth knee with an air-core asymptote: lambda(i) = L_air i + Lambda_s tanh((L_u - L_air) i / Lambda_s) (DOMAIN.md §2, common practice).
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class SmoothKneeCurve implements SaturationCurve {

    /**
     * @param unsaturatedInductance L_u, H, slope at the origin
     * @param airCoreInductance L_air, H, 0 &lt; L_air &lt; L_u
     * @param saturationFlux Lambda_s, Wb-turn, &gt; 0
     */
    public SmoothKneeCurve(double unsaturatedInductance, double airCoreInductance, double saturationFlux) { }

    @Override public double current(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double currentSlope(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double fundamentalCurrent(double fluxAmplitude) { throw new UnsupportedOperationException("pending"); }
    @Override public double fluxLinkage(double current) { throw new UnsupportedOperationException("pending"); }
    @Override public List<CurvePoint> definingPoints() { throw new UnsupportedOperationException("pending"); }
    @Override public double airCoreInductance() { throw new UnsupportedOperationException("pending"); }
    @Override public String describe() { throw new UnsupportedOperationException("pending"); }
}
