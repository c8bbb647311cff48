package org.ferromap.equipment;

/**
 * A magnetizing curve from core design data: B-H points of the steel, core cross-section,
 * magnetic path length and turns (lambda = N A B, i = H l / N).
 *
 * <p>STUB: signature fixed, implementation pending (curves work item).
 */
public final class CoreDesignCurve {
    private CoreDesignCurve() { }

    /**
     * @param inductionTesla B points, T, positive and strictly increasing
     * @param fieldAPerM H points, A/m, positive and strictly increasing
     * @param coreArea net core cross-section, m^2
     * @param pathLength mean magnetic path length, m
     * @param turns primary turns
     * @param airCoreInductance slope past the last point, H; NaN = mu0 N^2 A / l
     */
    public static TabulatedCurve fromSteel(double[] inductionTesla, double[] fieldAPerM, double coreArea,
                                           double pathLength, int turns, double airCoreInductance) {
        throw new UnsupportedOperationException("pending");
    }
}
