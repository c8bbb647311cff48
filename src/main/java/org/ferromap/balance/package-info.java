/**
 * Harmonic balance of the single-phase equivalent circuit (DOMAIN.md §3).
 *
 * <ul>
 *   <li>{@link org.ferromap.balance.SingleHarmonicBalance}: the graphical method in numbers:
 *       every steady state at the source voltage with its slow-flow stability and kind, the folds
 *       in source voltage (closed form for polynomial curves, extrema of the explicit E(Lambda)
 *       otherwise), the cusp condition (C_min, G_min) and the margin to the jump-up fold.</li>
 *   <li>{@link org.ferromap.balance.CriticalLength}: the cable lengths at which the folds cross
 *       the source voltage, for a length-to-circuit function.</li>
 *   <li>{@link org.ferromap.balance.MultiHarmonicResidual}: F(x, p) and its Jacobians by the
 *       alternating frequency-time method, p any {@link org.ferromap.balance.CircuitParameter};
 *       the plain interface the continuation engine consumes.</li>
 *   <li>{@link org.ferromap.balance.MultiHarmonicBalance}: Newton solutions, folds and Hill
 *       stability ({@link org.ferromap.balance.HillStability}) of multi-harmonic steady states.</li>
 *   <li>{@link org.ferromap.balance.BalanceContinuation}: the balance handed to the continuation
 *       engine in any parameter ({@link org.ferromap.balance.BalanceAxis}, the circuit given as a
 *       function of one or two values): branches with stability, folds and branch points
 *       ({@link org.ferromap.balance.BranchResult}), fold curves with cusps and labelled regions
 *       ({@link org.ferromap.balance.FoldCurveResult}).</li>
 * </ul>
 *
 * Everything is computed in per unit (voltage base the rated peak, flux base V/w, current base
 * w C V) so that SI studies with polynomial coefficients near 1e-17 need no hand scaling.
 * May use: circuit, equipment, continuation, errors, Hipparchus (core, ode).
 */
package org.ferromap.balance;
