package org.ferromap.cli.run;

import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;

/**
 * The smallest total shunt conductance at which a circuit's branch has no fold pair, found by
 * bisection on "has a fold pair" with conductance added at the terminal (as a load). The cusp
 * condition gives the same figure in closed form for polynomial curves; this search needs only
 * the folds, so it holds for every curve the balance can fold.
 */
final class FoldFreeDamping {

    private static final int BISECTIONS = 60;

    private FoldFreeDamping() {
    }

    /** Total conductance (S) that removes the fold pair; the circuit's own when it has none; NaN when not found. */
    static double totalConductance(SingleHarmonicBalance b, EquivalentCircuit c) {
        double g = c.conductance();
        if (!bistable(b, c, 0)) {
            return g;
        }
        double scale = c.omega() * c.totalCapacitance(); // the capacitor's admittance: damping of this order ends any fold
        double lo = 0;
        double hi = 1e-6 * scale;
        int k = 0;
        while (bistable(b, c, hi)) {
            lo = hi;
            hi *= 2;
            if (++k > 80) {
                return Double.NaN;
            }
        }
        for (int i = 0; i < BISECTIONS; i++) {
            double m = 0.5 * (lo + hi);
            if (bistable(b, c, m)) {
                lo = m;
            } else {
                hi = m;
            }
        }
        return g + hi;
    }

    private static boolean bistable(SingleHarmonicBalance b, EquivalentCircuit c, double added) {
        EquivalentCircuit d = added == 0 ? c : c.withLoadResistance(1 / (1 / c.loadResistance() + added));
        try {
            return b.folds(d).size() >= 2;
        } catch (FerromapException e) {
            return false;
        }
    }
}
