package org.ferromap.continuation;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

/**
 * The pseudo-arclength loop shared by branches and fold curves: tangent predictor from the
 * bordered system [G_z; t_prev^T] t = [0; 1] (orientation kept), Newton corrector on G = 0 with
 * t_prev . (z - z_prev) = ds, step size from the iteration count, rejection with a reason and
 * halving, stop rules, and detection and location of special points by sign changes of test
 * functions. Everything here is in scaled variables. One instance per run; not thread-safe.
 */
final class CurveTracer {

    /** Problem-specific parts: extra test function, precise fold location, per-point updates. */
    interface Hooks {
        /** The custom test function (cusp coefficient) at z; NaN when undefined. */
        default double customTest(double[] z) {
            return Double.NaN;
        }

        /**
         * Locates a fold between two accepted points by a dedicated method.
         *
         * @return true with the fold in out, false to fall back to location along the curve
         */
        default boolean locateFold(double[] zA, double[] tA, double[] zB, double[] tB, double[] out) {
            return false;
        }

        /** Called when a point is accepted, after its test functions were evaluated. */
        default void accepted(double[] z) {
        }
    }

    /** What to watch and where to stop, in scaled variables. */
    record Config(
            int fixedIndex,
            int foldIndex,
            boolean branchPoints,
            SpecialPoint.Kind customKind,
            int[] windowIndex,
            double[] windowLow,
            double[] windowHigh,
            double[] windowLowPhysical,
            double[] windowHighPhysical,
            String[] windowName,
            int[] capIndex,
            double[] cap,
            Function<double[], String> describe) {
    }

    /** A special point in scaled variables. */
    record Special(SpecialPoint.Kind kind, int afterIndex, double[] z, boolean located) {
    }

    /** A refused step. */
    record Rejection(int fromIndex, RejectionReason reason, double stepSize) {
    }

    /** The outcome of a run, in scaled variables. */
    static final class Trace {
        final List<double[]> points = new ArrayList<>();
        final List<double[]> tangents = new ArrayList<>();
        final List<Double> arclength = new ArrayList<>();
        final List<Special> specials = new ArrayList<>();
        final List<Rejection> rejections = new ArrayList<>();
        StopReason stop;
        String detail;
    }

    private static final double MAX_EXP = 700;

    private final CurveSystem system;
    private final ContinuationSettings settings;
    private final Config config;
    private final Hooks hooks;
    private final Newton newton;
    private final int size;
    private final int equations;
    private final double[][] matrix;
    private final DenseLu lu;
    private double lastDetSign;
    private double lastLogDet;

    // Work buffers of the location routines.
    private final double[] locZ;
    private final double[] locT;
    private final double[] bestZ;

    CurveTracer(CurveSystem system, ContinuationSettings settings, Config config, Hooks hooks) {
        this.system = system;
        this.settings = settings;
        this.config = config;
        this.hooks = hooks;
        this.newton = new Newton(system);
        this.size = system.unknowns();
        this.equations = system.equations();
        this.matrix = new double[size][size];
        this.lu = new DenseLu(size);
        this.locZ = new double[size];
        this.locT = new double[size];
        this.bestZ = new double[size];
    }

    /**
     * Runs from zStart (corrected first with the fixed coordinate held).
     *
     * @param direction +1 or -1: the sign of the fixed coordinate's tangent component at the start
     */
    Trace run(double[] zStart, int direction) {
        Trace trace = new Trace();
        double[] z = zStart.clone();
        double[] unit = new double[size];
        unit[config.fixedIndex()] = 1;
        int it = newton.solve(z, unit, z[config.fixedIndex()], 2 * settings.maxNewtonIterations(), settings.newtonTolerance());
        if (it < 0) {
            return stop(trace, StopReason.START_FAILED, "the start point could not be corrected onto the curve ("
                    + newton.failure() + ") near " + config.describe().apply(zStart));
        }
        double[] t = new double[size];
        if (!startTangent(z, t, direction)) {
            return stop(trace, StopReason.START_FAILED, "the tangent at the start point is undefined (singular Jacobian) at "
                    + config.describe().apply(z));
        }
        double[] z0 = z.clone();
        double[] t0 = t.clone();
        double s = 0;
        trace.points.add(z.clone());
        trace.tangents.add(t.clone());
        trace.arclength.add(0.0);
        double foldPrev = config.foldIndex() >= 0 ? t[config.foldIndex()] : Double.NaN;
        double detSignPrev = lastDetSign;
        double logDetPrev = lastLogDet;
        double customPrev = config.customKind() != null ? hooks.customTest(z) : Double.NaN;
        hooks.accepted(z);
        double hPrev = 0;

        double ds = settings.initialStep();
        double[] zn = new double[size];
        double[] tn = new double[size];
        RejectionReason lastReason = null;
        while (true) {
            int index = trace.points.size() - 1;
            if (index >= settings.maxSteps()) {
                return stop(trace, StopReason.MAX_STEPS, "reached maxSteps = " + settings.maxSteps() + " at "
                        + config.describe().apply(z));
            }
            if (ds < settings.minStep()) {
                String why = lastReason == RejectionReason.NO_CONVERGENCE ? lastReason + " (" + newton.failure() + ")"
                        : String.valueOf(lastReason);
                return stop(trace, StopReason.MIN_STEP, "step fell below minStep = " + settings.minStep() + " after "
                        + why + " at " + config.describe().apply(z));
            }
            double rhs = 0;
            for (int j = 0; j < size; j++) {
                zn[j] = z[j] + ds * t[j];
                rhs += t[j] * z[j];
            }
            it = newton.solve(zn, t, rhs + ds, settings.maxNewtonIterations(), settings.newtonTolerance());
            RejectionReason reason = null;
            if (it < 0) {
                reason = RejectionReason.NO_CONVERGENCE;
            } else if (!tangent(zn, t, tn)) {
                reason = RejectionReason.SINGULAR_TANGENT;
            } else {
                double cos = dot(t, tn);
                if (Math.acos(Math.min(1.0, cos)) > settings.maxTangentAngle()) {
                    reason = RejectionReason.ANGLE_TOO_LARGE;
                } else {
                    for (int c = 0; c < config.capIndex().length; c++) {
                        int k = config.capIndex()[c];
                        if (Math.abs(zn[k] - z[k]) > config.cap()[c]) {
                            reason = RejectionReason.PARAMETER_STEP_TOO_LARGE;
                            break;
                        }
                    }
                }
            }
            if (reason != null) {
                trace.rejections.add(new Rejection(index, reason, ds));
                lastReason = reason;
                ds *= 0.5;
                continue;
            }
            double detSign = lastDetSign;
            double logDet = lastLogDet;

            // Window: land on the edge and stop.
            int leaving = -1;
            boolean high = false;
            for (int w = 0; w < config.windowIndex().length; w++) {
                int k = config.windowIndex()[w];
                if (zn[k] < config.windowLow()[w] || zn[k] > config.windowHigh()[w]) {
                    leaving = w;
                    high = zn[k] > config.windowHigh()[w];
                    break;
                }
            }
            String windowDetail = null;
            if (leaving >= 0) {
                int k = config.windowIndex()[leaving];
                double edge = high ? config.windowHigh()[leaving] : config.windowLow()[leaving];
                double edgePhysical = high ? config.windowHighPhysical()[leaving] : config.windowLowPhysical()[leaving];
                windowDetail = config.windowName()[leaving] + " left its window at the " + (high ? "upper" : "lower")
                        + " edge " + edgePhysical;
                double lambda = (edge - z[k]) / (zn[k] - z[k]);
                double[] zb = new double[size];
                for (int j = 0; j < size; j++) {
                    zb[j] = z[j] + lambda * (zn[j] - z[j]);
                }
                double[] ub = new double[size];
                ub[k] = 1;
                double[] tb = new double[size];
                boolean resolved = newton.solve(zb, ub, edge, settings.maxNewtonIterations(), settings.newtonTolerance()) >= 0
                        && tangent(zb, t, tb);
                double along = 0;
                for (int j = 0; j < size; j++) {
                    along += t[j] * (zb[j] - z[j]);
                }
                if (!resolved || along < -settings.newtonTolerance() || along > 1.5 * ds) {
                    return stop(trace, StopReason.WINDOW_LEFT, windowDetail + "; the edge point could not be resolved, the last point is "
                            + config.describe().apply(z));
                }
                if (along <= 10 * settings.newtonTolerance()) {
                    // The previous point already sits on the edge.
                    return stop(trace, StopReason.WINDOW_LEFT, windowDetail + " at " + config.describe().apply(z));
                }
                System.arraycopy(zb, 0, zn, 0, size);
                System.arraycopy(tb, 0, tn, 0, size);
                detSign = lastDetSign;
                logDet = lastLogDet;
            }

            // Closure: the branch comes back through the start point's normal plane, in the start direction.
            boolean closed = false;
            if (leaving < 0 && index >= 2) {
                double hNew = 0;
                for (int j = 0; j < size; j++) {
                    hNew += t0[j] * (zn[j] - z0[j]);
                }
                if (hPrev < 0 && hNew >= 0 && dot(tn, t0) > 0) {
                    double lambda = -hPrev / (hNew - hPrev);
                    double[] zc = new double[size];
                    double r0 = 0;
                    for (int j = 0; j < size; j++) {
                        zc[j] = z[j] + lambda * (zn[j] - z[j]);
                        r0 += t0[j] * z0[j];
                    }
                    if (newton.solve(zc, t0, r0, settings.maxNewtonIterations(), settings.newtonTolerance()) >= 0
                            && maxDistance(zc, z0) <= settings.closedTolerance()) {
                        closed = true;
                        System.arraycopy(z0, 0, zn, 0, size);
                        System.arraycopy(t0, 0, tn, 0, size);
                        tangent(zn, t, tn);
                        detSign = lastDetSign;
                        logDet = lastLogDet;
                    }
                }
                hPrev = hNew;
            } else if (leaving < 0) {
                hPrev = 0;
                for (int j = 0; j < size; j++) {
                    hPrev += t0[j] * (zn[j] - z0[j]);
                }
            }

            // Special points between z and zn.
            if (config.foldIndex() >= 0) {
                double fold = tn[config.foldIndex()];
                if (fold * foldPrev < 0) {
                    locateFold(trace, index, z, t, foldPrev, zn, tn, fold);
                }
                if (fold != 0) {
                    foldPrev = fold;
                }
            }
            if (config.branchPoints()) {
                if (detSign != detSignPrev) {
                    locateAlong(trace, SpecialPoint.Kind.BRANCH_POINT, index, z, t, detSignPrev, logDetPrev, zn,
                            detSign * Math.exp(Math.max(-MAX_EXP, Math.min(MAX_EXP, logDet - logDetPrev))));
                }
                detSignPrev = detSign;
                logDetPrev = logDet;
            }
            if (config.customKind() != null) {
                double custom = hooks.customTest(zn);
                if (custom * customPrev < 0) {
                    locateAlong(trace, config.customKind(), index, z, t, customPrev, 0, zn, custom);
                }
                if (custom != 0 && !Double.isNaN(custom)) {
                    customPrev = custom;
                }
            }

            s += Math.sqrt(distanceSquared(z, zn));
            System.arraycopy(zn, 0, z, 0, size);
            System.arraycopy(tn, 0, t, 0, size);
            trace.points.add(z.clone());
            trace.tangents.add(t.clone());
            trace.arclength.add(s);
            hooks.accepted(z);
            if (leaving >= 0) {
                return stop(trace, StopReason.WINDOW_LEFT, windowDetail + " at " + config.describe().apply(z));
            }
            if (closed) {
                return stop(trace, StopReason.BRANCH_CLOSED, "the curve came back to its start point "
                        + config.describe().apply(z) + " after " + (trace.points.size() - 1) + " steps");
            }
            double factor = (double) settings.targetNewtonIterations() / Math.max(it, 1);
            ds = Math.min(settings.maxStep(), ds * Math.max(0.5, Math.min(2.0, factor)));
        }
    }

    private Trace stop(Trace trace, StopReason reason, String detail) {
        trace.stop = reason;
        trace.detail = detail;
        return trace;
    }

    /**
     * Unit tangent at z oriented so that prev . t > 0; also leaves the sign and log-magnitude of
     * det [G_z; t^T] in lastDetSign and lastLogDet (the branch-point test function).
     */
    private boolean tangent(double[] z, double[] prev, double[] out) {
        system.jacobian(z, matrix);
        System.arraycopy(prev, 0, matrix[equations], 0, size);
        if (!lu.factor(matrix)) {
            return false;
        }
        java.util.Arrays.fill(out, 0.0);
        out[size - 1] = 1;
        lu.solve(out);
        double norm = Math.sqrt(dot(out, out));
        if (!(norm > 0) || !Double.isFinite(norm)) {
            return false;
        }
        for (int j = 0; j < size; j++) {
            out[j] /= norm;
        }
        // det [J; t^T] = det [J; prev^T] * |u| when [J; prev^T] u = e_N (rank-one update).
        lastDetSign = lu.determinantSign();
        lastLogDet = lu.logAbsDeterminant() + Math.log(norm);
        return true;
    }

    /** Tangent at the start: bordered with the fixed coordinate, else with any unit vector that works. */
    private boolean startTangent(double[] z, double[] t, int direction) {
        double[] border = new double[size];
        boolean ok = false;
        for (int attempt = -1; attempt < size && !ok; attempt++) {
            int k = attempt < 0 ? config.fixedIndex() : attempt;
            if (attempt == config.fixedIndex()) {
                continue;
            }
            java.util.Arrays.fill(border, 0.0);
            border[k] = 1;
            ok = tangent(z, border, t);
        }
        if (!ok) {
            return false;
        }
        int orient = config.fixedIndex();
        if (Math.abs(t[orient]) < 1e-12) {
            // Starting on a fold of the fixed coordinate: orient by the largest component instead.
            for (int j = 0; j < size; j++) {
                if (Math.abs(t[j]) > Math.abs(t[orient])) {
                    orient = j;
                }
            }
        }
        if (t[orient] * direction < 0) {
            for (int j = 0; j < size; j++) {
                t[j] = -t[j];
            }
            // Reversing the tangent negates one row of [J; t^T], so its determinant changes sign.
            lastDetSign = -lastDetSign;
        }
        return true;
    }

    private void locateFold(Trace trace, int index, double[] zA, double[] tA, double fA, double[] zB, double[] tB, double fB) {
        double[] out = new double[size];
        if (hooks.locateFold(zA, tA, zB, tB, out)) {
            double span = 0;
            double along = 0;
            for (int j = 0; j < size; j++) {
                span += tA[j] * (zB[j] - zA[j]);
                along += tA[j] * (out[j] - zA[j]);
            }
            if (along >= -0.05 * span && along <= 1.05 * span) {
                trace.specials.add(new Special(SpecialPoint.Kind.FOLD, index, out, true));
                return;
            }
        }
        locateAlong(trace, SpecialPoint.Kind.FOLD, index, zA, tA, fA, 0, zB, fB);
    }

    /**
     * Locates a zero of a test function between two accepted points by the Illinois variant of
     * regula falsi in the pseudo-arclength s along tA, each trial point corrected onto the curve.
     */
    private void locateAlong(Trace trace, SpecialPoint.Kind kind, int index, double[] zA, double[] tA, double fA,
            double logRef, double[] zB, double fB) {
        double span = 0;
        double base = 0;
        for (int j = 0; j < size; j++) {
            span += tA[j] * (zB[j] - zA[j]);
            base += tA[j] * zA[j];
        }
        double lo = 0;
        double hi = span;
        double fLo = fA;
        double fHi = fB;
        int side = 0;
        boolean located = false;
        double tol = settings.locateTolerance();
        double sPrev = Double.NaN;
        // Best estimate so far: linear interpolation between the end points.
        double alpha = fA / (fA - fB);
        for (int j = 0; j < size; j++) {
            bestZ[j] = zA[j] + alpha * (zB[j] - zA[j]);
        }
        for (int iter = 0; iter < 200 && !located; iter++) {
            double sTry = (lo * fHi - hi * fLo) / (fHi - fLo);
            if (!(sTry > lo && sTry < hi)) {
                sTry = 0.5 * (lo + hi);
            }
            double f = testAt(kind, zA, tA, base, sTry, logRef);
            if (Double.isNaN(f)) {
                // A branch point makes the bordered matrix singular on the spot: step aside by
                // half the tolerance and carry on from there.
                double[] aside = {sTry + 0.25 * tol, sTry - 0.25 * tol};
                for (double s2 : aside) {
                    if (s2 > lo && s2 < hi) {
                        f = testAt(kind, zA, tA, base, s2, logRef);
                        if (!Double.isNaN(f)) {
                            sTry = s2;
                            break;
                        }
                    }
                }
                if (Double.isNaN(f)) {
                    // Both sides singular too: the zero is pinned between the last good points
                    // when they are that close.
                    located = hi - lo <= 2 * tol;
                    break;
                }
            }
            System.arraycopy(locZ, 0, bestZ, 0, size);
            if (f == 0 || hi - lo <= tol || Math.abs(sTry - sPrev) <= tol) {
                located = true;
                break;
            }
            if (f * fHi > 0) {
                hi = sTry;
                fHi = f;
                if (side == 1) {
                    fLo *= 0.5;
                }
                side = 1;
            } else {
                lo = sTry;
                fLo = f;
                if (side == -1) {
                    fHi *= 0.5;
                }
                side = -1;
            }
            if (hi - lo <= tol) {
                located = true;
            }
            sPrev = sTry;
        }
        trace.specials.add(new Special(kind, index, bestZ.clone(), located));
    }

    /** The test function at pseudo-arclength s from zA along tA (point left in locZ), NaN on failure. */
    private double testAt(SpecialPoint.Kind kind, double[] zA, double[] tA, double base, double s, double logRef) {
        for (int j = 0; j < size; j++) {
            locZ[j] = zA[j] + s * tA[j];
        }
        if (newton.solve(locZ, tA, base + s, 2 * settings.maxNewtonIterations(), settings.locateTolerance()) < 0
                || !tangent(locZ, tA, locT)) {
            return Double.NaN;
        }
        if (kind == SpecialPoint.Kind.FOLD) {
            return locT[config.foldIndex()];
        } else if (kind == SpecialPoint.Kind.BRANCH_POINT) {
            return lastDetSign * Math.exp(Math.max(-MAX_EXP, Math.min(MAX_EXP, lastLogDet - logRef)));
        }
        return hooks.customTest(locZ);
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int j = 0; j < a.length; j++) {
            s += a[j] * b[j];
        }
        return s;
    }

    private static double distanceSquared(double[] a, double[] b) {
        double s = 0;
        for (int j = 0; j < a.length; j++) {
            double d = a[j] - b[j];
            s += d * d;
        }
        return s;
    }

    private static double maxDistance(double[] a, double[] b) {
        double m = 0;
        for (int j = 0; j < a.length; j++) {
            m = Math.max(m, Math.abs(a[j] - b[j]));
        }
        return m;
    }
}
