package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/** The engine's LU against Commons Math's (an independent implementation). */
class DenseLuTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 7, 40})
    void solvesDeterminantAndTransposeAgreeWithCommonsMath(int n) {
        Random random = new Random(1234 + n);
        double[][] a = new double[n][n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            b[i] = random.nextGaussian();
            for (int j = 0; j < n; j++) {
                a[i][j] = random.nextGaussian();
            }
        }
        DenseLu lu = new DenseLu(n);
        assertTrue(lu.factor(a));
        LUDecomposition ref = new LUDecomposition(new Array2DRowRealMatrix(a));
        RealVector expected = ref.getSolver().solve(new ArrayRealVector(b));
        RealVector expectedT = new LUDecomposition(new Array2DRowRealMatrix(a).transpose()).getSolver().solve(new ArrayRealVector(b));
        double[] x = b.clone();
        lu.solve(x);
        double[] xt = b.clone();
        lu.solveTranspose(xt);
        // Gaussian random matrices of these sizes have condition numbers below about 1e4:
        // 1e-9 relative leaves room for eps * cond in both implementations.
        for (int i = 0; i < n; i++) {
            assertEquals(expected.getEntry(i), x[i], 1e-9 * expected.getLInfNorm());
            assertEquals(expectedT.getEntry(i), xt[i], 1e-9 * expectedT.getLInfNorm());
        }
        double det = ref.getDeterminant();
        assertEquals(Math.signum(det), lu.determinantSign());
        assertEquals(Math.log(Math.abs(det)), lu.logAbsDeterminant(), 1e-10 * Math.max(1, Math.abs(Math.log(Math.abs(det)))));
    }

    @Test
    void rankDeficientMatrixIsSingularEvenAtSiScale() {
        // Rows 1e-9 x (1, 2) and 1e-9 x (2, 4): an absolute pivot threshold would miss the scale.
        DenseLu lu = new DenseLu(2);
        assertFalse(lu.factor(new double[][] {{1e-9, 2e-9}, {2e-9, 4e-9}}));
        assertTrue(lu.factor(new double[][] {{1e-9, 2e-9}, {2e-9, 3e-9}}));
    }
}
