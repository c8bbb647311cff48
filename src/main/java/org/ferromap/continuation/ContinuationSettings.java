package org.ferromap.continuation;

import java.util.Arrays;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Settings of the pseudo-arclength engine. Steps, tolerances and the closure test are measured in
 * the engine's scaled variables (each state divided by its scale, p by its scale), so they are
 * dimensionless; the parameter window and the parameter step cap are in the units of p.
 *
 * @param initialStep first step, scaled arclength; default 0.01
 * @param minStep smallest step before the run stops, scaled arclength; default 1e-8
 * @param maxStep largest step, scaled arclength; default 0.5
 * @param maxParameterStep largest change of p in one step, units of p; default +infinity (no cap)
 * @param newtonTolerance corrector convergence: largest Newton update, scaled; default 1e-9
 * @param maxNewtonIterations corrector iterations before a step is rejected; default 10
 * @param targetNewtonIterations iteration count the step size is adapted towards: fewer grow the
 *     step, more shrink it; default 4
 * @param maxTangentAngle largest angle between successive unit tangents, radians; a step that
 *     turns more is rejected (it may have jumped to another branch); default 0.3
 * @param pMin lower end of the parameter window, units of p; default -infinity
 * @param pMax upper end of the parameter window, units of p; default +infinity
 * @param maxSteps accepted steps before the run stops; default 1000
 * @param closedTolerance distance from the start point, scaled, under which a branch that comes
 *     back through the start point's normal plane counts as closed; default 1e-6
 * @param locateTolerance convergence of special-point location, scaled; default 1e-10
 * @param xScale per-state scale, units of each state, all positive; null (the default) takes the
 *     largest |x_j| of the start point for every state (1 if the start point is zero): states of
 *     one vector usually share units, and one of them may start at zero
 * @param pScale scale of p, units of p, positive; NaN (the default) takes the window width when
 *     the window is finite, else |p0|, else 1
 */
public record ContinuationSettings(
        double initialStep,
        double minStep,
        double maxStep,
        double maxParameterStep,
        double newtonTolerance,
        int maxNewtonIterations,
        int targetNewtonIterations,
        double maxTangentAngle,
        double pMin,
        double pMax,
        int maxSteps,
        double closedTolerance,
        double locateTolerance,
        double[] xScale,
        double pScale) {

    /** The documented defaults. */
    public static final ContinuationSettings DEFAULTS = new ContinuationSettings(0.01, 1e-8, 0.5,
            Double.POSITIVE_INFINITY, 1e-9, 10, 4, 0.3, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, 1000,
            1e-6, 1e-10, null, Double.NaN);

    public ContinuationSettings {
        positive("initialStep", initialStep);
        positive("minStep", minStep);
        positive("maxStep", maxStep);
        if (!(minStep <= initialStep && initialStep <= maxStep)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "steps must satisfy minStep <= initialStep <= maxStep, got "
                    + minStep + ", " + initialStep + ", " + maxStep);
        }
        if (!(maxParameterStep > 0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "maxParameterStep = " + maxParameterStep + " must be > 0 (infinity for no cap)");
        }
        positive("newtonTolerance", newtonTolerance);
        if (maxNewtonIterations < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "maxNewtonIterations = " + maxNewtonIterations + " must be >= 1");
        }
        if (targetNewtonIterations < 1 || targetNewtonIterations > maxNewtonIterations) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "targetNewtonIterations = " + targetNewtonIterations
                    + " must lie in [1, maxNewtonIterations = " + maxNewtonIterations + "]");
        }
        if (!(maxTangentAngle > 0 && maxTangentAngle <= Math.PI / 2)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "maxTangentAngle = " + maxTangentAngle + " rad must lie in (0, pi/2]");
        }
        if (Double.isNaN(pMin) || Double.isNaN(pMax) || !(pMin < pMax)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "parameter window [" + pMin + ", " + pMax + "] must have pMin < pMax");
        }
        if (maxSteps < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "maxSteps = " + maxSteps + " must be >= 1");
        }
        positive("closedTolerance", closedTolerance);
        positive("locateTolerance", locateTolerance);
        if (xScale != null) {
            xScale = xScale.clone();
            for (int j = 0; j < xScale.length; j++) {
                if (!(xScale[j] > 0) || Double.isInfinite(xScale[j])) {
                    throw new FerromapException(MessageKey.OUT_OF_RANGE, "xScale[" + j + "] = " + xScale[j] + " must be finite and > 0");
                }
            }
        }
        if (!Double.isNaN(pScale) && !(pScale > 0 && Double.isFinite(pScale))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "pScale = " + pScale + " must be finite and > 0 (NaN for automatic)");
        }
    }

    private static void positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, name + " = " + value + " must be finite and > 0");
        }
    }

    /** The per-state scale (a copy), or null for automatic. */
    @Override
    public double[] xScale() {
        return xScale == null ? null : xScale.clone();
    }

    /** Copy with new step limits (scaled arclength). */
    public ContinuationSettings withSteps(double initial, double min, double max) {
        return new ContinuationSettings(initial, min, max, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, pMin, pMax, maxSteps, closedTolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with a new cap on the parameter change per step, units of p. */
    public ContinuationSettings withMaxParameterStep(double cap) {
        return new ContinuationSettings(initialStep, minStep, maxStep, cap, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, pMin, pMax, maxSteps, closedTolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with new corrector settings. */
    public ContinuationSettings withNewton(double tolerance, int maxIterations, int targetIterations) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, tolerance, maxIterations,
                targetIterations, maxTangentAngle, pMin, pMax, maxSteps, closedTolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with a new angle guard, radians. */
    public ContinuationSettings withMaxTangentAngle(double angle) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, angle, pMin, pMax, maxSteps, closedTolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with a new parameter window, units of p. */
    public ContinuationSettings withWindow(double min, double max) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, min, max, maxSteps, closedTolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with a new limit on accepted steps. */
    public ContinuationSettings withMaxSteps(int steps) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, pMin, pMax, steps, closedTolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with a new closure tolerance, scaled. */
    public ContinuationSettings withClosedTolerance(double tolerance) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, pMin, pMax, maxSteps, tolerance, locateTolerance, xScale, pScale);
    }

    /** Copy with a new location tolerance, scaled. */
    public ContinuationSettings withLocateTolerance(double tolerance) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, pMin, pMax, maxSteps, closedTolerance, tolerance, xScale, pScale);
    }

    /** Copy with explicit scales: per state (units of each state, null for automatic) and of p (NaN for automatic). */
    public ContinuationSettings withScales(double[] states, double parameter) {
        return new ContinuationSettings(initialStep, minStep, maxStep, maxParameterStep, newtonTolerance, maxNewtonIterations,
                targetNewtonIterations, maxTangentAngle, pMin, pMax, maxSteps, closedTolerance, locateTolerance, states, parameter);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ContinuationSettings s
                && initialStep == s.initialStep && minStep == s.minStep && maxStep == s.maxStep
                && Double.compare(maxParameterStep, s.maxParameterStep) == 0 && newtonTolerance == s.newtonTolerance
                && maxNewtonIterations == s.maxNewtonIterations && targetNewtonIterations == s.targetNewtonIterations
                && maxTangentAngle == s.maxTangentAngle && Double.compare(pMin, s.pMin) == 0 && Double.compare(pMax, s.pMax) == 0
                && maxSteps == s.maxSteps && closedTolerance == s.closedTolerance && locateTolerance == s.locateTolerance
                && Arrays.equals(xScale, s.xScale) && Double.compare(pScale, s.pScale) == 0;
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(xScale) + Double.hashCode(initialStep) + 7 * Double.hashCode(pMin) + 13 * Double.hashCode(pMax)
                + 17 * maxSteps + 19 * Double.hashCode(pScale);
    }

    @Override
    public String toString() {
        return "ContinuationSettings[initialStep=" + initialStep + ", minStep=" + minStep + ", maxStep=" + maxStep
                + ", maxParameterStep=" + maxParameterStep + ", newtonTolerance=" + newtonTolerance
                + ", maxNewtonIterations=" + maxNewtonIterations + ", targetNewtonIterations=" + targetNewtonIterations
                + ", maxTangentAngle=" + maxTangentAngle + ", pMin=" + pMin + ", pMax=" + pMax + ", maxSteps=" + maxSteps
                + ", closedTolerance=" + closedTolerance + ", locateTolerance=" + locateTolerance
                + ", xScale=" + Arrays.toString(xScale) + ", pScale=" + pScale + "]";
    }
}
