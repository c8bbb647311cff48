package org.ferromap.equipment;

import java.util.List;

/**
 * Series combination of two magnetizing branches carrying related currents: lambda_eq(i) = lambda_1(i) + lambda_2(i * ratio). The floating-wye composite of DOMAIN.md §1.2 is floatingWye(c) = lambda(i) + lambda(i/2).
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class CompositeCurve implements SaturationCurve {

    /** @return lambda_eq(i) = lambda(i) + lambda(i/2) */
    public static CompositeCurve floatingWye(SaturationCurve phase) { throw new UnsupportedOperationException("pending"); }

    @Override public double current(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double currentSlope(double fluxLinkage) { throw new UnsupportedOperationException("pending"); }
    @Override public double fundamentalCurrent(double fluxAmplitude) { throw new UnsupportedOperationException("pending"); }
    @Override public double fluxLinkage(double current) { throw new UnsupportedOperationException("pending"); }
    @Override public List<CurvePoint> definingPoints() { throw new UnsupportedOperationException("pending"); }
    @Override public double airCoreInductance() { throw new UnsupportedOperationException("pending"); }
    @Override public String describe() { throw new UnsupportedOperationException("pending"); }
}
