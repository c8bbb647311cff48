package org.ferromap.equipment;

import java.util.List;

/**
 * A curve scaled in flux and current: i_s(lambda) = currentScale * i(lambda / fluxScale). An inductance factor k (L_eq = k Lm) is fluxScale = k, currentScale = 1.
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class ScaledCurve implements SaturationCurve {

    /**
     * @param base the curve scaled
     * @param fluxScale &gt; 0
     * @param currentScale &gt; 0
     */
    public ScaledCurve(SaturationCurve base, double fluxScale, double currentScale) { }

    @Override public double current(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double currentSlope(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double fundamentalCurrent(double fluxAmplitude) { throw new UnsupportedOperationException("pending"); }
    @Override public double fluxLinkage(double current) { throw new UnsupportedOperationException("pending"); }
    @Override public List<CurvePoint> definingPoints() { throw new UnsupportedOperationException("pending"); }
    @Override public double airCoreInductance() { throw new UnsupportedOperationException("pending"); }
    @Override public String describe() { throw new UnsupportedOperationException("pending"); }
}
