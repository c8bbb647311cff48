package org.ferromap.balance;

import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathRuntimeException;

/**
 * The cable length at which the single-harmonic folds cross the source voltage (DOMAIN.md §4:
 * "the tool's own answer"): scan the length range, bracket the changes, refine with Brent's
 * method. The fold voltages are continued past the cusp by the voltage where the fold pair is
 * born, so every function refined is continuous in length.
 */
public final class CriticalLength {

    private final SingleHarmonicBalance balance;
    private final int scanPoints;

    /** Default: closed forms where available, 64 scan lengths. */
    public CriticalLength() {
        this(new SingleHarmonicBalance(), 64);
    }

    /**
     * @param balance the balance used per length
     * @param scanPoints number of equally spaced lengths scanned before refining, at least 4;
     *        a fold crossing narrower than one spacing may be missed
     */
    public CriticalLength(SingleHarmonicBalance balance, int scanPoints) {
        if (scanPoints < 4) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "scan points = " + scanPoints + " is not allowed; expected >= 4");
        }
        this.balance = balance;
        this.scanPoints = scanPoints;
    }

    /** Compares the folds with each circuit's own source peak. */
    public CriticalLengthResult find(DoubleFunction<EquivalentCircuit> circuitAtLength, double minLength, double maxLength) {
        return find(circuitAtLength, minLength, maxLength, Double.NaN);
    }

    /**
     * @param circuitAtLength the equivalent circuit for a cable length
     * @param minLength shortest length searched, &gt;= 0
     * @param maxLength longest length searched, &gt; minLength
     * @param sourcePeak source peak voltage compared with the folds, V; NaN to use each circuit's own
     */
    public CriticalLengthResult find(DoubleFunction<EquivalentCircuit> circuitAtLength, double minLength, double maxLength,
                                     double sourcePeak) {
        if (!(minLength >= 0) || !(maxLength > minLength) || Double.isInfinite(maxLength)) {
            throw new FerromapException(MessageKey.BAD_REQUEST,
                    "length range [" + minLength + ", " + maxLength + "] is not allowed; expected 0 <= min < max, finite");
        }
        if (!Double.isNaN(sourcePeak) && !(sourcePeak > 0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "source peak = " + sourcePeak + " V is not allowed; expected > 0 or NaN");
        }
        int m = scanPoints;
        double[] ls = new double[m];
        double[] ind = new double[m];
        for (int k = 0; k < m; k++) {
            ls[k] = minLength + (maxLength - minLength) * k / (m - 1);
            ind[k] = balance.cuspIndicator(circuitAtLength.apply(ls[k]));
        }
        int first = -1;
        for (int k = 0; k < m; k++) {
            if (ind[k] > 0) {
                first = k;
                break;
            }
        }
        if (first < 0) {
            return new CriticalLengthResult(Double.NaN, Double.NaN, Double.NaN, Double.NaN, sourcePeak,
                    "no fold pair for lengths in [" + minLength + ", " + maxLength + "]: no jump at any source voltage");
        }
        DoubleUnaryOperator indicator = l -> balance.cuspIndicator(circuitAtLength.apply(l));
        double cusp = first == 0 ? minLength : root(indicator, ls[first - 1], ls[first]);
        double[] down = crossing(circuitAtLength, ls, ind, 1, sourcePeak, indicator);
        double[] up = crossing(circuitAtLength, ls, ind, 0, sourcePeak, indicator);
        String note;
        if (Double.isNaN(down[0])) {
            note = "bistable from the cusp length on, but both folds stay above the source voltage in the range";
        } else if (Double.isNaN(up[0])) {
            note = "a ferroresonant state exists at the source from the jump-down length; the normal state survives the whole range";
        } else {
            note = "the normal state is lost from the jump-up length" + (Double.isNaN(up[1]) ? " to the end of the range"
                    : " until the jump-up exit length") + (first == 0 ? " (already bistable at the shortest length)" : "");
        }
        return new CriticalLengthResult(cusp, down[0], up[0], up[1], sourcePeak, note);
    }

    /**
     * First interval of lengths where fold j (0 up, 1 down) is at or below the source:
     * {entry, exit}, NaN where not found.
     */
    private double[] crossing(DoubleFunction<EquivalentCircuit> at, double[] ls, double[] ind, int j, double fixedSource,
                              DoubleUnaryOperator indicator) {
        DoubleUnaryOperator excess = l -> {
            EquivalentCircuit c = at.apply(l);
            double e = Double.isNaN(fixedSource) ? c.sourcePeak() : fixedSource;
            return balance.foldSourcesContinued(c)[j] - e;
        };
        int m = ls.length;
        boolean[] below = new boolean[m];
        for (int k = 0; k < m; k++) {
            below[k] = ind[k] > 0 && !(excess.applyAsDouble(ls[k]) > 0);
        }
        int in = -1;
        for (int k = 0; k < m; k++) {
            if (below[k]) {
                in = k;
                break;
            }
        }
        if (in < 0) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double entry = in == 0 ? ls[0] : change(excess, indicator, ls[in - 1], ls[in], ind[in - 1] > 0, true);
        double exit = Double.NaN;
        for (int k = in + 1; k < m; k++) {
            if (!below[k]) {
                exit = change(excess, indicator, ls[k - 1], ls[k], ind[k] > 0, false);
                break;
            }
        }
        return new double[] {entry, exit};
    }

    /**
     * Where the fold-below-source condition changes between lengths a and b. When the far side
     * of the change is not bistable the fold pair is born (or vanishes) in between: the change is
     * at that cusp if the pair appears (or disappears) below the source, else past it.
     */
    private double change(DoubleUnaryOperator excess, DoubleUnaryOperator indicator, double a, double b,
                          boolean otherSideBistable, boolean entering) {
        if (otherSideBistable) {
            return root(excess, a, b);
        }
        double cusp = root(indicator, a, b);
        double hc = excess.applyAsDouble(cusp);
        if (!(hc > 0)) {
            return cusp;
        }
        return entering ? root(excess, cusp, b) : root(excess, a, cusp);
    }

    private static double root(DoubleUnaryOperator f, double a, double b) {
        double fa = f.applyAsDouble(a);
        double fb = f.applyAsDouble(b);
        if (fa == 0) {
            return a;
        }
        if (fb == 0) {
            return b;
        }
        if (Double.isNaN(fa) || Double.isNaN(fb) || fa * fb > 0) {
            // Rounding at a merging fold pair: the scanned end where the change was seen is the answer.
            return b;
        }
        try {
            return new BrentSolver(1e-13, 1e-12 * Math.max(Math.abs(a), Math.abs(b)) + Double.MIN_NORMAL, Double.MIN_NORMAL)
                    .solve(200, f::applyAsDouble, a, b);
        } catch (MathRuntimeException e) {
            throw new FerromapException(MessageKey.NO_CONVERGENCE,
                    "critical length not refined between " + a + " and " + b + ": " + e.getMessage(), e);
        }
    }
}
