package org.ferromap.bench;

import java.nio.file.Path;
import java.time.Duration;
import java.util.EnumSet;
import java.util.concurrent.TimeUnit;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.maps.Axis;
import org.ferromap.maps.EnsembleSettings;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.MapLayer;
import org.ferromap.maps.PlaneAxis;
import org.ferromap.maps.StudyMap;
import org.ferromap.maps.StudyMapResult;
import org.ferromap.maps.StudyMapSettings;
import org.ferromap.maps.StudyPlane;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.StudyReader;
import org.ferromap.study.SweepParameter;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The study map's layers on this machine's threads (every cell computed, no refinement, no resume
 * tiles):
 * <ul>
 * <li>{@link #balanceLayer400}: the balance layer at 400 x 400 cells of the kV-scale polynomial
 * circuit ({@code maps/bench-circuit-kv-scale.yaml}) over source 10 to 40 kV peak and series
 * capacitance 20 to 500 nF (log): closed-form folds per cell. Target below 1 s.</li>
 * <li>{@link #balanceLayerEquipment100}: the balance layer at 100 x 100 cells of the notebook demo
 * ({@code maps/corrie-bridge-notebook-demo.yaml}) over cable length and damping load: an
 * equipment study, reduced again in every cell, whose loop curve (a scaled polynomial) goes
 * through the balance's general quadrature path.</li>
 * <li>{@link #timeLayer64}: the time-domain layer at 64 x 64 cells x 8 switching angles (no
 * residual flux; with the mirror symmetry 4 are simulated per cell) on the demo's plane, each
 * event simulated until an orbit is certified (the early stop) or 400 periods. Target below 120 s.
 * {@link #timeLayer64NoMirror} simulates all 8 per cell.</li>
 * </ul>
 * Run: {@code scripts/jmh StudyMapBenchmark}. The time layer is one shot per iteration.
 */
@State(Scope.Benchmark)
@Fork(value = 1, jvmArgs = {"-Xmx2g"})
public class StudyMapBenchmark {

    private StudyPlane kvPlane;
    private StudyPlane demoPlane100;
    private StudyPlane demoPlane64;
    private StudyMapSettings balanceOnly;
    private StudyMapSettings timeOnly;
    private StudyMapSettings timeOnlyNoMirror;
    private int threads;

    @Setup(Level.Trial)
    public void setUp() {
        threads = Runtime.getRuntime().availableProcessors();
        Study kv = StudyReader.read(Path.of("maps/bench-circuit-kv-scale.yaml"));
        kvPlane = new StudyPlane(new StudyParameters(kv),
                PlaneAxis.ofSi(SweepParameter.SOURCE, 10e3, 40e3, 400, Axis.Scale.LINEAR),
                PlaneAxis.ofSi(SweepParameter.SERIES_CAPACITANCE, 20e-9, 500e-9, 400, Axis.Scale.LOG));
        Study demo = StudyReader.read(Path.of("maps/corrie-bridge-notebook-demo.yaml"));
        StudyParameters dp = new StudyParameters(demo);
        demoPlane100 = new StudyPlane(dp, PlaneAxis.ofSi(SweepParameter.CABLE_LENGTH, 40, 10e3, 100, Axis.Scale.LOG),
                PlaneAxis.ofSi(SweepParameter.LOAD_RESISTANCE, 10e3, 10e6, 100, Axis.Scale.LOG));
        demoPlane64 = new StudyPlane(dp, PlaneAxis.ofSi(SweepParameter.CABLE_LENGTH, 40, 10e3, 64, Axis.Scale.LOG),
                PlaneAxis.ofSi(SweepParameter.LOAD_RESISTANCE, 10e3, 10e6, 64, Axis.Scale.LOG));
        balanceOnly = StudyMapSettings.defaults().withLayers(EnumSet.of(MapLayer.BALANCE)).withRefine(false);
        EnsembleSettings eight = EnsembleSettings.defaults().withAngles(8).withResidualFluxes(0)
                .withSimulation(SimulationSettings.defaults().withMaxPeriods(400).withTolerance(1e-8));
        timeOnly = StudyMapSettings.defaults().withLayers(EnumSet.of(MapLayer.TIME)).withEnsemble(eight).withRefine(false);
        timeOnlyNoMirror = timeOnly.withEnsemble(eight.withMirror(false));
    }

    private StudyMapResult run(StudyPlane plane, StudyMapSettings s) {
        return StudyMap.run(plane, s, new LocalPoolExecutor(threads, false, Duration.ZERO), null, null, threads);
    }

    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 2, time = 2)
    @Measurement(iterations = 5, time = 2)
    public StudyMapResult balanceLayer400() {
        return run(kvPlane, balanceOnly);
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @Warmup(iterations = 1)
    @Measurement(iterations = 3)
    public StudyMapResult balanceLayerEquipment100() {
        return run(demoPlane100, balanceOnly);
    }

    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @Warmup(iterations = 0)
    @Measurement(iterations = 1)
    public StudyMapResult timeLayer64() {
        return run(demoPlane64, timeOnly);
    }

    /** As {@link #timeLayer64} with all 8 events simulated in every cell (mirror symmetry off). */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.SECONDS)
    @Warmup(iterations = 0)
    @Measurement(iterations = 1)
    public StudyMapResult timeLayer64NoMirror() {
        return run(demoPlane64, timeOnlyNoMirror);
    }
}
