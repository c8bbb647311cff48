package org.ferromap.cli;

import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;
import org.ferromap.units.Dimension;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;
import picocli.CommandLine.Option;

/**
 * The options of the verbs that vary one parameter of the study over a range (orbits, sweep):
 * --vary, --from, --to. Bounds are quantities in the parameter's kind ("28 kV peak", "0.2 uF",
 * "3 km") or plain numbers / "pu", read as per unit of the study's own value.
 */
final class VaryOptions {

    /**
     * Parameters the orbit verbs accept: those that leave the frequency and the rated voltage (the
     * per-unit bases in which orbit states are carried and compared) unchanged. Source angle only
     * shifts every orbit in time, and frequency changes the bases: both are refused.
     */
    static final List<SweepParameter> SUPPORTED = List.of(SweepParameter.SOURCE, SweepParameter.SERIES_CAPACITANCE,
            SweepParameter.SHUNT_CAPACITANCE, SweepParameter.CORE_LOSS_RESISTANCE, SweepParameter.LOAD_RESISTANCE,
            SweepParameter.CABLE_LENGTH, SweepParameter.SOURCE_LINE_VOLTAGE, SweepParameter.NO_LOAD_LOSS);

    @Option(names = "--vary", required = true, paramLabel = "PARAM", description = "Parameter to vary: source, "
            + "series-capacitance, shunt-capacitance, core-loss-resistance, load-resistance; for equipment studies also "
            + "cable-length, source-line-voltage, no-load-loss.")
    String vary;

    @Option(names = "--from", required = true, paramLabel = "Q", description = "One end of the range, e.g. '20 kV peak', "
            + "'0.1 uF', '500 m' (the source must say peak or rms); a plain number or 'pu' is per unit of the study's own value.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "Q", description = "The other end of the range, same kinds as --from.")
    String to;

    /**
     * The range asked for, checked against the study: a parameter this verb can vary, two
     * different ends inside the parameter's physical range.
     *
     * @throws FerromapException BAD_REQUEST, BAD_QUANTITY or OUT_OF_RANGE (all exit 2)
     */
    Range resolve(Study study) {
        StudyParameters sp = new StudyParameters(study);
        SweepParameter p = SweepParameter.byName(vary);
        List<String> allowed = SUPPORTED.stream().filter(q -> study.isEquipmentForm() || !q.equipmentOnly())
                .map(SweepParameter::studyName).toList();
        if (p == null || !SUPPORTED.contains(p)) {
            String why = p == SweepParameter.FREQUENCY ? " (it changes the per-unit bases the orbit states are compared in)"
                    : p == SweepParameter.SOURCE_ANGLE ? " (it only shifts every orbit in time)" : "";
            throw new FerromapException(MessageKey.BAD_REQUEST, "--vary " + vary + " is not supported here" + why
                    + "; allowed: " + String.join(", ", allowed));
        }
        if (p.equipmentOnly() && !study.isEquipmentForm()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--vary " + vary + " needs an equipment-form study (equipment:); "
                    + "allowed for this circuit-form study: " + String.join(", ", allowed));
        }
        double own = sp.valueOf(p);
        double a = bound("--from", from, p, own);
        double b = bound("--to", to, p, own);
        if (a == b) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the range " + from + " to " + to
                    + " is empty; give two different values");
        }
        double lo = Math.min(a, b);
        double hi = Math.max(a, b);
        check(sp, p, lo, a == lo ? from : to);
        check(sp, p, hi, a == hi ? from : to);
        return new Range(p, sp, lo, hi, own);
    }

    private static void check(StudyParameters sp, SweepParameter p, double v, String text) {
        try {
            sp.circuit(p, v);
        } catch (FerromapException e) {
            throw new FerromapException(e.key().isInputError() ? e.key() : MessageKey.OUT_OF_RANGE,
                    "'" + text + "' is outside what " + p.studyName() + " can be: " + e.getMessage(), e);
        }
    }

    /** A bound in SI: per unit of the study's own value for plain numbers; source peaks must say peak or rms. */
    static double bound(String option, String text, SweepParameter p, double own) {
        Quantity q;
        try {
            q = Quantities.parse(text, p.dimension(), Dimension.DIMENSIONLESS);
        } catch (FerromapException e) {
            throw new FerromapException(e.key(), option + ": " + e.getMessage(), e);
        }
        if (q.dimension() == Dimension.DIMENSIONLESS) {
            if (!(own > 0) || !Double.isFinite(own)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, option + " " + text + " is per unit of the study's "
                        + p.studyName() + ", which is " + own + " " + p.dimension().siUnit() + "; give the value with its unit");
            }
            return q.value() * own;
        }
        return SweepAxes.value(text, p, option); // as the branch and folds verbs read values
    }

    /**
     * A checked range of one parameter.
     *
     * @param parameter the parameter
     * @param study the study as a function of it
     * @param from lower end, SI (source: V peak; source-line-voltage: V rms)
     * @param to upper end, SI, &gt; from
     * @param own the study's own value, SI
     */
    record Range(SweepParameter parameter, StudyParameters study, double from, double to, double own) {

        /** The circuit at a value, SI. */
        EquivalentCircuit circuit(double v) {
            return study.circuit(parameter, v);
        }

        /** The circuit as a function of the value. */
        DoubleFunction<EquivalentCircuit> circuits() {
            return this::circuit;
        }

        /** The parameter's name as the study writes it. */
        String name() {
            return parameter.studyName();
        }

        /** The SI unit of the values. */
        String unit() {
            return parameter.dimension().siUnit();
        }

        /** The unit with the form of a voltage, for reports: "V peak", "V rms", "F", ... */
        String unitLabel() {
            return switch (parameter) {
                case SOURCE -> "V peak";
                case SOURCE_LINE_VOLTAGE -> "V rms";
                default -> unit();
            };
        }

        /** Words for chart axes. */
        String words() {
            return switch (parameter) {
                case SOURCE -> "source peak voltage";
                case SOURCE_LINE_VOLTAGE -> "supply line voltage (rms)";
                default -> parameter.studyName().replace('-', ' ');
            };
        }

        /** Whether v lies in [from, to]. */
        boolean contains(double v) {
            return v >= from && v <= to;
        }

        /** n values from..to evenly spaced, both ends included. */
        double[] values(int n) {
            double[] v = new double[n];
            for (int k = 0; k < n; k++) {
                v[k] = from + (to - from) * k / (n - 1);
            }
            v[n - 1] = to;
            return v;
        }
    }
}
