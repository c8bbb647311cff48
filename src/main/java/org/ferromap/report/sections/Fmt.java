package org.ferromap.report.sections;

import java.util.Locale;

/** Number formatting for notebook tables: engineering prefixes and a few significant digits. */
public final class Fmt {

    private static final String[] PREFIX = {"p", "n", "u", "m", "", "k", "M", "G"};

    private Fmt() {
    }

    /**
     * A value with an SI prefix on its unit and four significant digits, e.g. {@code 28.17 kV},
     * {@code 0.2 uF} is written {@code 200 nF}; infinity as "none" and NaN as "-".
     */
    public static String si(double v, String unit) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "infinite" : "-infinite";
        }
        if (v == 0) {
            return "0 " + unit;
        }
        int e = (int) Math.floor(Math.log10(Math.abs(v)) / 3);
        e = Math.max(-4, Math.min(3, e));
        double scaled = v / Math.pow(10, 3 * e);
        return sig(scaled, 4) + " " + PREFIX[e + 4] + unit;
    }

    /** A plain number with {@code digits} significant digits, trailing zeros dropped. */
    public static String sig(double v, int digits) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "infinite" : "-infinite";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e6 || a < 1e-4) {
            return String.format(Locale.ROOT, "%." + (digits - 1) + "e", v);
        }
        int decimals = Math.max(0, digits - 1 - (int) Math.floor(Math.log10(a)));
        String s = String.format(Locale.ROOT, "%." + decimals + "f", v);
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "");
            if (s.endsWith(".")) {
                s = s.substring(0, s.length() - 1);
            }
        }
        return s;
    }

    /** Per unit with three decimals, e.g. {@code 1.234 pu}. */
    public static String pu(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.3f pu", v);
    }

    /** An angle in degrees with one decimal. */
    public static String deg(double rad) {
        return Double.isNaN(rad) ? "-" : String.format(Locale.ROOT, "%.1f deg", Math.toDegrees(rad));
    }

    /** A share as a percentage with one decimal. */
    public static String percent(double share) {
        return Double.isNaN(share) ? "-" : String.format(Locale.ROOT, "%.1f %%", 100 * share);
    }
}
