package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A magnetizing curve from core design data: B-H points of the steel, core cross-section,
 * magnetic path length and turns (lambda = N A B, i = H l / N).
 *
 * <p>The points are joined as a {@link TabulatedCurve}. Past the last point the default slope is
 * that of the core's own volume with the steel gone, mu0 N^2 A / l: a rough stand-in for the
 * winding's air-core inductance (which uses the winding's own area and height, DOMAIN.md §2);
 * give the winding value when it is known.
 */
public final class CoreDesignCurve {

    /**
     * Vacuum permeability mu0, H/m: CODATA 2018 recommended value 1.25663706212e-6 [mem]. Since the
     * 2019 SI revision it is measured, not defined; it agrees with the former defined value
     * 4 pi 1e-7 to about 5e-10 relative.
     */
    public static final double VACUUM_PERMEABILITY = 1.25663706212e-6;

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
        CurveChecks.points(inductionTesla, "induction", "T", fieldAPerM, "field", "A/m");
        CurveChecks.positive(coreArea, "core area", "m^2");
        CurveChecks.positive(pathLength, "magnetic path length", "m");
        if (turns < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "turns = " + turns + " must be at least 1");
        }
        CurveChecks.airCoreOrNaN(airCoreInductance);
        int n = inductionTesla.length;
        double[] flux = new double[n];
        double[] current = new double[n];
        for (int k = 0; k < n; k++) {
            flux[k] = turns * coreArea * inductionTesla[k];
            current[k] = fieldAPerM[k] * pathLength / turns;
        }
        double lair = Double.isNaN(airCoreInductance)
                ? VACUUM_PERMEABILITY * (double) turns * turns * coreArea / pathLength
                : airCoreInductance;
        return new TabulatedCurve(flux, current, lair);
    }
}
