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
import org.ferromap.continuation.TestProblems;
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

    private static final ContinuationProblem S_CURVE = TestProblems.sCurve();
    private static final TwoParameterProblem CUBIC = TestProblems.cubicCusp();
    private static final int BRATU_NODES = 50;
    private static final ContinuationProblem BRATU = TestProblems.bratu(BRATU_NODES);

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
