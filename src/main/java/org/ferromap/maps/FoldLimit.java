package org.ferromap.maps;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.balance.CuspCondition;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldDirection;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathRuntimeException;

/**
 * The longest cable with no jump risk, from the folds of the single-harmonic balance (DOMAIN.md
 * §3-4): the shortest cable length at which a ferroresonant steady state exists at a given source
 * voltage, that is where the jump-down fold reaches the source. Below it the loop has only its
 * normal state at that voltage, so no switching transient can settle on the ferroresonant branch
 * (in the single-harmonic approximation; subharmonic states are checked by simulation).
 *
 * <p>Two facts make this cheap and exact in length rather than a scan:
 * <ul>
 *   <li>The total loop capacitance grows in proportion to the cable length, and whether a fold
 *   pair exists depends only on the total capacitance, the curve and the conductance (the cusp
 *   condition, DOMAIN.md §3 [der]). So the cusp length is C_min / C'_eq from one cusp condition.</li>
 *   <li>At the cusp the fold pair is born at the source voltage E_birth. A source at or above it
 *   has a ferroresonant state from the cusp length on. A lower source meets the jump-down fold
 *   further out: the fold falls with length, so the first crossing is bracketed on a geometric
 *   ladder of lengths (ratio 2^(1/4)) and refined with Brent's method (relative 1e-10).</li>
 * </ul>
 * The folds define the limit, so the cusp length is checked against the fold scan 0.1 % either
 * side; where they disagree (numerical cusp conditions of kinked, piecewise-linear curves can) the
 * cusp is found by bisection on whether the fold scan has a pair (relative 1e-7) instead.
 * Immutable and thread-safe.
 */
public final class FoldLimit {

    /** Ratio between successive lengths of the bracketing ladder: a crossing narrower than this may be missed. */
    static final double LADDER = Math.pow(2.0, 0.25);
    private static final double RELATIVE_ACCURACY = 1e-10;

    private final SingleHarmonicBalance balance;
    private final double maxLength;

    /**
     * @param balance   the balance used at each length
     * @param maxLength longest length searched, m; limits beyond it are reported as infinite
     */
    public FoldLimit(SingleHarmonicBalance balance, double maxLength) {
        if (!(maxLength > 0) || Double.isInfinite(maxLength)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "longest length searched = " + maxLength
                    + " m is not allowed; expected a finite value > 0");
        }
        this.balance = balance;
        this.maxLength = maxLength;
    }

    /** The longest length searched, m. */
    public double maxLength() {
        return maxLength;
    }

    /**
     * Fold-based limits of one installation.
     *
     * @param cuspLength        the shortest length with a fold pair (bistability at some voltage), m;
     *                          infinite when none up to the longest length searched
     * @param cuspSourcePeak    source peak at which the fold pair is born at the cusp length, V (NaN if none)
     * @param sourcePeaks       the source peaks asked about, V
     * @param limits            per source peak: the shortest length with a ferroresonant steady state at
     *                          that source, m; infinite when none up to the longest length searched
     * @param note              one line on what was found
     */
    public record Result(double cuspLength, double cuspSourcePeak, double[] sourcePeaks, double[] limits, String note) {
        public Result {
            sourcePeaks = sourcePeaks.clone();
            limits = limits.clone();
        }

        @Override
        public double[] sourcePeaks() {
            return sourcePeaks.clone();
        }

        @Override
        public double[] limits() {
            return limits.clone();
        }
    }

    /**
     * Finds the limits.
     *
     * @param circuitAtLength the loop for a cable length (m); its total capacitance must be
     *                        proportional to the length, as every open-phase loop's is
     * @param referenceLength a length where the circuit can be built, m (the installed one)
     * @param sourcePeaks     source peaks to compare with the folds, V, each &gt; 0
     */
    public Result find(DoubleFunction<EquivalentCircuit> circuitAtLength, double referenceLength, double... sourcePeaks) {
        if (!(referenceLength > 0) || Double.isInfinite(referenceLength)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "reference length = " + referenceLength + " m; expected > 0");
        }
        for (double e : sourcePeaks) {
            if (!(e > 0) || Double.isInfinite(e)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, "source peak = " + e + " V is not allowed; expected > 0");
            }
        }
        double[] limits = new double[sourcePeaks.length];
        EquivalentCircuit c0 = circuitAtLength.apply(referenceLength);
        double perMetre = c0.totalCapacitance() / referenceLength;
        CuspCondition cc = balance.cuspCondition(c0);
        if (Double.isNaN(cc.minimumCapacitance())) {
            Arrays.fill(limits, Double.POSITIVE_INFINITY);
            return new Result(Double.POSITIVE_INFINITY, Double.NaN, sourcePeaks, limits,
                    "no fold pair at any cable length: the loop's loss removes bistability");
        }
        double first = cc.minimumCapacitance() / perMetre;
        if (first > maxLength) {
            Arrays.fill(limits, Double.POSITIVE_INFINITY);
            return new Result(Double.POSITIVE_INFINITY, Double.NaN, sourcePeaks, limits,
                    String.format("no fold pair up to %.4g m (the cusp lies at about %.4g m)", maxLength, first));
        }
        // Once more at the cusp itself: numerical cusp conditions depend slightly on where they are
        // evaluated, and the birth voltage is that of the circuit with C = C_min.
        CuspCondition atCusp = balance.cuspCondition(circuitAtLength.apply(first));
        double cusp = Double.isNaN(atCusp.minimumCapacitance()) ? first : atCusp.minimumCapacitance() / perMetre;
        double birth = Double.isNaN(atCusp.cuspSourcePeak()) ? cc.cuspSourcePeak() : atCusp.cuspSourcePeak();
        // The folds are what the limit is defined by: check that they appear at the cusp found, and
        // where they do not (numerical cusp conditions of kinked curves can disagree with the fold
        // scan) bracket and bisect on "the balance has a fold pair" instead.
        double[] pairHi = pair(circuitAtLength, cusp * (1 + CUSP_CHECK));
        boolean pairLo = pair(circuitAtLength, cusp * (1 - CUSP_CHECK)) != null;
        if (pairHi == null || pairLo) {
            double[] found = bisectCusp(circuitAtLength, cusp, pairHi != null);
            if (found == null) {
                Arrays.fill(limits, Double.POSITIVE_INFINITY);
                return new Result(Double.POSITIVE_INFINITY, Double.NaN, sourcePeaks, limits,
                        String.format("no fold pair up to %.4g m", maxLength));
            }
            cusp = found[0];
            birth = found[1];
        }
        Ladder ladder = new Ladder(circuitAtLength, cusp, birth);
        int below = 0;
        for (int k = 0; k < sourcePeaks.length; k++) {
            double e = sourcePeaks[k];
            if (e >= birth) {
                limits[k] = cusp;
                below++;
            } else {
                limits[k] = ladder.crossing(e);
            }
        }
        String note;
        if (below == sourcePeaks.length) {
            note = String.format("the fold pair is born below the source (at %.4g V peak) at the cusp length: "
                    + "a ferroresonant state exists from the cusp length on", birth);
        } else {
            note = String.format("the fold pair is born at %.4g V peak at the cusp length; lower sources meet the "
                    + "jump-down fold at longer lengths", birth);
        }
        return new Result(cusp, birth, sourcePeaks, limits, note);
    }

    /** Relative distance from the cusp at which the fold scan must agree with the cusp condition. */
    static final double CUSP_CHECK = 1e-3;
    /** Relative accuracy of a bisected cusp length. */
    static final double CUSP_BISECTION = 1e-7;

    /** {jump-up source, jump-down source} of the lowest fold pair at a length, V; null when there is none. */
    private double[] pair(DoubleFunction<EquivalentCircuit> at, double length) {
        List<Fold> folds = balance.folds(at.apply(length));
        double up = Double.NaN;
        for (Fold f : folds) {
            if (f.direction() == FoldDirection.JUMP_UP && Double.isNaN(up)) {
                up = f.sourcePeak();
            } else if (f.direction() == FoldDirection.JUMP_DOWN && !Double.isNaN(up)) {
                return new double[] {up, f.sourcePeak()};
            }
        }
        return null;
    }

    /**
     * The cusp by bisection on whether the fold scan finds a pair, starting near a guess:
     * {length, birth voltage}, or null when no pair exists up to the longest length.
     */
    private double[] bisectCusp(DoubleFunction<EquivalentCircuit> at, double guess, boolean bistableAtGuess) {
        double a;
        double b;
        if (bistableAtGuess) {
            b = guess;
            a = guess / LADDER;
            while (pair(at, a) != null) {
                b = a;
                a /= LADDER;
                if (a < 1e-6) {
                    return new double[] {0.0, pairOrNaN(at, b)};
                }
            }
        } else {
            a = guess;
            b = guess * LADDER;
            while (pair(at, b) == null) {
                a = b;
                b *= LADDER;
                if (b > maxLength * LADDER) {
                    return null;
                }
            }
        }
        while (b - a > CUSP_BISECTION * b) {
            double m = 0.5 * (a + b);
            if (pair(at, m) != null) {
                b = m;
            } else {
                a = m;
            }
        }
        return new double[] {b, pairOrNaN(at, b)};
    }

    /** Mid-voltage of the fold pair at a length (where the two folds have nearly merged), V. */
    private double pairOrNaN(DoubleFunction<EquivalentCircuit> at, double length) {
        double[] p = pair(at, length);
        return p == null ? Double.NaN : 0.5 * (p[0] + p[1]);
    }

    /** Jump-down fold voltages on a geometric ladder of lengths from the cusp, computed as needed. */
    private final class Ladder {
        private final DoubleFunction<EquivalentCircuit> at;
        private final double cusp;
        private final double birth;
        private final List<double[]> rungs = new ArrayList<>();

        Ladder(DoubleFunction<EquivalentCircuit> at, double cusp, double birth) {
            this.at = at;
            this.cusp = cusp;
            this.birth = birth;
            rungs.add(new double[] {cusp, birth});
        }

        /** The lowest jump-down fold source at a length, V; the birth voltage where the pair is not resolved yet. */
        double jumpDown(double length) {
            if (length <= cusp) {
                return birth;
            }
            double best = Double.POSITIVE_INFINITY;
            for (Fold f : balance.folds(at.apply(length))) {
                if (f.direction() == FoldDirection.JUMP_DOWN) {
                    best = Math.min(best, f.sourcePeak());
                }
            }
            return Double.isInfinite(best) ? birth : best;
        }

        double crossing(double e) {
            int k = 1;
            while (true) {
                if (k >= rungs.size()) {
                    double l = rungs.get(k - 1)[0] * LADDER;
                    if (l > maxLength * LADDER) {
                        return Double.POSITIVE_INFINITY;
                    }
                    rungs.add(new double[] {l, jumpDown(l)});
                }
                double[] r = rungs.get(k);
                if (r[1] <= e) {
                    if (r[0] > maxLength) {
                        return Double.POSITIVE_INFINITY;
                    }
                    double a = rungs.get(k - 1)[0];
                    return refine(e, a, r[0]);
                }
                k++;
            }
        }

        private double refine(double e, double a, double b) {
            try {
                return new BrentSolver(1e-14, RELATIVE_ACCURACY * b, Double.MIN_NORMAL)
                        .solve(200, l -> jumpDown(l) - e, a, b);
            } catch (MathRuntimeException ex) {
                // Not a clean sign change (rounding at the fold): the rung where it was seen is the safe answer.
                return a;
            }
        }
    }
}
