package org.ferromap.orbits;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.PerUnitCircuit;

/**
 * The single-phase equivalent circuit as a {@link PeriodicSystem}: the per-unit model of
 * {@link PerUnitCircuit} (state x = lambda / lambda_b, y = v / V_b, time tau = omega t, period
 * 2 pi), whose right-hand side and magnetizing slope it delegates to. The Jacobian is
 * [[0, 1], [-h'(x), -g]]. The circuit is always half-period symmetric: the saturation curve is odd
 * and the source a pure sine.
 */
public final class CircuitSystem implements PeriodicSystem {

    private final EquivalentCircuit circuit;
    private final PerUnitCircuit model;

    private CircuitSystem(EquivalentCircuit circuit) {
        this.circuit = circuit;
        this.model = PerUnitCircuit.of(circuit);
    }

    /** The scaled model of a circuit. */
    public static CircuitSystem of(EquivalentCircuit circuit) {
        return new CircuitSystem(circuit);
    }

    /** The circuit in SI. */
    public EquivalentCircuit circuit() {
        return circuit;
    }

    /** The per-unit model it delegates to. */
    public PerUnitCircuit model() {
        return model;
    }

    /** Flux linkage of a scaled flux, Wb-turn. */
    public double flux(double x) {
        return x * model.fluxBase();
    }

    /** Voltage of a scaled voltage, V. */
    public double voltage(double y) {
        return y * model.voltageBase();
    }

    /** Scaled state (x, y) of a flux linkage in Wb-turn and a voltage in V. */
    public double[] scaledState(double flux, double voltage) {
        return new double[] {flux / model.fluxBase(), voltage / model.voltageBase()};
    }

    @Override
    public int dimension() {
        return 2;
    }

    @Override
    public double period() {
        return PerUnitCircuit.PERIOD;
    }

    @Override
    public void derivatives(double t, double[] z, double[] dz) {
        model.derivatives(t, z, dz);
    }

    @Override
    public void jacobian(double t, double[] z, double[] jac) {
        jac[0] = 0;
        jac[1] = 1;
        jac[2] = -model.restoringSlope(z[0]);
        jac[3] = -model.damping();
    }

    @Override
    public boolean halfPeriodSymmetric() {
        return true;
    }
}
