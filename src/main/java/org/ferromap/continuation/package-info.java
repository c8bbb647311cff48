/**
 * A generic pseudo-arclength continuation engine for F(x, p) = 0: branches, folds, branch points,
 * fold curves and cusps. Knows nothing of circuits: the balance and orbit packages hand it their
 * residuals through {@link org.ferromap.continuation.ContinuationProblem} or
 * {@link org.ferromap.continuation.TwoParameterProblem}.
 *
 * <p>Entry points: {@link org.ferromap.continuation.BranchTracer} follows a branch in one
 * parameter and reports folds and branch points; {@link org.ferromap.continuation.FoldCurveTracer}
 * follows a fold in two parameters and reports cusps. Both work in scaled variables (state,
 * parameters and residual rows brought to order one) so SI problems need no hand scaling.
 *
 * <p>May use: errors, Hipparchus.
 */
package org.ferromap.continuation;
