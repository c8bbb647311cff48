package org.ferromap.orbits;

/**
 * A time-periodic ODE z' = f(t, z), f(t + T, z) = f(t, z), with its Jacobian: everything the
 * shooting, the monodromy and the continuation need. The equivalent circuit is one implementation
 * ({@link CircuitSystem}); linear test equations (Mathieu, the forced damped oscillator) are others.
 *
 * <p>Implementations are plain, immutable providers; the two evaluation methods write into
 * caller-owned arrays and should allocate nothing (they run in the integrator's inner loop).
 * Units are the implementation's own: the circuit works in per unit of its bases with time in
 * radians of the source.
 */
public interface PeriodicSystem {

    /** Number of states n. */
    int dimension();

    /** The forcing period T, in the system's time unit, &gt; 0. The section is t = 0 mod T. */
    double period();

    /**
     * Writes f(t, z) into the first n entries of {@code dz}. The arrays may be longer than n (the
     * integrator carries the variations behind the state): read and write only the first n
     * entries, and do not keep or modify {@code z}.
     */
    void derivatives(double t, double[] z, double[] dz);

    /** Writes the Jacobian df/dz at (t, z) row-major into {@code jac} (length n * n); reads the first n entries of z. */
    void jacobian(double t, double[] z, double[] jac);

    /**
     * Whether f(t + T/2, -z) = -f(t, z): an odd system under a half-period shift (odd
     * characteristic, pure sine source, no DC). Then the symmetric orbits are the fixed points of
     * the half-period map z -&gt; -P_{T/2}(z), and symmetry-breaking pitchforks can be told from
     * folds. Default false.
     */
    default boolean halfPeriodSymmetric() {
        return false;
    }
}
