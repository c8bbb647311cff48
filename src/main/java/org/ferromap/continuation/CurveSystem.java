package org.ferromap.continuation;

/**
 * An implicit system G(z) = 0 in the engine's scaled variables: a curve when it has one equation
 * fewer than unknowns, a square system for point location. Implementations keep work arrays, so
 * one instance serves one computation at a time.
 */
interface CurveSystem {

    /** Number of unknowns N. */
    int unknowns();

    /** Number of equations: N - 1 for a curve, N for a square system. */
    int equations();

    /** Writes G(z) into out[0 .. equations()-1]. */
    void value(double[] z, double[] out);

    /** Writes dG/dz into rows 0 .. equations()-1, columns 0 .. N-1 of out. */
    void jacobian(double[] z, double[][] out);
}
