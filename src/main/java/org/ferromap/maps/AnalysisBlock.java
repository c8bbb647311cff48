package org.ferromap.maps;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Problem;
import org.ferromap.study.Study;
import org.ferromap.study.StudyException;
import org.ferromap.units.Dimension;
import org.ferromap.units.Form;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;
import org.ferromap.errors.FerromapException;

/**
 * Reads the settings of one analysis from a study's {@code analyses:} section (plain Java values
 * as the study reader keeps them) and collects every problem with its path in the file, like the
 * study reader does, so that a misspelt key or a bad quantity is reported together with the
 * others ({@link StudyException}, exit 2) before anything is computed or written.
 */
final class AnalysisBlock {

    private final String file;
    private final String path;
    private final Map<String, Object> map;
    private final List<Problem> problems;

    private AnalysisBlock(String file, String path, Map<String, Object> map, List<Problem> problems) {
        this.file = file;
        this.path = path;
        this.map = map;
        this.problems = problems;
    }

    /** The block of {@code analyses.<name>} of a study; empty when absent or written without settings. */
    static AnalysisBlock of(Study study, String name) {
        List<Problem> problems = new ArrayList<>();
        String file = study.file() == null ? "study" : study.file().toString();
        return wrap(file, "analyses." + name, study.analyses().get(name), problems);
    }

    @SuppressWarnings("unchecked")
    private static AnalysisBlock wrap(String file, String path, Object value, List<Problem> problems) {
        if (value == null) {
            return new AnalysisBlock(file, path, Map.of(), problems);
        }
        if (value instanceof Map<?, ?> m) {
            return new AnalysisBlock(file, path, (Map<String, Object>) m, problems);
        }
        problems.add(new Problem(file, path, String.valueOf(value), "is not a mapping of settings; expected {key: value, ...}",
                MessageKey.BAD_QUANTITY));
        return new AnalysisBlock(file, path, Map.of(), problems);
    }

    /** Where this block sits in the file. */
    String path() {
        return path;
    }

    /** Reports every key that is not among the allowed ones. */
    void allowOnly(String... keys) {
        List<String> allowed = Arrays.asList(keys);
        for (String k : map.keySet()) {
            if (!allowed.contains(k)) {
                problems.add(new Problem(file, path + "." + k, k, "is not a key here; expected one of " + String.join(", ", keys),
                        MessageKey.UNKNOWN_KEY));
            }
        }
    }

    boolean has(String key) {
        return map.containsKey(key) && map.get(key) != null;
    }

    /** Records a problem at {@code path.key}. */
    void problem(String key, Object value, String allowed, MessageKey k) {
        problems.add(new Problem(file, key.isEmpty() ? path : path + "." + key, value == null ? "" : String.valueOf(value), allowed, k));
    }

    /** Throws every problem collected by this block and the blocks read from it. */
    void throwIfAny() {
        if (!problems.isEmpty()) {
            throw new StudyException(problems);
        }
    }

    /** Whether problems were found so far. */
    boolean failed() {
        return !problems.isEmpty();
    }

    /** A nested mapping; empty when absent. */
    AnalysisBlock block(String key) {
        return wrap(file, path + "." + key, map.get(key), problems);
    }

    /** A list of mappings under a key; empty when absent. */
    List<AnalysisBlock> blocks(String key) {
        List<AnalysisBlock> out = new ArrayList<>();
        Object v = map.get(key);
        if (v == null) {
            return out;
        }
        List<?> list = v instanceof List<?> l ? l : List.of(v);
        for (int i = 0; i < list.size(); i++) {
            out.add(wrap(file, path + "." + key + "[" + i + "]", list.get(i), problems));
        }
        return out;
    }

    /** The raw value, or null. */
    Object raw(String key) {
        return map.get(key);
    }

    /** A quantity of one kind, SI; {@code dflt} when absent. */
    double quantity(String key, Dimension d, double dflt) {
        if (!has(key)) {
            return dflt;
        }
        return parse(map.get(key), path + "." + key, d, dflt);
    }

    /** One quantity or a list of them, SI; {@code dflt} when absent. */
    double[] quantities(String key, Dimension d, double[] dflt) {
        if (!has(key)) {
            return dflt;
        }
        Object v = map.get(key);
        List<?> list = v instanceof List<?> l ? l : List.of(v);
        if (list.isEmpty()) {
            problem(key, "[]", "is an empty list; give at least one value (" + d.example() + ")", MessageKey.OUT_OF_RANGE);
            return dflt;
        }
        double[] out = new double[list.size()];
        for (int i = 0; i < list.size(); i++) {
            String p = v instanceof List<?> ? path + "." + key + "[" + i + "]" : path + "." + key;
            out[i] = parse(list.get(i), p, d, Double.NaN);
        }
        return out;
    }

    /** A line-to-line voltage, V rms: "peak" is refused (nameplate voltages are rms). */
    double rmsVoltage(String key, double dflt) {
        double[] v = rmsVoltages(key, new double[] {dflt});
        return v.length == 0 ? dflt : v[0];
    }

    /** One or several rms voltages, V. */
    double[] rmsVoltages(String key, double[] dflt) {
        if (!has(key)) {
            return dflt;
        }
        Object v = map.get(key);
        List<?> list = v instanceof List<?> l ? l : List.of(v);
        double[] out = new double[list.size()];
        for (int i = 0; i < list.size(); i++) {
            String p = v instanceof List<?> ? path + "." + key + "[" + i + "]" : path + "." + key;
            try {
                Quantity q = Quantities.parse(String.valueOf(list.get(i)), Dimension.VOLTAGE);
                if (q.form() == Form.PEAK) {
                    problems.add(new Problem(file, p, String.valueOf(list.get(i)),
                            "is a peak value; write the rms line-to-line voltage (e.g. 24.9 kV)", MessageKey.BAD_QUANTITY));
                }
                out[i] = q.value();
                if (!(out[i] > 0)) {
                    problems.add(new Problem(file, p, String.valueOf(list.get(i)), "must be above 0 V", MessageKey.OUT_OF_RANGE));
                }
            } catch (FerromapException e) {
                problems.add(new Problem(file, p, String.valueOf(list.get(i)), e.getMessage(), e.key()));
                out[i] = Double.NaN;
            }
        }
        return out;
    }

    /** A plain number ("1.05", "1.05 pu", "80 %" or a YAML number); {@code dflt} when absent. */
    double number(String key, double dflt) {
        if (!has(key)) {
            return dflt;
        }
        return parse(map.get(key), path + "." + key, Dimension.DIMENSIONLESS, dflt);
    }

    /** One plain number or a list of them. */
    double[] numbers(String key, double[] dflt) {
        return quantities(key, Dimension.DIMENSIONLESS, dflt);
    }

    /** A whole number in [min, max]; {@code dflt} when absent. */
    int integer(String key, int dflt, int min, int max) {
        if (!has(key)) {
            return dflt;
        }
        Object v = map.get(key);
        if (v instanceof Integer i && i >= min && i <= max) {
            return i;
        }
        problem(key, v, "is not allowed; expected a whole number from " + min + " to " + max, MessageKey.OUT_OF_RANGE);
        return dflt;
    }

    /** A true/false setting; {@code dflt} when absent. */
    boolean flag(String key, boolean dflt) {
        if (!has(key)) {
            return dflt;
        }
        Object v = map.get(key);
        if (v instanceof Boolean b) {
            return b;
        }
        problem(key, v, "is not allowed; expected true or false", MessageKey.BAD_QUANTITY);
        return dflt;
    }

    /** A word among the allowed ones; {@code dflt} when absent. */
    String word(String key, String dflt, String... allowed) {
        if (!has(key)) {
            return dflt;
        }
        String v = String.valueOf(map.get(key));
        if (Arrays.asList(allowed).contains(v)) {
            return v;
        }
        problem(key, v, "is not allowed; expected one of " + String.join(", ", allowed), MessageKey.BAD_QUANTITY);
        return dflt;
    }

    /** One word or a list of words, each among the allowed ones; {@code dflt} when absent. */
    List<String> words(String key, List<String> dflt, String... allowed) {
        if (!has(key)) {
            return dflt;
        }
        Object v = map.get(key);
        List<?> list = v instanceof List<?> l ? l : List.of(v);
        List<String> out = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            String w = String.valueOf(list.get(i));
            if (Arrays.asList(allowed).contains(w)) {
                out.add(w);
            } else {
                String p = v instanceof List<?> ? key + "[" + i + "]" : key;
                problem(p, w, "is not allowed; expected one of " + String.join(", ", allowed), MessageKey.BAD_QUANTITY);
            }
        }
        return out;
    }

    /** Text (file names, labels); {@code dflt} when absent. */
    List<String> texts(String key, List<String> dflt) {
        if (!has(key)) {
            return dflt;
        }
        Object v = map.get(key);
        List<?> list = v instanceof List<?> l ? l : List.of(v);
        List<String> out = new ArrayList<>();
        for (Object o : list) {
            out.add(String.valueOf(o));
        }
        return out;
    }

    private double parse(Object value, String p, Dimension d, double dflt) {
        if (value instanceof Number n && d == Dimension.DIMENSIONLESS) {
            return n.doubleValue();
        }
        try {
            Quantity q = Quantities.parse(String.valueOf(value), d);
            return q.value();
        } catch (FerromapException e) {
            problems.add(new Problem(file, p, String.valueOf(value), e.getMessage(), e.key()));
            return dflt;
        }
    }
}
