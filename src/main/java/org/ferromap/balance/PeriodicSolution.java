package org.ferromap.balance;

/**
 * A multi-harmonic steady state of the equivalent circuit, in SI.
 *
 * @param omega source angular frequency, rad/s
 * @param harmonics highest harmonic kept
 * @param oddOnly whether only odd harmonics were kept (layout of the coefficients)
 * @param fluxCoefficients Fourier coefficients of the flux linkage, Wb-turn, in the layout of
 *        {@link HarmonicBasis} (lambda(t) = c0 + sum a_k cos(k w t) + b_k sin(k w t))
 * @param baseFlux the per-unit flux base Lambda_b = V_b/w used by the solver, Wb-turn
 * @param peakFlux largest |lambda(t)|, Wb-turn
 * @param peakVoltage largest |v(t)| = |dlambda/dt| across the magnetizing branch, V
 * @param fundamentalFlux amplitude of the fundamental of lambda, Wb-turn
 * @param fundamentalVoltage amplitude of the fundamental of v, w times {@code fundamentalFlux}, V
 * @param residualNorm largest per-unit residual coefficient at the solution
 * @param samples time samples per period used by the alternating frequency-time method
 */
public record PeriodicSolution(
        double omega,
        int harmonics,
        boolean oddOnly,
        double[] fluxCoefficients,
        double baseFlux,
        double peakFlux,
        double peakVoltage,
        double fundamentalFlux,
        double fundamentalVoltage,
        double residualNorm,
        int samples) {

    public PeriodicSolution {
        fluxCoefficients = fluxCoefficients.clone();
    }

    @Override
    public double[] fluxCoefficients() {
        return fluxCoefficients.clone();
    }

    /** The coefficients in per unit of {@link #baseFlux}: the solver's unknown vector. */
    public double[] perUnit() {
        double[] x = fluxCoefficients.clone();
        for (int k = 0; k < x.length; k++) {
            x[k] /= baseFlux;
        }
        return x;
    }

    /** Peak magnetizing voltage over a given voltage base, per unit. */
    public double peakVoltagePerUnit(double baseVoltage) {
        return peakVoltage / baseVoltage;
    }
}
