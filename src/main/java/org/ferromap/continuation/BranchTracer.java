package org.ferromap.continuation;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Follows a branch of F(x, p) = 0 by pseudo-arclength continuation and reports its folds (sign
 * change of the tangent's p-component, located on the minimally augmented system) and simple
 * branch points (sign change of det [F_x F_p; t^T], located along the branch), with the
 * stability of every point from a pluggable criterion. Immutable and stateless between runs:
 * each call to {@link #trace} builds its own work space, so one tracer may serve several threads
 * (as long as the problems it is given are themselves safe to share).
 */
public final class BranchTracer {

    private final ContinuationSettings settings;
    private final StabilityCriterion stability;

    /** A tracer with the steady-state stability criterion (eigenvalues of F_x, for x' = F). */
    public BranchTracer(ContinuationSettings settings) {
        this(settings, StabilityCriterion.steadyState());
    }

    /**
     * @param settings engine settings
     * @param stability criterion applied to every accepted point ({@link StabilityCriterion#none()} to skip)
     */
    public BranchTracer(ContinuationSettings settings, StabilityCriterion stability) {
        if (settings == null || stability == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "settings and stability criterion must be given");
        }
        this.settings = settings;
        this.stability = stability;
    }

    public ContinuationSettings settings() {
        return settings;
    }

    /**
     * Traces the branch through (x0, p0). The start point is first corrected with p held at p0,
     * so x0 need only be close. Ordinary ends (window left, step limit, step underflow, closed
     * branch, a start that does not converge) are reported in the result, not thrown.
     *
     * @param problem the system
     * @param x0 approximate state at the start, units of the problem
     * @param p0 parameter at the start, units of p, inside the window
     * @param direction whether p increases or decreases as the run leaves the start
     * @throws FerromapException with BAD_REQUEST or OUT_OF_RANGE for start values of the wrong
     *     size, not finite, or outside the window
     */
    public Branch trace(ContinuationProblem problem, double[] x0, double p0, Direction direction) {
        if (problem == null || direction == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "problem and direction must be given");
        }
        int n = problem.dimension();
        if (n < 1) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "problem dimension = " + n + " must be >= 1");
        }
        Scales.checkStart("x0", x0, n);
        Scales.checkParameter("p0", p0, settings.pMin(), settings.pMax());
        double[] xScale = Scales.states(settings.xScale(), x0);
        double pScale = Scales.parameter(settings.pScale(), settings.pMin(), settings.pMax(), p0);
        ScaledProblem scaled = new ScaledProblem(RawSystem.of(problem), 1, xScale, pScale, 1.0, Double.NaN);
        double[] z0 = new double[n + 1];
        for (int j = 0; j < n; j++) {
            z0[j] = x0[j] / xScale[j];
        }
        z0[n] = p0 / pScale;
        double[][] work = new double[n][n + 1];
        scaled.scaleRows(z0, work);

        FoldSystem fold = new FoldSystem(scaled);
        Newton foldNewton = new Newton(fold);
        CurveTracer.Hooks hooks = new CurveTracer.Hooks() {
            @Override
            public boolean locateFold(double[] zA, double[] tA, double[] zB, double[] tB, double[] out) {
                double alpha = tA[n] / (tA[n] - tB[n]);
                double[] guess = new double[n];
                for (int j = 0; j <= n; j++) {
                    out[j] = zA[j] + alpha * (zB[j] - zA[j]);
                    if (j < n) {
                        guess[j] = tA[j] + alpha * (tB[j] - tA[j]);
                    }
                }
                return fold.initBorders(out, guess)
                        && foldNewton.solve(out, null, 0, 4 * settings.maxNewtonIterations(), settings.locateTolerance()) >= 0;
            }
        };
        CurveTracer.Config config = new CurveTracer.Config(n, n, true, null,
                new int[] {n}, new double[] {settings.pMin() / pScale}, new double[] {settings.pMax() / pScale},
                new double[] {settings.pMin()}, new double[] {settings.pMax()}, new String[] {"p"},
                new int[] {n}, new double[] {settings.maxParameterStep() / pScale},
                z -> Scales.describe(scaled, z));
        CurveTracer.Trace trace = new CurveTracer(scaled, settings, config, hooks).run(z0, direction.sign());

        int count = trace.points.size();
        double[][] x = new double[count][n];
        double[] p = new double[count];
        double[] s = new double[count];
        double[] tp = new double[count];
        int[] unstable = new int[count];
        double[][] physical = new double[n][n];
        for (int k = 0; k < count; k++) {
            double[] z = trace.points.get(k);
            scaled.state(z, x[k]);
            p[k] = scaled.p(z);
            s[k] = trace.arclength.get(k);
            tp[k] = trace.tangents.get(k)[n];
            if (stability == NoStability.INSTANCE) {
                unstable[k] = -1;
            } else {
                scaled.physicalStateJacobian(z, work, physical);
                unstable[k] = stability.unstableCount(x[k].clone(), p[k], physical);
            }
        }
        List<SpecialPoint> specials = new ArrayList<>();
        for (CurveTracer.Special sp : trace.specials) {
            double[] xs = new double[n];
            scaled.state(sp.z(), xs);
            specials.add(new SpecialPoint(sp.kind(), sp.afterIndex(), xs, scaled.p(sp.z()), Double.NaN, sp.located()));
        }
        List<RejectedStep> rejected = new ArrayList<>();
        for (CurveTracer.Rejection r : trace.rejections) {
            rejected.add(new RejectedStep(r.fromIndex(), r.reason(), r.stepSize(), p[r.fromIndex()]));
        }
        return new Branch(x, p, s, tp, unstable, specials, rejected, trace.stop, trace.detail, xScale, pScale);
    }
}
