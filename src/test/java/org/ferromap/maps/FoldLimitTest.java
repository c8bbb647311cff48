package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleFunction;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

/**
 * The fold-based limit against the closed forms of the polynomial balance (DOMAIN.md §3 [der],
 * written out independently in {@link PolynomialFolds}, roots by Commons Math).
 */
class FoldLimitTest {

    private static final double W = 2 * Math.PI * 60;
    /** Series and shunt capacitance per metre of a loop, F/m (E_eq = 0.2). */
    private static final double S = 0.1e-9;
    private static final double Q = 0.4e-9;
    /** Loop conductance, S. */
    private static final double G = 2e-6;
    private static final double A = 7e-3;
    private static final double B = 1e-14;
    private static final int N = 9;

    private static DoubleFunction<EquivalentCircuit> loop() {
        PolynomialCurve curve = new PolynomialCurve(A, B, N);
        return l -> new EquivalentCircuit(W, 10e3, 0, S * l, Q * l, 1 / G, Double.POSITIVE_INFINITY, curve, Exactness.GIVEN, 10e3);
    }

    /**
     * Cusp length C_min / C' with C_min = (a + (2 sqrt(n)/(n-1)) w G)/w^2; sources at or above the
     * birth voltage have their limit there; lower sources meet the jump-down fold further out, at
     * the length Commons Math's Brent solver finds on the closed form. Tolerances: 1e-9 relative on
     * the cusp (closed form on both sides, rounding only), 1e-8 on the crossings (the limit is
     * refined to 1e-10 relative).
     */
    @Test
    void limitsFollowTheClosedForm() {
        PolynomialFolds pf = new PolynomialFolds(A, B, N, W);
        double lc = pf.cuspCapacitance(G) / (S + Q);
        double birth = pf.birthSource(G, S * lc);
        double[] sources = {0.3 * birth, 0.7 * birth, 0.99 * birth, 1.0 * birth * 1.001, 3 * birth};
        FoldLimit.Result r = new FoldLimit(new SingleHarmonicBalance(), 1e6).find(loop(), 1000, sources);
        assertEquals(lc, r.cuspLength(), 1e-9 * lc);
        assertEquals(birth, r.cuspSourcePeak(), 1e-9 * birth);
        double[] l = r.limits();
        for (int k = 0; k < 3; k++) {
            double expected = pf.crossingLength(sources[k], S, Q, G, lc * (1 + 1e-12), lc * 1e4);
            assertEquals(expected, l[k], 1e-8 * expected, "source " + sources[k]);
        }
        assertEquals(lc, l[3], 1e-9 * lc);
        assertEquals(lc, l[4], 1e-9 * lc);
        // higher sources reach a ferroresonant state on shorter cables [der: E_down falls with C]
        assertTrue(l[0] > l[1] && l[1] > l[2] && l[2] > l[3]);
    }

    /** No pair within the longest length searched: the limit is reported as infinite, not guessed. */
    @Test
    void beyondTheSearchNoLimit() {
        PolynomialFolds pf = new PolynomialFolds(A, B, N, W);
        double lc = pf.cuspCapacitance(G) / (S + Q);
        FoldLimit.Result r = new FoldLimit(new SingleHarmonicBalance(), 0.5 * lc).find(loop(), 10, 5e3);
        assertTrue(Double.isInfinite(r.cuspLength()));
        assertTrue(Double.isInfinite(r.limits()[0]));
    }
}
