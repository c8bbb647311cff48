package org.ferromap.equipment;

/**
 * Converts rms open-circuit test data to a peak lambda-i curve by the point-by-point method
 * (DOMAIN.md §2, from memory: Neves and Dommel, IEEE Trans. Power Systems 8(2), 1993).
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class RmsTestConversion {
    private RmsTestConversion() { }

    /**
     * @param omega angular frequency of the test, rad/s
     * @param voltageRms test voltages, V rms, strictly increasing
     * @param currentRms measured currents, A rms, strictly increasing
     * @param lossWatts no-load loss per point, W, or null when the loss current is not removed
     * @param airCoreInductance slope past the last point, H; NaN = last segment slope
     * @return the piecewise-linear peak curve with one breakpoint per test point
     */
    public static PiecewiseLinearCurve convert(double omega, double[] voltageRms, double[] currentRms,
                                               double[] lossWatts, double airCoreInductance) {
        throw new UnsupportedOperationException("pending");
    }
}
