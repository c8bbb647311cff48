package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/** Stop reporting and input checks of the fold-curve tracer. */
class FoldCurveTracerTest {

    @Test
    void aStartAwayFromAnyFoldReportsWhy() {
        // F = x + p q has F_x = 1 everywhere: no fold exists [der], so the start cannot converge.
        TwoParameterProblem linear = new TwoParameterProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double q, double[] out) {
                out[0] = x[0] + p * q;
            }
        };
        FoldCurve c = new FoldCurveTracer(FoldCurveSettings.DEFAULTS).trace(linear, new double[] {1}, -1, 1);
        assertEquals(StopReason.START_FAILED, c.increasingStop());
        assertEquals(StopReason.START_FAILED, c.decreasingStop());
        assertEquals(0, c.size());
        assertTrue(c.increasingDetail().contains("could not be corrected"), c.increasingDetail());
    }

    @Test
    void secondParameterOutsideItsWindowIsAnInputError() {
        FoldCurveTracer tracer = new FoldCurveTracer(FoldCurveSettings.DEFAULTS.withQWindow(0, 1));
        FerromapException e = assertThrows(FerromapException.class,
                () -> tracer.trace(TestProblems.cubicCusp(), new double[] {1}, -2, 3));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
    }

    @Test
    void stepLimitEndsBothRuns() {
        FoldCurveSettings s = FoldCurveSettings.DEFAULTS.withContinuation(ContinuationSettings.DEFAULTS.withMaxSteps(3));
        FoldCurve c = new FoldCurveTracer(s).trace(TestProblems.cubicCusp(), new double[] {1}, -2, 3);
        assertEquals(StopReason.MAX_STEPS, c.increasingStop());
        assertEquals(StopReason.MAX_STEPS, c.decreasingStop());
        assertEquals(7, c.size());
        assertEquals(3, c.startIndex());
        // Ordered along the curve: q falls towards the cusp side from the increasing end [der: q = 3 x^2].
        for (int k = 1; k < c.size(); k++) {
            assertTrue(c.q(k) > c.q(k - 1), "q increases with the index at " + k);
            assertTrue(c.arclength()[k] > c.arclength()[k - 1]);
        }
    }
}
