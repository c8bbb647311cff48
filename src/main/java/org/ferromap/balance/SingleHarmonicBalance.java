package org.ferromap.balance;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.exception.MathRuntimeException;

/**
 * The LC balance at fundamental frequency (the graphical method, DOMAIN.md §3):
 * (w Cs E)^2 = (I1(Lambda) - w^2 C Lambda)^2 + (w G Lambda)^2, C = Cs + Cg, G the total shunt
 * conductance. Along the branch the source voltage is an explicit function of the flux,
 * E(Lambda) = Lambda sqrt((I1/Lambda - w^2 C)^2 + (w G)^2) / (w Cs), so folds are the local
 * extrema of E(Lambda) and every steady state lies on one monotone piece between them.
 *
 * <p>Stability is that of the averaged (slow-flow) equations of the forced oscillator
 * C lambda'' + G lambda' + i(lambda) = Cs e': with lambda = Re(z e^{jwt}) and
 * 2jwC z' = jwCs E - (I1(|z|)/|z| - w^2 C + jwG) z, the Jacobian at a steady state has trace
 * -G/C and a determinant of the sign of dE/dLambda. So a point is stable exactly where E rises
 * with Lambda, the points between a fold pair are saddles, and there is no Hopf point in this
 * approximation. All work is in per unit ({@link PerUnitBranch}).
 *
 * <p>Immutable and thread-safe. Polynomial curves use closed forms (microseconds per circuit);
 * others scan the flux on a geometric grid refined across sharp knees, bracket sign changes of
 * dE/dLambda and refine with Brent's method; their cusp is found by bisection on that same scan,
 * so it always agrees with {@link #folds}.
 */
public final class SingleHarmonicBalance {

    private static final int MAX_EVALUATIONS = 300;
    /** Relative accuracy of Brent roots: a few ulps. */
    private static final double ROOT_RELATIVE = 1e-15;
    /** Below this per-unit E^2 a fold counts as lying at zero source (lossless jump-down). */
    private static final double ZERO_DRIVE_SQUARED = 1e-24;

    private final BalanceSettings settings;

    public SingleHarmonicBalance() {
        this(BalanceSettings.DEFAULTS);
    }

    public SingleHarmonicBalance(BalanceSettings settings) {
        this.settings = settings;
    }

    public BalanceSettings settings() {
        return settings;
    }

    /**
     * Every single-harmonic steady state at the circuit's source voltage, ascending in flux.
     * A source exactly on a fold (within the tangency tolerance) gives one point there.
     */
    public List<OperatingPoint> operatingPoints(EquivalentCircuit circuit) {
        PerUnitBranch b = branch(circuit);
        FoldStructure st = structure(b);
        return operatingPoints(b, st);
    }

    /** The folds of the branch in source voltage, ascending in flux: jump-up and jump-down alternate. */
    public List<Fold> folds(EquivalentCircuit circuit) {
        PerUnitBranch b = branch(circuit);
        FoldStructure st = structure(b);
        List<Fold> out = new ArrayList<>(st.count);
        for (int k = 0; k < st.count; k++) {
            out.add(fold(b, st.x[k], st.phi[k], st.up[k]));
        }
        return out;
    }

    /** The cusp: minimum capacitance and damping conductance for bistability, and where the folds merge. */
    public CuspCondition cuspCondition(EquivalentCircuit circuit) {
        PerUnitBranch b = branch(circuit);
        double w = b.omega;
        double cap = circuit.totalCapacitance();
        if (b.closedForm()) {
            int n = b.exponent;
            double c = 2 * Math.sqrt(n) / (n - 1);
            double kappa = 1 - b.alpha;
            double rMin = b.alpha + c * b.g;
            double gMin = kappa > 0 ? kappa / c : 0.0;
            // Cusp point with C = C_min: kappa_min = c g, X = kappa_min (n+1)/(2n) (DOMAIN.md §3 [der]).
            double kMin = c * b.g;
            double xx = kMin * (n + 1) / (2.0 * n);
            double flux = Math.pow(xx / b.beta, 1.0 / (n - 1));
            double e = flux * Math.sqrt((xx - kMin) * (xx - kMin) + b.g * b.g) * b.sourcePerDrive;
            boolean bistable = kappa > c * b.g;
            return new CuspCondition(bistable, rMin * cap, 1.0 / rMin, gMin * w * cap, flux * b.baseFlux, e);
        }
        return scannedCusp(circuit);
    }

    /** Steps of the bisections on "has a fold pair": halves the bracket to below 1e-12 relative. */
    private static final int BISECTIONS = 200;
    /** Relative width at which a bisection in C or G stops: far below the 1e-3 the tests probe. */
    private static final double BISECTION_RELATIVE = 1e-12;
    /** How far (factor 2 each step) the capacitance or conductance bracket is widened before giving up. */
    private static final int BRACKET_STEPS = 200;

    /**
     * The cusp of a curve without closed form, by the definition itself: fold pairs are what
     * {@link #folds} finds, C_min and G_min the boundaries of "has a fold pair" in C (at this G)
     * and in G (at this C), found by bracketing and bisection. For G the predicate is monotone
     * (det grows with g^2 at every flux); in C the bracket is grown from this circuit's
     * capacitance, so the boundary found is that of the fold pair that persists up to it.
     */
    private CuspCondition scannedCusp(EquivalentCircuit circuit) {
        double w = circuit.omega();
        double cap = circuit.totalCapacitance();
        double g = circuit.conductance();
        boolean bistable = hasFoldPair(circuit);
        // G_min: the total shunt conductance at and above which no fold pair is left.
        double gLoad = 1.0 / circuit.loadResistance();
        double gMin = 0.0;
        if (hasFoldPair(withConductance(circuit, gLoad))) {
            double lo = gLoad;
            double hi = Math.max(g, gLoad) > 0 ? 2 * Math.max(g, gLoad) : w * cap * 1e-9;
            for (int k = 0; k < BRACKET_STEPS && hasFoldPair(withConductance(circuit, hi)); k++) {
                lo = hi;
                hi *= 2;
            }
            for (int k = 0; k < BISECTIONS && hi - lo > BISECTION_RELATIVE * hi; k++) {
                double mid = 0.5 * (lo + hi);
                if (hasFoldPair(withConductance(circuit, mid))) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            gMin = hi;
        }
        // C_min: grow C from this circuit's until a fold pair exists, then shrink until none does.
        double cHi = cap;
        boolean found = bistable;
        for (int k = 0; k < BRACKET_STEPS && !found; k++) {
            cHi *= 2;
            found = hasFoldPair(withCapacitance(circuit, cHi));
        }
        if (!found) {
            return new CuspCondition(false, Double.NaN, Double.NaN, gMin, Double.NaN, Double.NaN);
        }
        double cLo = 0.5 * cHi;
        for (int k = 0; k < BRACKET_STEPS && hasFoldPair(withCapacitance(circuit, cLo)); k++) {
            cHi = cLo;
            cLo *= 0.5;
        }
        for (int k = 0; k < BISECTIONS && cHi - cLo > BISECTION_RELATIVE * cHi; k++) {
            double mid = 0.5 * (cLo + cHi);
            if (hasFoldPair(withCapacitance(circuit, mid))) {
                cHi = mid;
            } else {
                cLo = mid;
            }
        }
        double cMin = cHi;
        // The cusp: the narrowest fold pair just above C_min, the one being born there.
        PerUnitBranch bc = branch(withCapacitance(circuit, cMin));
        FoldStructure st = structure(bc);
        double cuspFlux = Double.NaN;
        double cuspSource = Double.NaN;
        double bestGap = Double.POSITIVE_INFINITY;
        for (int k = 0; k + 1 < st.count; k += 2) {
            double gap = Math.abs(st.phi[k] - st.phi[k + 1]);
            if (gap <= bestGap) {
                bestGap = gap;
                double x = 0.5 * (st.x[k] + st.x[k + 1]);
                cuspFlux = x * bc.baseFlux;
                // E at that flux with C = C_min but Cs as given (the record's convention).
                cuspSource = Math.sqrt(bc.phi(x)) * bc.baseVoltage * cMin / circuit.seriesCapacitance();
            }
        }
        return new CuspCondition(bistable, cMin, cap / cMin, gMin, cuspFlux, cuspSource);
    }

    private boolean hasFoldPair(EquivalentCircuit c) {
        return structure(branch(c)).bistable();
    }

    /** The circuit with total shunt conductance g (S, at least the load's), through the core-loss resistance. */
    private static EquivalentCircuit withConductance(EquivalentCircuit c, double g) {
        double core = g - 1.0 / c.loadResistance();
        return c.withCoreLossResistance(core > 0 ? 1.0 / core : Double.POSITIVE_INFINITY);
    }

    /** The circuit with total capacitance cap (F), all in series (only Cs + Cg matters for the folds). */
    private static EquivalentCircuit withCapacitance(EquivalentCircuit c, double cap) {
        return c.withShuntCapacitance(0).withSeriesCapacitance(cap);
    }

    /** Distance of the source from the first jump-up fold (the end of the normal branch). */
    public FoldMargin margin(EquivalentCircuit circuit) {
        PerUnitBranch b = branch(circuit);
        FoldStructure st = structure(b);
        double e = circuit.sourcePeak();
        for (int k = 0; k < st.count; k++) {
            if (st.up[k]) {
                double up = Math.sqrt(st.phi[k]) * b.sourcePerDrive;
                String note = e < up ? "normal state exists; the source may rise by the headroom before the jump"
                        : "source at or above the jump-up fold: no normal state";
                return new FoldMargin(e, up, e > 0 ? up / e : Double.POSITIVE_INFINITY, up - e, note);
            }
        }
        return new FoldMargin(e, Double.NaN, Double.NaN, Double.NaN,
                "no fold pair: the branch is single-valued (below the cusp), no jump at any source voltage");
    }

    /**
     * Samples of the whole branch E(Lambda) for drawing, geometric in flux from maxFlux/1000 to
     * maxFlux (Wb-turn), each with its source voltage and stability.
     */
    public List<BranchSample> branch(EquivalentCircuit circuit, double maxFlux, int points) {
        if (!(maxFlux > 0) || points < 2) {
            throw new FerromapException(MessageKey.BAD_REQUEST,
                    "branch sampling needs maxFlux > 0 Wb-turn and at least 2 points; got " + maxFlux + " and " + points);
        }
        PerUnitBranch b = branch(circuit);
        List<BranchSample> out = new ArrayList<>(points);
        double top = maxFlux / b.baseFlux;
        double ratio = Math.pow(1000.0, 1.0 / (points - 1));
        double x = top / 1000.0;
        for (int k = 0; k < points; k++) {
            out.add(new BranchSample(x * b.baseFlux, b.sourceAt(x), b.det(x) > 0));
            x *= ratio;
        }
        return out;
    }

    /** One sample of the branch: flux (Wb-turn), the source peak that holds it (V), stability. */
    public record BranchSample(double flux, double sourcePeak, boolean stable) { }

    // ----------------------------------------------------------------------------------------
    // package-private helpers shared with CriticalLength and the multi-harmonic balance

    PerUnitBranch branch(EquivalentCircuit circuit) {
        DescribingFunction df = settings.closedForms() ? DescribingFunction.of(circuit.magnetizing())
                : DescribingFunction.numerical(circuit.magnetizing());
        return new PerUnitBranch(circuit, df, settings.closedForms() && circuit.magnetizing() instanceof PolynomialCurve);
    }

    /**
     * Signed distance to the cusp, per unit: positive exactly when the circuit has a fold pair,
     * continuous in the circuit's parameters (for root finding). It is max over x of
     * (1 - n1)(i1' - 1) minus g^2, which for polynomials is kappa^2 (n-1)^2/(4n) - delta^2 when
     * kappa &gt; 0 and -kappa^2 - delta^2 otherwise.
     */
    double cuspIndicator(EquivalentCircuit circuit) {
        PerUnitBranch b = branch(circuit);
        if (b.closedForm()) {
            int n = b.exponent;
            double kappa = 1 - b.alpha;
            double q = kappa > 0 ? kappa * kappa * (n - 1) * (n - 1) / (4.0 * n) : -kappa * kappa;
            return q - b.g * b.g;
        }
        double[] xs = foldGrid(b);
        double best = Double.NEGATIVE_INFINITY;
        int bk = 0;
        for (int k = 0; k < xs.length; k++) {
            double q = (1 - b.n1(xs[k])) * (b.slope(xs[k]) - 1);
            if (q > best) {
                best = q;
                bk = k;
            }
        }
        if (bk > 0 && bk < xs.length - 1) {
            LocalMinimum lm = new LocalMinimum();
            lm.minimize(t -> {
                double x = Math.exp(t);
                return -(1 - b.n1(x)) * (b.slope(x) - 1);
            }, Math.log(xs[bk - 1]), Math.log(xs[bk + 1]), 1e-10, 1e-10, 200);
            best = Math.max(best, -lm.lastValue());
        }
        return best - b.g * b.g;
    }

    /**
     * Source voltages (V) of the first jump-up and jump-down folds, continued past the cusp by
     * the source at the steepest-flattening point of the single branch (where the folds would
     * be born), so the values are continuous in the circuit's parameters. {NaN, NaN} when the
     * branch has no inflection either (small capacitance).
     */
    double[] foldSourcesContinued(EquivalentCircuit circuit) {
        PerUnitBranch b = branch(circuit);
        FoldStructure st = structure(b);
        if (st.bistable()) {
            return new double[] {Math.sqrt(st.phi[0]) * b.sourcePerDrive, Math.sqrt(st.phi[1]) * b.sourcePerDrive};
        }
        double x;
        if (b.closedForm()) {
            double kappa = 1 - b.alpha;
            if (kappa <= 0) {
                return new double[] {Double.NaN, Double.NaN};
            }
            int n = b.exponent;
            double xx = kappa * (n + 1) / (2.0 * n);
            x = Math.pow(xx / b.beta, 1.0 / (n - 1));
        } else {
            double[] xs = foldGrid(b);
            double best = Double.NEGATIVE_INFINITY;
            int bk = 0;
            for (int k = 0; k < xs.length; k++) {
                double q = (1 - b.n1(xs[k])) * (b.slope(xs[k]) - 1);
                if (q > best) {
                    best = q;
                    bk = k;
                }
            }
            if (best < 0 && b.alpha >= 1) {
                return new double[] {Double.NaN, Double.NaN};
            }
            x = xs[bk];
            if (bk > 0 && bk < xs.length - 1) {
                LocalMinimum lm = new LocalMinimum();
                x = Math.exp(lm.minimize(t -> {
                    double y = Math.exp(t);
                    return -(1 - b.n1(y)) * (b.slope(y) - 1);
                }, Math.log(xs[bk - 1]), Math.log(xs[bk + 1]), 1e-10, 1e-10, 200));
            }
        }
        double e = b.sourceAt(x);
        return new double[] {e, e};
    }

    FoldStructure structure(PerUnitBranch b) {
        return b.closedForm() ? closedFormStructure(b) : scannedStructure(b);
    }

    List<OperatingPoint> operatingPoints(PerUnitBranch b, FoldStructure st) {
        List<OperatingPoint> out = new ArrayList<>(3);
        double s2 = b.drive * b.drive;
        if (b.drive == 0) {
            out.add(point(b, 0.0, true, PointKind.NORMAL, false));
            for (int k = 0; k < st.count; k++) {
                if (st.phi[k] <= ZERO_DRIVE_SQUARED) {
                    out.add(point(b, st.x[k], false, PointKind.UNSTABLE, true));
                }
            }
            return out;
        }
        double tol = settings.tangencyTolerance() * s2;
        boolean bistable = st.bistable();
        BrentSolver solver = new BrentSolver(ROOT_RELATIVE, Double.MIN_NORMAL, Double.MIN_NORMAL);
        UnivariateFunction f = b::amplitudeResidual;
        for (int seg = 0; seg <= st.count; seg++) {
            boolean leftTangent = seg > 0 && Math.abs(st.phi[seg - 1] - s2) <= tol;
            boolean rightTangent = seg < st.count && Math.abs(st.phi[seg] - s2) <= tol;
            boolean increasing = (seg & 1) == 0;
            if (!leftTangent && !rightTangent) {
                double xa = seg == 0 ? 0.0 : st.x[seg - 1];
                double pa = seg == 0 ? 0.0 : st.phi[seg - 1];
                double xb;
                double pb;
                if (seg < st.count) {
                    xb = st.x[seg];
                    pb = st.phi[seg];
                } else {
                    xb = upperBracket(b, xa, s2);
                    pb = b.phi(xb);
                }
                if ((pa - s2) * (pb - s2) < 0) {
                    double x = solve(solver, f, xa, xb);
                    PointKind kind;
                    if (!bistable) {
                        kind = b.alpha < 1 && b.n1(x) > 1 ? PointKind.FERRORESONANT : PointKind.NORMAL;
                    } else if (!increasing) {
                        kind = PointKind.UNSTABLE;
                    } else {
                        kind = seg == 0 ? PointKind.NORMAL : PointKind.FERRORESONANT;
                    }
                    out.add(point(b, x, increasing, kind, false));
                }
            }
            if (rightTangent) {
                out.add(point(b, st.x[seg], false, PointKind.UNSTABLE, true));
            }
        }
        return out;
    }

    // ----------------------------------------------------------------------------------------

    private static FoldStructure closedFormStructure(PerUnitBranch b) {
        // DOMAIN.md §3 [der]: roots X = beta x^m of (1+m) X^2 - (2+m) kappa X + kappa^2 + delta^2 = 0.
        int n = b.exponent;
        int m = n - 1;
        double kappa = 1 - b.alpha;
        double delta = b.g;
        double disc = (double) m * m * kappa * kappa - 4.0 * (1 + m) * delta * delta;
        if (kappa <= 0 || disc <= 0) {
            return FoldStructure.NONE;
        }
        double q = 0.5 * ((2 + m) * kappa + Math.sqrt(disc));
        double xUp = (kappa * kappa + delta * delta) / q;   // smaller root: jump-up
        double xDown = q / (1 + m);                         // larger root: jump-down
        double[] x = {Math.pow(xUp / b.beta, 1.0 / m), Math.pow(xDown / b.beta, 1.0 / m)};
        double[] phi = {
            x[0] * x[0] * ((xUp - kappa) * (xUp - kappa) + delta * delta),
            x[1] * x[1] * ((xDown - kappa) * (xDown - kappa) + delta * delta)};
        return new FoldStructure(x, phi, new boolean[] {true, false}, 2);
    }

    private FoldStructure scannedStructure(PerUnitBranch b) {
        double[] xs = foldGrid(b);
        int n = xs.length;
        double[] ds = new double[n];
        for (int k = 0; k < n; k++) {
            ds[k] = b.det(xs[k]);
        }
        BrentSolver solver = new BrentSolver(ROOT_RELATIVE, Double.MIN_NORMAL, Double.MIN_NORMAL);
        UnivariateFunction det = b::det;
        LocalMinimum lm = new LocalMinimum();
        double[] roots = new double[8];
        boolean[] ups = new boolean[8];
        int count = 0;
        for (int k = 0; k + 1 < n; k++) {
            if ((ds[k] > 0) != (ds[k + 1] > 0)) {
                if (count + 2 > roots.length) {
                    roots = java.util.Arrays.copyOf(roots, 2 * roots.length);
                    ups = java.util.Arrays.copyOf(ups, 2 * ups.length);
                }
                roots[count] = solve(solver, det, xs[k], xs[k + 1]);
                ups[count++] = ds[k] > 0;
            } else if (k > 0 && isNearTouch(ds, k)) {
                // A fold pair closer than one grid step (near the cusp): look for the extremum of det.
                double sign = ds[k] > 0 ? 1 : -1;
                double u = lm.minimize(t -> sign * b.det(Math.exp(t)), Math.log(xs[k - 1]), Math.log(xs[k + 1]), 1e-12, 1e-12, 200);
                if (lm.lastValue() < 0) {
                    double xm = Math.exp(u);
                    if (count + 2 > roots.length) {
                        roots = java.util.Arrays.copyOf(roots, 2 * roots.length);
                        ups = java.util.Arrays.copyOf(ups, 2 * ups.length);
                    }
                    roots[count] = solve(solver, det, xs[k - 1], xm);
                    ups[count++] = ds[k] > 0;
                    roots[count] = solve(solver, det, xm, xs[k + 1]);
                    ups[count++] = ds[k] <= 0;
                }
            }
        }
        if (count == 0) {
            return FoldStructure.NONE;
        }
        double[] phi = new double[count];
        for (int k = 0; k < count; k++) {
            phi[k] = b.phi(roots[k]);
        }
        return new FoldStructure(java.util.Arrays.copyOf(roots, count), phi, java.util.Arrays.copyOf(ups, count), count);
    }

    /** det has a local extremum at node k on the same side of zero as its neighbours. */
    private static boolean isNearTouch(double[] ds, int k) {
        if (k + 1 >= ds.length) {
            return false;
        }
        if (ds[k] > 0) {
            return ds[k - 1] > 0 && ds[k + 1] > 0 && ds[k] < ds[k - 1] && ds[k] <= ds[k + 1];
        }
        return ds[k - 1] <= 0 && ds[k + 1] <= 0 && ds[k] > ds[k - 1] && ds[k] >= ds[k + 1];
    }

    /**
     * Flux range (per unit) outside which the branch cannot fold: below, the curve is linear
     * (n1 and i1' no longer change); above, it is either linear again (air core) or the magnetizing
     * admittance exceeds twice the capacitor's (then, for curves whose i/lambda does not fall,
     * E rises monotonically).
     */
    double[] scanRange(PerUnitBranch b) {
        double lo = 1.0;
        double n = b.n1(lo);
        double s = b.slope(lo);
        for (int k = 0; k < 80; k++) {
            double x = 0.5 * lo;
            double n2 = b.n1(x);
            double s2 = b.slope(x);
            boolean flat = Math.abs(n2 - n) <= 1e-7 * (1 + Math.abs(n)) && Math.abs(s2 - s) <= 1e-7 * (1 + Math.abs(s));
            lo = x;
            n = n2;
            s = s2;
            if (flat) {
                break;
            }
        }
        double hi = 1.0;
        n = b.n1(hi);
        s = b.slope(hi);
        for (int k = 0; k < 80; k++) {
            if (n >= 2 && s >= 2) {
                break;
            }
            double x = 2 * hi;
            double n2 = b.n1(x);
            double s2 = b.slope(x);
            boolean flat = Math.abs(n2 - n) <= 1e-7 * (1 + Math.abs(n)) && Math.abs(s2 - s) <= 1e-7 * (1 + Math.abs(s));
            hi = x;
            n = n2;
            s = s2;
            if (flat) {
                break;
            }
        }
        return new double[] {0.5 * lo, 2 * hi};
    }

    /** Largest change of n1 or i1' (per unit, against the capacitor line's 1) between neighbouring scan nodes. */
    private static final double MAX_STEP_CHANGE = 0.125;
    /** Cap on the nodes a refined scan may hold. */
    private static final int MAX_NODES = 20000;

    /**
     * The geometric scan grid refined where n1 or i1' moves by more than {@link #MAX_STEP_CHANGE}
     * between nodes while n1 is still small enough for a fold (det &lt; 0 needs n1 &lt; 1 &lt; i1'):
     * sharp knees (piecewise-linear and tabulated curves) pass from linear to saturated within
     * a few percent of flux, where a fixed 16 per decade would step over the whole fold pair.
     */
    double[] foldGrid(PerUnitBranch b) {
        double[] range = scanRange(b);
        double[] coarse = grid(range[0], range[1]);
        double[] xs = new double[Math.max(64, 4 * coarse.length)];
        int m = 0;
        double xPrev = coarse[0];
        double nPrev = b.n1(xPrev);
        double sPrev = b.slope(xPrev);
        xs[m++] = xPrev;
        // Explicit stack of pending right ends, so the refinement stays ascending without recursion.
        double[] stackX = new double[128];
        int top;
        for (int k = 1; k < coarse.length; k++) {
            top = 0;
            stackX[top++] = coarse[k];
            while (top > 0) {
                double xr = stackX[top - 1];
                double nr = b.n1(xr);
                double sr = b.slope(xr);
                boolean steep = Math.abs(nr - nPrev) > MAX_STEP_CHANGE || Math.abs(sr - sPrev) > MAX_STEP_CHANGE;
                boolean foldPossible = Math.min(nPrev, nr) < 1 + MAX_STEP_CHANGE;
                if (steep && foldPossible && xr / xPrev > 1 + 1e-9 && m < MAX_NODES && top < stackX.length) {
                    stackX[top++] = Math.sqrt(xPrev * xr);
                    continue;
                }
                top--;
                if (m == xs.length) {
                    xs = java.util.Arrays.copyOf(xs, 2 * m);
                }
                xs[m++] = xr;
                xPrev = xr;
                nPrev = nr;
                sPrev = sr;
            }
        }
        return java.util.Arrays.copyOf(xs, m);
    }

    double[] grid(double lo, double hi) {
        int per = settings.scanPointsPerDecade();
        int m = Math.max(2, (int) Math.ceil(Math.log10(hi / lo) * per));
        double ratio = Math.pow(hi / lo, 1.0 / m);
        double[] xs = new double[m + 1];
        double x = lo;
        for (int k = 0; k <= m; k++) {
            xs[k] = x;
            x *= ratio;
        }
        xs[m] = hi;
        return xs;
    }

    /** A flux above xa (per unit) where Phi exceeds s^2, on the last, rising piece of the branch. */
    private static double upperBracket(PerUnitBranch b, double xa, double s2) {
        double x = xa > 0 ? 2 * xa : Math.max(1e-3, Math.sqrt(s2));
        for (int k = 0; k < 200; k++) {
            if (b.phi(x) > s2) {
                return x;
            }
            x *= 2;
        }
        throw new FerromapException(MessageKey.NO_CONVERGENCE,
                "no steady state found up to " + x + " per unit flux: the magnetizing curve never balances the capacitors");
    }

    private static double solve(BrentSolver solver, UnivariateFunction f, double a, double b) {
        try {
            return solver.solve(MAX_EVALUATIONS, f, a, b);
        } catch (MathRuntimeException e) {
            throw new FerromapException(MessageKey.NO_CONVERGENCE,
                    "Brent's method failed on the balance between " + a + " and " + b + " per unit flux: " + e.getMessage(), e);
        }
    }

    private static Fold fold(PerUnitBranch b, double x, double phi, boolean up) {
        double e = Math.sqrt(phi) * b.sourcePerDrive;
        double flux = x * b.baseFlux;
        return new Fold(e, e / b.baseVoltage, flux, b.omega * flux, up ? FoldDirection.JUMP_UP : FoldDirection.JUMP_DOWN);
    }

    private static OperatingPoint point(PerUnitBranch b, double x, boolean stable, PointKind kind, boolean atFold) {
        double n1 = b.n1(x);
        double s1 = b.slope(x);
        double flux = x * b.baseFlux;
        double prod = -(n1 - 1) * (s1 - 1);
        double rate = 0.5 * b.omega * (-b.g + (prod > 0 ? Math.sqrt(prod) : 0.0));
        double phase = Math.atan2(b.g, 1 - n1);
        return new OperatingPoint(flux, b.omega * flux, x * b.baseFlux * b.omega / b.baseVoltage,
                n1 * x * b.baseCurrent, phase, stable, kind, rate, n1 > 1, atFold);
    }
}
