package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;

/**
 * Which stable single-harmonic state a simulated period-1 state is (DOMAIN.md §6: tell states apart
 * by branch): the stable point of the balance whose phase is nearest the simulated fundamental's.
 * The limit table's time-domain check uses it to see that switching events just below a limit
 * settle on the single state the balance predicts there.
 */
final class Branches {

    /**
     * Largest phase difference, rad, between a simulated fundamental and the balance point it is
     * matched to: the single-harmonic phases and the simulated ones agree within a few hundredths
     * of a radian on smooth states, and the two branches lie close to pi apart.
     */
    static final double PHASE_MATCH = 0.5;

    private Branches() {
    }

    /** The stable single-harmonic states of a circuit (source angle irrelevant); empty when the balance fails. */
    static List<OperatingPoint> stable(SingleHarmonicBalance balance, EquivalentCircuit c) {
        List<OperatingPoint> out = new ArrayList<>();
        try {
            for (OperatingPoint p : balance.operatingPoints(c)) {
                if (p.stable()) {
                    out.add(p);
                }
            }
        } catch (FerromapException e) {
            // no branch information: the simulator's verdicts stand
        }
        return out;
    }

    /** The stable point whose phase is nearest a simulated fundamental phase, or null. */
    static OperatingPoint nearest(double phase, List<OperatingPoint> stable) {
        OperatingPoint best = null;
        double bestD = Double.POSITIVE_INFINITY;
        for (OperatingPoint p : stable) {
            double d = distance(phase, p.voltagePhase());
            if (d < bestD) {
                bestD = d;
                best = p;
            }
        }
        return best;
    }

    /** Wrapped phase distance, rad in [0, pi]. */
    static double distance(double a, double b) {
        return Math.abs(Math.IEEEremainder(a - b, 2 * Math.PI));
    }
}
