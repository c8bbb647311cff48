package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/** Branch points, closed branches, rejections, stop rules and input checks of the branch tracer. */
class BranchTracerTest {

    /** Pitchfork F = x (p - x^2) with its analytic Jacobian. */
    private static final ContinuationProblem PITCHFORK = new ContinuationProblem() {
        @Override
        public int dimension() {
            return 1;
        }

        @Override
        public void residual(double[] x, double p, double[] out) {
            out[0] = x[0] * (p - x[0] * x[0]);
        }

        @Override
        public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
            dFdx[0][0] = p - 3 * x[0] * x[0];
            dFdp[0] = x[0];
        }
    };

    /** Transcritical F = x (p - x), Jacobian left to the engine. */
    private static final ContinuationProblem TRANSCRITICAL = new ContinuationProblem() {
        @Override
        public int dimension() {
            return 1;
        }

        @Override
        public void residual(double[] x, double p, double[] out) {
            out[0] = x[0] * (p - x[0]);
        }
    };

    /** The unit circle x^2 + p^2 = 1. */
    private static final ContinuationProblem CIRCLE = new ContinuationProblem() {
        @Override
        public int dimension() {
            return 1;
        }

        @Override
        public void residual(double[] x, double p, double[] out) {
            out[0] = x[0] * x[0] + p * p - 1;
        }
    };

    @Test
    void pitchforkBranchPointOnTheTrivialBranch() {
        // [der] On x = 0: F_x = p and F_p = 0, so [F_x F_p] loses rank at p = 0 where x = +-sqrt(p) crosses.
        Branch b = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-1, 1))
                .trace(PITCHFORK, new double[] {0}, -1, Direction.INCREASING);
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        List<SpecialPoint> bps = b.specialPoints(SpecialPoint.Kind.BRANCH_POINT);
        assertEquals(1, bps.size(), "special points: " + b.specialPoints());
        assertTrue(bps.get(0).located());
        // 1e-10 scaled, p scale 2 (window width).
        assertEquals(0, bps.get(0).p(), 2e-10);
        assertEquals(0, bps.get(0).x(0), 1e-12);
        assertTrue(b.specialPoints(SpecialPoint.Kind.FOLD).isEmpty());
        // [der] x' = x (p - x^2) at x = 0 has eigenvalue p: stable below the branch point, unstable above.
        for (int k = 0; k < b.size(); k++) {
            if (Math.abs(b.p(k)) > 1e-9) {
                assertEquals(b.p(k) > 0 ? 1 : 0, b.unstableCount(k), "point " + k);
            }
        }
    }

    @Test
    void transcriticalBranchPointOnTheDiagonalBranch() {
        // [der] On x = p: F_x = -p, F_p = p, both vanish at p = 0 where x = 0 crosses.
        Branch b = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-1, 1))
                .trace(TRANSCRITICAL, new double[] {-1}, -1, Direction.INCREASING);
        List<SpecialPoint> bps = b.specialPoints(SpecialPoint.Kind.BRANCH_POINT);
        assertEquals(1, bps.size(), "special points: " + b.specialPoints());
        // 1e-10 scaled (scales 1 and 2) plus the 4e-11 bias of the difference Jacobian (h^2 with h = 6e-6).
        assertEquals(0, bps.get(0).p(), 3e-10);
        assertEquals(0, bps.get(0).x(0), 2e-10);
        // No jump to x = 0: the branch stays on x = p (residual and x - p at Newton accuracy).
        for (int k = 0; k < b.size(); k++) {
            assertEquals(b.p(k), b.x(k, 0), 1e-8);
        }
        assertEquals(1.0, b.p(b.size() - 1), 1e-12);
    }

    @Test
    void closedBranchStopsAtItsStartWithBothFolds() {
        // [der] The circle turns back in p at p = +-1, x = 0, and closes.
        Branch b = new BranchTracer(ContinuationSettings.DEFAULTS).trace(CIRCLE, new double[] {1}, 0, Direction.INCREASING);
        assertEquals(StopReason.BRANCH_CLOSED, b.stopReason(), b.stopDetail());
        List<SpecialPoint> folds = b.specialPoints(SpecialPoint.Kind.FOLD);
        assertEquals(2, folds.size());
        // 1e-10 scaled with unit scales; x carries the difference Jacobian's 1e-11-level error too.
        assertEquals(1, folds.get(0).p(), 1e-10);
        assertEquals(-1, folds.get(1).p(), 1e-10);
        assertEquals(0, folds.get(0).x(0), 1e-9);
        assertEquals(0, folds.get(1).x(0), 1e-9);
        // The last point is the start point again; the circumference is 2 pi (chords fall short by O(ds^2)).
        assertEquals(1, b.x(b.size() - 1, 0), 1e-12);
        assertEquals(0, b.p(b.size() - 1), 1e-12);
        assertEquals(2 * Math.PI, b.arclength()[b.size() - 1], 0.02);
    }

    @Test
    void tightAngleGuardRejectsStepsWithReasonsAndStillPassesTheFolds() {
        ContinuationSettings s = ContinuationSettings.DEFAULTS.withWindow(-2, 2).withSteps(0.5, 1e-8, 0.5).withMaxTangentAngle(0.05);
        Branch b = new BranchTracer(s).trace(TestProblems.sCurve(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        assertEquals(2, b.specialPoints(SpecialPoint.Kind.FOLD).size());
        List<RejectedStep> angle = b.rejectedSteps().stream().filter(r -> r.reason() == RejectionReason.ANGLE_TOO_LARGE).toList();
        assertFalse(angle.isEmpty(), "expected angle rejections, got " + b.rejectedSteps());
        // The first step of 0.5 turns the tangent too far, and is halved on each retry.
        RejectedStep first = b.rejectedSteps().get(0);
        assertEquals(0, first.fromIndex());
        assertEquals(0.5, first.stepSize());
        assertEquals(-1.875, first.p());
        for (int i = 1; i < b.rejectedSteps().size(); i++) {
            RejectedStep r = b.rejectedSteps().get(i);
            RejectedStep prev = b.rejectedSteps().get(i - 1);
            if (r.fromIndex() == prev.fromIndex()) {
                assertEquals(prev.stepSize() / 2, r.stepSize());
            }
        }
    }

    @Test
    void parameterCapRejectsLargeParameterSteps() {
        ContinuationSettings s = ContinuationSettings.DEFAULTS.withWindow(-2, 2).withSteps(0.5, 1e-8, 0.5).withMaxParameterStep(0.05);
        Branch b = new BranchTracer(s).trace(TestProblems.sCurve(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        assertEquals(StopReason.WINDOW_LEFT, b.stopReason(), b.stopDetail());
        assertTrue(b.rejectedSteps().stream().anyMatch(r -> r.reason() == RejectionReason.PARAMETER_STEP_TOO_LARGE));
        for (int k = 1; k < b.size(); k++) {
            assertTrue(Math.abs(b.p(k) - b.p(k - 1)) <= 0.05, "parameter step " + k);
        }
    }

    @Test
    void anImpossibleAngleGuardStopsAtTheMinimumStepAndSaysWhy() {
        ContinuationSettings s = ContinuationSettings.DEFAULTS.withWindow(-2, 2).withSteps(0.01, 1e-3, 0.5).withMaxTangentAngle(1e-6);
        Branch b = new BranchTracer(s).trace(TestProblems.sCurve(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        assertEquals(StopReason.MIN_STEP, b.stopReason());
        assertTrue(b.stopDetail().contains("ANGLE_TOO_LARGE"), b.stopDetail());
        assertTrue(b.stopDetail().contains("p = "), "the detail says where: " + b.stopDetail());
        assertTrue(b.rejectedSteps().size() >= 4);
    }

    @Test
    void aRunThatCannotStartSaysWhy() {
        // x^2 + 1 + p^2 = 0 has no real solution: the start correction cannot converge.
        ContinuationProblem none = new ContinuationProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double[] out) {
                out[0] = x[0] * x[0] + 1 + p * p;
            }
        };
        Branch b = new BranchTracer(ContinuationSettings.DEFAULTS).trace(none, new double[] {0.5}, 0, Direction.INCREASING);
        assertEquals(StopReason.START_FAILED, b.stopReason());
        assertEquals(0, b.size());
        assertTrue(b.stopDetail().contains("could not be corrected"), b.stopDetail());
    }

    @Test
    void stepLimitStops() {
        Branch b = new BranchTracer(ContinuationSettings.DEFAULTS.withMaxSteps(5))
                .trace(TestProblems.sCurve(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        assertEquals(StopReason.MAX_STEPS, b.stopReason());
        assertEquals(6, b.size());
    }

    @Test
    void runsAreDeterministic() {
        BranchTracer tracer = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-2, 2));
        Branch a = tracer.trace(TestProblems.sCurveDifferenced(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        Branch b = tracer.trace(TestProblems.sCurveDifferenced(), new double[] {-1.5}, -1.875, Direction.INCREASING);
        assertArrayEquals(a.p(), b.p());
        assertEquals(a.specialPoints().get(0).p(), b.specialPoints().get(0).p());
    }

    @Test
    void stabilityCriterionGetsTheJacobianInTheProblemsUnits() {
        // F = 1e-3 ((X/1e4)^3 - X/1e4 - P/1e-7): dF/dX = 1e-3 (3 X^2/1e12 - 1/1e4) [der].
        ContinuationProblem si = new ContinuationProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double[] out) {
                double xs = x[0] / 1e4;
                out[0] = 1e-3 * (xs * xs * xs - xs - p / 1e-7);
            }
        };
        double[] worst = {0};
        StabilityCriterion check = (x, p, j) -> {
            double expected = 1e-3 * (3 * x[0] * x[0] / 1e12 - 1e-4);
            worst[0] = Math.max(worst[0], Math.abs(j[0][0] - expected) / 3e-7);
            return 0;
        };
        new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-2e-7, 2e-7), check)
                .trace(si, new double[] {-1.5e4}, -1.875e-7, Direction.INCREASING);
        // Central differences in scaled variables: about 1e-10 relative to the largest entry (3e-7).
        assertTrue(worst[0] < 1e-8, "relative Jacobian error " + worst[0]);
    }

    @Test
    void defaultJacobianMatchesTheAnalyticOne() {
        double[][] fd = new double[1][1];
        double[] fdp = new double[1];
        TestProblems.sCurveDifferenced().jacobian(new double[] {0.7}, 0.2, fd, fdp);
        // [der] d/dx (x^3 - x - p) = 3x^2 - 1, d/dp = -1; central differences: ~1e-10.
        assertEquals(3 * 0.49 - 1, fd[0][0], 1e-9);
        assertEquals(-1, fdp[0], 1e-9);
    }

    @Test
    void fixedSecondParameterKeepsTheAnalyticJacobian() {
        int[] calls = {0};
        TwoParameterProblem counted = new TwoParameterProblem() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void residual(double[] x, double p, double q, double[] out) {
                out[0] = x[0] * x[0] * x[0] - q * x[0] - p;
            }

            @Override
            public void jacobian(double[] x, double p, double q, double[][] dFdx, double[] dFdp, double[] dFdq) {
                calls[0]++;
                dFdx[0][0] = 3 * x[0] * x[0] - q;
                dFdp[0] = -1;
                dFdq[0] = -x[0];
            }
        };
        Branch b = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-2, 2))
                .trace(counted.atFixedQ(1), new double[] {-1.5}, -1.875, Direction.INCREASING);
        assertEquals(2, b.specialPoints(SpecialPoint.Kind.FOLD).size());
        assertTrue(calls[0] > 0, "the problem's own Jacobian must be used through atFixedQ");
    }

    @Test
    void badStartValuesAreInputErrors() {
        BranchTracer tracer = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-2, 2));
        FerromapException size = assertThrows(FerromapException.class,
                () -> tracer.trace(TestProblems.sCurve(), new double[] {1, 2}, 0, Direction.INCREASING));
        assertEquals(MessageKey.BAD_REQUEST, size.key());
        FerromapException window = assertThrows(FerromapException.class,
                () -> tracer.trace(TestProblems.sCurve(), new double[] {1}, 3, Direction.INCREASING));
        assertEquals(MessageKey.OUT_OF_RANGE, window.key());
        FerromapException nan = assertThrows(FerromapException.class,
                () -> tracer.trace(TestProblems.sCurve(), new double[] {Double.NaN}, 0, Direction.INCREASING));
        assertEquals(MessageKey.OUT_OF_RANGE, nan.key());
    }

    @Test
    void settingsAreValidated() {
        ContinuationSettings d = ContinuationSettings.DEFAULTS;
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> d.withSteps(0.1, 1, 2)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> d.withWindow(1, 1)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> d.withMaxTangentAngle(2)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> d.withNewton(1e-9, 3, 4)).key());
        assertEquals(MessageKey.OUT_OF_RANGE,
                assertThrows(FerromapException.class, () -> d.withScales(new double[] {1, 0}, Double.NaN)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class,
                () -> FoldCurveSettings.DEFAULTS.withQWindow(2, 1)).key());
        // withX copies change one thing only.
        ContinuationSettings w = d.withWindow(-1, 1);
        assertEquals(d.withWindow(-1, 1), w);
        assertEquals(d.maxStep(), w.maxStep());
    }
}
