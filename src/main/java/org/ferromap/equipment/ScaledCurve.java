package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A curve scaled in flux and current: i_s(lambda) = currentScale * i(lambda / fluxScale). An inductance factor k (L_eq = k Lm) is fluxScale = k, currentScale = 1.
 *
 * <p>Every property follows exactly from the base curve: slope (currentScale / fluxScale) i',
 * describing function currentScale * I1(A / fluxScale), air-core inductance
 * (fluxScale / currentScale) L_air.
 */
public final class ScaledCurve implements SaturationCurve, KinkedCurve {

    private final SaturationCurve base;
    private final double fluxScale;
    private final double currentScale;

    /**
     * @param base the curve scaled
     * @param fluxScale &gt; 0
     * @param currentScale &gt; 0
     */
    public ScaledCurve(SaturationCurve base, double fluxScale, double currentScale) {
        if (base == null) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "the curve to scale is missing");
        }
        this.base = base;
        this.fluxScale = CurveChecks.positive(fluxScale, "flux scale", "(dimensionless)");
        this.currentScale = CurveChecks.positive(currentScale, "current scale", "(dimensionless)");
    }

    /** The curve scaled. */
    public SaturationCurve base() {
        return base;
    }

    /** Flux factor, dimensionless. */
    public double fluxScale() {
        return fluxScale;
    }

    /** Current factor, dimensionless. */
    public double currentScale() {
        return currentScale;
    }

    @Override
    public double current(double fluxLinkage) {
        return currentScale * base.current(fluxLinkage / fluxScale);
    }

    @Override
    public double currentSlope(double fluxLinkage) {
        return currentScale / fluxScale * base.currentSlope(fluxLinkage / fluxScale);
    }

    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        return currentScale * base.fundamentalCurrent(fluxAmplitude / fluxScale);
    }

    @Override
    public double fluxLinkage(double current) {
        return fluxScale * base.fluxLinkage(current / currentScale);
    }

    @Override
    public List<CurvePoint> definingPoints() {
        List<CurvePoint> src = base.definingPoints();
        List<CurvePoint> pts = new ArrayList<>(src.size());
        for (CurvePoint p : src) {
            pts.add(new CurvePoint(fluxScale * p.flux(), currentScale * p.current()));
        }
        return List.copyOf(pts);
    }

    @Override
    public double airCoreInductance() {
        return fluxScale / currentScale * base.airCoreInductance();
    }

    @Override
    public String describe() {
        return String.format("%s, scaled x%.4g in flux and x%.4g in current", base.describe(), fluxScale, currentScale);
    }

    @Override
    public double[] kinkFluxes() {
        double[] k = base instanceof KinkedCurve kc ? kc.kinkFluxes() : new double[0];
        for (int j = 0; j < k.length; j++) {
            k[j] *= fluxScale;
        }
        return k;
    }
}
