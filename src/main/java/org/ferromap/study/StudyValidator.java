package org.ferromap.study;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ferromap.equipment.Cable;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.Insulation;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.Transformer;
import org.ferromap.equipment.TypicalTransformerData;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;
import org.ferromap.units.Dimension;
import org.ferromap.units.Form;
import org.ferromap.units.PerUnitBase;
import org.ferromap.units.Quantity;

/** Walks a study's YAML tree once, collecting every problem with its path (STYLE.md habit 9). */
final class StudyValidator {

    static final List<String> TOP_KEYS = List.of("study", "description", "frequency", "circuit", "equipment", "analyses", "map");
    static final List<String> CIRCUIT_KEYS = List.of("source", "source-angle", "series-capacitance", "shunt-capacitance",
            "core-loss-resistance", "load-resistance", "magnetizing");
    static final List<String> EQUIPMENT_KEYS = List.of("source", "transformer", "cable", "open-phases");
    static final List<String> SOURCE_KEYS = List.of("line-voltage", "angle");
    static final List<String> TRANSFORMER_KEYS = List.of("rating", "primary-voltage", "rated-frequency", "connection", "core",
            "exciting-current", "no-load-loss", "saturation");
    static final List<String> CABLE_KEYS = List.of("kind", "length", "core-to-sheath", "core-to-core", "insulation",
            "conductor-screen-diameter", "insulation-diameter", "one-core-to-rest", "bunched-cores-to-sheath");
    static final List<String> CONNECTIONS = List.of("delta", "ungrounded-wye", "grounded-wye");
    static final List<String> CORES = List.of("separate", "three-legged", "five-legged");
    static final List<String> AXIS_KEYS = List.of("parameter", "from", "to", "steps", "scale");
    /** Largest number of steps on one map axis. */
    static final int MAX_STEPS = 10_000;

    private final Problems problems;
    private final Path file;
    private final List<String> notes = new ArrayList<>();

    StudyValidator(Path file, Problems problems) {
        this.file = file;
        this.problems = problems;
    }

    ValidatedStudy validate(JsonNode root) {
        Section top = new Section(root, "", problems);
        top.allowOnly(TOP_KEYS);
        String title = top.text("study", true, "a title for the study");
        String description = top.text("description", false, "free text");
        Double frequency = top.value("frequency", true, Section.Check.POSITIVE, Dimension.FREQUENCY);

        boolean hasCircuit = top.has("circuit");
        boolean hasEquipment = top.has("equipment");
        ValidatedStudy.CircuitSpec circuit = null;
        ValidatedStudy.EquipmentSpec equipment = null;
        if (hasCircuit && hasEquipment) {
            problems.add("equipment", "", "a study has either circuit: or equipment:, not both", MessageKey.OUT_OF_RANGE);
        } else if (!hasCircuit && !hasEquipment) {
            problems.add("circuit", "", "is missing; a study needs circuit: (the equivalent circuit) or equipment: "
                    + "(source, transformer, cable, open-phases)", MessageKey.MISSING_KEY);
        } else if (hasCircuit) {
            Section c = top.child("circuit", true, "a mapping of " + String.join(", ", CIRCUIT_KEYS));
            if (c != null) {
                circuit = circuit(c, frequency);
            }
        } else {
            Section e = top.child("equipment", true, "a mapping of " + String.join(", ", EQUIPMENT_KEYS));
            if (e != null) {
                equipment = equipment(e, frequency);
            }
        }
        Map<String, Object> analyses = analyses(top);
        MapSettings map = map(top, hasEquipment && !hasCircuit);
        problems.throwIfAny();
        return new ValidatedStudy(title, description == null ? "" : description, file, frequency,
                circuit, equipment, analyses, map, notes);
    }

    // ---------------------------------------------------------------- circuit form

    private ValidatedStudy.CircuitSpec circuit(Section c, Double frequency) {
        c.allowOnly(CIRCUIT_KEYS);
        Quantity src = c.quantity("source", true, Section.Check.POSITIVE, Dimension.VOLTAGE);
        Double peak = null;
        if (src != null) {
            if (src.form() == Form.UNSPECIFIED) {
                problems.add(c.at("source"), src.text(), "does not say peak or rms; write e.g. '28.17 kV peak' or '19.92 kV rms'",
                        MessageKey.BAD_QUANTITY);
            } else {
                peak = src.form() == Form.RMS ? src.value() * Constants.SQRT2 : src.value();
            }
        }
        Double angle = c.value("source-angle", false, Section.Check.ANY, Dimension.ANGLE);
        Double cs = c.value("series-capacitance", true, Section.Check.POSITIVE, Dimension.CAPACITANCE);
        Double cg = c.value("shunt-capacitance", true, Section.Check.NON_NEGATIVE, Dimension.CAPACITANCE);
        Double rc = c.value("core-loss-resistance", false, Section.Check.POSITIVE, Dimension.RESISTANCE);
        Double rl = c.value("load-resistance", false, Section.Check.POSITIVE, Dimension.RESISTANCE);
        Section m = c.child("magnetizing", true, "one curve: " + String.join(", ", CurveReader.FORMS));
        CurveSpec curve = null;
        if (m != null) {
            curve = CurveReader.read(m, frequency == null ? Double.NaN : Constants.omega(frequency), false, null);
        }
        if (peak == null || cs == null || cg == null || curve == null) {
            return null;
        }
        if (rc == null) {
            notes.add("no core-loss-resistance: the circuit is lossless (the most exposed case)");
        }
        return new ValidatedStudy.CircuitSpec(peak, angle == null ? 0.0 : angle, cs, cg,
                rc == null ? Double.POSITIVE_INFINITY : rc, rl == null ? Double.POSITIVE_INFINITY : rl, curve);
    }

    // ---------------------------------------------------------------- equipment form

    private ValidatedStudy.EquipmentSpec equipment(Section e, Double frequency) {
        e.allowOnly(EQUIPMENT_KEYS);
        Double lineVoltage = null;
        double angle = 0.0;
        Section s = e.child("source", true, "a mapping {line-voltage, angle}");
        if (s != null) {
            s.allowOnly(SOURCE_KEYS);
            lineVoltage = rmsVoltage(s, "line-voltage", true);
            Double a = s.value("angle", false, Section.Check.ANY, Dimension.ANGLE);
            angle = a == null ? 0.0 : a;
        }
        Section t = e.child("transformer", true, "a mapping of " + String.join(", ", TRANSFORMER_KEYS));
        ValidatedStudy.TransformerSpec transformer = t == null ? null : transformer(t, frequency);
        Section cs = e.child("cable", true, "a mapping with kind, length and capacitances or insulation data");
        Cable cable = null;
        Double length = null;
        if (cs != null) {
            cs.allowOnly(CABLE_KEYS);
            length = cs.value("length", true, Section.Check.POSITIVE, Dimension.LENGTH);
            cable = cable(cs);
        }
        Integer open = e.integer("open-phases", true, "1 or 2");
        if (open != null && open != 1 && open != 2) {
            problems.add(e.at("open-phases"), String.valueOf(open), "is not allowed; expected 1 or 2", MessageKey.OUT_OF_RANGE);
            open = null;
        }
        if (lineVoltage == null || transformer == null || cable == null || length == null || open == null) {
            return null;
        }
        return new ValidatedStudy.EquipmentSpec(lineVoltage, angle, transformer, cable, length, new OpenPhaseCase(open));
    }

    /** A nameplate-style voltage: rms unless written "peak". */
    private static Double rmsVoltage(Section s, String key, boolean required) {
        Quantity q = s.quantity(key, required, Section.Check.POSITIVE, Dimension.VOLTAGE);
        if (q == null) {
            return null;
        }
        return q.form() == Form.PEAK ? q.value() / Constants.SQRT2 : q.value();
    }

    private ValidatedStudy.TransformerSpec transformer(Section t, Double frequency) {
        t.allowOnly(TRANSFORMER_KEYS);
        Double rating = t.value("rating", true, Section.Check.POSITIVE, Dimension.APPARENT_POWER);
        Double primary = rmsVoltage(t, "primary-voltage", true);
        Double ratedF = t.has("rated-frequency")
                ? t.value("rated-frequency", false, Section.Check.POSITIVE, Dimension.FREQUENCY) : frequency;
        String conn = t.choice("connection", true, CONNECTIONS);
        String core = t.choice("core", true, CORES);
        Double i0 = t.number("exciting-current", true, Section.Check.POSITIVE);
        if (i0 != null && !(i0 < 0.2)) {
            problems.add(t.at("exciting-current"), Section.scalar(t.get("exciting-current")), String.format(
                    "is %.4g %% of rated current, not plausible for a distribution transformer; write it with %%, e.g. '0.8 %%' "
                            + "(typical 0.2 %% to 2 %%)", 100 * i0), MessageKey.OUT_OF_RANGE);
            i0 = null;
        }
        Double loss = null;
        if (t.has("no-load-loss")) {
            JsonNode v = t.get("no-load-loss");
            if (v.isTextual() && v.asText().trim().equalsIgnoreCase("typical")) {
                if (rating != null) {
                    TypicalTransformerData.Sourced s = TypicalTransformerData.noLoadLoss(rating);
                    loss = s.value();
                    notes.add(String.format("no-load loss taken as typical: %.0f W %s", s.value(), s.source()));
                }
            } else {
                loss = t.value("no-load-loss", false, Section.Check.NON_NEGATIVE, Dimension.ACTIVE_POWER);
            }
        } else {
            loss = 0.0;
            notes.add("no no-load-loss given: the transformer is taken as lossless (the most exposed case)");
        }
        Connection connection = conn == null ? null : switch (conn) {
            case "delta" -> Connection.DELTA;
            case "ungrounded-wye" -> Connection.UNGROUNDED_WYE;
            default -> Connection.GROUNDED_WYE;
        };
        CoreType coreType = core == null ? null : switch (core) {
            case "separate" -> CoreType.SEPARATE_PHASE_CORES;
            case "three-legged" -> CoreType.THREE_LEGGED;
            default -> CoreType.FIVE_LEGGED;
        };
        PerUnitBase base = null;
        if (rating != null && primary != null && connection != null && ratedF != null) {
            base = Transformer.windingBase(rating, primary, connection, ratedF);
        }
        Section sat = t.child("saturation", true, "one curve: " + String.join(", ", CurveReader.FORMS));
        CurveSpec curve = null;
        if (sat != null) {
            curve = CurveReader.read(sat, ratedF == null ? Double.NaN : Constants.omega(ratedF), true, base);
        }
        if (rating == null || primary == null || ratedF == null || connection == null || coreType == null
                || i0 == null || loss == null || curve == null) {
            return null;
        }
        return new ValidatedStudy.TransformerSpec(rating, primary, ratedF, connection, coreType, i0, loss, curve);
    }

    private Cable cable(Section c) {
        String kind = c.choice("kind", true, List.of("screened", "belted"));
        if (kind == null) {
            return null;
        }
        boolean direct = c.has("core-to-sheath") || c.has("core-to-core");
        boolean geometry = c.has("insulation") || c.has("conductor-screen-diameter") || c.has("insulation-diameter");
        boolean measured = c.has("one-core-to-rest") || c.has("bunched-cores-to-sheath");
        try {
            if (kind.equals("screened")) {
                for (String k : List.of("core-to-core", "one-core-to-rest", "bunched-cores-to-sheath")) {
                    if (c.has(k)) {
                        problems.add(c.at(k), Section.scalar(c.get(k)), "does not apply to a screened cable "
                                + "(no core-to-core capacitance); use kind: belted", MessageKey.OUT_OF_RANGE);
                        return null;
                    }
                }
                if (direct == geometry) {
                    problems.add(c.path, "", direct ? "gives both core-to-sheath and insulation data; give one"
                            : "has no capacitance; give core-to-sheath (e.g. 0.25 uF/km) or insulation, "
                            + "conductor-screen-diameter and insulation-diameter", direct ? MessageKey.OUT_OF_RANGE : MessageKey.MISSING_KEY);
                    return null;
                }
                if (direct) {
                    Double ccs = c.value("core-to-sheath", true, Section.Check.POSITIVE, Dimension.CAPACITANCE_PER_LENGTH);
                    return ccs == null ? null : Cable.screened(ccs);
                }
                String ins = c.choice("insulation", true, insulationNames());
                Double dc = c.value("conductor-screen-diameter", true, Section.Check.POSITIVE, Dimension.LENGTH);
                Double di = c.value("insulation-diameter", true, Section.Check.POSITIVE, Dimension.LENGTH);
                if (dc != null && di != null && !(di > dc)) {
                    problems.add(c.at("insulation-diameter"), Section.scalar(c.get("insulation-diameter")),
                            "must exceed conductor-screen-diameter (" + Section.scalar(c.get("conductor-screen-diameter")) + ")",
                            MessageKey.OUT_OF_RANGE);
                    return null;
                }
                if (ins == null || dc == null || di == null) {
                    return null;
                }
                return Cable.screened(Insulation.fromName(ins), dc, di);
            }
            for (String k : List.of("insulation", "conductor-screen-diameter", "insulation-diameter")) {
                if (c.has(k)) {
                    problems.add(c.at(k), Section.scalar(c.get(k)), "applies to screened cables only; give a belted cable's "
                            + "core-to-sheath and core-to-core, or one-core-to-rest and bunched-cores-to-sheath", MessageKey.OUT_OF_RANGE);
                    return null;
                }
            }
            if (direct == measured) {
                problems.add(c.path, "", direct ? "gives both capacitances and measurements; give one pair"
                        : "has no capacitance; give core-to-sheath and core-to-core, or one-core-to-rest (C1) and "
                        + "bunched-cores-to-sheath (C2)", direct ? MessageKey.OUT_OF_RANGE : MessageKey.MISSING_KEY);
                return null;
            }
            if (direct) {
                Double ccs = c.value("core-to-sheath", true, Section.Check.POSITIVE, Dimension.CAPACITANCE_PER_LENGTH);
                Double ccc = c.value("core-to-core", true, Section.Check.POSITIVE, Dimension.CAPACITANCE_PER_LENGTH);
                return ccs == null || ccc == null ? null : Cable.belted(ccs, ccc);
            }
            Double c1 = c.value("one-core-to-rest", true, Section.Check.POSITIVE, Dimension.CAPACITANCE_PER_LENGTH);
            Double c2 = c.value("bunched-cores-to-sheath", true, Section.Check.POSITIVE, Dimension.CAPACITANCE_PER_LENGTH);
            if (c1 != null && c2 != null && !(c1 > c2 / 3)) {
                problems.add(c.at("one-core-to-rest"), Section.scalar(c.get("one-core-to-rest")),
                        "must exceed a third of bunched-cores-to-sheath (C1 = C'cs + 2 C'cc, C2 = 3 C'cs)", MessageKey.OUT_OF_RANGE);
                return null;
            }
            return c1 == null || c2 == null ? null : Cable.beltedFromMeasurements(c1, c2);
        } catch (FerromapException ex) {
            problems.add(c.path, "", ex.getMessage(), ex.key());
            return null;
        }
    }

    private static List<String> insulationNames() {
        List<String> n = new ArrayList<>();
        for (Insulation i : Insulation.values()) {
            n.add(i.studyName());
        }
        return n;
    }

    // ---------------------------------------------------------------- analyses and map

    private Map<String, Object> analyses(Section top) {
        Map<String, Object> out = new LinkedHashMap<>();
        if (!top.has("analyses")) {
            return out;
        }
        JsonNode a = top.get("analyses");
        String path = top.at("analyses");
        if (a.isObject()) {
            Iterator<Map.Entry<String, JsonNode>> it = a.fields();
            while (it.hasNext()) {
                Map.Entry<String, JsonNode> e = it.next();
                if (known(e.getKey(), path + "." + e.getKey())) {
                    out.put(e.getKey(), plain(e.getValue()));
                }
            }
        } else if (a.isArray()) {
            for (int i = 0; i < a.size(); i++) {
                JsonNode item = a.get(i);
                String p = Section.index(path, i);
                if (item.isTextual()) {
                    if (known(item.asText(), p)) {
                        out.put(item.asText(), null);
                    }
                } else if (item.isObject() && item.size() == 1) {
                    String name = item.fieldNames().next();
                    if (known(name, p + "." + name)) {
                        out.put(name, plain(item.get(name)));
                    }
                } else {
                    problems.add(p, Section.scalar(item), "is not an analysis; expected a name or {name: settings}",
                            MessageKey.BAD_QUANTITY);
                }
            }
        } else if (!a.isNull()) {
            problems.add(path, Section.scalar(a), "is not a mapping or list of analyses; expected names among "
                    + String.join(", ", Study.ANALYSIS_NAMES), MessageKey.BAD_QUANTITY);
        }
        return out;
    }

    private boolean known(String name, String path) {
        if (Study.ANALYSIS_NAMES.contains(name)) {
            return true;
        }
        problems.add(path, name, "is not an analysis; " + Problems.suggestion(name, Study.ANALYSIS_NAMES)
                + "expected one of " + String.join(", ", Study.ANALYSIS_NAMES), MessageKey.UNKNOWN_KEY);
        return false;
    }

    /** YAML tree to plain Java values: Map, List, String, Number, Boolean, null. */
    static Object plain(JsonNode n) {
        if (n == null || n.isNull() || n.isMissingNode()) {
            return null;
        }
        if (n.isObject()) {
            Map<String, Object> m = new LinkedHashMap<>();
            n.fields().forEachRemaining(e -> m.put(e.getKey(), plain(e.getValue())));
            return java.util.Collections.unmodifiableMap(m);
        }
        if (n.isArray()) {
            List<Object> l = new ArrayList<>();
            n.forEach(x -> l.add(plain(x)));
            return java.util.Collections.unmodifiableList(l);
        }
        if (n.isBoolean()) {
            return n.booleanValue();
        }
        if (n.isIntegralNumber()) {
            return n.canConvertToInt() ? (Object) n.intValue() : (Object) n.longValue();
        }
        if (n.isNumber()) {
            return n.doubleValue();
        }
        return n.asText();
    }

    private MapSettings map(Section top, boolean equipmentForm) {
        Section m = top.child("map", false, "a mapping {x, y} of axes");
        if (m == null) {
            return null;
        }
        m.allowOnly(List.of("x", "y"));
        Section xs = m.child("x", true, "an axis {parameter, from, to, steps, scale}");
        Section ys = m.child("y", false, "an axis {parameter, from, to, steps, scale}");
        MapAxis x = xs == null ? null : axis(xs, equipmentForm);
        MapAxis y = ys == null ? null : axis(ys, equipmentForm);
        if (x != null && y != null && x.parameter() == y.parameter()) {
            problems.add(m.at("y") + ".parameter", y.parameter().studyName(), "sweeps the same parameter as x; "
                    + "choose another", MessageKey.BAD_REQUEST);
            return null;
        }
        if (x == null || (ys != null && y == null)) {
            return null;
        }
        return new MapSettings(x, y);
    }

    private MapAxis axis(Section a, boolean equipmentForm) {
        a.allowOnly(AXIS_KEYS);
        List<String> names = SweepParameter.names(equipmentForm);
        String name = a.text("parameter", true, "one of " + String.join(", ", names));
        SweepParameter p = null;
        if (name != null) {
            p = SweepParameter.byName(name);
            if (p == null || !names.contains(name)) {
                String why = p != null ? "applies to equipment studies only; " : "is not a parameter ferromap can sweep; "
                        + Problems.suggestion(name, names);
                problems.add(a.at("parameter"), name, why + "expected one of " + String.join(", ", names), MessageKey.BAD_REQUEST);
                p = null;
            }
        }
        Integer steps = a.integer("steps", true, "a whole number from 2 to " + MAX_STEPS);
        if (steps != null && (steps < 2 || steps > MAX_STEPS)) {
            problems.add(a.at("steps"), String.valueOf(steps), "is not allowed; expected 2 to " + MAX_STEPS, MessageKey.BAD_REQUEST);
            steps = null;
        }
        String scale = a.choice("scale", false, List.of("linear", "log"));
        if (p == null) {
            return null;
        }
        Quantity from = a.quantity("from", true, Section.Check.ANY, p.dimension(), Dimension.DIMENSIONLESS);
        Quantity to = a.quantity("to", true, Section.Check.ANY, p.dimension(), Dimension.DIMENSIONLESS);
        if (from == null || to == null || steps == null) {
            return null;
        }
        boolean pu = from.dimension() == Dimension.DIMENSIONLESS;
        if (pu != (to.dimension() == Dimension.DIMENSIONLESS)) {
            problems.add(a.at("to"), to.text(), "must be of the same kind as from (" + from.text()
                    + "): both per unit or both in " + p.dimension().siUnit(), MessageKey.BAD_REQUEST);
            return null;
        }
        double f = axisValue(a, "from", from, p);
        double t = axisValue(a, "to", to, p);
        if (Double.isNaN(f) || Double.isNaN(t)) {
            return null;
        }
        if (f == t) {
            problems.add(a.at("to"), to.text(), "equals from; an axis needs a range", MessageKey.BAD_REQUEST);
            return null;
        }
        MapAxis.Scale sc = "log".equals(scale) ? MapAxis.Scale.LOG : MapAxis.Scale.LINEAR;
        boolean mustBePositive = pu || p.dimension() != Dimension.ANGLE;
        if ((sc == MapAxis.Scale.LOG || mustBePositive) && !(f > 0 && t > 0)) {
            problems.add(a.at(f > 0 ? "to" : "from"), (f > 0 ? to : from).text(), sc == MapAxis.Scale.LOG
                    ? "must be positive on a log axis" : "must be positive for " + p.studyName(), MessageKey.BAD_REQUEST);
            return null;
        }
        return new MapAxis(p, f, t, steps, sc, pu);
    }

    /** Axis bound in SI: source peaks must say peak or rms; line voltages are rms unless peak. NaN on a problem. */
    private double axisValue(Section a, String key, Quantity q, SweepParameter p) {
        if (q.dimension() != Dimension.VOLTAGE) {
            return q.value();
        }
        if (p == SweepParameter.SOURCE) {
            if (q.form() == Form.UNSPECIFIED) {
                problems.add(a.at(key), q.text(), "does not say peak or rms; write e.g. '28.17 kV peak'", MessageKey.BAD_QUANTITY);
                return Double.NaN;
            }
            return q.form() == Form.RMS ? q.value() * Constants.SQRT2 : q.value();
        }
        return q.form() == Form.PEAK ? q.value() / Constants.SQRT2 : q.value();
    }
}
