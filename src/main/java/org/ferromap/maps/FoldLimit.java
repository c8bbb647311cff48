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
import org.ferromap.equipment.PolynomialCurve;
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
 *   condition, DOMAIN.md §3 [der]). So the cusp length is C_min / C'_eq from one cusp condition
 *   (exactly so for polynomial curves; a first guess for the others, see below).</li>
 *   <li>At the cusp the fold pair is born at the source voltage E_birth. A source at or above it
 *   has a ferroresonant state from the cusp length on. A lower source meets the jump-down fold
 *   further out: the fold falls with length, so the first crossing is bracketed on a geometric
 *   ladder of lengths (ratio 2^(1/4)) and refined with Brent's method (relative 1e-10).</li>
 * </ul>
 * For curves without closed forms the folds themselves decide: the cusp condition only gives a
 * first guess, and the start of the lasting bistable region is found on the fold scan (a fine
 * geometric ladder down from four times the guess, then bisection to relative 1e-7). This steps over
 * narrow windows of bistability that close again (interpolated table curves make them between
 * coarse points, where the two states differ little; numerical cusp conditions find them or not
 * depending on their grid) and over disagreements between the cusp condition and the fold scan
 * (piecewise-linear curves), so the limit is smooth in the parameters. A window found is named in
 * the note.
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
     * @param cuspLength        where the lasting bistable region begins (a fold pair at some voltage), m;
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
        double cusp;
        double birth;
        String window = null;
        if (balance.settings().closedForms() && c0.magnetizing() instanceof PolynomialCurve) {
            // Closed form: one fold structure, bistable for every C > C_min. Once more at the cusp
            // itself for the birth voltage of the circuit with C = C_min.
            CuspCondition atCusp = balance.cuspCondition(circuitAtLength.apply(first));
            cusp = atCusp.minimumCapacitance() / perMetre;
            birth = atCusp.cuspSourcePeak();
        } else {
            double[] main = mainCusp(circuitAtLength, first);
            if (main == null) {
                Arrays.fill(limits, Double.POSITIVE_INFINITY);
                return new Result(Double.POSITIVE_INFINITY, Double.NaN, sourcePeaks, limits,
                        String.format("no fold pair up to %.4g m", maxLength));
            }
            cusp = main[0];
            birth = main[1];
            if (first < cusp * (1 - CUSP_CHECK)) {
                double at = first * (1 + 10 * CUSP_CHECK);
                double spread = foldFluxSpread(circuitAtLength, at);
                double[] wf = windowFolds(circuitAtLength, at);
                boolean brackets = false;
                for (double e : sourcePeaks) {
                    brackets |= wf != null && e >= wf[1] && e <= wf[0];
                }
                window = String.format("another fold pair at lower flux appears near %.4g m%s%s; it is not the pair whose "
                        + "upper branch is the saturated state and does not set the limit", first,
                        Double.isNaN(spread) ? "" : String.format(" (its folds %.2g %% apart in flux", 100 * spread)
                                + String.format(", at %.4g and %.4g V peak)", wf[0], wf[1]),
                        brackets ? "; CAUTION: a source lies between its folds, so two states coexist there at that source"
                                : "");
            }
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
        return new Result(cusp, birth, sourcePeaks, limits, window == null ? note : note + "; " + window);
    }

    /** Relative distance below the lasting bistable region at which a cusp-condition minimum counts as a separate window. */
    static final double CUSP_CHECK = 1e-3;
    /** Relative accuracy of a bisected cusp length. */
    static final double CUSP_BISECTION = 1e-7;

    /**
     * One fold pair of a circuit's branch.
     *
     * @param upSource   source peak at the jump-up fold, V
     * @param downSource source peak at the jump-down fold, V
     * @param upFlux     flux at the jump-up fold, Wb-turn
     * @param downFlux   flux at the jump-down fold, Wb-turn
     */
    record Pair(double upSource, double downSource, double upFlux, double downFlux) { }

    /** The fold pairs at a length, ascending in flux (a jump-up fold followed by a jump-down fold). */
    private List<Pair> pairs(DoubleFunction<EquivalentCircuit> at, double length) {
        List<Pair> out = new ArrayList<>(2);
        Fold up = null;
        for (Fold f : balance.folds(at.apply(length))) {
            if (f.direction() == FoldDirection.JUMP_UP) {
                up = f;
            } else if (up != null) {
                out.add(new Pair(up.sourcePeak(), f.sourcePeak(), up.flux(), f.flux()));
                up = null;
            }
        }
        return out;
    }

    /** The highest-flux fold pair at a length (the one whose upper branch is the saturated state), or null. */
    private Pair last(DoubleFunction<EquivalentCircuit> at, double length) {
        List<Pair> p = pairs(at, length);
        return p.isEmpty() ? null : p.get(p.size() - 1);
    }

    /** The pair whose jump-down flux is within {@link #TRACK} of a tracked flux, or null. */
    private Pair near(DoubleFunction<EquivalentCircuit> at, double length, double trackedFlux) {
        Pair best = null;
        double bestD = Double.POSITIVE_INFINITY;
        for (Pair p : pairs(at, length)) {
            double d = Math.abs(Math.log(p.downFlux() / trackedFlux));
            if (d < bestD) {
                bestD = d;
                best = p;
            }
        }
        return bestD <= Math.log(TRACK) ? best : null;
    }

    /**
     * Where the lasting bistable region begins: {length, birth voltage}, or null when no pair exists
     * up to the longest length. From a length {@link #START} times the guess (or further, to a fold pair), the
     * highest-flux pair is followed down a fine geometric ladder (ratio {@link #FINE}), each rung
     * taking the pair whose jump-down flux is nearest the previous one, until that pair is gone;
     * then bisection to relative {@link #CUSP_BISECTION}. So windows of bistability at lower flux
     * (other pairs, which may come and go or overlap it) do not move the limit.
     */
    private double[] mainCusp(DoubleFunction<EquivalentCircuit> at, double guess) {
        double hi = Math.min(START * guess, maxLength);
        Pair p = last(at, hi);
        while (p == null) {
            hi *= LADDER;
            if (hi > maxLength * LADDER) {
                return null;
            }
            p = last(at, hi);
        }
        double b = hi;
        Pair pb = p;
        double a;
        while (true) {
            a = b / FINE;
            if (a < 1e-6) {
                return new double[] {0.0, 0.5 * (pb.upSource() + pb.downSource())};
            }
            Pair pa = near(at, a, pb.downFlux());
            if (pa == null) {
                break;
            }
            b = a;
            pb = pa;
        }
        while (b - a > CUSP_BISECTION * b) {
            double m = 0.5 * (a + b);
            Pair pm = near(at, m, pb.downFlux());
            if (pm != null) {
                b = m;
                pb = pm;
            } else {
                a = m;
            }
        }
        return new double[] {b, 0.5 * (pb.upSource() + pb.downSource())};
    }

    /** How far above the cusp condition's guess the walk down starts: windows below it reaching that far are stepped over. */
    static final double START = 4.0;

    /** Largest factor between the jump-down fluxes of one pair on neighbouring rungs: the fluxes move a few percent per rung. */
    static final double TRACK = 1.15;

    /** Ratio of the fine ladder that finds the start of the lasting bistable region: 2^(1/16), about 4.4 %. */
    static final double FINE = Math.pow(2.0, 1.0 / 16);

    /** Relative flux difference between the folds of the highest-flux pair at a length; NaN without a pair. */
    private double foldFluxSpread(DoubleFunction<EquivalentCircuit> at, double length) {
        Pair p = last(at, length);
        return p == null ? Double.NaN : (p.downFlux() - p.upFlux()) / p.upFlux();
    }

    /** {jump-up, jump-down} source peaks of the highest-flux pair at a length, V; null without a pair. */
    private double[] windowFolds(DoubleFunction<EquivalentCircuit> at, double length) {
        Pair p = last(at, length);
        return p == null ? null : new double[] {p.upSource(), p.downSource()};
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

        /** The jump-down fold source of the highest-flux pair at a length, V; the birth voltage where the pair is not resolved yet. */
        double jumpDown(double length) {
            if (length <= cusp) {
                return birth;
            }
            Pair p = last(at, length);
            return p == null ? birth : p.downSource();
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
