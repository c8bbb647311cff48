package org.ferromap.study;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Dimension;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;

/**
 * A YAML mapping at a path in the study, with readers that record a problem (and return null)
 * instead of throwing, so that one walk finds everything wrong with a file.
 */
final class Section {

    /** Range a parsed value must lie in. */
    enum Check { ANY, POSITIVE, NON_NEGATIVE }

    final JsonNode node;
    final String path;
    final Problems problems;

    Section(JsonNode node, String path, Problems problems) {
        this.node = node;
        this.path = path;
        this.problems = problems;
    }

    /** Path of a child key. */
    String at(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** Path of a list element. */
    static String index(String listPath, int i) {
        return listPath + "[" + i + "]";
    }

    boolean has(String key) {
        return node.has(key);
    }

    JsonNode get(String key) {
        return node.get(key);
    }

    /** Records every key not in {@code allowed} as an unknown key, with a did-you-mean hint. */
    void allowOnly(List<String> allowed) {
        Iterator<String> it = node.fieldNames();
        while (it.hasNext()) {
            String k = it.next();
            if (!allowed.contains(k)) {
                problems.add(at(k), k, "is not a key here; " + Problems.suggestion(k, allowed)
                        + "allowed: " + String.join(", ", allowed), MessageKey.UNKNOWN_KEY);
            }
        }
    }

    /** Whether the key is present; if absent and required, records a missing key. */
    boolean present(String key, boolean required, String what) {
        JsonNode v = node.get(key);
        if (v == null) {
            if (required) {
                problems.add(at(key), "", "is missing; required: " + what, MessageKey.MISSING_KEY);
            }
            return false;
        }
        if (v.isNull()) {
            problems.add(at(key), "", "is empty; expected " + what, required ? MessageKey.MISSING_KEY : MessageKey.BAD_QUANTITY);
            return false;
        }
        return true;
    }

    /** A nested mapping, or null (problem recorded when required or of the wrong type). */
    Section child(String key, boolean required, String what) {
        if (!present(key, required, what)) {
            return null;
        }
        JsonNode v = node.get(key);
        if (!v.isObject()) {
            problems.add(at(key), scalar(v), "is not a mapping; expected " + what, MessageKey.BAD_QUANTITY);
            return null;
        }
        return new Section(v, at(key), problems);
    }

    /** A list, or null (problem recorded when required, of the wrong type, or shorter than minSize). */
    List<JsonNode> list(String key, boolean required, int minSize, String what) {
        if (!present(key, required, what)) {
            return null;
        }
        JsonNode v = node.get(key);
        if (!v.isArray()) {
            problems.add(at(key), scalar(v), "is not a list; expected " + what, MessageKey.BAD_QUANTITY);
            return null;
        }
        if (v.size() < minSize) {
            problems.add(at(key), v.size() + " item" + (v.size() == 1 ? "" : "s"),
                    "is too short; expected at least " + minSize + ": " + what, MessageKey.OUT_OF_RANGE);
            return null;
        }
        List<JsonNode> out = new ArrayList<>();
        v.forEach(out::add);
        return out;
    }

    /** The list's items as mappings; items that are not mappings are recorded and skipped as null. */
    List<Section> mappings(List<JsonNode> items, String key, String what) {
        List<Section> out = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            JsonNode it = items.get(i);
            String p = index(at(key), i);
            if (!it.isObject()) {
                problems.add(p, scalar(it), "is not a mapping; expected " + what, MessageKey.BAD_QUANTITY);
                out.add(null);
            } else {
                out.add(new Section(it, p, problems));
            }
        }
        return out;
    }

    /** A string value, or null. */
    String text(String key, boolean required, String what) {
        if (!present(key, required, what)) {
            return null;
        }
        JsonNode v = node.get(key);
        if (!v.isValueNode() || v.isNull()) {
            problems.add(at(key), scalar(v), "is not a single value; expected " + what, MessageKey.BAD_QUANTITY);
            return null;
        }
        String s = v.asText().trim();
        if (s.isEmpty()) {
            problems.add(at(key), "", "is empty; expected " + what, MessageKey.MISSING_KEY);
            return null;
        }
        return s;
    }

    /** One of {@code options} (case-insensitive), returned lower-case, or null. */
    String choice(String key, boolean required, List<String> options) {
        String s = text(key, required, "one of " + String.join(", ", options));
        if (s == null) {
            return null;
        }
        String l = s.toLowerCase(Locale.ROOT);
        if (!options.contains(l)) {
            problems.add(at(key), s, "is not allowed; " + Problems.suggestion(s, options) + "expected one of "
                    + String.join(", ", options), MessageKey.OUT_OF_RANGE);
            return null;
        }
        return l;
    }

    /** A quantity of one of the given kinds, range-checked; null when absent or wrong. */
    Quantity quantity(String key, boolean required, Check check, Dimension... dims) {
        if (!present(key, required, Quantities.describe(dims))) {
            return null;
        }
        return quantityOf(node.get(key), at(key), check, problems, dims);
    }

    /** SI value of {@link #quantity}, or null. */
    Double value(String key, boolean required, Check check, Dimension... dims) {
        Quantity q = quantity(key, required, check, dims);
        return q == null ? null : q.value();
    }

    /** A plain number ("0.8 %" and "1.2 pu" count), or null. */
    Double number(String key, boolean required, Check check) {
        return value(key, required, check, Dimension.DIMENSIONLESS);
    }

    /** An integer, or null. */
    Integer integer(String key, boolean required, String what) {
        if (!present(key, required, what)) {
            return null;
        }
        JsonNode v = node.get(key);
        double d;
        if (v.isNumber()) {
            d = v.asDouble();
        } else if (v.isTextual()) {
            try {
                d = Double.parseDouble(v.asText().trim());
            } catch (NumberFormatException e) {
                d = Double.NaN;
            }
        } else {
            d = Double.NaN;
        }
        if (!(d == Math.rint(d)) || Math.abs(d) > Integer.MAX_VALUE) {
            problems.add(at(key), scalar(v), "is not a whole number; expected " + what, MessageKey.BAD_QUANTITY);
            return null;
        }
        return (int) d;
    }

    /** Parses one node as a quantity; records a problem and returns null when it does not fit. */
    static Quantity quantityOf(JsonNode v, String path, Check check, Problems problems, Dimension... dims) {
        Quantity q;
        if (v.isNumber()) {
            boolean plainOk = false;
            for (Dimension d : dims) {
                plainOk |= d == Dimension.DIMENSIONLESS;
            }
            if (!plainOk) {
                problems.add(path, v.asText(), "is a plain number without a unit; expected "
                        + Quantities.describe(dims), MessageKey.BAD_QUANTITY);
                return null;
            }
            q = new Quantity(v.asDouble(), Dimension.DIMENSIONLESS, org.ferromap.units.Form.UNSPECIFIED, v.asText());
        } else if (v.isTextual()) {
            try {
                q = Quantities.parse(v.asText(), dims);
            } catch (FerromapException e) {
                String msg = e.getMessage();
                String prefix = "'" + v.asText() + "' ";
                problems.add(path, v.asText(), msg.startsWith(prefix) ? msg.substring(prefix.length()) : msg, e.key());
                return null;
            }
        } else {
            problems.add(path, scalar(v), "is not a quantity; expected " + Quantities.describe(dims), MessageKey.BAD_QUANTITY);
            return null;
        }
        if (!Double.isFinite(q.value())) {
            problems.add(path, q.text(), "is not finite", MessageKey.OUT_OF_RANGE);
            return null;
        }
        if (check == Check.POSITIVE && !(q.value() > 0)) {
            problems.add(path, q.text(), "must be greater than zero", MessageKey.OUT_OF_RANGE);
            return null;
        }
        if (check == Check.NON_NEGATIVE && !(q.value() >= 0)) {
            problems.add(path, q.text(), "must not be negative", MessageKey.OUT_OF_RANGE);
            return null;
        }
        return q;
    }

    /** A short rendering of a node for messages. */
    static String scalar(JsonNode v) {
        if (v == null) {
            return "";
        }
        if (v.isValueNode()) {
            return v.asText();
        }
        String s = v.toString();
        return s.length() > 60 ? s.substring(0, 57) + "..." : s;
    }
}
