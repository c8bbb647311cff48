package org.ferromap.balance;

/**
 * The folds of one circuit's branch in per unit, ascending in flux: abscissa x (per-unit flux),
 * Phi(x) = s^2 there, and whether each is a maximum of E (jump-up). Maxima and minima alternate,
 * starting with a maximum, because E rises from zero and rises again past the last fold.
 */
final class FoldStructure {

    final double[] x;
    final double[] phi;
    final boolean[] up;
    final int count;

    FoldStructure(double[] x, double[] phi, boolean[] up, int count) {
        this.x = x;
        this.phi = phi;
        this.up = up;
        this.count = count;
    }

    static final FoldStructure NONE = new FoldStructure(new double[0], new double[0], new boolean[0], 0);

    boolean bistable() {
        return count >= 2;
    }
}
