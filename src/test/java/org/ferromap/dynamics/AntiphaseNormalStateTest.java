package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

class AntiphaseNormalStateTest {

    /**
     * Below the knee the loop gives v/e = w^2 Cs / (w^2 C - a) [der, DOMAIN.md §1.1 with i = a
     * lambda]. With a > w^2 C the unsaturated state is in antiphase with the source at a small
     * amplitude, and no fold pair exists (kappa = w^2 C - a < 0, DOMAIN.md §3): it is the normal
     * state and must not be called ferroresonance.
     */
    @Test
    void smallAntiphaseStateOfAnInductiveLoopIsNormal() {
        double w = 1.0;
        double cs = 0.2;
        double cg = 0.0;
        double a = 1.0; // a > w^2 C = 0.2
        var c = EquivalentCircuit.of(w, 0.05, cs, cg, new PolynomialCurve(a, 1.0, 3)).withCoreLossResistance(20.0);
        SimulationResult r = Simulator.simulate(c, SimulationSettings.defaults());
        double linear = w * w * cs / (w * w * (cs + cg) - a) * 0.05; // -0.0125: antiphase, tiny
        assertTrue(linear < 0);
        assertEquals(SteadyMode.NORMAL, r.mode(), r.reason());
        // peak within 2 % of the linear amplitude: the cubic term at lambda ~ 0.0125 is ~1e-4 of the linear one
        assertEquals(Math.abs(linear), r.peakVoltage(), 0.02 * Math.abs(linear));
    }
}
