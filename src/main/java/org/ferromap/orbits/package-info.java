/**
 * Periodic orbits: shooting on the stroboscopic map, Floquet multipliers, continuation of orbits
 * and their bifurcations, and the brute-force bifurcation diagram.
 *
 * <ul>
 * <li>{@link org.ferromap.orbits.PeriodicSystem}: any time-periodic ODE with its Jacobian; the
 * circuit is {@link org.ferromap.orbits.CircuitSystem} (delegating to the dynamics package's
 * per-unit model), test equations (Mathieu, forced linear systems) are others.</li>
 * <li>{@link org.ferromap.orbits.PeriodMap}: P^k and the half-period map with their monodromy,
 * state and variations integrated as one error-controlled system by the dynamics package's
 * DOP853, and the trace integral for Liouville's check.</li>
 * <li>{@link org.ferromap.orbits.Shooting}: Newton on S(z) = z; {@link org.ferromap.orbits.Orbit}
 * with {@link org.ferromap.orbits.FloquetMultipliers} and their accuracy figures.</li>
 * <li>{@link org.ferromap.orbits.OrbitContinuation}: the shooting residual on the continuation
 * engine; folds, period doublings, tori and pitchforks located along the branch; branch switching.</li>
 * <li>{@link org.ferromap.orbits.BruteForceSweep}: up and down runs carrying the state.</li>
 * <li>{@link org.ferromap.orbits.CircuitOrbits}: the same for an equivalent circuit in SI, with the
 * JSON records of the contract ({@link org.ferromap.orbits.OrbitsReport},
 * {@link org.ferromap.orbits.SweepReport}); exploration and sweeps over any family of circuits
 * (a function of the parameter, such as an equipment-level one re-reduced for each value), seeded
 * by settled states and by the harmonic-balance steady states; {@link org.ferromap.orbits.OrbitExtent}:
 * an orbit followed over its period for its peaks and its (and its mirror image's) section states.</li>
 * </ul>
 * May use: dynamics, continuation, balance, circuit, equipment, errors, Hipparchus.
 */
package org.ferromap.orbits;
