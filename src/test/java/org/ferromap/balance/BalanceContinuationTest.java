package org.ferromap.balance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.StopReason;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class BalanceContinuationTest {

    private static final BalanceContinuation CONTINUATION = new BalanceContinuation();
    private static final BalanceAxis SOURCE = BalanceAxis.of(CircuitParameter.SOURCE);

    /** SI-scale circuit of the kind the studies hold: 60 Hz, 0.2 uF + 0.05 uF, 1.19 MOhm or lossless, n-th power curve near 1e-17 for n = 9. */
    static EquivalentCircuit siCircuit(int n, boolean lossy) {
        PolynomialCurve si = new PolynomialCurve(1.5e-3, 1.33e-17 * Math.pow(75.0, 9 - n), n);
        return SingleHarmonicBalanceTest.circuit(2 * Math.PI * 60, 28.17e3, 0.2e-6, 0.05e-6,
                lossy ? 1.19e6 : Double.POSITIVE_INFINITY, si);
    }

    /**
     * Folds of the source branch against the closed form of DOMAIN.md §3 [der], transcribed
     * independently in {@link SingleHarmonicBalanceTest#closedFormFolds}, n = 3..11, lossless and
     * lossy, at SI scale with no hand scaling. 1e-8 relative: the engine locates folds to 1e-10
     * in its scaled variables (scales: the window width for E, about 1.5 pu for the flux).
     */
    @ParameterizedTest
    @CsvSource({"3,false", "5,false", "7,false", "9,false", "11,false", "3,true", "5,true", "7,true", "9,true", "11,true"})
    void sourceFoldsMatchTheClosedForm(int n, boolean lossy) {
        EquivalentCircuit c = siCircuit(n, lossy);
        double[] ref = SingleHarmonicBalanceTest.closedFormFolds(c, (PolynomialCurve) c.magnetizing());
        double top = 2 * ref[0];
        // Start on the normal state at half the jump-up voltage (the study's 28.17 kV lies above it for n < 11).
        BranchResult b = CONTINUATION.branch(SOURCE, c::withSourcePeak, lossy ? 0.2 * ref[2] : 0.0, top,
                0.5 * ref[0], 1, StartState.NORMAL);
        System.out.println("n=" + n + " lossy=" + lossy + " points=" + b.points().size() + " folds=" + b.folds()
                + " stops " + b.increasingStop() + "/" + b.decreasingStop() + " " + b.increasingDetail());
        assertEquals(StopReason.WINDOW_LEFT, b.increasingStop(), b.increasingDetail());
        List<BranchResult.Special> folds = b.folds();
        if (lossy) {
            assertEquals(2, folds.size(), "folds " + folds);
            assertEquals(ref[0], folds.get(0).parameter(), 1e-8 * ref[0]);
            assertEquals(ref[1], folds.get(0).flux(), 1e-8 * ref[1]);
            assertEquals(ref[2], folds.get(1).parameter(), 1e-8 * ref[0]);
            assertEquals(ref[3], folds.get(1).flux(), 1e-8 * ref[3]);
        } else {
            // Lossless: the jump-down fold sits at E = 0, the window's edge [der]; one fold inside.
            assertEquals(1, folds.size(), "folds " + folds);
            assertEquals(ref[0], folds.get(0).parameter(), 1e-8 * ref[0]);
            assertEquals(ref[1], folds.get(0).flux(), 1e-8 * ref[1]);
        }
    }
}
