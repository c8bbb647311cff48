package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.Test;

class SpectrumTest {

    @Test
    void transformAgreesWithCommonsMath() {
        // Independent implementation: Commons Math's FastFourierTransformer.
        double[] x = new double[1024];
        Random rnd = new Random(7);
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();
        }
        double[][] ours = RealFourier.forward(x);
        Complex[] ref = new FastFourierTransformer(DftNormalization.STANDARD).transform(x, TransformType.FORWARD);
        for (int k = 0; k < x.length; k++) {
            // 1e-10: sums of 1024 unit-size terms, rounding only (log2 N stages of ~1e-16 each).
            assertEquals(ref[k].getReal(), ours[0][k], 1e-10);
            assertEquals(ref[k].getImaginary(), ours[1][k], 1e-10);
        }
    }

    @Test
    void periodicSpectrumReadsAmplitudesAndPhasesExactly() {
        // 3 + 2 cos(w t + 0.4) + 0.5 cos(3 w t - 1) sampled over one period of 50 Hz [der].
        int n = 256;
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            double th = 2 * Math.PI * j / n;
            x[j] = 3 + 2 * Math.cos(th + 0.4) + 0.5 * Math.cos(3 * th - 1);
        }
        Spectrum s = Spectrum.ofPeriodic(x, 0.02, 10.0);
        // 1e-12: exact up to rounding for lines on bins.
        assertEquals(50.0, s.frequency()[1], 1e-12);
        assertEquals(30.0, s.amplitude()[0], 1e-12);
        assertEquals(20.0, s.amplitude()[1], 1e-12);
        assertEquals(0.4, s.phase()[1], 1e-12);
        assertEquals(5.0, s.amplitude()[3], 1e-12);
        assertEquals(-1.0, s.phase()[3], 1e-12);
        assertEquals(0.0, s.amplitude()[2], 1e-12);
        assertEquals(1, s.strongestLine());
    }

    @Test
    void hannWindowKeepsTheAmplitudeOfABinCentredLine() {
        // A line on a bin centre read through the Hann window, corrected by its coherent gain [der].
        int n = 1024;
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = 1.5 * Math.sin(2 * Math.PI * 40 * j / n);
        }
        Spectrum s = Spectrum.ofRecord(x, 1.0, 1.0);
        assertEquals(1.5, s.amplitude()[40], 1e-12);
        assertEquals(40, s.strongestLine());
    }
}
