package org.ferromap.bench;

import java.util.concurrent.TimeUnit;
import org.ferromap.continuation.Branch;
import org.ferromap.continuation.BranchTracer;
import org.ferromap.continuation.ContinuationProblem;
import org.ferromap.continuation.ContinuationSettings;
import org.ferromap.continuation.Direction;
import org.ferromap.continuation.FoldCurve;
import org.ferromap.continuation.FoldCurveSettings;
import org.ferromap.continuation.FoldCurveTracer;
import org.ferromap.continuation.StabilityCriterion;
import org.ferromap.continuation.TwoParameterProblem;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Figures for the continuation engine (not a test): a full S-curve branch with both folds, a fold
 * curve of the cubic normal form over a decade of q, and a 50-node Bratu branch through its fold.
 * Run: {@code java -cp target/test-classes:target/classes:<test classpath> org.openjdk.jmh.Main ContinuationBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class ContinuationBenchmark {

    private static final ContinuationProblem S_CURVE = new ContinuationProblem() {
        @Override
        public int dimension() {
            return 1;
        }

        @Override
        public void residual(double[] x, double p, double[] out) {
            out[0] = x[0] * x[0] * x[0] - x[0] - p;
        }

        @Override
        public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
            dFdx[0][0] = 3 * x[0] * x[0] - 1;
            dFdp[0] = -1;
        }
    };

    private static final TwoParameterProblem CUBIC = new TwoParameterProblem() {
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
            dFdx[0][0] = 3 * x[0] * x[0] - q;
            dFdp[0] = -1;
            dFdq[0] = -x[0];
        }
    };

    private static final int BRATU_NODES = 50;

    private static final ContinuationProblem BRATU = new ContinuationProblem() {
        private final double h2 = 1.0 / ((BRATU_NODES + 1.0) * (BRATU_NODES + 1.0));

        @Override
        public int dimension() {
            return BRATU_NODES;
        }

        @Override
        public void residual(double[] u, double p, double[] out) {
            for (int i = 0; i < BRATU_NODES; i++) {
                double left = i > 0 ? u[i - 1] : 0;
                double right = i < BRATU_NODES - 1 ? u[i + 1] : 0;
                out[i] = (left - 2 * u[i] + right) / h2 + p * Math.exp(u[i]);
            }
        }

        @Override
        public void jacobian(double[] u, double p, double[][] dFdx, double[] dFdp) {
            for (int i = 0; i < BRATU_NODES; i++) {
                java.util.Arrays.fill(dFdx[i], 0.0);
                double e = Math.exp(u[i]);
                dFdx[i][i] = -2 / h2 + p * e;
                if (i > 0) {
                    dFdx[i][i - 1] = 1 / h2;
                }
                if (i < BRATU_NODES - 1) {
                    dFdx[i][i + 1] = 1 / h2;
                }
                dFdp[i] = e;
            }
        }
    };

    private final BranchTracer sCurveTracer = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(-2, 2));
    private final FoldCurveTracer decadeTracer = new FoldCurveTracer(FoldCurveSettings.DEFAULTS
            .withContinuation(ContinuationSettings.DEFAULTS.withWindow(-5, 5)).withQWindow(0.3, 3));
    private final BranchTracer bratuTracer = new BranchTracer(ContinuationSettings.DEFAULTS.withWindow(0.5, 4),
            StabilityCriterion.none());

    /** S-curve from p = -1.875 to the window edge p = 2 through both folds, with steady-state stability. */
    @Benchmark
    public Branch sCurveFullBranch() {
        return sCurveTracer.trace(S_CURVE, new double[] {-1.5}, -1.875, Direction.INCREASING);
    }

    /** Fold curve p = -2 (q/3)^{3/2} of x^3 - q x - p from q = 3 down to q = 0.3. */
    @Benchmark
    public FoldCurve cubicFoldCurveOverADecade() {
        return decadeTracer.trace(CUBIC, new double[] {1}, -2, 3);
    }

    /** 50-node Bratu branch from p = 0.5 through its fold back to p = 0.5 on the upper solution. */
    @Benchmark
    public Branch bratu50Branch() {
        return bratuTracer.trace(BRATU, new double[BRATU_NODES], 0.5, Direction.INCREASING);
    }
}
