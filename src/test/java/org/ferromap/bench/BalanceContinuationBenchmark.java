package org.ferromap.bench;

import java.util.concurrent.TimeUnit;
import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.BranchResult;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.balance.FoldCurveResult;
import org.ferromap.balance.StartState;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.equipment.PolynomialCurve;
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
 * Figures for the balance continuation (not a test), on the SI-scale circuit of the examples
 * (60 Hz, 0.2 uF + 0.05 uF, 1.19 MOhm, ninth-power curve): a single-harmonic source branch over
 * the full S curve with both folds located (target under 50 ms), and the fold curves in the
 * (source, series-capacitance) plane over one decade of capacitance, regions labelled (target
 * under 500 ms).
 * Run: {@code java -cp target/test-classes:target/classes:<test classpath> org.openjdk.jmh.Main BalanceContinuationBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class BalanceContinuationBenchmark {

    private static final EquivalentCircuit CIRCUIT = new EquivalentCircuit(2 * Math.PI * 60, 28.17e3, 0.0, 0.2e-6, 0.05e-6,
            1.19e6, Double.POSITIVE_INFINITY, new PolynomialCurve(1.5e-3, 1.33e-17, 9), Exactness.GIVEN, 28.17e3);

    private final BalanceContinuation continuation = new BalanceContinuation();
    private final BalanceAxis source = BalanceAxis.of(CircuitParameter.SOURCE);
    private final BalanceAxis series = BalanceAxis.of(CircuitParameter.SERIES_CAPACITANCE);

    /** Source from 0.2 kV to 60 kV peak through the jump-up (28.1 kV) and jump-down (0.39 kV) folds. */
    @Benchmark
    public BranchResult sourceBranchFullSCurve() {
        BranchResult r = continuation.branch(source, CIRCUIT::withSourcePeak, 200, 60e3, 20e3, 1, StartState.NORMAL);
        if (r.folds().size() != 2) {
            throw new IllegalStateException("expected both folds, got " + r.folds());
        }
        return r;
    }

    /** Fold curves for source 0 to 80 kV peak and series capacitance 0.05 uF to 0.5 uF, regions labelled. */
    @Benchmark
    public FoldCurveResult foldCurvesOverADecadeOfCapacitance() {
        return continuation.foldCurves(source, series, (e, cs) -> CIRCUIT.withSourcePeak(e).withSeriesCapacitance(cs),
                0, 80e3, 0.05e-6, 0.5e-6, 28.17e3, 0.2e-6);
    }
}
