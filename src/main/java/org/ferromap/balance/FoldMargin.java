package org.ferromap.balance;

/**
 * How far the source is from the jump-up fold that ends the normal branch.
 *
 * @param sourcePeak the circuit's source peak, V
 * @param jumpUpSourcePeak source peak at the first jump-up fold, V; NaN when there is none
 * @param ratio jumpUpSourcePeak / sourcePeak: above 1 the normal state still exists; NaN when no fold
 * @param headroom jumpUpSourcePeak - sourcePeak, V; negative past the fold; NaN when no fold
 * @param note one line on what the figures mean for this circuit
 */
public record FoldMargin(double sourcePeak, double jumpUpSourcePeak, double ratio, double headroom, String note) {

    /** Whether there is a jump-up fold at all. */
    public boolean hasFold() {
        return !Double.isNaN(jumpUpSourcePeak);
    }
}
