package org.ferromap.cli.run;

import java.util.List;
import java.util.Map;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.SweepParameter;
import org.ferromap.units.Dimension;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;

/**
 * The settings one analysis was given in the study's {@code analyses:} section, read with the
 * path of each key in messages ({@code analyses.simulate.cycles}). Unknown keys are refused with
 * the allowed ones, so a typo never passes silently.
 */
final class AnalysisSettings {

    private final String analysis;
    private final Map<?, ?> values;

    private AnalysisSettings(String analysis, Map<?, ?> values) {
        this.analysis = analysis;
        this.values = values;
    }

    /** Reads an analysis's raw settings (a mapping, or null for none) and checks its keys. */
    static AnalysisSettings of(String analysis, Object raw, List<String> allowed) {
        Map<?, ?> m;
        if (raw == null) {
            m = Map.of();
        } else if (raw instanceof Map<?, ?> map) {
            m = map;
        } else {
            throw bad(analysis, "", raw, "a mapping of settings" + (allowed.isEmpty() ? " (this analysis takes none)"
                    : " among " + String.join(", ", allowed)));
        }
        for (Object k : m.keySet()) {
            if (!allowed.contains(String.valueOf(k))) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses." + analysis + "." + k + " is not a setting of "
                        + analysis + "; " + (allowed.isEmpty() ? "it takes none" : "allowed: " + String.join(", ", allowed)));
            }
        }
        return new AnalysisSettings(analysis, m);
    }

    boolean has(String key) {
        return values.get(key) != null;
    }

    /** A whole number within [min, max], or the default. */
    int integer(String key, int dflt, int min, int max) {
        Object v = values.get(key);
        if (v == null) {
            return dflt;
        }
        if (v instanceof Number n && n.doubleValue() == Math.rint(n.doubleValue()) && n.doubleValue() >= min
                && n.doubleValue() <= max) {
            return n.intValue();
        }
        throw bad(analysis, key, v, "a whole number from " + min + " to " + max);
    }

    /** A plain number within [min, max] (percent and pu allowed), or the default. */
    double number(String key, double dflt, double min, double max) {
        Object v = values.get(key);
        if (v == null) {
            return dflt;
        }
        double d;
        if (v instanceof Number n) {
            d = n.doubleValue();
        } else {
            try {
                d = Quantities.number(String.valueOf(v));
            } catch (FerromapException e) {
                throw bad(analysis, key, v, "a plain number from " + min + " to " + max);
            }
        }
        if (!(d >= min && d <= max)) {
            throw bad(analysis, key, v, "a plain number from " + min + " to " + max);
        }
        return d;
    }

    /** An angle in rad ("30 deg"), or the default. */
    double angle(String key, double dflt) {
        Object v = values.get(key);
        return v == null ? dflt : Quantities.angle(String.valueOf(v));
    }

    /** A text, or the default. */
    String text(String key, String dflt) {
        Object v = values.get(key);
        return v == null ? dflt : String.valueOf(v);
    }

    /** Texts: a list, or one text. */
    List<String> texts(String key) {
        Object v = values.get(key);
        if (v == null) {
            return List.of();
        }
        if (v instanceof List<?> l) {
            return l.stream().map(String::valueOf).toList();
        }
        return List.of(String.valueOf(v));
    }

    /**
     * A sweep parameter by its study name, or the default; refused when not available for this
     * study or not among {@code allowed}.
     */
    SweepParameter parameter(org.ferromap.study.StudyParameters sp, String key, SweepParameter dflt, List<SweepParameter> refused) {
        Object v = values.get(key);
        if (v == null) {
            return dflt;
        }
        SweepParameter p = sp.parameter(String.valueOf(v));
        if (refused.contains(p)) {
            throw bad(analysis, key, v, "a parameter other than " + String.join(", ", refused.stream().map(SweepParameter::studyName).toList()));
        }
        return p;
    }

    /**
     * A bound of parameter p in SI: a quantity of its kind (source voltages say peak or rms) or a
     * plain number, per unit of the study's value {@code studyValue}; NaN when absent.
     */
    double bound(String key, SweepParameter p, double studyValue) {
        Object v = values.get(key);
        if (v == null) {
            return Double.NaN;
        }
        if (v instanceof Number n) {
            return n.doubleValue() * studyValue;
        }
        Quantity q = Quantities.parse(String.valueOf(v), p.dimension(), Dimension.DIMENSIONLESS);
        if (q.dimension() == Dimension.DIMENSIONLESS) {
            return q.value() * studyValue;
        }
        if (q.dimension() == Dimension.VOLTAGE) {
            boolean peak = q.form() == org.ferromap.units.Form.PEAK
                    || (q.form() == org.ferromap.units.Form.UNSPECIFIED && p == SweepParameter.SOURCE);
            if (p == SweepParameter.SOURCE) {
                return peak ? q.value() : q.value() * Math.sqrt(2);
            }
            return peak ? q.value() / Math.sqrt(2) : q.value();
        }
        return q.value();
    }

    static FerromapException bad(String analysis, String key, Object value, String expected) {
        return new FerromapException(MessageKey.BAD_REQUEST, "analyses." + analysis + (key.isEmpty() ? "" : "." + key) + " = "
                + value + " is not allowed; expected " + expected);
    }
}
