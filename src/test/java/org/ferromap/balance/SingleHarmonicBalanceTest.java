package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class SingleHarmonicBalanceTest {

    private static final SingleHarmonicBalance CLOSED = new SingleHarmonicBalance();
    private static final SingleHarmonicBalance NUMERIC = new SingleHarmonicBalance(BalanceSettings.DEFAULTS.withClosedForms(false));

    static EquivalentCircuit circuit(double w, double e, double cs, double cg, double r, SaturationCurve curve) {
        return new EquivalentCircuit(w, e, 0.0, cs, cg, r, Double.POSITIVE_INFINITY, curve, Exactness.GIVEN, e > 0 ? e : 1.0);
    }

    /** The SI-scale example of the brief: 28.17 kV peak, 0.2 uF + 0.05 uF, 1.19 MOhm, 60 Hz, n = 9. Realistic scale only. */
    static EquivalentCircuit siExample() {
        return circuit(2 * Math.PI * 60, 28.17e3, 0.2e-6, 0.05e-6, 1.19e6, new PolynomialCurve(1.5e-3, 1.33e-17, 9));
    }

    /** Folds from the closed form of DOMAIN.md §3 [der], written out independently here: {E_up, L_up, E_down, L_down}. */
    static double[] closedFormFolds(EquivalentCircuit c, PolynomialCurve p) {
        double w = c.omega();
        double kappa = w * w * c.totalCapacitance() - p.a();
        double delta = w * c.conductance();
        int m = p.n() - 1;
        double beta = PolynomialCurve.describingCoefficient(p.n()) * p.b();
        double disc = (2.0 + m) * (2.0 + m) * kappa * kappa - 4.0 * (1 + m) * (kappa * kappa + delta * delta);
        double x1 = ((2 + m) * kappa - Math.sqrt(disc)) / (2 * (1 + m));
        double x2 = ((2 + m) * kappa + Math.sqrt(disc)) / (2 * (1 + m));
        double l1 = Math.pow(x1 / beta, 1.0 / m);
        double l2 = Math.pow(x2 / beta, 1.0 / m);
        return new double[] {
            l1 * Math.sqrt((x1 - kappa) * (x1 - kappa) + delta * delta) / (w * c.seriesCapacitance()), l1,
            l2 * Math.sqrt((x2 - kappa) * (x2 - kappa) + delta * delta) / (w * c.seriesCapacitance()), l2};
    }

    /** Relative residual of (w Cs E)^2 = (I1 - w^2 C L)^2 + (w G L)^2 (DOMAIN.md §3), evaluated in SI. */
    static double balanceResidual(EquivalentCircuit c, double flux) {
        double w = c.omega();
        double lhs = Math.pow(w * c.seriesCapacitance() * c.sourcePeak(), 2);
        double i1 = c.magnetizing().fundamentalCurrent(flux);
        double rhs = Math.pow(i1 - w * w * c.totalCapacitance() * flux, 2) + Math.pow(w * c.conductance() * flux, 2);
        return Math.abs(lhs - rhs) / lhs;
    }

    /**
     * DOMAIN.md §9.1 [der, closed form]: w = 1, Cs = 1, Cg = 0, a = 0.5, b = 1, lossless cubic:
     * jump-up fold E_up = 0.157135 at Lambda = 0.4714. Tolerance: half a unit in the last digit given.
     */
    @Test
    void cubicJumpUpFoldMatchesCheckValue() {
        EquivalentCircuit c = circuit(1, 0.1, 1, 0, Double.POSITIVE_INFINITY, new PolynomialCurve(0.5, 1, 3));
        for (SingleHarmonicBalance shb : List.of(CLOSED, NUMERIC)) {
            Fold up = shb.folds(c).get(0);
            assertEquals(FoldDirection.JUMP_UP, up.direction());
            assertEquals(0.157135, up.sourcePeak(), 5e-7);
            assertEquals(0.4714, up.flux(), 5e-5);
        }
    }

    /**
     * The numerical fold finder (extrema of E(Lambda) from the quadrature slope) against the
     * closed form of DOMAIN.md §3 [der], n = 3..11, lossless and lossy, at pu scale and SI scale.
     * 1e-8 relative: the quadrature slope is good to ~1e-12 and the fold flux is a simple root of
     * dE/dLambda; the lossless jump-down fold sits at E = 0 and is checked against the jump-up E.
     */
    @ParameterizedTest
    @CsvSource({"3,0", "5,0", "7,0", "9,0", "11,0", "3,1", "5,1", "7,1", "9,1", "11,1"})
    void numericalFoldsReproduceClosedForm(int n, int lossy) {
        PolynomialCurve pu = new PolynomialCurve(0.3, 0.8, n);
        EquivalentCircuit small = circuit(1, 0.5, 0.6, 0.4, lossy == 1 ? 50.0 : Double.POSITIVE_INFINITY, pu);
        PolynomialCurve si = new PolynomialCurve(1.5e-3, 1.33e-17 * Math.pow(75.0, 9 - n), n);
        EquivalentCircuit big = circuit(2 * Math.PI * 60, 28.17e3, 0.2e-6, 0.05e-6, lossy == 1 ? 1.19e6 : Double.POSITIVE_INFINITY, si);
        for (EquivalentCircuit c : List.of(small, big)) {
            double[] ref = closedFormFolds(c, (PolynomialCurve) c.magnetizing());
            for (SingleHarmonicBalance shb : List.of(NUMERIC, CLOSED)) {
                List<Fold> f = shb.folds(c);
                assertEquals(2, f.size());
                assertEquals(FoldDirection.JUMP_UP, f.get(0).direction());
                assertEquals(FoldDirection.JUMP_DOWN, f.get(1).direction());
                assertEquals(ref[0], f.get(0).sourcePeak(), 1e-8 * ref[0]);
                assertEquals(ref[1], f.get(0).flux(), 1e-8 * ref[1]);
                assertEquals(ref[3], f.get(1).flux(), 1e-8 * ref[3]);
                if (lossy == 1) {
                    assertEquals(ref[2], f.get(1).sourcePeak(), 1e-8 * ref[2]);
                } else {
                    assertEquals(0.0, f.get(1).sourcePeak(), 1e-8 * ref[0]);
                }
            }
        }
    }

    /**
     * Duffing single-harmonic balance, DOMAIN.md §9.2 [der; response equation as in Nayfeh and
     * Mook]: x'' + 0.1 x' + x + x^3 = F cos(w t) is our circuit with C = 1, G = 0.1, a = b = 1,
     * n = 3, Cs = 1, and F = w Cs E. At w = 1.5 folds at amplitude 0.753451 (F 0.631220, jump-up)
     * and 1.286287 (F 0.193298, jump-down). Tolerance: half a unit in the last digit given.
     */
    @Test
    void duffingFoldsMatchCheckValues() {
        double w = 1.5;
        EquivalentCircuit c = circuit(w, 0.1, 1, 0, 10.0, new PolynomialCurve(1, 1, 3));
        for (SingleHarmonicBalance shb : List.of(CLOSED, NUMERIC)) {
            List<Fold> f = shb.folds(c);
            assertEquals(2, f.size());
            assertEquals(0.753451, f.get(0).flux(), 5e-7);
            assertEquals(0.631220, w * f.get(0).sourcePeak(), 5e-7);
            assertEquals(1.286287, f.get(1).flux(), 5e-7);
            assertEquals(0.193298, w * f.get(1).sourcePeak(), 5e-7);
        }
    }

    /**
     * Duffing cusp, DOMAIN.md §9.2 [der]: w = 1.0903455, amplitude 0.409719, F = 0.0515845. The
     * frequency at which C_min equals C is found with Commons Math's Brent solver. Tolerances:
     * half a unit in the last digit given.
     */
    @Test
    void duffingCuspMatchesCheckValues() {
        for (SingleHarmonicBalance shb : List.of(CLOSED, NUMERIC)) {
            BrentSolver brent = new BrentSolver(1e-14, 1e-14);
            double w = brent.solve(200, x -> shb.cuspCondition(circuit(x, 0.1, 1, 0, 10.0, new PolynomialCurve(1, 1, 3)))
                    .capacitanceRatio() - 1, 1.01, 1.5);
            assertEquals(1.0903455, w, 5e-8);
            CuspCondition cc = shb.cuspCondition(circuit(w, 0.1, 1, 0, 10.0, new PolynomialCurve(1, 1, 3)));
            assertEquals(0.409719, cc.cuspFlux(), 5e-7);
            assertEquals(0.0515845, w * cc.cuspSourcePeak(), 5e-8);
        }
    }

    /**
     * The cusp condition kappa = (2 sqrt(n)/(n-1)) delta (DOMAIN.md §3, §7 [der]): C_min and
     * G_min by their formulas, reproduced by the numerical fold-locus search to 1e-9 relative (a
     * minimum of a smooth function is found to far better than its abscissa); and the fold count
     * flips across C_min (0.1 % either side, well outside the tolerances).
     */
    @ParameterizedTest
    @ValueSource(ints = {3, 5, 7, 9, 11})
    void cuspConditionMatchesFormula(int n) {
        double w = 2 * Math.PI * 60;
        double g = 1 / 1.19e6;
        PolynomialCurve p = new PolynomialCurve(1.5e-3, 1.33e-17 * Math.pow(75.0, 9 - n), n);
        EquivalentCircuit c = circuit(w, 28.17e3, 0.2e-6, 0.05e-6, 1.19e6, p);
        double cMin = (p.a() + 2 * Math.sqrt(n) / (n - 1) * w * g) / (w * w);
        double gMin = (w * w * c.totalCapacitance() - p.a()) * (n - 1) / (2 * Math.sqrt(n) * w);
        for (SingleHarmonicBalance shb : List.of(CLOSED, NUMERIC)) {
            CuspCondition cc = shb.cuspCondition(c);
            assertEquals(cMin, cc.minimumCapacitance(), 1e-9 * cMin);
            assertEquals(gMin, cc.dampingConductance(), 1e-9 * gMin);
            assertTrue(cc.bistable());
            // C_min is below this Cg, so the flip is shown with the whole capacitance in series.
            EquivalentCircuit seriesOnly = c.withShuntCapacitance(0);
            assertEquals(2, shb.folds(seriesOnly.withSeriesCapacitance(cMin * 1.001)).size());
            assertEquals(0, shb.folds(seriesOnly.withSeriesCapacitance(cMin * 0.999)).size());
            assertEquals(2, shb.folds(c.withCoreLossResistance(1 / (gMin * 0.999))).size());
            assertEquals(0, shb.folds(c.withCoreLossResistance(1 / (gMin * 1.001))).size());
        }
    }

    /**
     * SI-scale example (realistic scale, not a reference value): inside the bistable window there
     * are three steady states, each satisfying the balance of DOMAIN.md §3 to 1e-9 relative
     * (Brent converges to a few ulps in flux; the E^2 balance amplifies that by about 2n), ordered
     * normal / unstable / ferroresonant with stable / saddle / stable; outside the window one.
     */
    @Test
    void siExampleHasThreeStatesInsideTheWindow() {
        EquivalentCircuit base = siExample();
        for (SingleHarmonicBalance shb : List.of(CLOSED, NUMERIC)) {
            List<Fold> f = shb.folds(base);
            assertEquals(2, f.size());
            double eUp = f.get(0).sourcePeak();
            double eDown = f.get(1).sourcePeak();
            assertTrue(eDown < eUp);
            EquivalentCircuit inside = base.withSourcePeak(Math.sqrt(eUp * eDown));
            List<OperatingPoint> pts = shb.operatingPoints(inside);
            assertEquals(3, pts.size());
            for (OperatingPoint p : pts) {
                assertTrue(balanceResidual(inside, p.flux()) < 1e-9, "balance residual " + balanceResidual(inside, p.flux()));
            }
            assertEquals(PointKind.NORMAL, pts.get(0).kind());
            assertEquals(PointKind.UNSTABLE, pts.get(1).kind());
            assertEquals(PointKind.FERRORESONANT, pts.get(2).kind());
            assertTrue(pts.get(0).stable() && !pts.get(1).stable() && pts.get(2).stable());
            assertTrue(pts.get(0).flux() < f.get(0).flux() && pts.get(1).flux() > f.get(0).flux()
                    && pts.get(1).flux() < f.get(1).flux() && pts.get(2).flux() > f.get(1).flux());
            assertTrue(pts.get(0).slowFlowRate() < 0 && pts.get(1).slowFlowRate() > 0 && pts.get(2).slowFlowRate() < 0);
            assertTrue(pts.get(2).capacitive() && !pts.get(0).capacitive());

            List<OperatingPoint> below = shb.operatingPoints(base.withSourcePeak(0.5 * eDown));
            assertEquals(1, below.size());
            assertEquals(PointKind.NORMAL, below.get(0).kind());
            List<OperatingPoint> above = shb.operatingPoints(base.withSourcePeak(2 * eUp));
            assertEquals(1, above.size());
            assertEquals(PointKind.FERRORESONANT, above.get(0).kind());
            assertTrue(balanceResidual(base.withSourcePeak(2 * eUp), above.get(0).flux()) < 1e-9);

            // Exactly on the jump-up fold: one double root reported at the fold.
            List<OperatingPoint> onFold = shb.operatingPoints(base.withSourcePeak(eUp));
            assertEquals(2, onFold.size());
            assertTrue(onFold.get(0).atFold());
            assertEquals(f.get(0).flux(), onFold.get(0).flux(), 1e-12 * f.get(0).flux());

            FoldMargin mg = shb.margin(inside);
            assertEquals(eUp / inside.sourcePeak(), mg.ratio(), 1e-12);
            assertEquals(eUp - inside.sourcePeak(), mg.headroom(), 1e-9 * eUp);
        }
    }

    /**
     * Near-linear limit, series LC divider [cp, circuit theory]: with a negligible saturation
     * term, V = w^2 Cs E / |1/L - w^2 C| and the magnetizing voltage is in phase with the source
     * on the inductive side (1/L &lt; w^2 C) and in antiphase on the capacitive side. 1e-12
     * relative: the saturation term contributes ~1e-16 at this flux.
     */
    @Test
    void nearLinearCircuitIsTheCapacitiveDivider() {
        double w = 2 * Math.PI * 50;
        double cs = 1e-6;
        double e = 1000;
        for (double invL : new double[] {0.5 * w * w * cs, 3 * w * w * cs}) {
            EquivalentCircuit c = circuit(w, e, cs, 0, Double.POSITIVE_INFINITY, new PolynomialCurve(invL, 1e-30, 3));
            for (SingleHarmonicBalance shb : List.of(CLOSED, NUMERIC)) {
                List<OperatingPoint> pts = shb.operatingPoints(c);
                OperatingPoint p = pts.get(0);
                double v = w * w * cs * e / Math.abs(invL - w * w * cs);
                assertEquals(v, p.voltage(), 1e-12 * v);
                assertEquals(invL < w * w * cs ? 0.0 : Math.PI, Math.abs(p.voltagePhase()), 1e-12);
                assertEquals(PointKind.NORMAL, p.kind());
            }
        }
    }

    /**
     * A smooth non-polynomial curve through the numerical path (no closed form to compare with):
     * each steady state satisfies the balance to 1e-9 relative; each fold is a local extremum of
     * E(Lambda) (checked by the balance itself 1e-4 relative either side); C_min separates
     * fold counts (0.1 % either side). Properties that must hold, DOMAIN.md §3.
     */
    @Test
    void smoothKneeCurveThroughTheNumericalPath() {
        double w = 2 * Math.PI * 50;
        double vb = 10e3;
        ArctanKneeCurve curve = new ArctanKneeCurve(400.0, 0.4, 1.2 * vb / w);
        EquivalentCircuit base = circuit(w, vb, 0.4e-6, 0.1e-6, 2e6, curve);
        SingleHarmonicBalance shb = new SingleHarmonicBalance();
        List<Fold> f = shb.folds(base);
        assertEquals(2, f.size(), "the chosen curve and capacitance are bistable");
        for (Fold fold : f) {
            double l = fold.flux();
            double e = fold.sourcePeak();
            double eLeft = sourceAt(base, l * (1 - 1e-4));
            double eRight = sourceAt(base, l * (1 + 1e-4));
            if (fold.direction() == FoldDirection.JUMP_UP) {
                assertTrue(eLeft < e && eRight < e);
            } else {
                assertTrue(eLeft > e && eRight > e);
            }
        }
        EquivalentCircuit inside = base.withSourcePeak(0.5 * (f.get(0).sourcePeak() + f.get(1).sourcePeak()));
        List<OperatingPoint> pts = shb.operatingPoints(inside);
        assertEquals(3, pts.size());
        for (OperatingPoint p : pts) {
            assertTrue(balanceResidual(inside, p.flux()) < 1e-9);
        }
        CuspCondition cc = shb.cuspCondition(base);
        assertTrue(cc.bistable());
        EquivalentCircuit seriesOnly = base.withShuntCapacitance(0);
        assertEquals(2, shb.folds(seriesOnly.withSeriesCapacitance(cc.minimumCapacitance() * 1.001)).size());
        assertEquals(0, shb.folds(seriesOnly.withSeriesCapacitance(cc.minimumCapacitance() * 0.999)).size());
        assertEquals(2, shb.folds(base.withCoreLossResistance(1 / (cc.dampingConductance() * 0.999))).size());
        assertEquals(0, shb.folds(base.withCoreLossResistance(1 / (cc.dampingConductance() * 1.001))).size());
    }

    /** E(Lambda) from the balance of DOMAIN.md §3, SI. */
    static double sourceAt(EquivalentCircuit c, double flux) {
        double w = c.omega();
        double i1 = c.magnetizing().fundamentalCurrent(flux);
        return Math.sqrt(Math.pow(i1 - w * w * c.totalCapacitance() * flux, 2) + Math.pow(w * c.conductance() * flux, 2))
                / (w * c.seriesCapacitance());
    }
}
