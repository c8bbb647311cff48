/**
 * Time-domain simulation of the single-phase equivalent circuit and classification of the state
 * it settles into (DOMAIN.md §6).
 *
 * <ul>
 * <li>{@link org.ferromap.dynamics.PerUnitCircuit}: the circuit as a per-unit ODE (state, state
 * with a tangent vector, state with the 2x2 fundamental matrix), allocation-free, also exposed as
 * Hipparchus {@code OrdinaryDifferentialEquation}s.</li>
 * <li>{@link org.ferromap.dynamics.DormandPrince853}: a lean DOP853 (Hairer, Norsett, Wanner)
 * with dense output and stiffness detection; Hipparchus is kept as the cross-check in tests.</li>
 * <li>{@link org.ferromap.dynamics.StroboscopicMap} and {@link org.ferromap.dynamics.OrbitCertifier}:
 * the period map, its monodromy, and Newton on P^k to certify a settled periodic state.</li>
 * <li>{@link org.ferromap.dynamics.Simulator}: the run and the classification into
 * {@link org.ferromap.dynamics.SteadyMode}, with the largest Lyapunov exponent (Benettin), the
 * 0-1 test ({@link org.ferromap.dynamics.ZeroOneTest}) and the spectrum.</li>
 * <li>{@link org.ferromap.dynamics.ModeRules}: the classification rules on recorded data, shared by
 * the single-phase and the three-phase runs.</li>
 * <li>{@link org.ferromap.dynamics.NetworkSimulator} and {@link org.ferromap.dynamics.NetworkClassifier}:
 * the full three-phase network run in chunks until its stroboscopic samples repeat, and the
 * classification of its open-phase voltage ({@link org.ferromap.dynamics.SettledState}) by
 * recurrence, the 0-1 test and the spectrum (no Newton certification, no Lyapunov exponent).</li>
 * <li>{@link org.ferromap.dynamics.SimulationBenchmark}: the speed benchmark against the peer
 * program (GSL rk8pd).</li>
 * </ul>
 * May use: circuit, equipment, errors, Hipparchus.
 */
package org.ferromap.dynamics;
