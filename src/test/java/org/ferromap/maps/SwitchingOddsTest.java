package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.commons.math3.distribution.UniformRealDistribution;
import org.apache.commons.math3.stat.inference.KolmogorovSmirnovTest;
import org.ferromap.study.Study;
import org.junit.jupiter.api.Test;

class SwitchingOddsTest {

    /** A bistable kV-scale circuit whose switching events settle within a few tens of periods. */
    private static Study study() {
        return DeliverableStudies.circuitStudy("15 kV peak", "100 kOhm", "");
    }

    /**
     * Deterministic for a seed and independent of the thread count: every run's draws and outcome
     * (mode, period, peak to the last bit) are the same with 1 and 3 threads and on a second call.
     */
    @Test
    void sameSeedSameRunsWhateverTheThreads() {
        OddsSettings s = OddsSettings.defaults().withRuns(12).withSeed(42);
        OddsResult one = SwitchingOdds.estimate(study(), s, new LocalPoolExecutor(1));
        OddsResult three = SwitchingOdds.estimate(study(), s, new LocalPoolExecutor(3));
        OddsResult again = SwitchingOdds.estimate(study(), s, new LocalPoolExecutor(2));
        assertEquals(one.runList(), three.runList());
        assertEquals(one.runList(), again.runList());
        assertEquals(one.interval(), three.interval());
        assertEquals(12, one.runs());
        OddsResult other = SwitchingOdds.estimate(study(), s.withSeed(43), new LocalPoolExecutor(2));
        assertNotEquals(one.runList().get(0).angle(), other.runList().get(0).angle(), "another seed draws otherwise");
    }

    /** A run's draws depend on (seed, index) only: the first runs of a longer estimate are the shorter one's. */
    @Test
    void addingRunsKeepsTheFirstOnes() {
        OddsSettings s = OddsSettings.defaults().withSeed(7);
        List<OddsResult.Run> six = SwitchingOdds.estimate(study(), s.withRuns(6), new LocalPoolExecutor(2)).runList();
        List<OddsResult.Run> ten = SwitchingOdds.estimate(study(), s.withRuns(10), new LocalPoolExecutor(2)).runList();
        assertEquals(six, ten.subList(0, 6));
    }

    /**
     * The draws are uniform: angles on [0, 2 pi) and residual fluxes on [-r, r), by Commons Math's
     * Kolmogorov-Smirnov test over 20000 draws at the 1 % level. Deterministic (fixed seed), so it
     * passes or fails the same way on every run; a generator or mixing error fails it.
     */
    @Test
    void drawsAreUniform() {
        int n = 20000;
        double[] angles = new double[n];
        double[] fluxes = new double[n];
        for (int i = 0; i < n; i++) {
            double[] d = SwitchingOdds.draws(12345L, i, 0.8);
            angles[i] = d[0];
            fluxes[i] = d[1];
        }
        KolmogorovSmirnovTest ks = new KolmogorovSmirnovTest();
        assertTrue(ks.kolmogorovSmirnovTest(new UniformRealDistribution(0, 2 * Math.PI), angles) > 0.01);
        assertTrue(ks.kolmogorovSmirnovTest(new UniformRealDistribution(-0.8, 0.8), fluxes) > 0.01);
    }

    /**
     * The estimate is k/n with the interval of those counts (against Commons Math in
     * BinomialIntervalTest), undetermined runs counted with the ferroresonant ones; the mode counts
     * add up to the runs.
     */
    @Test
    void estimateIsTheCountsAndTheirInterval() {
        OddsResult r = SwitchingOdds.estimate(study(), OddsSettings.defaults().withRuns(16).withSeed(3), new LocalPoolExecutor(2));
        int k = 0;
        for (OddsResult.Run run : r.runList()) {
            k += run.mode().equals("normal") ? 0 : 1;
        }
        assertEquals(k, r.ferroresonant());
        assertEquals((double) k / 16, r.probability(), 0.0);
        assertEquals(BinomialInterval.of(k, 16, 0.95, BinomialInterval.Method.CLOPPER_PEARSON), r.interval());
        assertEquals(16, r.counts().values().stream().mapToInt(Integer::intValue).sum());
    }

    /**
     * With a precision asked for, runs are added up to n = z^2 p(1-p)/h^2 at the planning value
     * (the interval's point nearest 1/2), here capped by max runs; the runs needed are listed.
     */
    @Test
    void precisionAddsTheRunsTheFormulaAsksFor() {
        OddsSettings s = OddsSettings.defaults().withRuns(8).withSeed(5).withPrecision(0.25).withMaxRuns(40);
        OddsResult r = SwitchingOdds.estimate(study(), s, new LocalPoolExecutor(2));
        OddsResult first = SwitchingOdds.estimate(study(), s.withPrecision(Double.NaN), new LocalPoolExecutor(2));
        double planning = SwitchingOdds.planning(first.interval());
        long want = BinomialInterval.runsNeeded(planning, 0.25, 0.95);
        assertEquals(Math.min(Math.max(want, 8), 40), r.runs());
        assertEquals(8, r.firstBatch());
        assertEquals(first.runList(), r.runList().subList(0, 8));
        assertTrue(r.needed().stream().anyMatch(x -> x.halfWidth() == 0.25));
    }
}
