package org.ferromap.cli;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;

/**
 * The initial states the orbit verbs settle from or sweep with. The first is the de-energized
 * terminal (zero flux, zero voltage: the transformer switched onto its cable); the others are
 * spread in amplitude and phase so that coexisting attractors get a chance: state j &gt;= 1 is the
 * point at t = 0 of lambda(t) = r_j lambda_b cos(omega t + theta_j), with r_j = 0.5 j per unit of
 * the rated flux lambda_b = V_rated / omega and theta_j = j times the golden angle (phases that
 * never repeat and stay evenly spread for any count). Deterministic.
 */
final class StartStates {

    /** Largest count the verbs accept: each state is a full run, more than this is rarely useful. */
    static final int MAX = 16;

    /** The golden angle, rad: pi (3 - sqrt 5). */
    private static final double GOLDEN = Math.PI * (3 - Math.sqrt(5));

    private StartStates() {
    }

    /** {flux Wb-turn, voltage V} pairs, count of them. */
    static List<double[]> spread(EquivalentCircuit c, int count) {
        double vb = c.ratedPeak();
        double lb = vb / c.omega();
        List<double[]> out = new ArrayList<>();
        out.add(new double[] {0, 0});
        for (int j = 1; j < count; j++) {
            double r = 0.5 * j;
            double th = j * GOLDEN;
            out.add(new double[] {r * lb * Math.cos(th), -r * vb * Math.sin(th)});
        }
        return out;
    }
}
