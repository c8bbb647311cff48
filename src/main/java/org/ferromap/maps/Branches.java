package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.PointKind;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.errors.FerromapException;

/**
 * Tells which branch of the balance a simulated period-1 state lies on (DOMAIN.md §6: tell the
 * normal state from fundamental ferroresonance by branch and a peak threshold).
 *
 * <p>Why it is needed: the simulator calls every period-1 state in antiphase with the source
 * fundamental ferroresonance. Past the loop's linear resonance that is the ferroresonant branch,
 * but on a cable shorter than resonance the normal state itself is in antiphase (a series LC below
 * resonance: the inductor's voltage opposes the source), small and unique, and the balance calls
 * it normal. So a period-1 state the simulator calls fundamental is counted normal here when its
 * peak is below the threshold and its fundamental phase lies nearest a stable normal point of
 * the balance, within {@link #PHASE_MATCH}. Events keep the simulator's own verdict beside it.
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

    /** The settled mode with period-1 states assigned by branch (see the class notes). */
    static SteadyMode mode(SimulationResult r, List<OperatingPoint> stable, double peakThreshold) {
        if (r.mode() != SteadyMode.FUNDAMENTAL || r.period() != 1 || !(r.peakPerUnit() <= peakThreshold)
                || Double.isNaN(r.fundamentalPhase())) {
            return r.mode();
        }
        OperatingPoint p = nearest(r.fundamentalPhase(), stable);
        if (p != null && p.kind() == PointKind.NORMAL && distance(r.fundamentalPhase(), p.voltagePhase()) <= PHASE_MATCH) {
            return SteadyMode.NORMAL;
        }
        return r.mode();
    }
}
