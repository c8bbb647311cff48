package org.ferromap.maps;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.SweepParameter;

/**
 * One axis of a study map: the study parameter swept, its samples in a unit people read
 * ({@code kV peak}, {@code uF}, {@code km}, or {@code pu} of the study's own value), and the
 * factor that turns a sample into SI. Charts, CSV and JSON show the display values; cells turn
 * them into SI with {@link #si(double)}.
 *
 * @param parameter the study parameter swept
 * @param axis      the samples, in the display unit {@code axis.unit()}, named after the parameter
 * @param siPerUnit SI value of one display unit (e.g. 1e3 for {@code kV peak}, 1e-6 for
 *                  {@code uF}, the study's own SI value for {@code pu}); positive
 */
public record PlaneAxis(SweepParameter parameter, Axis axis, double siPerUnit) {

    /** Significant digits kept of display bounds converted from SI: hides binary noise such as 0.19999999999999998. */
    private static final MathContext DISPLAY_DIGITS = new MathContext(12);

    public PlaneAxis {
        Objects.requireNonNull(parameter, "parameter");
        Objects.requireNonNull(axis, "axis");
        if (!(siPerUnit > 0) || Double.isInfinite(siPerUnit)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "axis " + parameter.studyName()
                    + ": the display unit's SI value is " + siPerUnit + "; it must be positive and finite");
        }
    }

    /**
     * An axis whose bounds are given in SI (V peak for {@code source}, V rms for
     * {@code source-line-voltage}, rad for {@code source-angle}, otherwise the parameter's SI
     * unit); the display unit is chosen from the larger bound's magnitude.
     */
    public static PlaneAxis ofSi(SweepParameter p, double fromSi, double toSi, int steps, Axis.Scale scale) {
        double big = Math.max(Math.abs(fromSi), Math.abs(toSi));
        String unit;
        double factor;
        switch (p) {
            case SOURCE -> {
                unit = big >= 1e3 ? "kV peak" : "V peak";
                factor = big >= 1e3 ? 1e3 : 1;
            }
            case SOURCE_LINE_VOLTAGE -> {
                unit = big >= 1e3 ? "kV rms" : "V rms";
                factor = big >= 1e3 ? 1e3 : 1;
            }
            case SOURCE_ANGLE -> {
                unit = "deg";
                factor = Math.PI / 180;
            }
            case SERIES_CAPACITANCE, SHUNT_CAPACITANCE -> {
                unit = big >= 1e-6 ? "uF" : big >= 1e-9 ? "nF" : "pF";
                factor = big >= 1e-6 ? 1e-6 : big >= 1e-9 ? 1e-9 : 1e-12;
            }
            case CORE_LOSS_RESISTANCE, LOAD_RESISTANCE -> {
                unit = big >= 1e6 ? "MOhm" : big >= 1e3 ? "kOhm" : "Ohm";
                factor = big >= 1e6 ? 1e6 : big >= 1e3 ? 1e3 : 1;
            }
            case FREQUENCY -> {
                unit = "Hz";
                factor = 1;
            }
            case CABLE_LENGTH -> {
                unit = big >= 1e3 ? "km" : "m";
                factor = big >= 1e3 ? 1e3 : 1;
            }
            case NO_LOAD_LOSS -> {
                unit = big >= 1e3 ? "kW" : "W";
                factor = big >= 1e3 ? 1e3 : 1;
            }
            default -> throw new IllegalStateException("no display unit for " + p);
        }
        return new PlaneAxis(p, new Axis(p.studyName(), unit, display(fromSi / factor), display(toSi / factor), steps,
                scale), factor);
    }

    /**
     * An axis whose bounds are per unit of the study's own value {@code studyValueSi} of the
     * parameter (e.g. 0.9 to 1.1 of the supply voltage).
     */
    public static PlaneAxis perUnit(SweepParameter p, double from, double to, int steps, Axis.Scale scale,
            double studyValueSi) {
        if (!(studyValueSi > 0) || Double.isInfinite(studyValueSi)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "axis " + p.studyName() + ": bounds in per unit need a "
                    + "positive finite study value of the parameter, but the study's is " + studyValueSi
                    + " (SI); give the bounds with a unit instead");
        }
        return new PlaneAxis(p, new Axis(p.studyName(), "pu", from, to, steps, scale), studyValueSi);
    }

    /** The SI value of a sample given in the display unit. */
    public double si(double displayValue) {
        return displayValue * siPerUnit;
    }

    /** Whether the samples are spaced logarithmically. */
    public boolean log() {
        return axis.scale() == Axis.Scale.LOG;
    }

    /** The display unit, e.g. {@code kV peak}. */
    public String unit() {
        return axis.unit();
    }

    /** Axis title for charts, e.g. {@code cable-length (km)}. */
    public String title() {
        return parameter.studyName() + " (" + (unit().equals("pu") ? "pu of the study's value" : unit()) + ")";
    }

    /** A stable text naming the parameter, the SI factor (exact bits) and the samples. */
    String fingerprint() {
        return parameter.studyName() + " x" + Long.toHexString(Double.doubleToLongBits(siPerUnit));
    }

    private static double display(double v) {
        return v == 0 || !Double.isFinite(v) ? v : new BigDecimal(v).round(DISPLAY_DIGITS).doubleValue();
    }
}
