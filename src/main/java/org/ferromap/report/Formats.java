package org.ferromap.report;

import java.util.Locale;

/** Number formats shared by the deliverable reports (tables and captions). */
final class Formats {

    private Formats() {
    }

    /** A length for tables: "33.0 m", "1.85 km", "no limit" for infinity, "-" for NaN. */
    static String length(double m) {
        if (Double.isInfinite(m)) {
            return "no limit";
        }
        if (Double.isNaN(m)) {
            return "-";
        }
        return m >= 999.5 ? String.format(Locale.ROOT, "%.3g km", m / 1e3) : String.format(Locale.ROOT, "%.3g m", m);
    }

    /** A number with 4 significant digits, "-" for NaN or infinity. */
    static String num(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g", v) : "-";
    }

    /** A power in kW, "-" for NaN. */
    static String kw(double w) {
        return Double.isFinite(w) ? String.format(Locale.ROOT, "%.4g kW", w / 1e3) : "-";
    }

    /** A fraction as a percentage. */
    static String percent(double f) {
        return Double.isFinite(f) ? String.format(Locale.ROOT, "%.3g %%", 100 * f) : "-";
    }

    /** A rating in kVA. */
    static String kva(double va) {
        return String.format(Locale.ROOT, "%.4g kVA", va / 1e3);
    }

    /** A voltage in kV. */
    static String kv(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.4g kV", v / 1e3) : "-";
    }

    /** A CSV cell for a length: empty for NaN, "inf" for no limit. */
    static Object lengthCell(double m) {
        return Double.isInfinite(m) ? "inf" : (Object) m;
    }
}
