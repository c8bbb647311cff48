package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.Test;

/** The direct transform for records of any length (whole periods of a subharmonic at a fixed rate). */
class SpectrumWholePeriodsTest {

    @Test
    void readsLinesOfThreePeriodsExactly() {
        // Three periods of 3 + 2 cos(w t + 0.4) + 0.5 cos(w t / 3 - 1) at 60 Hz, 384 samples (not a
        // power of two): the lines sit on bins 3 and 1, exact up to rounding (the discrete
        // exponentials are orthogonal over whole periods) [der].
        int n = 3 * 128;
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            double th = 2 * Math.PI * j / n;   // one turn over the three periods
            x[j] = 3 + 2 * Math.cos(3 * th + 0.4) + 0.5 * Math.cos(th - 1);
        }
        Spectrum s = Spectrum.ofWholePeriods(x, 3 / 60.0, 10.0);
        // 1e-11: sums of 384 terms of order one, rounding only.
        assertEquals(20.0, s.frequency()[1], 1e-11);
        assertEquals(30.0, s.amplitude()[0], 1e-11);
        assertEquals(5.0, s.amplitude()[1], 1e-11);
        assertEquals(-1.0, s.phase()[1], 1e-11);
        assertEquals(20.0, s.amplitude()[3], 1e-11);
        assertEquals(0.4, s.phase()[3], 1e-11);
        assertEquals(0.0, s.amplitude()[2], 1e-11);
        assertEquals(3, s.strongestLine());
        assertEquals(n / 2, s.size());
    }

    @Test
    void agreesWithCommonsMathOnAPowerOfTwo() {
        // Independent implementation: Commons Math's FFT; amplitudes as Spectrum scales them [der].
        int n = 512;
        double[] x = new double[n];
        Random rnd = new Random(5);
        for (int j = 0; j < n; j++) {
            x[j] = rnd.nextGaussian();
        }
        Spectrum s = Spectrum.ofWholePeriods(x, 1.0, 1.0);
        Complex[] ref = new FastFourierTransformer(DftNormalization.STANDARD).transform(x, TransformType.FORWARD);
        for (int k = 1; k < n / 2; k++) {
            // 1e-12: direct sums of 512 unit-size terms, rounding only
            assertEquals(2 * ref[k].abs() / n, s.amplitude()[k], 1e-12);
        }
        assertEquals(Math.abs(ref[0].getReal()) / n, s.amplitude()[0], 1e-12);
    }
}
