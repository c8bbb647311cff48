package org.ferromap.orbits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Direction;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The period-doubling route of the normalised cubic circuit x'' + k x' + x^3 = B cos t, k = 0.1
 * (DOMAIN.md §1.1 with alpha = 0: omega = 1, Cs = 1, Cg = 0, rated peak 1, curve i = lambda^3,
 * R = 1/k, so e = B, g = k, h(x) = x^3 [der]). The first two period doublings are located by
 * continuation in B and confirmed by the brute-force diagram.
 *
 * <p>Values found here (reported, not asserted as constants): the asymmetric period-1 orbit doubles
 * at B = 4.87609 and the period-2 orbit at B = 5.43954 (the period-4 orbit at 5.5191). The
 * literature places the cascades of this Ueda-type oscillator at k = 0.1 roughly in B = 5..12
 * [mem, order of magnitude only]; the assertion is the agreement of the two methods.
 */
class CubicPeriodDoublingTest {

    private static final double K = 0.1;
    private static final double STEP = 0.02;
    private static final DoubleFunction<CircuitSystem> FAMILY = b -> CircuitSystem.of(cubic(b));

    private static OrbitBranch periodOne;
    private static OrbitBranch periodTwo;
    private static double[] settled;

    static EquivalentCircuit cubic(double b) {
        return EquivalentCircuit.of(1.0, b, 1.0, 0.0, new PolynomialCurve(0, 1, 3)).withCoreLossResistance(1 / K)
                .withRatedPeak(1.0);
    }

    @BeforeAll
    static void continueTheRoute() {
        settled = new double[] {0, 0};
        new PeriodMap(2, 1e-10, 100_000).advance(FAMILY.apply(4.0), settled, 1000);
        OrbitContinuation oc = new OrbitContinuation(OrbitContinuationSettings.DEFAULTS.withWindow(3.9, 5.7));
        periodOne = oc.trace(FAMILY, settled, 4.0, Section.periods(1), Direction.INCREASING);
        LocatedBifurcation first = periodOne.bifurcations(BifurcationType.PERIOD_DOUBLING).get(0);
        periodTwo = oc.switchBranch(FAMILY, first).orElseThrow(() -> new AssertionError(oc.lastFailure()));
    }

    private static double firstDoubling(OrbitBranch b) {
        List<LocatedBifurcation> pd = b.bifurcations(BifurcationType.PERIOD_DOUBLING);
        assertTrue(!pd.isEmpty(), "no period doubling on " + b.section());
        assertTrue(pd.get(0).located(), "period doubling not located");
        // At a period doubling one multiplier is -1 [der]; 1e-6 leaves room for the location tolerance.
        assertEquals(-1.0, pd.get(0).critical()[0], 1e-6);
        return pd.get(0).parameter();
    }

    @Test
    void bruteForceConfirmsBothDoublingsWithinOneStep() {
        double b1 = firstDoubling(periodOne);
        double b2 = firstDoubling(periodTwo);
        assertTrue(b2 > b1, "second doubling " + b2 + " after the first " + b1);
        double[] values = new double[46];
        for (int i = 0; i < values.length; i++) {
            values[i] = 4.70 + STEP * i;
        }
        SweepRun up = BruteForceSweep.sweep(FAMILY, values, List.of(settled.clone()),
                SweepSettings.DEFAULTS.withTransients(1000, 600)).get(0);
        // Samples count as equal within 1e-4 per unit: far above the integration error (1e-9) and the
        // transient left after 600 periods, far below the split of a doubled orbit one step past the
        // doubling (of order sqrt(0.02) ~ 0.1).
        double firstTwo = Double.NaN;
        double firstFour = Double.NaN;
        for (int i = 0; i < values.length; i++) {
            int p = up.period(i, 1e-4);
            if (p == 2 && Double.isNaN(firstTwo)) {
                firstTwo = up.parameters()[i];
            }
            if (p == 4 && Double.isNaN(firstFour)) {
                firstFour = up.parameters()[i];
            }
        }
        // The brute-force grid brackets each located doubling: it lies within one step below the first
        // value where the doubled period shows (the brute-force resolution, STEP).
        assertTrue(firstTwo - STEP < b1 && b1 <= firstTwo, "period 2 first seen at " + firstTwo + ", doubling at " + b1);
        assertTrue(firstFour - STEP < b2 && b2 <= firstFour, "period 4 first seen at " + firstFour + ", doubling at " + b2);
    }

    @Test
    void doubledBranchHoldsPeriodTwoOrbits() {
        assertEquals(2, periodTwo.period());
        Shooting shooting = new Shooting(ShootingSettings.DEFAULTS);
        int mid = periodTwo.size() / 2;
        double b = periodTwo.parameter(mid);
        Orbit o = shooting.solve(FAMILY.apply(b), periodTwo.states()[mid], Section.periods(2));
        assertEquals(2, o.period(), "least period of a point on the doubled branch");
        // Not the period-1 orbit again: P(z) differs from z by far more than the Newton tolerance.
        double[] image = new double[2];
        shooting.map(2).apply(FAMILY.apply(b), o.state(), 1, image, null);
        assertTrue(Shooting.distance(image, o.state(), 2) > 1e-3);
    }

    @Test
    void liouvilleHoldsOnEveryOrbit() {
        // Liouville [der]: trace J = -k, so the multipliers of a period-m orbit multiply to exp(-2 pi k m).
        // 1e-8 relative: the monodromy is integrated at 1e-11 over at most two periods.
        for (OrbitBranch b : List.of(periodOne, periodTwo)) {
            double expected = Math.exp(-2 * Math.PI * K * b.period());
            for (FloquetMultipliers mu : b.multipliers()) {
                double re = mu.re()[0] * mu.re()[1] - mu.im()[0] * mu.im()[1];
                assertEquals(expected, re, 1e-8 * expected, b.section() + " " + mu);
            }
        }
    }

    @Test
    void stabilityChangesAtTheDoubling() {
        // Before the first doubling the attracting orbit is stable, after it unstable (a multiplier below -1).
        double b1 = firstDoubling(periodOne);
        int after = 0;
        while (periodOne.parameter(after) <= b1) {
            after++;
        }
        assertTrue(periodOne.multipliers().get(after - 1).stable(), "point before the doubling");
        assertTrue(!periodOne.multipliers().get(after).stable(), "point after the doubling");
        assertTrue(periodOne.multipliers().get(after).re()[1] < -1 || periodOne.multipliers().get(after).re()[0] < -1);
    }
}
