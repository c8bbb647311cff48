package org.ferromap.balance;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.StabilityCriterion;

/**
 * Stability of a multi-harmonic point by Hill's method ({@link MultiHarmonicBalance#stability},
 * which falls back to the waveform monodromy when the Hill eigenproblem fails): the number of
 * Floquet exponents with a positive real part. The point's coefficients are converted from the
 * residual's bases to the circuit's own before the call. A real part below 1e-7 of w counts as
 * zero: a lossless orbit is neutral (a centre), counted stable as for H = 1.
 */
final class HillCriterion implements StabilityCriterion {

    private static final double ZERO_RATE = 1e-7;

    private final LoopResidual residual;
    private final double q;
    private final HarmonicSettings settings;

    HillCriterion(LoopResidual residual, double q, HarmonicSettings settings) {
        this.residual = residual;
        this.q = q;
        this.settings = settings;
    }

    @Override
    public int unstableCount(double[] x, double p, double[][] dFdx) {
        EquivalentCircuit c = residual.circuit(p, q);
        if (c == null) {
            return -1;
        }
        double ratio = residual.baseFlux / (c.ratedPeak() / c.omega());
        double[] xc = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            xc[k] = x[k] * ratio;
        }
        try {
            FloquetExponents fe = new MultiHarmonicBalance(c, settings).stability(xc);
            int count = 0;
            for (double re : fe.real()) {
                if (re > ZERO_RATE * c.omega()) {
                    count++;
                }
            }
            return count;
        } catch (RuntimeException e) {
            return -1;
        }
    }
}
