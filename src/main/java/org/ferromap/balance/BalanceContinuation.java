package org.ferromap.balance;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.Branch;
import org.ferromap.continuation.BranchTracer;
import org.ferromap.continuation.ContinuationProblem;
import org.ferromap.continuation.ContinuationSettings;
import org.ferromap.continuation.Direction;
import org.ferromap.continuation.FoldCurve;
import org.ferromap.continuation.FoldCurveSettings;
import org.ferromap.continuation.FoldCurveTracer;
import org.ferromap.continuation.SpecialPoint;
import org.ferromap.continuation.StabilityCriterion;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The LC balance followed by pseudo-arclength continuation in any circuit parameter
 * ({@link BalanceAxis}): branches with their stability, folds and branch points, and fold curves
 * in a plane of two parameters with their cusps and the regions they bound.
 *
 * <p>The residual is the per-unit balance of {@link LoopResidual} with bases taken at the start
 * circuit, so studies in kV, uF and MOhm need no hand scaling. A branch starts at the requested
 * value (normally the study's own, clamped into the range) on a steady state of the
 * single-harmonic balance ({@link SingleHarmonicBalance#operatingPoints}): the normal one or the
 * upper one; for H &gt; 1 that point is first solved by {@link MultiHarmonicBalance#solve}. It is
 * then continued both ways to the ends of the range. Stability is the slow-flow criterion for
 * H = 1 and Hill's method for H &gt; 1.
 *
 * <p>Fold curves start from the folds of the single-harmonic branch in P1 at the study's P2
 * (or, when that branch has none, at the first of a few P2 values across the window that has),
 * are traced through cusps to the window's edges, and every fold not yet on a traced curve starts
 * another. The regions between the curves are labelled by the single-harmonic steady states at a
 * probe point inside each.
 *
 * <p>Immutable and thread-safe: every call builds its own residuals and work space.
 */
public final class BalanceContinuation {

    /**
     * Engine settings used by default: the engine's defaults with a first step of 0.005 and a
     * largest step of 0.05 in scaled arclength (at least twenty points across the range, enough
     * for a smooth chart) and up to 4000 steps per run.
     */
    public static final ContinuationSettings DEFAULT_ENGINE = ContinuationSettings.DEFAULTS
            .withSteps(0.005, 1e-9, 0.05).withMaxSteps(4000);

    /** Largest harmonic order accepted: beyond it the Hill matrices and AFT grids grow large for no gain in the balance. */
    public static final int MAX_HARMONICS = 49;

    private final ContinuationSettings engine;
    private final SingleHarmonicBalance single;

    public BalanceContinuation() {
        this(DEFAULT_ENGINE);
    }

    /**
     * @param engine engine settings; their window is replaced by each request's range
     */
    public BalanceContinuation(ContinuationSettings engine) {
        if (engine == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "engine settings must be given");
        }
        this.engine = engine;
        this.single = new SingleHarmonicBalance();
    }

    public ContinuationSettings engine() {
        return engine;
    }

    /** Checks a harmonic order: 1 to {@link #MAX_HARMONICS}. */
    public static void checkHarmonics(int harmonics) {
        if (harmonics < 1 || harmonics > MAX_HARMONICS) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "harmonics H = " + harmonics
                    + " is not allowed; expected 1 (single-harmonic) to " + MAX_HARMONICS);
        }
    }

    /**
     * Traces the balance branch in one parameter across [from, to].
     *
     * @param axis the parameter
     * @param family the circuit at a value of the parameter (SI, the axis's unit)
     * @param from one end of the range, axis unit
     * @param to the other end, axis unit
     * @param start value to start from (the study's own), clamped into the range
     * @param harmonics H, 1 for the single-harmonic balance
     * @param state which steady state to start on
     * @throws FerromapException BAD_REQUEST for a range or H that cannot be honoured;
     *     NO_CONVERGENCE when the start point cannot be put on the branch
     */
    public BranchResult branch(BalanceAxis axis, DoubleFunction<EquivalentCircuit> family, double from, double to,
                               double start, int harmonics, StartState state) {
        if (axis == null || family == null || state == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "axis, circuit family and start state must be given");
        }
        checkHarmonics(harmonics);
        double lo = Math.min(from, to);
        double hi = Math.max(from, to);
        axis.checkRange(lo, hi);
        double p0 = clamp(start, lo, hi);
        CircuitPlane plane = CircuitPlane.of(family);
        EquivalentCircuit c0 = plane.at(p0, Double.NaN);
        OperatingPoint seed = pick(single.operatingPoints(c0), state);

        LoopResidual res;
        double[] x0;
        StabilityCriterion criterion;
        if (harmonics == 1) {
            res = new LoopResidual(plane, c0, axis, hi - lo, null, 0, 1, 0);
            x0 = res.seed(seed, c0);
            criterion = SlowFlowStability.INSTANCE;
        } else {
            HarmonicSettings hs = HarmonicSettings.DEFAULTS.withHarmonics(harmonics);
            MultiHarmonicBalance mhb = new MultiHarmonicBalance(c0, hs);
            x0 = mhb.seed(seed);
            int samples = mhb.basis().samples();
            try {
                PeriodicSolution s = mhb.solve(x0);
                x0 = s.perUnit();
                samples = s.samples();
            } catch (FerromapException e) {
                if (e.key() != MessageKey.NO_CONVERGENCE) {
                    throw e;
                }
                // Leave the single-harmonic seed: the engine corrects its start with p held.
            }
            res = new LoopResidual(plane, c0, axis, hi - lo, null, 0, harmonics, samples);
            criterion = new HillCriterion(res, Double.NaN, hs.withSamples(samples));
        }
        BranchTracer tracer = new BranchTracer(engine.withWindow(lo, hi), criterion);
        ContinuationProblem problem = res.atQ(Double.NaN);
        Branch up = tracer.trace(problem, x0, p0, Direction.INCREASING);
        Branch down = tracer.trace(problem, x0, p0, Direction.DECREASING);
        if (up.size() == 0 && down.size() == 0) {
            throw new FerromapException(MessageKey.NO_CONVERGENCE, "the " + axis.name() + " branch could not start at "
                    + p0 + " " + axis.unit() + ": " + up.stopDetail());
        }

        // Join: the decreasing run reversed (without its start point when the other run has it), then the increasing run.
        List<double[]> xs = new ArrayList<>();
        List<Double> ps = new ArrayList<>();
        List<Integer> unstable = new ArrayList<>();
        int m = down.size();
        double[][] downX = down.x();
        double[][] upX = up.x();
        int firstDown = up.size() > 0 ? 1 : 0;
        for (int i = m - 1; i >= firstDown; i--) {
            xs.add(downX[i]);
            ps.add(down.p(i));
            unstable.add(down.unstableCount(i));
        }
        int offset = xs.size();
        for (int i = 0; i < up.size(); i++) {
            xs.add(upX[i]);
            ps.add(up.p(i));
            unstable.add(up.unstableCount(i));
        }
        List<BranchResult.Point> points = new ArrayList<>(xs.size());
        for (int k = 0; k < xs.size(); k++) {
            double[] x = xs.get(k);
            double p = ps.get(k);
            int u = unstable.get(k);
            points.add(new BranchResult.Point(p, res.fundamental(x) * res.baseFlux, voltage(res, x, p),
                    res.peakFlux(x) * res.baseFlux, u == 0, u));
        }
        List<BranchResult.Special> folds = new ArrayList<>();
        List<BranchResult.Special> branchPoints = new ArrayList<>();
        // The decreasing run's specials, last met first, with the index of the point before each in joined order.
        List<SpecialPoint> downSpecials = new ArrayList<>(down.specialPoints());
        java.util.Collections.reverse(downSpecials);
        for (SpecialPoint sp : downSpecials) {
            // Between down points a and a + 1, i.e. joined points m - 1 - a and m - 2 - a.
            add(sp, m - 2 - sp.afterIndex(), res, folds, branchPoints);
        }
        for (SpecialPoint sp : up.specialPoints()) {
            add(sp, offset + sp.afterIndex(), res, folds, branchPoints);
        }
        double startFlux = res.fundamental(x0) * res.baseFlux;
        if (up.size() > 0) {
            startFlux = res.fundamental(upX[0]) * res.baseFlux;
        }
        return new BranchResult(axis.name(), axis.unit(), harmonics, harmonics == 1 ? "slow flow" : "Hill",
                lo, hi, start, p0, state, seed.kind().label(), startFlux, points, folds, branchPoints,
                up.stopReason(), up.stopDetail(), down.stopReason(), down.stopDetail(),
                up.rejectedSteps().size() + down.rejectedSteps().size());
    }

    /**
     * Traces the fold curves of the single-harmonic balance in the plane (P1, P2) over the window
     * [p1From, p1To] x [p2From, p2To], with their cusps, and labels the regions between them.
     *
     * @param p1 the parameter the folds are in
     * @param p2 the second parameter
     * @param plane the circuit at (P1, P2) values, SI in the axes' units
     * @param p1Start P1 value the fold-finding branch starts from (the study's own), clamped
     * @param p2Start P2 value at which folds are first looked for (the study's own), clamped
     * @throws FerromapException BAD_REQUEST for ranges that cannot be honoured or the same
     *     parameter twice
     */
    public FoldCurveResult foldCurves(BalanceAxis p1, BalanceAxis p2, CircuitPlane plane, double p1From, double p1To,
                                      double p2From, double p2To, double p1Start, double p2Start) {
        if (p1 == null || p2 == null || plane == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "both axes and the circuit plane must be given");
        }
        if (p1.name().equals(p2.name())) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "a fold curve needs two different parameters; got "
                    + p1.name() + " twice");
        }
        double lo1 = Math.min(p1From, p1To);
        double hi1 = Math.max(p1From, p1To);
        double lo2 = Math.min(p2From, p2To);
        double hi2 = Math.max(p2From, p2To);
        p1.checkRange(lo1, hi1);
        p2.checkRange(lo2, hi2);
        double s1 = clamp(p1Start, lo1, hi1);
        double q0 = clamp(p2Start, lo2, hi2);

        // Folds on the P1 branch: at the study's P2 first, then across the P2 window.
        List<SpecialPoint> starts = List.of();
        double qStart = q0;
        LoopResidual res = null;
        for (double q : candidates(q0, lo2, hi2)) {
            EquivalentCircuit c = plane.at(s1, q);
            LoopResidual r = new LoopResidual(plane, c, p1, hi1 - lo1, p2, hi2 - lo2, 1, 0);
            List<SpecialPoint> found = foldsAt(r, c, s1, q, lo1, hi1);
            if (!found.isEmpty() || res == null) {
                res = r;
                starts = found;
                qStart = q;
            }
            if (!found.isEmpty()) {
                break;
            }
        }

        FoldCurveSettings fs = FoldCurveSettings.DEFAULTS.withContinuation(engine.withWindow(lo1, hi1)).withQWindow(lo2, hi2);
        FoldCurveTracer tracer = new FoldCurveTracer(fs);
        List<FoldCurveResult.CurvePoint> curve = new ArrayList<>();
        List<FoldCurveResult.Cusp> cusps = new ArrayList<>();
        List<FoldCurveResult.Segment> segments = new ArrayList<>();
        List<double[][]> polylines = new ArrayList<>();
        List<FoldCurve> traced = new ArrayList<>();
        for (SpecialPoint start : starts) {
            double startFlux = res.fundamental(start.x()) * res.baseFlux;
            if (onTraced(traced, res, start.p(), qStart, startFlux, hi1 - lo1)) {
                continue;
            }
            FoldCurve fc = tracer.trace(res, start.x(), start.p(), qStart);
            traced.add(fc);
            int segment = segments.size();
            segments.add(new FoldCurveResult.Segment(start.p(), qStart, startFlux, fc.size(), fc.increasingStop(),
                    fc.increasingDetail(), fc.decreasingStop(), fc.decreasingDetail(), fc.rejectedSteps().size()));
            double[][] line = new double[fc.size()][];
            double[][] fx = fc.x();
            for (int k = 0; k < fc.size(); k++) {
                curve.add(new FoldCurveResult.CurvePoint(fc.p(k), fc.q(k), res.fundamental(fx[k]) * res.baseFlux, segment));
                line[k] = new double[] {unit(fc.p(k), lo1, hi1), unit(fc.q(k), lo2, hi2)};
            }
            polylines.add(line);
            for (SpecialPoint cusp : fc.cusps()) {
                cusps.add(new FoldCurveResult.Cusp(cusp.p(), cusp.q(), res.fundamental(cusp.x()) * res.baseFlux, segment,
                        cusp.located()));
            }
        }

        List<FoldCurveResult.Region> regions = new ArrayList<>();
        for (PlaneRegions.Raw raw : PlaneRegions.find(polylines)) {
            double a = value(raw.u(), lo1, hi1);
            double b = value(raw.v(), lo2, hi2);
            int[] probe = classify(plane, a, b);
            String label = label(probe);
            if (!FoldCurveResult.BISTABLE.equals(label)) {
                // A one-state region may wrap round a cusp, its state going continuously from
                // normal to ferroresonant: call it ferroresonant-only only if every sample agrees.
                for (double[] uv : raw.samples()) {
                    String other = label(classify(plane, value(uv[0], lo1, hi1), value(uv[1], lo2, hi2)));
                    if (!other.equals(label) && !FoldCurveResult.BISTABLE.equals(other)) {
                        label = FoldCurveResult.ONE_STATE;
                    }
                }
            }
            regions.add(new FoldCurveResult.Region(label, a, b, probe[0], raw.share()));
        }
        return new FoldCurveResult(p1.name(), p1.unit(), p2.name(), p2.unit(), lo1, hi1, lo2, hi2, s1, qStart,
                curve, cusps, segments, regions);
    }

    /**
     * Position of v in [lo, hi] as a fraction, logarithmic when the range is positive and spans
     * a factor of 20 or more (as the charts draw it), so that regions are found and probed where
     * a reader sees them.
     */
    static double unit(double v, double lo, double hi) {
        return logarithmic(lo, hi) ? Math.log(v / lo) / Math.log(hi / lo) : (v - lo) / (hi - lo);
    }

    /** The inverse of {@link #unit}. */
    static double value(double u, double lo, double hi) {
        return logarithmic(lo, hi) ? lo * Math.pow(hi / lo, u) : lo + u * (hi - lo);
    }

    /** Whether a range is drawn and rastered on a logarithmic scale: positive and spanning a factor of 20 or more. */
    public static boolean logarithmic(double lo, double hi) {
        return lo > 0 && hi / lo >= 20;
    }

    /** {stable states, 1 if the single stable state is ferroresonant} at (a, b); {-1, 0} where the circuit is refused. */
    private int[] classify(CircuitPlane plane, double a, double b) {
        EquivalentCircuit c;
        try {
            c = plane.at(a, b);
        } catch (FerromapException e) {
            return new int[] {-1, 0};
        }
        int stable = 0;
        boolean ferro = false;
        for (OperatingPoint op : single.operatingPoints(c)) {
            if (op.stable() && !op.atFold()) {
                stable++;
                ferro = op.kind() == PointKind.FERRORESONANT;
            }
        }
        return new int[] {stable, ferro ? 1 : 0};
    }

    private static String label(int[] probe) {
        if (probe[0] >= 2) {
            return FoldCurveResult.BISTABLE;
        }
        return probe[0] == 1 && probe[1] == 1 ? FoldCurveResult.FERRORESONANT_ONLY : FoldCurveResult.ONE_STATE;
    }

    /** P2 values to look for folds at: the start, then nine across the window (geometric when it spans a decade), nearest first. */
    private static List<Double> candidates(double q0, double lo, double hi) {
        List<Double> out = new ArrayList<>();
        out.add(q0);
        boolean geometric = lo > 0 && hi / lo >= 10;
        List<Double> across = new ArrayList<>();
        for (int k = 0; k <= 8; k++) {
            double t = k / 8.0;
            across.add(geometric ? lo * Math.pow(hi / lo, t) : lo + t * (hi - lo));
        }
        across.sort((x, y) -> Double.compare(Math.abs(x - q0), Math.abs(y - q0)));
        for (double q : across) {
            if (q != q0) {
                out.add(q);
            }
        }
        return out;
    }

    /** The folds of the single-harmonic P1 branch at q, from its normal and (when distinct) upper state, in P1 order. */
    private List<SpecialPoint> foldsAt(LoopResidual r, EquivalentCircuit c, double p0, double q, double lo, double hi) {
        List<OperatingPoint> ops = single.operatingPoints(c);
        OperatingPoint normal = pick(ops, StartState.NORMAL);
        OperatingPoint upper = pick(ops, StartState.UPPER);
        List<OperatingPoint> seeds = new ArrayList<>(List.of(normal));
        if (upper.flux() > normal.flux() * (1 + 1e-6)) {
            seeds.add(upper);
        }
        BranchTracer tracer = new BranchTracer(engine.withWindow(lo, hi), StabilityCriterion.none());
        ContinuationProblem problem = r.atQ(q);
        List<SpecialPoint> out = new ArrayList<>();
        for (OperatingPoint seed : seeds) {
            double[] x0 = r.seed(seed, c);
            for (Direction d : Direction.values()) {
                for (SpecialPoint sp : tracer.trace(problem, x0, p0, d).specialPoints(SpecialPoint.Kind.FOLD)) {
                    boolean known = false;
                    double flux = r.fundamental(sp.x());
                    for (SpecialPoint o : out) {
                        known |= Math.abs(o.p() - sp.p()) <= 1e-6 * (hi - lo)
                                && Math.abs(r.fundamental(o.x()) - flux) <= 1e-6 * Math.max(1, flux);
                    }
                    if (!known) {
                        out.add(sp);
                    }
                }
            }
        }
        out.sort((a, b) -> Double.compare(a.p(), b.p()));
        return out;
    }

    /** Whether a fold (p, q, flux) lies on one of the curves already traced (within 1e-4 of the window and of the flux). */
    private static boolean onTraced(List<FoldCurve> traced, LoopResidual r, double p, double q, double flux, double width) {
        for (FoldCurve fc : traced) {
            double[][] fx = fc.x();
            for (int k = 0; k + 1 < fc.size(); k++) {
                double qa = fc.q(k);
                double qb = fc.q(k + 1);
                if ((qa - q) * (qb - q) > 0 || qa == qb) {
                    continue;
                }
                double t = (q - qa) / (qb - qa);
                double pk = fc.p(k) + t * (fc.p(k + 1) - fc.p(k));
                double fa = r.fundamental(fx[k]) * r.baseFlux;
                double fb = r.fundamental(fx[k + 1]) * r.baseFlux;
                double fk = fa + t * (fb - fa);
                if (Math.abs(pk - p) <= 1e-4 * width && Math.abs(fk - flux) <= 1e-4 * Math.max(Math.abs(flux), Math.abs(fk))) {
                    return true;
                }
            }
        }
        return false;
    }

    private void add(SpecialPoint sp, int after, LoopResidual res, List<BranchResult.Special> folds, List<BranchResult.Special> bps) {
        double[] x = sp.x();
        BranchResult.Special s = new BranchResult.Special(sp.p(), res.fundamental(x) * res.baseFlux, voltage(res, x, sp.p()),
                after, sp.located());
        if (sp.kind() == SpecialPoint.Kind.FOLD) {
            folds.add(s);
        } else if (sp.kind() == SpecialPoint.Kind.BRANCH_POINT) {
            bps.add(s);
        }
    }

    /** Peak magnetizing voltage, V: Lambda_b w max|dy/dtau|. */
    private static double voltage(LoopResidual res, double[] x, double p) {
        EquivalentCircuit c = res.circuit(p, Double.NaN);
        double w = c == null ? res.baseOmega : c.omega();
        return res.peakRate(x) * res.baseFlux * w;
    }

    private static double clamp(double v, double lo, double hi) {
        if (Double.isNaN(v)) {
            return lo;
        }
        return Math.max(lo, Math.min(hi, v));
    }

    /** The normal (lowest-flux stable) or upper (highest-flux stable) point; any point when none is stable. */
    private static OperatingPoint pick(List<OperatingPoint> ops, StartState state) {
        if (ops.isEmpty()) {
            throw new FerromapException(MessageKey.NO_CONVERGENCE, "the single-harmonic balance has no steady state at the start");
        }
        OperatingPoint best = null;
        for (OperatingPoint op : ops) {
            if (op.stable() && !op.atFold()) {
                if (best == null || (state == StartState.UPPER ? op.flux() > best.flux() : op.flux() < best.flux())) {
                    best = op;
                }
            }
        }
        return best != null ? best : (state == StartState.UPPER ? ops.get(ops.size() - 1) : ops.get(0));
    }
}
