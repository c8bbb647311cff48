package org.ferromap.orbits;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

/**
 * An orbit followed over its period on a circuit that is linear in practice: w = 1, Cs = 1, Cg = 0,
 * i = w0^2 lambda (+ 1e-30 lambda^3, which the polynomial form needs and which changes nothing at
 * unit flux), G = c. Then lambda'' + c lambda' + w0^2 lambda = E cos t (DOMAIN.md §1.1 [der]).
 */
class OrbitExtentTest {

    private static final double W0 = 1.2;
    private static final double C = 0.3;
    private static final double E = 0.8;

    @Test
    void sectionStatesMirrorAndPeaksOfTheSteadyResponse() {
        EquivalentCircuit circuit = EquivalentCircuit.of(1.0, E, 1.0, 0.0, new PolynomialCurve(W0 * W0, 1e-30, 3))
                .withCoreLossResistance(1 / C).withRatedPeak(1.0);
        // Steady state lambda = Re(E e^{it} / (w0^2 - 1 + i c)) [der]: at t = 0 lambda = E (w0^2 - 1) / D,
        // v = lambda' = E c / D, D = (w0^2 - 1)^2 + c^2; both peaks equal the amplitude E / sqrt(D).
        double d = Math.pow(W0 * W0 - 1, 2) + C * C;
        double lambda0 = E * (W0 * W0 - 1) / d;
        double v0 = E * C / d;
        double amplitude = E / Math.sqrt(d);
        OrbitExtent x = CircuitOrbits.extent(circuit, lambda0, v0, 2, 1e-12);
        // The state after one period is the state again: 1e-9 for an integration at 1e-12 (a stable,
        // strongly damped orbit forgets its own error).
        assertEquals(lambda0, x.flux()[1], 1e-9);
        assertEquals(v0, x.voltage()[1], 1e-9);
        // A sinusoid is its own mirror image: -x(T/2) = x(0) [der].
        assertEquals(lambda0, x.mirrorFlux()[0], 1e-9);
        assertEquals(v0, x.mirrorVoltage()[0], 1e-9);
        // Peaks sampled at most 2 pi / 1024 apart: short of the crest by at most 5e-6 relative; 1e-5 allows it.
        assertEquals(amplitude, x.peakFlux(), 1e-5 * amplitude);
        assertEquals(amplitude, x.peakVoltage(), 1e-5 * amplitude);
    }
}
