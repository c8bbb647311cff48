package org.ferromap.orbits;

/**
 * An orbit followed over its whole period in SI: its states on the section t = jT (j = 0..k-1, the
 * k points a period-k orbit leaves on the stroboscopic diagram) and its peaks over the period (what
 * an engineer compares with the insulation and arrester ratings).
 *
 * @param flux flux linkage at t = jT, Wb-turn, k entries
 * @param voltage terminal voltage at t = jT, V, k entries
 * @param peakFlux largest |lambda(t)| over the period, Wb-turn
 * @param peakVoltage largest |v(t)| over the period, V
 */
public record OrbitExtent(double[] flux, double[] voltage, double peakFlux, double peakVoltage) {

    public OrbitExtent {
        if (flux.length != voltage.length || flux.length == 0) {
            throw new IllegalArgumentException("one flux and one voltage per section state, at least one");
        }
        flux = flux.clone();
        voltage = voltage.clone();
    }

    @Override
    public double[] flux() {
        return flux.clone();
    }

    @Override
    public double[] voltage() {
        return voltage.clone();
    }
}
