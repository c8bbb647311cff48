package org.ferromap.orbits;

import java.util.Optional;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Direction;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

class ScratchTest {
    static EquivalentCircuit cubic(double b) {
        return EquivalentCircuit.of(1.0, b, 1.0, 0.0, new PolynomialCurve(0, 1, 3)).withCoreLossResistance(10.0).withRatedPeak(1.0);
    }
    static void show(OrbitBranch br) {
        System.out.println(br.section() + " points " + br.size() + " p " + br.parameter(0) + " .. " + br.parameter(br.size() - 1) + " stop " + br.stopReason() + " " + br.stopDetail());
        for (LocatedBifurcation b : br.bifurcations()) {
            System.out.println("  " + b.type() + " p=" + b.parameter() + " per " + b.period() + " crit " + java.util.Arrays.toString(b.critical()) + " loc " + b.located());
        }
    }
    @Test
    void cont() {
        long t0 = System.nanoTime();
        OrbitContinuation oc = new OrbitContinuation(OrbitContinuationSettings.DEFAULTS.withWindow(0.2, 6.0));
        java.util.function.DoubleFunction<CircuitSystem> fam = b -> CircuitSystem.of(cubic(b));
        PeriodMap pm = new PeriodMap(2, 1e-10, 100000);
        double[] z = {0, 0};
        pm.advance(fam.apply(4.0), z, 1000);
        OrbitBranch down = oc.trace(fam, z, 4.0, Section.periods(1), Direction.DECREASING);
        show(down);
        OrbitBranch up = oc.trace(fam, z, 4.0, Section.periods(1), Direction.INCREASING);
        show(up);
        for (LocatedBifurcation pd : up.bifurcations(BifurcationType.PERIOD_DOUBLING)) {
            Optional<OrbitBranch> two = oc.switchBranch(fam, pd);
            if (two.isEmpty()) { System.out.println("switch failed " + oc.lastFailure()); continue; }
            show(two.get());
            for (LocatedBifurcation pd2 : two.get().bifurcations(BifurcationType.PERIOD_DOUBLING)) {
                Optional<OrbitBranch> four = oc.switchBranch(fam, pd2);
                if (four.isEmpty()) { System.out.println("switch failed " + oc.lastFailure()); continue; }
                show(four.get());
                break;
            }
            break;
        }
        double[] z1 = {0, 0};
        pm.advance(fam.apply(1.0), z1, 1000);
        OrbitBranch sym = oc.trace(fam, z1, 1.0, Section.halfPeriod(), Direction.INCREASING);
        show(sym);
        for (LocatedBifurcation b : sym.bifurcations(BifurcationType.PITCHFORK)) {
            Optional<OrbitBranch> a = oc.switchBranch(fam, b);
            if (a.isEmpty()) { System.out.println("switch failed " + oc.lastFailure()); continue; }
            show(a.get());
        }
        System.out.println("time " + (System.nanoTime() - t0) / 1e9);
    }
}
