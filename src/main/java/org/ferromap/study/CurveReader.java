package org.ferromap.study;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;
import org.ferromap.units.Dimension;
import org.ferromap.units.Form;
import org.ferromap.units.PerUnitBase;
import org.ferromap.units.Quantity;

/**
 * Reads a magnetizing-curve section ({@code circuit.magnetizing} or
 * {@code equipment.transformer.saturation}) into a {@link CurveSpec}, in absolute SI units.
 * Exactly one form key; per-unit data (equipment form, {@code basis: per-unit}) are converted
 * with the winding's base. Validation only: no curve is built here.
 */
final class CurveReader {

    static final List<String> FORMS = List.of("polynomial", "piecewise", "table", "smooth-knee", "rms-test", "steel");
    static final String AIR_CORE = "air-core-inductance";
    static final String BASIS = "basis";

    private CurveReader() {
    }

    /**
     * @param s the section
     * @param omega angular frequency of test data, rad/s (NaN when unknown because of another problem)
     * @param perUnitAllowed whether {@code basis:} is a key here (equipment form)
     * @param base the winding base for per-unit data, or null when unknown (then per-unit data are
     *        validated but not converted, and null is returned)
     */
    static CurveSpec read(Section s, double omega, boolean perUnitAllowed, PerUnitBase base) {
        List<String> keys = new ArrayList<>(FORMS);
        keys.add(AIR_CORE);
        if (perUnitAllowed) {
            keys.add(BASIS);
        }
        s.allowOnly(keys);
        boolean pu = false;
        if (perUnitAllowed) {
            String b = s.choice(BASIS, false, List.of("absolute", "per-unit"));
            pu = "per-unit".equals(b);
        }
        List<String> given = new ArrayList<>();
        for (String f : FORMS) {
            if (s.has(f)) {
                given.add(f);
            }
        }
        if (given.isEmpty()) {
            s.problems.add(s.path, "", "has no curve; expected exactly one of " + String.join(", ", FORMS),
                    MessageKey.MISSING_KEY);
            return null;
        }
        if (given.size() > 1) {
            s.problems.add(s.path, String.join(", ", given), "gives several curves; expected exactly one of "
                    + String.join(", ", FORMS), MessageKey.OUT_OF_RANGE);
            return null;
        }
        String form = given.get(0);
        boolean convert = pu && base != null;
        double airCore = Double.NaN;
        if (s.has(AIR_CORE)) {
            if (form.equals("polynomial") || form.equals("smooth-knee")) {
                s.problems.add(s.at(AIR_CORE), Section.scalar(s.get(AIR_CORE)), form.equals("polynomial")
                        ? "does not apply: a polynomial has no air-core slope"
                        : "belongs inside smooth-knee:", MessageKey.OUT_OF_RANGE);
            } else {
                Double l = pu ? s.number(AIR_CORE, false, Section.Check.POSITIVE)
                        : s.value(AIR_CORE, false, Section.Check.POSITIVE, Dimension.INDUCTANCE);
                if (l != null) {
                    airCore = convert ? l * base.inductance() : l;
                }
            }
        }
        CurveSpec spec = switch (form) {
            case "polynomial" -> polynomial(s, pu, base);
            case "piecewise" -> points(s, form, false, pu, base, airCore);
            case "table" -> points(s, form, true, pu, base, airCore);
            case "smooth-knee" -> smoothKnee(s, pu, base);
            case "rms-test" -> rmsTest(s, omega, pu, base, airCore);
            case "steel" -> steel(s, pu, airCore);
            default -> null;
        };
        return pu && base == null ? null : spec;
    }

    private static CurveSpec polynomial(Section s, boolean pu, PerUnitBase base) {
        Section p = s.child("polynomial", true, "a mapping {a, b, n}");
        if (p == null) {
            return null;
        }
        p.allowOnly(List.of("a", "b", "n"));
        Double a = p.number("a", true, Section.Check.NON_NEGATIVE);
        Double b = p.number("b", true, Section.Check.POSITIVE);
        Integer n = p.integer("n", true, "an odd whole number >= 3");
        if (n != null && (n < 3 || n % 2 == 0)) {
            p.problems.add(p.at("n"), String.valueOf(n), "must be odd and at least 3 (the curve must be odd in flux)",
                    MessageKey.OUT_OF_RANGE);
            n = null;
        }
        if (a == null || b == null || n == null) {
            return null;
        }
        if (pu && base != null) {
            // i/I_b = a (lambda/lambda_b) + b (lambda/lambda_b)^n
            double lb = base.flux();
            double ib = base.current();
            return new CurveSpec.Polynomial(a * ib / lb, b * ib / Math.pow(lb, n), n);
        }
        return new CurveSpec.Polynomial(a, b, n);
    }

    private static CurveSpec points(Section s, String key, boolean tabulated, boolean pu, PerUnitBase base, double airCore) {
        String what = "a list of {flux, current} points";
        List<JsonNode> items = s.list(key, true, tabulated ? 2 : 1, what);
        if (items == null) {
            return null;
        }
        List<Section> pts = s.mappings(items, key, "a point {flux, current}");
        int n = pts.size();
        double[] flux = new double[n];
        double[] cur = new double[n];
        boolean ok = true;
        for (int i = 0; i < n; i++) {
            Section p = pts.get(i);
            if (p == null) {
                ok = false;
                continue;
            }
            p.allowOnly(List.of("flux", "current"));
            Double f = pu ? p.number("flux", true, Section.Check.POSITIVE)
                    : p.value("flux", true, Section.Check.POSITIVE, Dimension.FLUX_LINKAGE);
            Double c;
            if (pu) {
                c = p.number("current", true, Section.Check.POSITIVE);
            } else {
                Quantity q = p.quantity("current", true, Section.Check.POSITIVE, Dimension.CURRENT);
                if (q != null && q.form() == Form.RMS) {
                    p.problems.add(p.at("current"), q.text(), "is rms; curve points are peak values (rms test data go under rms-test:)",
                            MessageKey.BAD_QUANTITY);
                    q = null;
                }
                c = q == null ? null : q.value();
            }
            if (f == null || c == null) {
                ok = false;
                continue;
            }
            flux[i] = f;
            cur[i] = c;
        }
        if (!ok) {
            return null;
        }
        if (!increasing(s, key, pts, flux, cur, "flux", "current")) {
            return null;
        }
        if (pu && base != null) {
            for (int i = 0; i < n; i++) {
                flux[i] *= base.flux();
                cur[i] *= base.current();
            }
        }
        return new CurveSpec.Points(tabulated, flux, cur, airCore);
    }

    /** Records a NOT_MONOTONE problem at the first point where either series fails to increase. */
    private static boolean increasing(Section s, String key, List<Section> pts, double[] x, double[] y, String xn, String yn) {
        boolean ok = true;
        for (int i = 1; i < x.length; i++) {
            String bad = !(x[i] > x[i - 1]) ? xn : !(y[i] > y[i - 1]) ? yn : null;
            if (bad != null) {
                Section p = pts.get(i);
                s.problems.add(p.at(bad), Section.scalar(p.get(bad)), "does not increase past point " + (i - 1) + " ("
                        + Section.scalar(pts.get(i - 1).get(bad)) + "); " + key + " points must increase strictly in "
                        + xn + " and " + yn, MessageKey.NOT_MONOTONE);
                ok = false;
            }
        }
        return ok;
    }

    private static CurveSpec smoothKnee(Section s, boolean pu, PerUnitBase base) {
        Section k = s.child("smooth-knee", true, "a mapping {unsaturated-inductance, air-core-inductance, saturation-flux}");
        if (k == null) {
            return null;
        }
        k.allowOnly(List.of("unsaturated-inductance", "air-core-inductance", "saturation-flux"));
        Double lu = pu ? k.number("unsaturated-inductance", true, Section.Check.POSITIVE)
                : k.value("unsaturated-inductance", true, Section.Check.POSITIVE, Dimension.INDUCTANCE);
        Double la = pu ? k.number("air-core-inductance", true, Section.Check.POSITIVE)
                : k.value("air-core-inductance", true, Section.Check.POSITIVE, Dimension.INDUCTANCE);
        Double fs = pu ? k.number("saturation-flux", true, Section.Check.POSITIVE)
                : k.value("saturation-flux", true, Section.Check.POSITIVE, Dimension.FLUX_LINKAGE);
        if (lu != null && la != null && !(la < lu)) {
            k.problems.add(k.at("air-core-inductance"), Section.scalar(k.get("air-core-inductance")),
                    "must be below unsaturated-inductance (" + Section.scalar(k.get("unsaturated-inductance")) + ")",
                    MessageKey.OUT_OF_RANGE);
            return null;
        }
        if (lu == null || la == null || fs == null) {
            return null;
        }
        if (pu && base != null) {
            return new CurveSpec.SmoothKnee(lu * base.inductance(), la * base.inductance(), fs * base.flux());
        }
        return new CurveSpec.SmoothKnee(lu, la, fs);
    }

    private static CurveSpec rmsTest(Section s, double omega, boolean pu, PerUnitBase base, double airCore) {
        String what = "a list of {voltage, current, loss} test points";
        List<JsonNode> items = s.list("rms-test", true, 1, what);
        if (items == null) {
            return null;
        }
        List<Section> pts = s.mappings(items, "rms-test", "a test point {voltage, current, loss}");
        int n = pts.size();
        double[] v = new double[n];
        double[] c = new double[n];
        double[] loss = new double[n];
        int withLoss = 0;
        boolean ok = true;
        for (int i = 0; i < n; i++) {
            Section p = pts.get(i);
            if (p == null) {
                ok = false;
                continue;
            }
            p.allowOnly(List.of("voltage", "current", "loss"));
            Double vi = rmsValue(p, "voltage", pu, Dimension.VOLTAGE);
            Double ci = rmsValue(p, "current", pu, Dimension.CURRENT);
            if (p.has("loss")) {
                withLoss++;
                Quantity q = pu ? p.quantity("loss", false, Section.Check.NON_NEGATIVE, Dimension.DIMENSIONLESS, Dimension.ACTIVE_POWER)
                        : p.quantity("loss", false, Section.Check.NON_NEGATIVE, Dimension.ACTIVE_POWER);
                if (q == null) {
                    ok = false;
                } else {
                    loss[i] = q.dimension() == Dimension.DIMENSIONLESS && base != null ? q.value() * base.power() : q.value();
                }
            }
            if (vi == null || ci == null) {
                ok = false;
                continue;
            }
            v[i] = vi;
            c[i] = ci;
        }
        if (withLoss > 0 && withLoss < n) {
            for (int i = 0; i < n; i++) {
                Section p = pts.get(i);
                if (p != null && !p.has("loss")) {
                    p.problems.add(p.at("loss"), "", "is missing; give loss for every test point or for none",
                            MessageKey.MISSING_KEY);
                }
            }
            ok = false;
        }
        if (!ok || !increasing(s, "rms-test", pts, v, c, "voltage", "current")) {
            return null;
        }
        if (pu && base != null) {
            for (int i = 0; i < n; i++) {
                v[i] *= base.voltage() / Constants.SQRT2;
                c[i] *= base.current() / Constants.SQRT2;
            }
        }
        if (withLoss > 0 && (!pu || base != null)) {
            for (int i = 0; i < n; i++) {
                // The loss current P/V must leave a magnetizing part: I_mag = sqrt(I^2 - (P/V)^2) (DOMAIN.md §2).
                double il = loss[i] / v[i];
                if (!(il < c[i])) {
                    Section p = pts.get(i);
                    p.problems.add(p.at("loss"), Section.scalar(p.get("loss")), String.format(
                            "gives a loss current P/V = %.4g A that is not below the measured current %.4g A", il, c[i]),
                            MessageKey.OUT_OF_RANGE);
                    ok = false;
                }
            }
        }
        if (!ok) {
            return null;
        }
        if (Double.isNaN(omega)) {
            return null;
        }
        return new CurveSpec.RmsTest(omega, v, c, withLoss > 0 ? loss : null, airCore);
    }

    /** A test voltage or current, rms unless written "peak"; per unit: a plain number. */
    private static Double rmsValue(Section p, String key, boolean pu, Dimension dim) {
        if (pu) {
            return p.number(key, true, Section.Check.POSITIVE);
        }
        Quantity q = p.quantity(key, true, Section.Check.POSITIVE, dim);
        if (q == null) {
            return null;
        }
        return q.form() == Form.PEAK ? q.value() / Constants.SQRT2 : q.value();
    }

    private static CurveSpec steel(Section s, boolean pu, double airCore) {
        if (pu) {
            s.problems.add(s.at(BASIS), "per-unit", "does not apply to steel data, which are absolute (T, A/m, m2, m, turns)",
                    MessageKey.OUT_OF_RANGE);
        }
        Section st = s.child("steel", true, "a mapping {b-h, area, path, turns}");
        if (st == null) {
            return null;
        }
        st.allowOnly(List.of("b-h", "area", "path", "turns"));
        Double area = st.value("area", true, Section.Check.POSITIVE, Dimension.AREA);
        Double path = st.value("path", true, Section.Check.POSITIVE, Dimension.LENGTH);
        Integer turns = st.integer("turns", true, "a whole number of turns >= 1");
        if (turns != null && turns < 1) {
            st.problems.add(st.at("turns"), String.valueOf(turns), "must be at least 1", MessageKey.OUT_OF_RANGE);
            turns = null;
        }
        List<JsonNode> items = st.list("b-h", true, 2, "a list of {b, h} points of the steel");
        double[] b = null;
        double[] h = null;
        boolean ok = items != null;
        if (items != null) {
            List<Section> pts = st.mappings(items, "b-h", "a point {b, h}");
            b = new double[pts.size()];
            h = new double[pts.size()];
            for (int i = 0; i < pts.size(); i++) {
                Section p = pts.get(i);
                if (p == null) {
                    ok = false;
                    continue;
                }
                p.allowOnly(List.of("b", "h"));
                Double bi = p.value("b", true, Section.Check.POSITIVE, Dimension.FLUX_DENSITY);
                Double hi = p.value("h", true, Section.Check.POSITIVE, Dimension.FIELD_STRENGTH);
                if (bi == null || hi == null) {
                    ok = false;
                    continue;
                }
                b[i] = bi;
                h[i] = hi;
            }
            ok = ok && increasing(st, "b-h", pts, b, h, "b", "h");
        }
        if (!ok || pu || area == null || path == null || turns == null) {
            return null;
        }
        return new CurveSpec.Steel(b, h, area, path, turns, airCore);
    }
}
