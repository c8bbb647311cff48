package org.ferromap.maps;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;
import org.ferromap.units.Form;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;

/**
 * How to size a damping load ({@code analyses: damping:}, docs/STUDY-FORMAT.md). Immutable;
 * change with the {@code withX} copies.
 *
 * @param length         cable length, m; NaN for the study's own (equipment studies only)
 * @param voltage        supply line-to-line voltage, V rms (equipment studies) or source peak, V
 *                       (circuit studies); NaN for the study's own
 * @param ensemble       switching events that must all settle in the normal state; default 8 angles x
 *                       residual flux 0 and +-0.8 pu, at most 600 periods each ({@code max-periods} in studies)
 * @param stepFactor     factor on the total conductance from one confirmation step to the next, &gt; 1;
 *                       default 1.25
 * @param maxSteps       confirmation steps after the cusp value, at least 1; default 6
 * @param undamped       whether the ensemble is also run without the added load (the "before"); default true
 * @param arrester       the arrester on the open phase whose duty is assessed; null for none
 * @param eventDuration  duration of the ferroresonance event for the arrester energy, s; default
 *                       10 s (an illustrative figure, no source: set it to the expected time before
 *                       the open phase is restored)
 */
public record DampingSettings(double length, double voltage, SwitchingEnsemble ensemble, double stepFactor, int maxSteps,
                              boolean undamped, ArresterModel arrester, double eventDuration) {

    /** Default conductance step factor. */
    public static final double DEFAULT_STEP = 1.25;
    /** Default number of steps after the cusp value. */
    public static final int DEFAULT_MAX_STEPS = 6;
    /** Default event duration, s (illustrative, no source). */
    public static final double DEFAULT_EVENT_DURATION = 10.0;

    public DampingSettings {
        if (!Double.isNaN(length) && !(length > 0 && Double.isFinite(length))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "length = " + length + " m is not allowed; expected > 0");
        }
        if (!Double.isNaN(voltage) && !(voltage > 0 && Double.isFinite(voltage))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "voltage = " + voltage + " V is not allowed; expected > 0");
        }
        if (ensemble == null) {
            ensemble = SwitchingEnsemble.defaults();
        }
        if (!(stepFactor > 1 && stepFactor <= 10)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "conductance step = " + stepFactor
                    + " is not allowed; expected a factor above 1 and at most 10 (1.25 adds 25 % per step)");
        }
        if (maxSteps < 1 || maxSteps > 50) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "max steps = " + maxSteps + " is not allowed; expected 1 to 50");
        }
        if (!(eventDuration > 0) || Double.isInfinite(eventDuration)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "event duration = " + eventDuration + " s; expected > 0");
        }
    }

    /** The documented defaults at the study's own length and voltage, no arrester. */
    public static DampingSettings defaults() {
        return new DampingSettings(Double.NaN, Double.NaN, SwitchingEnsemble.defaults(), DEFAULT_STEP, DEFAULT_MAX_STEPS, true,
                null, DEFAULT_EVENT_DURATION);
    }

    /** The study's {@code analyses: damping:} block over the defaults; problems reported with their paths (exit 2). */
    public static DampingSettings from(Study study) {
        DampingSettings d = defaults();
        AnalysisBlock b = AnalysisBlock.of(study, "damping");
        b.allowOnly("length", "voltage", "angles", "residual-flux", "step", "max-steps", "undamped", "arrester",
                "event-duration", "max-periods");
        int maxPeriods = b.integer("max-periods", d.ensemble.simulation().maxPeriods(), 30, 1_000_000);
        double length = b.quantity("length", Dimension.LENGTH, Double.NaN);
        if (b.has("length") && !study.isEquipmentForm()) {
            b.problem("length", b.raw("length"), "needs an equipment-form study (a circuit study has no cable length)",
                    MessageKey.BAD_REQUEST);
        }
        double voltage = Double.NaN;
        if (b.has("voltage")) {
            try {
                voltage = voltage(String.valueOf(b.raw("voltage")), study.isEquipmentForm());
            } catch (FerromapException e) {
                b.problem("voltage", b.raw("voltage"), e.getMessage(), e.key());
            }
        }
        int angles = b.integer("angles", d.ensemble.angles(), 1, 720);
        double[] flux = b.numbers("residual-flux", d.ensemble.residualFluxes());
        for (double r : flux) {
            if (!(r >= 0 && r < 2)) {
                b.problem("residual-flux", r, "is not allowed; expected magnitudes from 0 to below 2 pu", MessageKey.OUT_OF_RANGE);
            }
        }
        double step = b.number("step", d.stepFactor);
        if (!(step > 1 && step <= 10)) {
            b.problem("step", step, "is not allowed; expected a factor above 1 and at most 10", MessageKey.OUT_OF_RANGE);
        }
        int maxSteps = b.integer("max-steps", d.maxSteps, 1, 50);
        boolean undamped = b.flag("undamped", d.undamped);
        double duration = b.quantity("event-duration", Dimension.TIME, d.eventDuration);
        if (!(duration > 0)) {
            b.problem("event-duration", b.raw("event-duration"), "must be above 0 s", MessageKey.OUT_OF_RANGE);
        }
        ArresterModel arrester = null;
        if (b.has("arrester")) {
            AnalysisBlock a = b.block("arrester");
            a.allowOnly("rated-voltage", "reference-voltage", "reference-current", "alpha", "energy-rating");
            double ur = a.rmsVoltage("rated-voltage", Double.NaN);
            if (!a.has("rated-voltage")) {
                a.problem("rated-voltage", null, "is missing; give the arrester's rated voltage, e.g. 30 kV", MessageKey.MISSING_KEY);
            }
            double vref = Double.NaN;
            if (a.has("reference-voltage")) {
                try {
                    Quantity q = Quantities.parse(String.valueOf(a.raw("reference-voltage")), Dimension.VOLTAGE);
                    if (q.form() != Form.PEAK) {
                        a.problem("reference-voltage", a.raw("reference-voltage"), "must say peak (e.g. 42 kV peak)",
                                MessageKey.BAD_QUANTITY);
                    }
                    vref = q.value();
                } catch (FerromapException e) {
                    a.problem("reference-voltage", a.raw("reference-voltage"), e.getMessage(), e.key());
                }
            }
            double iref = a.quantity("reference-current", Dimension.CURRENT, ArresterModel.DEFAULT_REFERENCE_CURRENT);
            double alpha = a.number("alpha", ArresterModel.DEFAULT_ALPHA);
            double rating = Double.NaN;
            if (a.has("energy-rating")) {
                try {
                    rating = ArresterModel.parseEnergyRating(String.valueOf(a.raw("energy-rating")));
                } catch (FerromapException e) {
                    a.problem("energy-rating", a.raw("energy-rating"), e.getMessage(), e.key());
                }
            }
            if (!a.failed()) {
                try {
                    ArresterModel m = ArresterModel.ofRating(ur).withReferenceCurrent(iref).withAlpha(alpha)
                            .withEnergyRating(rating);
                    arrester = Double.isNaN(vref) ? m : m.withReferenceVoltage(vref);
                } catch (FerromapException e) {
                    a.problem("", null, e.getMessage(), e.key());
                }
            }
        }
        b.throwIfAny();
        return new DampingSettings(length, voltage, d.ensemble.withAngles(angles).withResidualFluxes(flux)
                .withSimulation(d.ensemble.simulation().withMaxPeriods(maxPeriods)), step, maxSteps, undamped, arrester, duration);
    }

    /**
     * A voltage for the damping case: the supply's line-to-line rms for equipment studies (peak
     * refused), the source peak for circuit studies (peak or rms must be said).
     */
    public static double voltage(String text, boolean equipmentForm) {
        Quantity q = Quantities.parse(text, Dimension.VOLTAGE);
        if (equipmentForm) {
            if (q.form() == Form.PEAK) {
                throw new FerromapException(MessageKey.BAD_QUANTITY, "'" + text
                        + "' is a peak value; give the supply's line-to-line rms voltage (e.g. 24.9 kV)");
            }
            return q.value();
        }
        if (q.form() == Form.UNSPECIFIED) {
            throw new FerromapException(MessageKey.BAD_QUANTITY, "'" + text
                    + "' does not say peak or rms; a circuit study's source is written e.g. 28.17 kV peak or 19.92 kV rms");
        }
        return q.form() == Form.PEAK ? q.value() : q.value() * Math.sqrt(2);
    }

    public DampingSettings withLength(double m) {
        return new DampingSettings(m, voltage, ensemble, stepFactor, maxSteps, undamped, arrester, eventDuration);
    }

    public DampingSettings withVoltage(double v) {
        return new DampingSettings(length, v, ensemble, stepFactor, maxSteps, undamped, arrester, eventDuration);
    }

    public DampingSettings withEnsemble(SwitchingEnsemble e) {
        return new DampingSettings(length, voltage, e, stepFactor, maxSteps, undamped, arrester, eventDuration);
    }

    public DampingSettings withSteps(double factor, int max) {
        return new DampingSettings(length, voltage, ensemble, factor, max, undamped, arrester, eventDuration);
    }

    public DampingSettings withUndamped(boolean on) {
        return new DampingSettings(length, voltage, ensemble, stepFactor, maxSteps, on, arrester, eventDuration);
    }

    public DampingSettings withArrester(ArresterModel a) {
        return new DampingSettings(length, voltage, ensemble, stepFactor, maxSteps, undamped, a, eventDuration);
    }

    public DampingSettings withEventDuration(double s) {
        return new DampingSettings(length, voltage, ensemble, stepFactor, maxSteps, undamped, arrester, s);
    }
}
