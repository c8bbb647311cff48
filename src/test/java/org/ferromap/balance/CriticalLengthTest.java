package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

class CriticalLengthTest {

    private static final double W = 2 * Math.PI * 50;
    /** Cable capacitance per metre, F/m (0.25 uF/km, a 25 kV-class screened cable, DOMAIN.md §5 range). */
    private static final double C_PER_M = 0.25e-9;
    private static final PolynomialCurve CURVE = new PolynomialCurve(1.5e-3, 1.33e-17, 9);
    private static final double R = 1.19e6;

    /** One open phase on screened cable reduced to a series loop: Cs = C' l, no shunt (DOMAIN.md §1.2 form). */
    private static DoubleFunction<EquivalentCircuit> loop(double sourcePeak) {
        return l -> SingleHarmonicBalanceTest.circuit(W, sourcePeak, C_PER_M * l, 0, R, CURVE);
    }

    /** C_min = (a + (2 sqrt(n)/(n-1)) w G)/w^2, DOMAIN.md §3 [der]; the loop's C is C' l. */
    private static double cuspLength() {
        int n = CURVE.n();
        return (CURVE.a() + 2 * Math.sqrt(n) / (n - 1) * W / R) / (W * W) / C_PER_M;
    }

    /** Source at the cusp, from the closed form of DOMAIN.md §3 [der] (X = kappa (n+1)/(2n) with kappa = c delta). */
    private static double cuspSource() {
        int n = CURVE.n();
        double delta = W / R;
        double kappa = 2 * Math.sqrt(n) / (n - 1) * delta;
        double x = kappa * (n + 1) / (2.0 * n);
        double lam = Math.pow(x / (PolynomialCurve.describingCoefficient(n) * CURVE.b()), 1.0 / (n - 1));
        double cs = cuspLength() * C_PER_M;
        return lam * Math.sqrt((x - kappa) * (x - kappa) + delta * delta) / (W * cs);
    }

    /**
     * Source above the cusp voltage: the fold pair is born below the source, so both the
     * jump-down and jump-up lengths equal the cusp length (closed form, DOMAIN.md §3 [der]);
     * the jump-up fold then rises through the source at the exit length, found here
     * independently with Commons Math's Brent solver on the closed-form fold. 1e-9 relative:
     * the lengths are refined to 1e-12 and the closed forms are exact to rounding.
     */
    @Test
    void sourceAboveCuspVoltage() {
        double e = 2 * cuspSource();
        CriticalLengthResult r = new CriticalLength().find(loop(e), 10, 5000);
        double lc = cuspLength();
        assertEquals(lc, r.cuspLength(), 1e-9 * lc);
        assertEquals(lc, r.jumpDownLength(), 1e-9 * lc);
        assertEquals(lc, r.jumpUpLength(), 1e-9 * lc);
        double exit = new BrentSolver(1e-14, 1e-12).solve(500,
                l -> SingleHarmonicBalanceTest.closedFormFolds(loop(e).apply(l), CURVE)[0] - e, lc * (1 + 1e-6), 5000);
        assertEquals(exit, r.jumpUpExitLength(), 1e-9 * exit);
        assertTrue(r.found());
    }

    /**
     * Source below the cusp voltage: the jump-up fold never comes down to it (no normal-state
     * loss), while the falling jump-down fold crosses it at a length found independently with
     * Commons Math's Brent solver on the closed form. Same tolerance reasoning as above.
     */
    @Test
    void sourceBelowCuspVoltage() {
        double e = 0.5 * cuspSource();
        CriticalLengthResult r = new CriticalLength().find(loop(e), 10, 5000);
        double lc = cuspLength();
        assertEquals(lc, r.cuspLength(), 1e-9 * lc);
        double entry = new BrentSolver(1e-14, 1e-12).solve(500,
                l -> SingleHarmonicBalanceTest.closedFormFolds(loop(e).apply(l), CURVE)[2] - e, lc * (1 + 1e-6), 5000);
        assertEquals(entry, r.jumpDownLength(), 1e-9 * entry);
        assertTrue(Double.isNaN(r.jumpUpLength()));
        assertFalse(r.found());
    }

    /** A range entirely below the cusp length has no fold pair: NaN lengths and a reason. */
    @Test
    void noFoldInRange() {
        CriticalLengthResult r = new CriticalLength().find(loop(1e4), 1, 0.5 * cuspLength());
        assertTrue(Double.isNaN(r.cuspLength()) && Double.isNaN(r.jumpUpLength()));
        assertTrue(r.note().contains("no fold pair"));
    }

    /** The numerical path (polynomial treated as a general curve) finds the same cusp length, 1e-8 relative. */
    @Test
    void numericalPathAgrees() {
        double e = 2 * cuspSource();
        CriticalLength numeric = new CriticalLength(new SingleHarmonicBalance(BalanceSettings.DEFAULTS.withClosedForms(false)), 32);
        CriticalLengthResult r = numeric.find(loop(e), 10, 2000);
        assertEquals(cuspLength(), r.cuspLength(), 1e-8 * cuspLength());
    }
}
