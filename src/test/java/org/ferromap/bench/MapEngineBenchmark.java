package org.ferromap.bench;

import java.util.concurrent.TimeUnit;
import org.ferromap.maps.Axis;
import org.ferromap.maps.CellFunction;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.MapGrid;
import org.ferromap.maps.MapRequest;
import org.ferromap.maps.MapRunner;
import org.ferromap.maps.RefinementSettings;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The map engine's own cost on a 400 x 400 map whose cell function costs almost nothing: tiling,
 * thread start-up, copying into the grid, refinement bookkeeping. Compare with
 * {@link #plainLoop()}, the same evaluations in one bare loop, to see the overhead per cell.
 *
 * <p>Run: {@code java -cp target/test-classes:target/classes:<test classpath> org.openjdk.jmh.Main MapEngineBenchmark}
 * (or {@code ferromap bench map-engine} once the command exists).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class MapEngineBenchmark {

    private static final MapRequest REQUEST = MapRequest.of(Axis.linear("x", "", -1, 1, 400),
            Axis.linear("y", "", -1, 1, 400));

    /** One value, x + y: as cheap as a cell can be. */
    private static final CellFunction TRIVIAL = new CellFunction() {
        @Override
        public int width() {
            return 1;
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            out[offset] = x + y;
        }

        @Override
        public String fingerprint() {
            return "bench x + y";
        }
    };

    /** A category (inside the unit disc or not): refinement infers most cells. */
    private static final CellFunction DISC = new CellFunction() {
        @Override
        public int width() {
            return 1;
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            out[offset] = x * x + y * y < 0.5 ? 1 : 0;
        }

        @Override
        public String fingerprint() {
            return "bench disc";
        }
    };

    @Param({"1", "2"})
    public int threads;

    private LocalPoolExecutor executor() {
        return new LocalPoolExecutor(threads, false, LocalPoolExecutor.DEFAULT_STOP_GRACE);
    }

    /** Every cell, tiles of 16 x 16. */
    @Benchmark
    public MapGrid fullGrid() {
        return MapRunner.run(REQUEST, TRIVIAL, executor(), null, null, RefinementSettings.OFF);
    }

    /** Refinement where nothing agrees (a smooth value compared exactly): the bookkeeping's worst case. */
    @Benchmark
    public MapGrid refinedNothingAgrees() {
        return MapRunner.run(REQUEST, TRIVIAL, executor(), null, null, RefinementSettings.DEFAULT);
    }

    /** Refinement of one round region: most cells inferred. */
    @Benchmark
    public MapGrid refinedDisc() {
        return MapRunner.run(REQUEST, DISC, executor(), null, null, RefinementSettings.DEFAULT);
    }

    /** The same 160 000 evaluations in one bare loop, the floor the engine is measured against. */
    @Benchmark
    public double[] plainLoop() {
        double[] xs = REQUEST.x().values();
        double[] ys = REQUEST.y().values();
        double[] out = new double[xs.length * ys.length];
        for (int iy = 0; iy < ys.length; iy++) {
            for (int ix = 0; ix < xs.length; ix++) {
                TRIVIAL.evaluate(xs[ix], ys[iy], out, iy * xs.length + ix);
            }
        }
        return out;
    }
}
