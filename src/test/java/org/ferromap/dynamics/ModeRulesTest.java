package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** The shared classification rules on constructed records whose nature is known by construction. */
class ModeRulesTest {

    /** Two components: a period-3 cycle of distinct points after a transient that decays by 0.5 a sample. */
    private static double[][] periodThree(int n) {
        double[][] z = new double[2][n];
        double[] cx = {0.8, -0.4, 0.1};
        double[] cy = {0.2, 0.9, -0.7};
        for (int k = 0; k < n; k++) {
            double decay = Math.pow(0.5, k);
            z[0][k] = cx[k % 3] + decay;
            z[1][k] = cy[k % 3] - decay;
        }
        return z;
    }

    @Test
    void recurrenceFindsTheLeastPeriod() {
        double[][] z = periodThree(80);
        ModeRules.Recurrence r = ModeRules.recurrence(z, 10, 79, 8, 1e-6, 10);
        assertEquals(3, r.period());
        assertTrue(r.residual() <= 1e-6);
        // Orders 6 and 9 repeat as well; the least one is reported.
        ModeRules.Recurrence none = ModeRules.recurrence(z, 10, 79, 2, 1e-6, 10);
        assertEquals(0, none.period());
        assertFalse(none.periodic());
    }

    @Test
    void recurrenceNeedsEnoughSamples() {
        ModeRules.Recurrence r = ModeRules.recurrence(periodThree(20), 10, 19, 8, 1e-6, 10);
        assertEquals(0, r.period());
        assertTrue(Double.isNaN(r.residual()));
    }

    /**
     * z_k = 1 + 3 tol cos(pi k / 2): repeats exactly after 4 samples, and after 1 and 2 comes
     * within a few tolerances only. Taken alone that is period 4; with the distinctness check
     * (10 tol) it is a state of lower period still settling, so no period is returned.
     */
    @Test
    void aSubharmonicNeedsDistinctPoints() {
        double tol = 1e-4;
        double[][] z = new double[1][60];
        for (int k = 0; k < 60; k++) {
            z[0][k] = 1 + 3 * tol * Math.cos(Math.PI * k / 2);
        }
        assertEquals(4, ModeRules.recurrence(z, 0, 59, 8, tol, 10).period());
        ModeRules.Recurrence r = ModeRules.recurrence(z, 0, 59, 8, tol, 10, 10 * tol);
        assertEquals(0, r.period());
        assertTrue(r.closest() < 4);
    }

    @Test
    void contractionTellsADecayingTransientFromASteadyOne() {
        int n = 200;
        double[][] decaying = new double[1][n];
        double[][] steady = new double[1][n];
        double golden = 0.6180339887498949;
        for (int k = 0; k < n; k++) {
            // a decaying oscillation (0.97 a sample) and a quasi-periodic one of constant amplitude
            decaying[0][k] = Math.pow(0.97, k) * Math.cos(2 * Math.PI * golden * k);
            steady[0][k] = Math.cos(2 * Math.PI * golden * k);
        }
        assertTrue(ModeRules.contracting(decaying, 10, n - 1, 1, 10));
        assertFalse(ModeRules.contracting(steady, 10, n - 1, 1, 10));
        assertFalse(ModeRules.contracting(decaying, 10, 40, 1, 10), "too short a record says nothing");
    }

    @Test
    void periodOneRules() {
        // The rules of DOMAIN.md §6 as stated there: branch by phase, 1.25 pu peak threshold [cp].
        assertEquals(SteadyMode.NORMAL, ModeRules.periodOne(0.1, 1.0, 1.25).mode());
        assertEquals(SteadyMode.FUNDAMENTAL, ModeRules.periodOne(3.0, 0.8, 1.25).mode());
        assertEquals(SteadyMode.FUNDAMENTAL, ModeRules.periodOne(-0.2, 1.3, 1.25).mode());
    }

    @Test
    void notPeriodicWithoutAnExponentUsesTheZeroOneTestAndTheSpectrum() {
        double band = 0.01;
        double thr = 0.5;
        assertEquals(SteadyMode.CHAOTIC, ModeRules.notPeriodic(
                new ModeRules.Indicators(Double.NaN, 0.95, 0.6, false, 300), band, thr, 8, 400).mode());
        assertEquals(SteadyMode.QUASI_PERIODIC, ModeRules.notPeriodic(
                new ModeRules.Indicators(Double.NaN, 0.05, 0.995, false, 300), band, thr, 8, 400).mode());
        assertEquals(SteadyMode.UNDETERMINED, ModeRules.notPeriodic(
                new ModeRules.Indicators(Double.NaN, 0.05, 0.995, true, 300), band, thr, 8, 400).mode());
        assertEquals(SteadyMode.UNDETERMINED, ModeRules.notPeriodic(
                new ModeRules.Indicators(Double.NaN, 0.95, 0.999, false, 300), band, thr, 8, 400).mode(),
                "chaos by K with a pure line spectrum: the indicators disagree");
        assertEquals(SteadyMode.UNDETERMINED, ModeRules.notPeriodic(
                new ModeRules.Indicators(Double.NaN, Double.NaN, 0.9, false, 50), band, thr, 8, 400).mode());
        // With an exponent the spectrum is not consulted (the single-phase rules).
        assertEquals(SteadyMode.CHAOTIC, ModeRules.notPeriodic(
                new ModeRules.Indicators(0.3, 0.9, Double.NaN, false, 300), band, thr, 8, 400).mode());
        assertEquals(SteadyMode.QUASI_PERIODIC, ModeRules.notPeriodic(
                new ModeRules.Indicators(0.001, 0.1, Double.NaN, false, 300), band, thr, 8, 400).mode());
    }

    /**
     * Two tones between bins under the Hann window: almost all their power stays in their main
     * lobes (first sidelobe -31.5 dB, falling 18 dB an octave [pub: F. J. Harris, "On the use of
     * windows for harmonic analysis with the discrete Fourier transform", Proc. IEEE 66(1), 1978]);
     * white noise spreads its power evenly over all bins, so 16 lines of 5 bins out of 2047 hold a
     * few percent.
     */
    @Test
    void lineShareSeparatesLinesFromNoise() {
        int n = 4096;
        double[] tones = new double[n];
        double[] noise = new double[n];
        Random rnd = new Random(11);
        for (int j = 0; j < n; j++) {
            tones[j] = Math.sin(2 * Math.PI * 100.3 * j / n) + 0.4 * Math.sin(2 * Math.PI * 161.7 * j / n + 1);
            noise[j] = rnd.nextGaussian();
        }
        double lines = ModeRules.lineShare(Spectrum.ofRecord(tones, 1.0, 1.0));
        double broad = ModeRules.lineShare(Spectrum.ofRecord(noise, 1.0, 1.0));
        // 0.99: the two main lobes hold all but the sidelobe power (well under 1 %).
        assertTrue(lines > 0.99, "tones " + lines);
        // 0.2: the expected share is 80/2047 = 0.04 plus the bias of picking the largest bins.
        assertTrue(broad < 0.2, "noise " + broad);
        assertTrue(Double.isNaN(ModeRules.lineShare(Spectrum.ofRecord(new double[64], 1.0, 1.0))));
    }
}
