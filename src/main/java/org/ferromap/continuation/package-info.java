/**
 * A generic pseudo-arclength continuation engine for F(x, p) = 0: branches, folds, branch points, fold curves and cusps. Knows nothing of circuits.
 * May use: errors.
 */
package org.ferromap.continuation;
