package org.ferromap.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.function.DoubleFunction;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Direction;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.orbits.BruteForceSweep;
import org.ferromap.orbits.CircuitSystem;
import org.ferromap.orbits.Orbit;
import org.ferromap.orbits.OrbitBranch;
import org.ferromap.orbits.OrbitContinuation;
import org.ferromap.orbits.OrbitContinuationSettings;
import org.ferromap.orbits.PeriodMap;
import org.ferromap.orbits.Section;
import org.ferromap.orbits.Shooting;
import org.ferromap.orbits.ShootingSettings;
import org.ferromap.orbits.SweepRun;
import org.ferromap.orbits.SweepSettings;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Figures for the orbits package (not a test), on the normalised cubic circuit
 * x'' + 0.1 x' + x^3 = B cos t: one period map with its monodromy, one shooting solve with the
 * accuracy check, the period-1 branch from B = 4 to 5.7 with its period doubling located, and a
 * 20-value brute-force sweep. Run:
 * {@code java -cp target/test-classes:target/classes:<test classpath> org.openjdk.jmh.Main OrbitsBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class OrbitsBenchmark {

    private static final DoubleFunction<CircuitSystem> FAMILY = b -> CircuitSystem.of(
            EquivalentCircuit.of(1.0, b, 1.0, 0.0, new PolynomialCurve(0, 1, 3)).withCoreLossResistance(10.0).withRatedPeak(1.0));

    private double[] seed;
    private PeriodMap map;
    private CircuitSystem system;

    @Setup
    public void setUp() {
        system = FAMILY.apply(4.0);
        seed = new double[] {0, 0};
        map = new PeriodMap(2, 1e-11, 100_000);
        map.advance(system, seed, 1000);
    }

    @Benchmark
    public double periodMapWithMonodromy() {
        double[] image = new double[2];
        double[] m = new double[4];
        map.apply(system, seed, 1, image, m);
        return m[0];
    }

    @Benchmark
    public Orbit shootingWithAccuracyCheck() {
        return new Shooting(ShootingSettings.DEFAULTS).solve(system, seed, Section.periods(1));
    }

    @Benchmark
    public OrbitBranch branchThroughPeriodDoubling() {
        return new OrbitContinuation(OrbitContinuationSettings.DEFAULTS.withWindow(3.9, 5.7))
                .trace(FAMILY, seed, 4.0, Section.periods(1), Direction.INCREASING);
    }

    @Benchmark
    public List<SweepRun> sweepTwentyValues() {
        double[] values = new double[20];
        for (int i = 0; i < values.length; i++) {
            values[i] = 4.0 + 0.05 * i;
        }
        return BruteForceSweep.sweep(FAMILY, values, List.of(seed.clone()), SweepSettings.DEFAULTS.withTransients(200, 100));
    }
}
