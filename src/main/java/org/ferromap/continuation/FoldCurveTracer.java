package org.ferromap.continuation;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Follows a fold of F(x, p, q) = 0 in two parameters: pseudo-arclength continuation of the
 * minimally augmented system F = 0, g = 0 in (x, p, q), both ways from a located fold. Cusps are
 * detected by a sign change of the quadratic normal-form coefficient w^T F_xx(v, v) (v, w the
 * right and left null vectors, kept continuously oriented by updating the borders after every
 * point), located along the curve, recorded, and passed: the fold curve is smooth in (x, p, q)
 * and only its (p, q) projection turns back there. Immutable; each call builds its own work space.
 */
public final class FoldCurveTracer {

    private final FoldCurveSettings settings;

    public FoldCurveTracer(FoldCurveSettings settings) {
        if (settings == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "fold-curve settings must be given");
        }
        this.settings = settings;
    }

    public FoldCurveSettings settings() {
        return settings;
    }

    /**
     * Traces the fold curve through a fold (x0, p0) at q0 (for instance a fold point of a
     * {@link Branch} of {@code problem.atFixedQ(q0)}). The start is first corrected onto the fold
     * with q held at q0.
     *
     * @param problem the two-parameter system
     * @param x0 approximate state at the fold, units of the problem
     * @param p0 approximate first parameter at the fold, units of p
     * @param q0 second parameter at the start, units of q, inside its window
     * @throws FerromapException with BAD_REQUEST or OUT_OF_RANGE for start values of the wrong
     *     size, not finite, or outside the windows
     */
    public FoldCurve trace(TwoParameterProblem problem, double[] x0, double p0, double q0) {
        if (problem == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "problem must be given");
        }
        ContinuationSettings base = settings.continuation();
        int n = problem.dimension();
        if (n < 1) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "problem dimension = " + n + " must be >= 1");
        }
        Scales.checkStart("x0", x0, n);
        Scales.checkParameter("p0", p0, base.pMin(), base.pMax());
        Scales.checkParameter("q0", q0, settings.qMin(), settings.qMax());
        double[] xScale = Scales.states(base.xScale(), x0);
        double pScale = Scales.parameter(base.pScale(), base.pMin(), base.pMax(), p0);
        double qScale = Scales.parameter(settings.qScale(), settings.qMin(), settings.qMax(), q0);
        ScaledProblem scaled = new ScaledProblem(RawSystem.of(problem), 2, xScale, pScale, qScale, Double.NaN);
        double[] z0 = new double[n + 2];
        for (int j = 0; j < n; j++) {
            z0[j] = x0[j] / xScale[j];
        }
        z0[n] = p0 / pScale;
        z0[n + 1] = q0 / qScale;
        scaled.scaleRows(z0, new double[n][n + 2]);

        CurveTracer.Config config = new CurveTracer.Config(n + 1, -1, false, SpecialPoint.Kind.CUSP,
                new int[] {n, n + 1},
                new double[] {base.pMin() / pScale, settings.qMin() / qScale},
                new double[] {base.pMax() / pScale, settings.qMax() / qScale},
                new double[] {base.pMin(), settings.qMin()},
                new double[] {base.pMax(), settings.qMax()},
                new String[] {"p", "q"},
                new int[] {n, n + 1},
                new double[] {base.maxParameterStep() / pScale, settings.maxQStep() / qScale},
                z -> Scales.describe(scaled, z));

        CurveTracer.Trace up = run(scaled, config, z0, 1);
        CurveTracer.Trace down;
        if (up.stop == StopReason.START_FAILED || up.stop == StopReason.BRANCH_CLOSED) {
            down = new CurveTracer.Trace();
            down.points.addAll(up.points.isEmpty() ? List.of() : List.of(up.points.get(0)));
            down.arclength.addAll(up.points.isEmpty() ? List.of() : List.of(0.0));
            down.stop = up.stop;
            down.detail = up.stop == StopReason.BRANCH_CLOSED ? "not run: the curve closed in increasing q" : up.detail;
        } else {
            down = run(scaled, config, z0, -1);
        }

        // Join: the decreasing run reversed, then the increasing run without its start point.
        int downCount = down.points.size();
        int upCount = up.points.size();
        int startIndex = Math.max(downCount - 1, 0);
        int count = upCount == 0 ? 0 : startIndex + upCount;
        double[][] x = new double[count][n];
        double[] p = new double[count];
        double[] q = new double[count];
        double[] s = new double[count];
        for (int k = 0; k < count; k++) {
            double[] z;
            double arc;
            if (k < startIndex) {
                z = down.points.get(startIndex - k);
                arc = -down.arclength.get(startIndex - k);
            } else {
                z = up.points.get(k - startIndex);
                arc = up.arclength.get(k - startIndex);
            }
            scaled.state(z, x[k]);
            p[k] = scaled.p(z);
            q[k] = scaled.q(z);
            s[k] = arc;
        }
        List<SpecialPoint> cusps = new ArrayList<>();
        List<CurveTracer.Special> downSpecials = new ArrayList<>(down.specials);
        java.util.Collections.reverse(downSpecials);
        for (CurveTracer.Special sp : downSpecials) {
            cusps.add(physical(scaled, sp, startIndex - sp.afterIndex() - 1));
        }
        for (CurveTracer.Special sp : up.specials) {
            cusps.add(physical(scaled, sp, startIndex + sp.afterIndex()));
        }
        List<RejectedStep> rejected = new ArrayList<>();
        for (CurveTracer.Rejection r : down.rejections) {
            int k = startIndex - r.fromIndex();
            rejected.add(new RejectedStep(k, r.reason(), r.stepSize(), p[k]));
        }
        for (CurveTracer.Rejection r : up.rejections) {
            int k = startIndex + r.fromIndex();
            rejected.add(new RejectedStep(k, r.reason(), r.stepSize(), p[k]));
        }
        return new FoldCurve(x, p, q, s, startIndex, cusps, rejected, up.stop, up.detail, down.stop, down.detail);
    }

    private CurveTracer.Trace run(ScaledProblem scaled, CurveTracer.Config config, double[] z0, int direction) {
        FoldSystem fold = new FoldSystem(scaled);
        if (!fold.initBorders(z0, null)) {
            CurveTracer.Trace failed = new CurveTracer.Trace();
            failed.stop = StopReason.START_FAILED;
            failed.detail = "no bordering vectors make the fold system regular at the start "
                    + Scales.describe(scaled, z0) + ": is F_x singular in more than one direction?";
            return failed;
        }
        CurveTracer.Hooks hooks = new CurveTracer.Hooks() {
            @Override
            public double customTest(double[] z) {
                return fold.cuspCoefficient(z);
            }

            @Override
            public void accepted(double[] z) {
                fold.updateBorders(z);
            }
        };
        return new CurveTracer(fold, settings.continuation(), config, hooks).run(z0, direction);
    }

    private static SpecialPoint physical(ScaledProblem scaled, CurveTracer.Special sp, int afterIndex) {
        double[] xs = new double[scaled.n];
        scaled.state(sp.z(), xs);
        return new SpecialPoint(sp.kind(), afterIndex, xs, scaled.p(sp.z()), scaled.q(sp.z()), sp.located());
    }
}
