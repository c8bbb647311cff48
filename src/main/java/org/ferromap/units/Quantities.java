package org.ferromap.units;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Parses quantities as engineers write them ("34.5 kV", "0.28 uF/km", "28.17 kV peak", "0.8 %")
 * into SI doubles, checked against the kinds of quantity the caller allows.
 *
 * <p>Grammar: a decimal number, optional spaces, then a unit, then optionally "peak", "pk" or
 * "rms" (voltages and currents only). A unit is a symbol with an optional SI prefix (p n u µ m
 * k M G, case matters: m is milli, M is mega; c only for metres), an optional exponent 2 on
 * lengths ("m2", "m^2", "cm2"), and at most one "/" ("uF/km", "A/m"). A plain number is
 * accepted only where the caller allows {@link Dimension#DIMENSIONLESS}.
 *
 * <p>Failures throw {@link FerromapException} with {@link MessageKey#BAD_QUANTITY}, naming the
 * text and the kinds of quantity allowed.
 */
public final class Quantities {

    private Quantities() {
    }

    private static final Pattern NUMBER =
            Pattern.compile("^\\s*([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*?)\\s*$");

    private static final Map<String, Double> PREFIXES = new LinkedHashMap<>();

    static {
        PREFIXES.put("p", 1e-12);
        PREFIXES.put("n", 1e-9);
        PREFIXES.put("u", 1e-6);
        PREFIXES.put("\u00b5", 1e-6); // micro sign
        PREFIXES.put("\u03bc", 1e-6); // Greek small mu
        PREFIXES.put("m", 1e-3);
        PREFIXES.put("c", 1e-2);
        PREFIXES.put("k", 1e3);
        PREFIXES.put("M", 1e6);
        PREFIXES.put("G", 1e9);
    }

    /** A unit symbol: its kind, its SI factor, and whether SI prefixes may stand before it. */
    private record Symbol(Dimension dimension, double factor, boolean prefixable, boolean centiAllowed) { }

    private static final Map<String, Symbol> SYMBOLS = new LinkedHashMap<>();

    private static void sym(Dimension d, double factor, boolean prefixable, String... names) {
        for (String n : names) {
            SYMBOLS.put(n, new Symbol(d, factor, prefixable, false));
        }
    }

    static {
        sym(Dimension.VOLTAGE, 1, true, "V");
        sym(Dimension.CURRENT, 1, true, "A");
        sym(Dimension.ACTIVE_POWER, 1, true, "W");
        sym(Dimension.APPARENT_POWER, 1, true, "VA");
        sym(Dimension.ENERGY, 1, true, "J");
        sym(Dimension.RESISTANCE, 1, true, "Ohm", "ohm", "Ohms", "ohms", "\u03a9", "\u2126");
        sym(Dimension.CONDUCTANCE, 1, true, "S");
        sym(Dimension.CAPACITANCE, 1, true, "F");
        sym(Dimension.INDUCTANCE, 1, true, "H");
        sym(Dimension.FREQUENCY, 1, true, "Hz");
        sym(Dimension.TIME, 1, true, "s");
        SYMBOLS.put("m", new Symbol(Dimension.LENGTH, 1, true, true));
        sym(Dimension.FLUX_DENSITY, 1, true, "T");
        sym(Dimension.FLUX_LINKAGE, 1, true, "Wb", "Wb-turn", "Wb-turns", "Wbturn", "Wbt", "Vs", "V.s", "V*s", "V\u00b7s");
        sym(Dimension.ANGLE, 1, true, "rad");
        sym(Dimension.ANGLE, Math.PI / 180.0, false, "deg", "\u00b0", "degree", "degrees");
        sym(Dimension.CYCLES, 1, false, "cycle", "cycles", "cyc");
        sym(Dimension.DIMENSIONLESS, 0.01, false, "%");
        sym(Dimension.DIMENSIONLESS, 1, false, "pu", "p.u.");
    }

    /**
     * Parses {@code text} and checks it is one of the {@code allowed} kinds.
     *
     * @return the quantity, value in SI
     * @throws FerromapException BAD_QUANTITY when the text does not parse or its unit does not fit
     */
    public static Quantity parse(String text, Dimension... allowed) {
        if (allowed.length == 0) {
            throw new IllegalArgumentException("no dimension allowed");
        }
        if (text == null || text.isBlank()) {
            throw bad(text, "is empty", allowed);
        }
        Matcher m = NUMBER.matcher(text);
        if (!m.matches()) {
            throw bad(text, "does not start with a number", allowed);
        }
        double number = Double.parseDouble(m.group(1));
        String rest = m.group(2);

        Form form = Form.UNSPECIFIED;
        String lower = rest.toLowerCase(Locale.ROOT);
        for (String[] w : new String[][] {{"peak", "PEAK"}, {"pk", "PEAK"}, {"rms", "RMS"}}) {
            if (lower.endsWith(w[0])) {
                // "kV peak", "kVpk" and "kVrms" all work; the rest must still be a known unit.
                String unitPart = rest.substring(0, rest.length() - w[0].length()).trim();
                if (unitPart.isEmpty() || parseUnitOrNull(unitPart) != null) {
                    form = Form.valueOf(w[1]);
                    rest = unitPart;
                    break;
                }
            }
        }

        Dimension dim;
        double factor;
        if (rest.isEmpty()) {
            dim = Dimension.DIMENSIONLESS;
            factor = 1.0;
        } else {
            UnitValue u = parseUnitOrNull(rest);
            if (u == null) {
                throw bad(text, "has a unit '" + rest + "' that ferromap does not know", allowed);
            }
            dim = u.dimension;
            factor = u.factor;
        }
        if (form != Form.UNSPECIFIED && dim != Dimension.VOLTAGE && dim != Dimension.CURRENT) {
            throw bad(text, "says peak or rms, which only voltages and currents may", allowed);
        }
        if (!Arrays.asList(allowed).contains(dim)) {
            String what = dim == Dimension.DIMENSIONLESS && rest.isEmpty()
                    ? "is a plain number without a unit" : "is " + dim.noun();
            throw bad(text, what, allowed);
        }
        double value = number * factor;
        if (!Double.isFinite(value)) {
            throw bad(text, "is not a finite number", allowed);
        }
        return new Quantity(value, dim, form, text.trim());
    }

    /** The SI value of {@code text}, which must be of kind {@code dimension}. */
    public static double si(String text, Dimension dimension) {
        return parse(text, dimension).value();
    }

    /** A voltage with its form kept ("28.17 kV peak", "19.92 kV rms", "34.5 kV"). */
    public static Voltage voltage(String text) {
        Quantity q = parse(text, Dimension.VOLTAGE);
        return new Voltage(q.value(), q.form());
    }

    /** A plain number (percent and pu allowed: "0.8 %" gives 0.008). */
    public static double number(String text) {
        return parse(text, Dimension.DIMENSIONLESS).value();
    }

    /**
     * A time, written in seconds ("2 ms") or in source cycles ("0.5 cycles"), in s.
     *
     * @param frequency source frequency, Hz, used for cycles
     */
    public static double time(String text, double frequency) {
        Quantity q = parse(text, Dimension.TIME, Dimension.CYCLES);
        return q.dimension() == Dimension.CYCLES ? q.value() / frequency : q.value();
    }

    /** An angle in rad ("30 deg", "0.5 rad"); a plain number is refused. */
    public static double angle(String text) {
        return parse(text, Dimension.ANGLE).value();
    }

    private record UnitValue(Dimension dimension, double factor) { }

    /** Unit text to kind and SI factor, or null when it is not a unit ferromap knows. */
    private static UnitValue parseUnitOrNull(String unit) {
        String u = unit.replaceAll("\\s+", "");
        // "Wb turn" and "V s" lose their space above; restore the one alias that needs a hyphen.
        if (u.endsWith("Wbturn") || u.endsWith("Wbturns")) {
            u = u.replace("Wbturns", "Wb-turn").replace("Wbturn", "Wb-turn");
        }
        int slash = u.indexOf('/');
        if (slash >= 0) {
            if (u.indexOf('/', slash + 1) >= 0) {
                return null;
            }
            Term num = term(u.substring(0, slash));
            Term den = term(u.substring(slash + 1));
            if (num == null || den == null || num.power != 1 || den.power != 1 || den.dimension != Dimension.LENGTH) {
                return null;
            }
            double f = num.factor / den.factor;
            if (num.dimension == Dimension.CAPACITANCE) {
                return new UnitValue(Dimension.CAPACITANCE_PER_LENGTH, f);
            }
            if (num.dimension == Dimension.CURRENT) {
                return new UnitValue(Dimension.FIELD_STRENGTH, f);
            }
            return null;
        }
        Term t = term(u);
        if (t == null) {
            return null;
        }
        if (t.power == 2) {
            return t.dimension == Dimension.LENGTH ? new UnitValue(Dimension.AREA, t.factor) : null;
        }
        return new UnitValue(t.dimension, t.factor);
    }

    private record Term(Dimension dimension, double factor, int power) { }

    /** One prefixed symbol with an optional exponent 2 (m2, m^2, m²). */
    private static Term term(String s) {
        if (s.isEmpty()) {
            return null;
        }
        int power = 1;
        for (String sq : new String[] {"^2", "\u00b2", "2"}) {
            if (s.endsWith(sq) && s.length() > sq.length()) {
                s = s.substring(0, s.length() - sq.length());
                power = 2;
                break;
            }
        }
        Symbol exact = SYMBOLS.get(s);
        double f;
        Dimension d;
        if (exact != null) {
            f = exact.factor;
            d = exact.dimension;
        } else {
            String p = s.substring(0, s.offsetByCodePoints(0, 1));
            String rest = s.substring(p.length());
            Double pf = PREFIXES.get(p);
            Symbol base = SYMBOLS.get(rest);
            if (pf == null || base == null || !base.prefixable) {
                return null;
            }
            if (p.equals("c") && !base.centiAllowed) {
                return null;
            }
            f = pf * base.factor;
            d = base.dimension;
        }
        if (power == 2) {
            f = f * f;
        }
        return new Term(d, f, power);
    }

    private static FerromapException bad(String text, String why, Dimension... allowed) {
        String kinds = Arrays.stream(allowed).map(Dimension::describe).collect(Collectors.joining("; or "));
        return new FerromapException(MessageKey.BAD_QUANTITY,
                "'" + text + "' " + why + "; expected " + kinds);
    }

    /** The allowed kinds as words for messages elsewhere ("a capacitance (F), e.g. 0.2 uF"). */
    public static String describe(Dimension... allowed) {
        return Arrays.stream(allowed).map(Dimension::describe).collect(Collectors.joining("; or "));
    }
}
