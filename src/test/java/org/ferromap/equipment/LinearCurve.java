package org.ferromap.equipment;

import java.util.List;
import org.ferromap.equipment.SaturationCurve;

/** Test-local linear magnetizing branch i = lambda / L (no saturation), for linear phasor checks. */
public record LinearCurve(double inductance) implements SaturationCurve {

    @Override
    public double current(double fluxLinkage) {
        return fluxLinkage / inductance;
    }

    @Override
    public double currentSlope(double fluxLinkage) {
        return 1.0 / inductance;
    }

    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        return fluxAmplitude / inductance;
    }

    @Override
    public double fluxLinkage(double current) {
        return current * inductance;
    }

    @Override
    public List<CurvePoint> definingPoints() {
        return List.of(new CurvePoint(1.0, 1.0 / inductance));
    }

    @Override
    public double airCoreInductance() {
        return inductance;
    }

    @Override
    public String describe() {
        return "linear L = " + inductance + " H";
    }
}
