package org.ferromap.equipment;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * Cost of the hot curve methods (figures, not assertions). Run with
 * {@code java -cp target/test-classes:target/classes:<test classpath> org.openjdk.jmh.Main CurveBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class CurveBenchmark {

    private final SaturationCurve piecewise = new PiecewiseLinearCurve(
            new double[] {0.6, 0.9, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6}, new double[] {0.05, 0.09, 0.2, 0.6, 2.5, 8, 20, 40}, 0.02);
    private final SaturationCurve knee = new SmoothKneeCurve(100, 0.05, 1.2);
    private final SaturationCurve table = new TabulatedCurve(
            new double[] {0.6, 0.9, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6}, new double[] {0.05, 0.09, 0.2, 0.6, 2.5, 8, 20, 40}, 0.02);
    private final SaturationCurve wye = CompositeCurve.floatingWye(piecewise);
    private double flux = 1.27;

    @Benchmark
    public double piecewiseCurrent() {
        return piecewise.current(flux);
    }

    @Benchmark
    public double kneeCurrent() {
        return knee.current(flux);
    }

    @Benchmark
    public double kneeSlope() {
        return knee.currentSlope(flux);
    }

    @Benchmark
    public double tableCurrent() {
        return table.current(flux);
    }

    @Benchmark
    public double floatingWyeCurrent() {
        return wye.current(flux);
    }

    @Benchmark
    public double piecewiseFundamental() {
        return piecewise.fundamentalCurrent(flux);
    }

    @Benchmark
    public double kneeFundamental() {
        return knee.fundamentalCurrent(flux);
    }

    @Benchmark
    public double tableFundamental() {
        return table.fundamentalCurrent(flux);
    }
}
