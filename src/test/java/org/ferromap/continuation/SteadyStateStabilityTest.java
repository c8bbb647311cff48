package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The default stability count against Commons Math's eigen-decomposition (an independent implementation). */
class SteadyStateStabilityTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 6})
    void countsEigenvaluesWithPositiveRealPart(int n) {
        Random random = new Random(99 + n);
        for (int trial = 0; trial < 200; trial++) {
            double[][] a = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    a[i][j] = random.nextGaussian();
                }
            }
            double[] re = new EigenDecomposition(new Array2DRowRealMatrix(a)).getRealEigenvalues();
            int expected = 0;
            boolean nearZero = false;
            for (double r : re) {
                expected += r > 0 ? 1 : 0;
                // Random matrices practically never have a real part this close to zero; skip if so.
                nearZero |= Math.abs(r) < 1e-6;
            }
            if (!nearZero) {
                assertEquals(expected, StabilityCriterion.steadyState().unstableCount(new double[n], 0, a), "trial " + trial);
            }
        }
    }
}
