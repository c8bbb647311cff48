package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.EnumSet;
import java.util.concurrent.atomic.AtomicLong;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.StudyReader;
import org.ferromap.study.SweepParameter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The time-domain layer: what each cell holds against simulations run one by one, independence
 * from the thread count, and resuming after an interruption.
 */
class TimeDomainMapTest {

    @TempDir
    Path tmp;

    /** The closed-form study of {@link BalanceMapTest}: 50 kOhm of core loss damps every transient within tens of periods. */
    static StudyPlane plane(int xSteps, int ySteps) {
        Study s = StudyReader.read(BalanceMapTest.STUDY, "time-domain.yaml");
        return new StudyPlane(new StudyParameters(s), PlaneAxis.ofSi(SweepParameter.SOURCE, 15e3, 45e3, xSteps,
                Axis.Scale.LINEAR), PlaneAxis.ofSi(SweepParameter.SERIES_CAPACITANCE, 40e-9, 300e-9, ySteps, Axis.Scale.LOG));
    }

    /** 4 angles x residual flux {0, +-0.8}: 12 events per cell. */
    static final EnsembleSettings ENSEMBLE = EnsembleSettings.defaults().withAngles(4)
            .withSimulation(SimulationSettings.defaults().withMaxPeriods(400).withTolerance(1e-8));

    static StudyMapSettings settings(EnsembleSettings e, boolean refine) {
        return StudyMapSettings.defaults().withLayers(EnumSet.of(MapLayer.TIME)).withEnsemble(e).withRefine(refine)
                .withTileSizes(16, 2);
    }

    static LocalPoolExecutor pool(int threads) {
        return new LocalPoolExecutor(threads, false, Duration.ZERO);
    }

    /**
     * Each cell agrees with the ensemble simulated one event at a time: switching angle
     * 2 pi k / 4, residual flux 0 and +-0.8 of the rated peak flux ratedPeak / omega [der: the
     * ensemble's definition], the share not ending normal, the worst mode and the largest peak.
     * Mirror symmetry off, so every event is simulated as in the loop here and the figures agree
     * exactly.
     */
    @Test
    void cellsAgreeWithSimulationsRunOneByOne() {
        StudyPlane plane = plane(3, 2);
        EnsembleSettings e = ENSEMBLE.withMirror(false);
        StudyMapResult r = StudyMap.run(plane, settings(e, false), pool(2), null, null, 2);
        int[] checkedModes = new int[SteadyMode.values().length];
        for (int iy = 0; iy < 2; iy++) {
            for (int ix = 0; ix < 3; ix++) {
                EquivalentCircuit c = plane.circuit(plane.x().axis().value(ix), plane.y().axis().value(iy));
                int notNormal = 0;
                int total = 0;
                double peak = 0;
                SteadyMode worst = SteadyMode.NORMAL;
                for (int k = 0; k < 4; k++) {
                    for (double r0 : new double[] {0, 0.8, -0.8}) {
                        SimulationSettings s = e.simulation().withSourceAngle(2 * Math.PI * k / 4)
                                .withInitialState(r0 * (c.ratedPeak() / c.omega()), 0);
                        SimulationResult res = Simulator.simulate(c, s);
                        total++;
                        notNormal += res.mode() == SteadyMode.NORMAL ? 0 : 1;
                        peak = Math.max(peak, res.peakPerUnit());
                        if (TimeDomainCell.worse(res.mode(), worst)) {
                            worst = res.mode();
                        }
                        checkedModes[res.mode().ordinal()]++;
                    }
                }
                assertEquals(12, total);
                assertEquals((double) notNormal / total, r.time().value(ix, iy, 0), 0.0, "fraction at " + ix + "," + iy);
                assertEquals(worst.ordinal(), r.time().value(ix, iy, 1), 0.0, "worst mode at " + ix + "," + iy);
                assertEquals(peak, r.time().value(ix, iy, 3), 0.0, "peak at " + ix + "," + iy);
            }
        }
        assertTrue(checkedModes[SteadyMode.NORMAL.ordinal()] > 0 && checkedModes[SteadyMode.NORMAL.ordinal()] < 72,
                "the plane holds both normal and ferroresonant outcomes: " + java.util.Arrays.toString(checkedModes));
    }

    /**
     * Mirror symmetry: with an odd magnetizing curve, switching at phi + pi with residual flux -r
     * is the mirror image of switching at phi with +r [der: (lambda, v, phi) -&gt; (-lambda, -v,
     * phi + pi) maps solutions to solutions], so simulating half the events gives the same
     * shares and worst modes in this well-damped plane (no chaotic cell, where rounding could
     * tell the halves apart). Peaks agree to 1e-6 pu: the mirrored runs differ by rounding only,
     * far below the 1e-8 integration tolerance's effect on a settled peak.
     */
    @Test
    void mirrorSymmetryHalvesTheWorkWithoutChangingTheMap() {
        StudyPlane plane = plane(3, 2);
        StudyMapResult full = StudyMap.run(plane, settings(ENSEMBLE.withMirror(false), false), pool(2), null, null, 2);
        StudyMapResult half = StudyMap.run(plane, settings(ENSEMBLE.withMirror(true), false), pool(2), null, null, 2);
        double[] a = full.time().data();
        double[] b = half.time().data();
        for (int c = 0; c < 6; c++) {
            assertEquals(a[c * 4], b[c * 4], 0.0, "fraction");
            assertEquals(a[c * 4 + 1], b[c * 4 + 1], 0.0, "worst mode");
            assertEquals(a[c * 4 + 2], b[c * 4 + 2], 0.0, "undetermined");
            assertEquals(a[c * 4 + 3], b[c * 4 + 3], 1e-6, "peak");
        }
    }

    /** One thread or two: the same bits [der: each cell is a pure function written to its own slots]. */
    @Test
    void identicalForOneAndTwoThreads() {
        StudyPlane plane = plane(4, 3);
        StudyMapResult one = StudyMap.run(plane, settings(ENSEMBLE, true), pool(1), null, null, 1);
        StudyMapResult two = StudyMap.run(plane, settings(ENSEMBLE, true), pool(2), null, null, 2);
        assertTrue(one.time().sameAs(two.time()));
    }

    /**
     * Stopped after a few cells, the map resumes from its saved tiles: the rerun computes only the
     * rest, and the result is bit-identical to an uninterrupted run [der: tiles hold the cells'
     * exact values].
     */
    @Test
    void anInterruptedMapResumesToTheSameResult() {
        StudyPlane plane = plane(4, 4);
        StudyMapSettings s = settings(ENSEMBLE, false);
        StudyMapResult reference = StudyMap.run(plane, s, pool(2), null, null, 2);

        TileStore store = TileStore.at(tmp.resolve(".tiles").resolve("study"));
        LocalPoolExecutor first = pool(2);
        AtomicLong done = new AtomicLong();
        ProgressListener stopper = new ProgressListener() {
            @Override
            public void passStarted(int pass, String label, long cellsToCompute, long cellsReused) {
            }

            @Override
            public void cellsDone(long cells) {
                if (done.addAndGet(cells) >= 4) {
                    first.requestStop();
                }
            }

            @Override
            public void passFinished(int pass) {
            }
        };
        FerromapException e = assertThrows(FerromapException.class, () -> StudyMap.run(plane, s, first, store, stopper, 2));
        assertEquals(MessageKey.INTERRUPTED, e.key());
        assertTrue(done.get() >= 4 && done.get() < 16, "stopped midway after " + done.get() + " cells");

        StudyMapResult resumed = StudyMap.run(plane, s, pool(2), TileStore.at(tmp.resolve(".tiles").resolve("study")), null, 2);
        assertTrue(resumed.time().sameAs(reference.time()));
        assertEquals(done.get(), resumed.time().stats().reused(), "every finished tile reused");
        assertEquals(16 - done.get(), resumed.time().stats().computed());
    }
}
