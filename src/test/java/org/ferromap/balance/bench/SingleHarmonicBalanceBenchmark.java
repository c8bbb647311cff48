package org.ferromap.balance.bench;

import java.util.concurrent.TimeUnit;
import org.ferromap.balance.BalanceSettings;
import org.ferromap.balance.MultiHarmonicResidual;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.balance.HarmonicBasis;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.ferromap.equipment.PolynomialCurve;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Cost per circuit of the single-harmonic balance (a map calls it once per cell) and of one
 * multi-harmonic residual and Jacobian. Figures, not assertions. Run with
 * {@code java -cp <test classpath> org.openjdk.jmh.Main SingleHarmonicBalanceBenchmark}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class SingleHarmonicBalanceBenchmark {

    private final SingleHarmonicBalance closed = new SingleHarmonicBalance();
    private final SingleHarmonicBalance numeric = new SingleHarmonicBalance(BalanceSettings.DEFAULTS.withClosedForms(false));
    private EquivalentCircuit circuit;
    private MultiHarmonicResidual residual;
    private double[] x;
    private double[] f;
    private double[][] j;
    private double[] jp;
    private double k;

    @Setup
    public void setUp() {
        circuit = new EquivalentCircuit(2 * Math.PI * 60, 27e3, 0, 0.2e-6, 0.05e-6, 1.19e6, Double.POSITIVE_INFINITY,
                new PolynomialCurve(1.5e-3, 1.33e-17, 9), Exactness.GIVEN, 28.17e3);
        residual = new MultiHarmonicResidual(circuit, CircuitParameter.SOURCE, new HarmonicBasis(9, true, 91));
        x = new double[residual.dimension()];
        x[0] = 1.1;
        x[2] = 0.05;
        f = new double[x.length];
        j = new double[x.length][x.length];
        jp = new double[x.length];
    }

    /** Vary the capacitance a little per call, as a map does. */
    private EquivalentCircuit next() {
        k = k > 1e-8 ? 0 : k + 1e-12;
        return circuit.withShuntCapacitance(0.05e-6 + k);
    }

    @Benchmark
    public Object operatingPointsClosedForm() {
        return closed.operatingPoints(next());
    }

    @Benchmark
    public Object foldsClosedForm() {
        return closed.folds(next());
    }

    @Benchmark
    public Object operatingPointsNumerical() {
        return numeric.operatingPoints(next());
    }

    @Benchmark
    public Object foldsNumerical() {
        return numeric.folds(next());
    }

    @Benchmark
    public double[] multiHarmonicResidualH9() {
        residual.residual(x, 27e3, f);
        return f;
    }

    @Benchmark
    public double[][] multiHarmonicJacobianH9() {
        residual.jacobian(x, 27e3, j, jp);
        return j;
    }
}
