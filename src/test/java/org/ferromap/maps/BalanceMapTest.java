package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.EnumSet;
import java.util.List;
import org.ferromap.balance.BalanceSettings;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.StudyReader;
import org.ferromap.study.SweepParameter;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The balance layer against the closed-form regions of a polynomial curve (DOMAIN.md §3 [der],
 * re-derived in {@link PolynomialRegions}): safe below the jump-down fold, at-risk between the
 * folds, ferroresonant-only above the jump-up fold, a fold pair only above C_min; below C_min the
 * single branch turns capacitive.
 */
class BalanceMapTest {

    static final double W = 2 * Math.PI * 60;
    /** R = 50 kOhm puts the cusp at Cs = 40.3 nF, E = 35.8 kV inside the plane below [der: PolynomialRegions]. */
    static final PolynomialRegions CLOSED = new PolynomialRegions(W, 1.5e-3, 1.33e-17, 9, 10e-9, 1 / 50e3);

    static final String STUDY = """
            study: closed-form check, ninth-power core
            frequency: 60 Hz
            circuit:
              source: 20 kV peak
              series-capacitance: 0.1 uF
              shunt-capacitance: 10 nF
              core-loss-resistance: 50 kOhm
              magnetizing:
                polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}
            """;

    static StudyPlane plane(int xSteps, int ySteps) {
        Study s = StudyReader.read(STUDY, "closed-form.yaml");
        StudyParameters p = new StudyParameters(s);
        return new StudyPlane(p, PlaneAxis.ofSi(SweepParameter.SOURCE, 2e3, 60e3, xSteps, Axis.Scale.LINEAR),
                PlaneAxis.ofSi(SweepParameter.SERIES_CAPACITANCE, 10e-9, 500e-9, ySteps, Axis.Scale.LOG));
    }

    static LocalPoolExecutor pool() {
        return new LocalPoolExecutor(2, false, Duration.ZERO);
    }

    static StudyMapResult map(StudyPlane plane, boolean closedForms, boolean refine) {
        StudyMapSettings s = StudyMapSettings.defaults().withRefine(refine)
                .withBalance(BalanceSettings.DEFAULTS.withClosedForms(closedForms))
                .withLayers(EnumSet.of(MapLayer.BALANCE, MapLayer.PEAK, MapLayer.FOLDS));
        return StudyMap.run(plane, s, pool(), null, null, 2);
    }

    /**
     * Every cell the closed-form boundary does not cross has the closed-form category. Run through
     * the closed forms and through the general numerical path of the balance (scan, Brent), with
     * and without refinement. The plane's axes are in kV peak and nF: the cells' conversion to SI
     * is part of what is checked.
     */
    @ParameterizedTest(name = "closed forms {0}, refine {1}")
    @CsvSource({"true, false", "false, false", "true, true"})
    void categoriesMatchTheClosedFormRegions(boolean closedForms, boolean refine) {
        StudyPlane plane = plane(59, 41);
        StudyMapResult r = map(plane, closedForms, refine);
        Axis xa = plane.x().axis();
        Axis ya = plane.y().axis();
        Region normal = (x, y) -> CLOSED.normal(plane.x().si(x), plane.y().si(y));
        Region ferro = (x, y) -> CLOSED.ferro(plane.x().si(x), plane.y().si(y));
        int[] seen = new int[3];
        int compared = 0;
        for (int iy = 0; iy < ya.steps(); iy++) {
            for (int ix = 0; ix < xa.steps(); ix++) {
                if (Boundaries.crossesCell(xa, ya, ix, iy, normal, 8) || Boundaries.crossesCell(xa, ya, ix, iy, ferro, 8)) {
                    continue;
                }
                int expected = CLOSED.category(plane.x().si(xa.value(ix)), plane.y().si(ya.value(iy)));
                assertEquals(expected, r.balance().value(ix, iy, 0), 0.0, "cell (" + ix + ", " + iy + ")");
                seen[expected]++;
                compared++;
            }
        }
        assertTrue(compared > 0.85 * xa.steps() * ya.steps(), "most cells are away from the boundary: " + compared);
        for (int k = 0; k < 3; k++) {
            assertTrue(seen[k] > 20, "category " + BalanceCell.CATEGORY_NAMES.get(k) + " present: " + seen[k]);
        }
    }

    /**
     * The fold curves lie on the closed-form folds: every interior point of a jump-up curve has
     * the closed-form jump-up source at its capacitance, likewise jump-down and the capacitive turn.
     * Tolerance 1e-6 relative in source: the bisection stops within 2^-24 of a cell, about 3e-8
     * of the source on these axes, and the curve's slope in a log-capacitance cell adds at most a
     * factor of ten. Where the fold pair is born the boundary lies on the closed-form C_min. The
     * cusp sits on the closed-form cusp (C_min, E_cusp) to 1e-6 relative: both coordinates come
     * from bisections carried to 2^-24 of a cell.
     */
    @Test
    void foldCurvesAndCuspLieOnTheClosedForms() {
        StudyPlane plane = plane(59, 41);
        StudyMapResult r = map(plane, true, false);
        FoldBoundaries.Result f = r.folds();
        int checked = 0;
        for (FoldBoundaries.Curve c : f.curves()) {
            for (int i = 1; i + 1 < c.x().length; i++) {
                double e = plane.x().si(c.x()[i]);
                double cs = plane.y().si(c.y()[i]);
                if (c.kind() == FoldBoundaries.Kind.FOLD_PAIR_BORN) {
                    double csCusp = CLOSED.cuspSeriesCapacitance();
                    assertEquals(csCusp, cs, 1e-6 * csCusp, "fold pair born on C = C_min, point " + i);
                    checked++;
                    continue;
                }
                double expected = switch (c.kind()) {
                    case JUMP_UP -> CLOSED.folds(cs)[0];
                    case JUMP_DOWN -> CLOSED.folds(cs)[1];
                    default -> CLOSED.turn(cs);
                };
                assertEquals(expected, e, 1e-6 * expected, c.kind() + " point " + i);
                checked++;
            }
        }
        assertTrue(f.of(FoldBoundaries.Kind.JUMP_UP).size() >= 1 && f.of(FoldBoundaries.Kind.JUMP_DOWN).size() >= 1
                && f.of(FoldBoundaries.Kind.CAPACITIVE_TURN).size() >= 1 && f.of(FoldBoundaries.Kind.FOLD_PAIR_BORN).size() >= 1,
                "all four kinds found: " + f.curves().size());
        assertTrue(checked > 60, "points checked: " + checked);

        List<FoldBoundaries.Cusp> cusps = f.cusps();
        assertEquals(1, cusps.size(), "one cusp: " + cusps);
        FoldBoundaries.Cusp c = cusps.get(0);
        double csCusp = CLOSED.cuspSeriesCapacitance();
        assertEquals(csCusp, plane.y().si(c.y()), 1e-6 * csCusp);
        assertEquals(CLOSED.cuspSource(), plane.x().si(c.x()), 1e-6 * CLOSED.cuspSource());
    }

    /**
     * The peak layer is the largest stable state's fundamental in per unit of the rated peak
     * (here the study's source peak, 20 kV). At the lowest source (2 kV) the flux is so small
     * that the lambda^9 term changes the current by about 1e-8 relative, so the terminal voltage
     * is the linear phasor solution |V| = E w Cs / sqrt((w C - a/w)^2 + G^2) [der: series
     * capacitor into C, G and L = 1/a in parallel]; tolerance 1e-6 relative covers the neglected
     * nonlinearity a hundred times over.
     */
    @Test
    void peakLayerIsThePerUnitTerminalVoltage() {
        StudyPlane plane = plane(30, 21);
        StudyMapResult r = map(plane, true, false);
        double rated = plane.study().circuit().ratedPeak();
        assertEquals(20e3, rated, 1e-9);
        double e = plane.x().si(plane.x().axis().value(0));
        for (int iy = 0; iy < 21; iy++) {
            double cs = plane.y().si(plane.y().axis().value(iy));
            double c = cs + CLOSED.cg;
            double expected = e * W * cs / Math.hypot(W * c - CLOSED.a / W, CLOSED.g);
            assertEquals(BalanceCell.SAFE, r.balance().value(0, iy, 0), 0.0);
            assertEquals(expected / rated, r.balance().value(0, iy, 1), 1e-6 * expected / rated, "row " + iy);
        }
    }
}
