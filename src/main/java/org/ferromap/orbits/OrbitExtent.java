package org.ferromap.orbits;

/**
 * An orbit followed over its whole period in SI: its states on the section t = jT (j = 0..k-1, the
 * k points a period-k orbit leaves on the stroboscopic diagram), those of its mirror image
 * x(t) -&gt; -x(t + T/2) (the circuit is half-period symmetric, so the mirror image is an orbit too,
 * with the same multipliers and peaks; for a symmetric orbit it is the orbit itself), and its peaks
 * over the period (what an engineer compares with the insulation and arrester ratings).
 *
 * @param flux flux linkage at t = jT, Wb-turn, k entries
 * @param voltage terminal voltage at t = jT, V, k entries
 * @param mirrorFlux flux linkage of the mirror image at t = jT: -lambda(jT + T/2), Wb-turn, k entries
 * @param mirrorVoltage terminal voltage of the mirror image at t = jT: -v(jT + T/2), V, k entries
 * @param peakFlux largest |lambda(t)| over the period, Wb-turn
 * @param peakVoltage largest |v(t)| over the period, V
 */
public record OrbitExtent(double[] flux, double[] voltage, double[] mirrorFlux, double[] mirrorVoltage, double peakFlux,
        double peakVoltage) {

    public OrbitExtent {
        int k = flux.length;
        if (k == 0 || voltage.length != k || mirrorFlux.length != k || mirrorVoltage.length != k) {
            throw new IllegalArgumentException("one flux and one voltage per section state, at least one");
        }
        flux = flux.clone();
        voltage = voltage.clone();
        mirrorFlux = mirrorFlux.clone();
        mirrorVoltage = mirrorVoltage.clone();
    }

    @Override
    public double[] mirrorFlux() {
        return mirrorFlux.clone();
    }

    @Override
    public double[] mirrorVoltage() {
        return mirrorVoltage.clone();
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
