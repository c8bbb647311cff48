package org.ferromap.orbits;

import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

class ScratchTest {
    static final double VB = 34500 * Math.sqrt(2.0 / 3.0);
    static EquivalentCircuit si() {
        return EquivalentCircuit.of(2 * Math.PI * 50, VB, 0.3e-6, 0.1e-6, new PolynomialCurve(1e-3, 1e-17, 9))
                .withCoreLossResistance(80e3);
    }
    @Test
    void explore() {
        long t0 = System.nanoTime();
        List<OrbitBranch> bs = CircuitOrbits.explore(si().withSourcePeak(0.6 * VB), CircuitParameter.SOURCE_PEAK,
                List.of(new double[] {0, 0}), 4, OrbitContinuationSettings.DEFAULTS.withWindow(0.2 * VB, 3 * VB));
        for (OrbitBranch br : bs) {
            System.out.println(br.section() + " points " + br.size() + " p " + (br.size() > 0 ? br.parameter(0) / VB + " .. " + br.parameter(br.size() - 1) / VB : "") + " stop " + br.stopReason() + " " + br.stopDetail());
            for (LocatedBifurcation b : br.bifurcations()) {
                System.out.println("  " + b.type() + " p=" + b.parameter() / VB + " per " + b.period() + " crit " + java.util.Arrays.toString(b.critical()) + " loc " + b.located());
            }
        }
        System.out.println("time " + (System.nanoTime() - t0) / 1e9);
    }
}
