package org.ferromap.continuation;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Settings of a fold-curve run: the branch settings (steps, tolerances, the window and step cap
 * of p, state and p scales) plus the window, scale and step cap of the second parameter q.
 *
 * @param continuation engine settings; the window [pMin, pMax] and cap apply to p
 * @param qMin lower end of the q window, units of q; default -infinity
 * @param qMax upper end of the q window, units of q; default +infinity
 * @param qScale scale of q, units of q; NaN (the default) takes the window width when finite,
 *     else |q0|, else 1
 * @param maxQStep largest change of q in one step, units of q; default +infinity
 */
public record FoldCurveSettings(ContinuationSettings continuation, double qMin, double qMax, double qScale, double maxQStep) {

    /** The documented defaults. */
    public static final FoldCurveSettings DEFAULTS = new FoldCurveSettings(ContinuationSettings.DEFAULTS,
            Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NaN, Double.POSITIVE_INFINITY);

    public FoldCurveSettings {
        if (continuation == null) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "continuation settings must be given");
        }
        if (Double.isNaN(qMin) || Double.isNaN(qMax) || !(qMin < qMax)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "q window [" + qMin + ", " + qMax + "] must have qMin < qMax");
        }
        if (!Double.isNaN(qScale) && !(qScale > 0 && Double.isFinite(qScale))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "qScale = " + qScale + " must be finite and > 0 (NaN for automatic)");
        }
        if (!(maxQStep > 0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "maxQStep = " + maxQStep + " must be > 0 (infinity for no cap)");
        }
    }

    /** Copy with new engine settings. */
    public FoldCurveSettings withContinuation(ContinuationSettings settings) {
        return new FoldCurveSettings(settings, qMin, qMax, qScale, maxQStep);
    }

    /** Copy with a new q window, units of q. */
    public FoldCurveSettings withQWindow(double min, double max) {
        return new FoldCurveSettings(continuation, min, max, qScale, maxQStep);
    }

    /** Copy with a new q scale, units of q (NaN for automatic). */
    public FoldCurveSettings withQScale(double scale) {
        return new FoldCurveSettings(continuation, qMin, qMax, scale, maxQStep);
    }

    /** Copy with a new cap on the change of q per step, units of q. */
    public FoldCurveSettings withMaxQStep(double cap) {
        return new FoldCurveSettings(continuation, qMin, qMax, qScale, cap);
    }
}
