package org.ferromap.circuit;

/**
 * The per-unit bases in which {@link NetworkEquations} integrates a {@link ThreePhaseNetwork}:
 * voltage base the source's phase-to-neutral peak, time base 1/omega (so tau = omega t), flux base
 * V/omega, capacitance base the core-to-sheath capacitance, and the current and impedance bases
 * that follow. With these, the capacitance matrix has 1 + 2r on its diagonal and the node
 * equations read C dv/dtau = i with every entry of order one, whether the study is in V and uF
 * or in kV and MOhm.
 *
 * @param voltage V per unit voltage (the source's phase-to-neutral peak)
 * @param omega rad/s, the source's angular frequency (1/omega is the time base, s)
 * @param capacitance F per unit capacitance (the core-to-sheath capacitance)
 */
public record NetworkPerUnit(double voltage, double omega, double capacitance) {

    /** Flux-linkage base V/omega, Wb-turn. */
    public double flux() {
        return voltage / omega;
    }

    /** Current base omega C V, A. */
    public double current() {
        return omega * capacitance * voltage;
    }

    /** Impedance base 1/(omega C), ohm. */
    public double impedance() {
        return 1.0 / (omega * capacitance);
    }

    /** Time base 1/omega, s. */
    public double time() {
        return 1.0 / omega;
    }
}
