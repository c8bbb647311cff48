package org.ferromap.equipment;

/** The polynomial curve under the common contract; n = 9 with b ~ 1e-17, the kV-scale case of the brief. */
class PolynomialCurveContractTest extends SaturationCurveContract {
    @Override
    protected SaturationCurve create() {
        return new PolynomialCurve(1.5e-3, 1.33e-17, 9);
    }
}
