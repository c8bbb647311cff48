package org.ferromap.cli.run;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.Axis;
import org.ferromap.maps.EnsembleSettings;
import org.ferromap.maps.MapLayer;
import org.ferromap.maps.PlaneAxis;
import org.ferromap.maps.StudyMapSettings;
import org.ferromap.maps.StudyPlane;
import org.ferromap.study.MapAxis;
import org.ferromap.study.MapSettings;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;
import org.ferromap.units.Constants;
import org.ferromap.units.Dimension;
import org.ferromap.units.Form;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;

/**
 * Turns a map request (the study's {@code map:} and {@code analyses: map:} sections, overridden
 * by command-line options) into a {@link StudyPlane} and {@link StudyMapSettings}. Every check
 * happens here, before anything is computed or written.
 */
public final class MapPlanner {

    /** Steps of an axis given on the command line without {@code --x-steps}. */
    public static final int DEFAULT_STEPS = 41;

    /** Settings of the {@code analyses: map:} entry a study may give. */
    static final List<String> SETTING_KEYS = List.of("layers", "angles", "residual-flux", "max-periods", "refine");

    private MapPlanner() {
    }

    /**
     * One axis as asked on the command line; any field may be null (not given).
     *
     * @param parameter the parameter's study name ({@code --x})
     * @param from      first value as a quantity ({@code 10 kV peak}) or a plain number (per unit of the study's value)
     * @param to        last value, same kind as {@code from}
     * @param steps     number of samples, both ends included
     * @param scale     {@code linear} or {@code log}
     */
    public record AxisRequest(String parameter, String from, String to, Integer steps, String scale) {

        /** Nothing given. */
        public static final AxisRequest NONE = new AxisRequest(null, null, null, null, null);

        boolean given() {
            return parameter != null || from != null || to != null || steps != null || scale != null;
        }
    }

    /**
     * The plane: each axis from the command line where given, else from the study's map section.
     * When the command line names the study's own parameter, missing pieces come from the study.
     *
     * @throws FerromapException {@code BAD_REQUEST} (unknown parameter, missing or inconsistent
     *         bounds, no axis at all), {@code BAD_QUANTITY}, {@code OUT_OF_RANGE}
     */
    public static StudyPlane plane(StudyParameters sp, AxisRequest x, AxisRequest y) {
        MapSettings m = sp.study().map();
        PlaneAxis px = axis(sp, "x", x, m == null ? null : m.x());
        PlaneAxis py = axis(sp, "y", y, m == null ? null : m.y());
        return new StudyPlane(sp, px, py);
    }

    static PlaneAxis axis(StudyParameters sp, String which, AxisRequest r, MapAxis studyAxis) {
        if (!r.given()) {
            if (studyAxis == null) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "no " + which + " axis: the study's map: section has none;"
                        + " give --" + which + " PARAM --" + which + "-from Q --" + which + "-to Q [--" + which + "-steps N]"
                        + " (parameters: " + String.join(", ", SweepParameter.names(sp.study().isEquipmentForm())) + ")");
            }
            return StudyPlane.axis(sp, studyAxis);
        }
        SweepParameter p = r.parameter() != null ? sp.parameter(r.parameter())
                : studyAxis != null ? studyAxis.parameter() : null;
        if (p == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--" + which + "-from/-to/-steps/-scale need --" + which
                    + " PARAM: the study's map: section has no " + which + " axis");
        }
        MapAxis base = studyAxis != null && studyAxis.parameter() == p ? studyAxis : null;
        if ((r.from() == null || r.to() == null) && base == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--" + which + " " + p.studyName() + " needs --" + which
                    + "-from and --" + which + "-to (e.g. " + example(p) + "), or a plain number of per unit of the study's value");
        }
        int steps = r.steps() != null ? r.steps() : base != null ? base.steps() : DEFAULT_STEPS;
        if (steps < 2) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--" + which + "-steps " + steps + "; at least 2 (both ends)");
        }
        Axis.Scale scale = r.scale() != null ? scale(which, r.scale())
                : base != null && base.scale() == MapAxis.Scale.LOG ? Axis.Scale.LOG : Axis.Scale.LINEAR;
        boolean perUnit;
        double from;
        double to;
        if (r.from() != null || r.to() != null) {
            if (r.from() == null || r.to() == null) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "give both --" + which + "-from and --" + which
                        + "-to (one of them alone would mix with the study's bounds)");
            }
            Quantity qf = Quantities.parse(r.from(), p.dimension(), Dimension.DIMENSIONLESS);
            Quantity qt = Quantities.parse(r.to(), p.dimension(), Dimension.DIMENSIONLESS);
            perUnit = qf.dimension() == Dimension.DIMENSIONLESS;
            if (perUnit != (qt.dimension() == Dimension.DIMENSIONLESS)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "--" + which + "-from '" + r.from() + "' and --" + which
                        + "-to '" + r.to() + "' must both have a unit or both be plain numbers (per unit of the study's value)");
            }
            from = perUnit ? qf.value() : si(p, qf, which + "-from");
            to = perUnit ? qt.value() : si(p, qt, which + "-to");
        } else {
            perUnit = base.perUnit();
            from = base.from();
            to = base.to();
        }
        if (from == to) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--" + which + "-from equals --" + which + "-to; an axis needs a range");
        }
        return perUnit ? PlaneAxis.perUnit(p, from, to, steps, scale, sp.valueOf(p))
                : PlaneAxis.ofSi(p, from, to, steps, scale);
    }

    /** SI value of a bound: source peaks must say peak or rms; line voltages are rms unless written peak. */
    private static double si(SweepParameter p, Quantity q, String option) {
        if (q.dimension() != Dimension.VOLTAGE) {
            return q.value();
        }
        if (p == SweepParameter.SOURCE) {
            if (q.form() == Form.UNSPECIFIED) {
                throw new FerromapException(MessageKey.BAD_QUANTITY, "--" + option + " '" + q.text()
                        + "' does not say peak or rms; write e.g. '28.17 kV peak'");
            }
            return q.form() == Form.RMS ? q.value() * Constants.SQRT2 : q.value();
        }
        return q.form() == Form.PEAK ? q.value() / Constants.SQRT2 : q.value();
    }

    private static Axis.Scale scale(String which, String s) {
        return switch (s.trim().toLowerCase(Locale.ROOT)) {
            case "log" -> Axis.Scale.LOG;
            case "linear" -> Axis.Scale.LINEAR;
            default -> throw new FerromapException(MessageKey.BAD_REQUEST, "--" + which + "-scale '" + s
                    + "'; allowed: linear, log");
        };
    }

    private static String example(SweepParameter p) {
        return switch (p) {
            case SOURCE -> "--x-from '10 kV peak' --x-to '40 kV peak'";
            case SOURCE_LINE_VOLTAGE -> "--x-from '30 kV' --x-to '38 kV'";
            case CABLE_LENGTH -> "--x-from '100 m' --x-to '5 km'";
            case SERIES_CAPACITANCE, SHUNT_CAPACITANCE -> "--x-from '20 nF' --x-to '0.5 uF'";
            case CORE_LOSS_RESISTANCE, LOAD_RESISTANCE -> "--x-from '100 kOhm' --x-to '5 MOhm'";
            case NO_LOAD_LOSS -> "--x-from '50 W' --x-to '900 W'";
            case FREQUENCY -> "--x-from '45 Hz' --x-to '65 Hz'";
            case SOURCE_ANGLE -> "--x-from '0 deg' --x-to '360 deg'";
        };
    }

    /**
     * What to compute, overridden by command-line values; any override may be null.
     *
     * @param layers       layer names
     * @param angles       switching angles of the time-domain ensemble
     * @param residualFlux residual flux magnitudes, pu of the rated peak flux
     * @param maxPeriods   longest simulation of one event, source periods
     * @param refine       adaptive refinement on or off
     */
    public record SettingsRequest(List<String> layers, Integer angles, List<String> residualFlux, Integer maxPeriods,
            Boolean refine) {

        /** Nothing given. */
        public static final SettingsRequest NONE = new SettingsRequest(null, null, null, null, null);
    }

    /**
     * The settings: defaults, then the study's {@code analyses: map:} settings, then the command
     * line. Unknown keys in the study are refused with the allowed ones.
     */
    public static StudyMapSettings settings(Study study, SettingsRequest cli) {
        StudyMapSettings s = StudyMapSettings.defaults();
        SettingsRequest fromStudy = fromStudy(study.analyses().get("map"));
        for (SettingsRequest r : new SettingsRequest[] {fromStudy, cli}) {
            if (r.layers() != null) {
                List<String> names = new ArrayList<>();
                for (String l : r.layers()) {
                    names.addAll(Arrays.asList(l.split(",")));
                }
                Set<MapLayer> layers = MapLayer.parse(names);
                s = s.withLayers(layers);
            }
            EnsembleSettings e = s.ensemble();
            if (r.angles() != null) {
                e = e.withAngles(r.angles());
            }
            if (r.residualFlux() != null) {
                double[] f = new double[r.residualFlux().size()];
                for (int i = 0; i < f.length; i++) {
                    f[i] = Quantities.number(r.residualFlux().get(i).trim());
                }
                e = e.withResidualFluxes(f);
            }
            if (r.maxPeriods() != null) {
                if (r.maxPeriods() <= e.simulation().transientPeriods()) {
                    throw new FerromapException(MessageKey.BAD_REQUEST, "max periods " + r.maxPeriods()
                            + " must exceed the " + e.simulation().transientPeriods() + " transient periods");
                }
                e = e.withSimulation(e.simulation().withMaxPeriods(r.maxPeriods()));
            }
            s = s.withEnsemble(e);
            if (r.refine() != null) {
                s = s.withRefine(r.refine());
            }
        }
        return s;
    }

    /** Parses {@code on}/{@code off} (also true/false, yes/no). */
    public static Boolean onOff(String option, String v) {
        if (v == null) {
            return null;
        }
        return switch (v.trim().toLowerCase(Locale.ROOT)) {
            case "on", "true", "yes" -> Boolean.TRUE;
            case "off", "false", "no" -> Boolean.FALSE;
            default -> throw new FerromapException(MessageKey.BAD_REQUEST, option + " '" + v + "'; allowed: on, off");
        };
    }

    private static SettingsRequest fromStudy(Object raw) {
        if (!(raw instanceof Map<?, ?> m)) {
            return SettingsRequest.NONE;
        }
        for (Object k : m.keySet()) {
            if (!SETTING_KEYS.contains(String.valueOf(k))) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.map." + k + " is not a map setting; allowed: "
                        + String.join(", ", SETTING_KEYS));
            }
        }
        List<String> layers = null;
        Object l = m.get("layers");
        if (l instanceof List<?> list) {
            layers = list.stream().map(String::valueOf).toList();
        } else if (l != null) {
            layers = List.of(String.valueOf(l));
        }
        List<String> flux = null;
        Object f = m.get("residual-flux");
        if (f instanceof List<?> list) {
            flux = list.stream().map(String::valueOf).toList();
        } else if (f != null) {
            flux = List.of(String.valueOf(f).split(","));
        }
        Object r = m.get("refine");
        return new SettingsRequest(layers, integer("angles", m.get("angles")), flux, integer("max-periods", m.get("max-periods")),
                r == null ? null : onOff("analyses.map.refine", String.valueOf(r)));
    }

    private static Integer integer(String key, Object v) {
        if (v == null) {
            return null;
        }
        if (v instanceof Number n && n.doubleValue() == Math.rint(n.doubleValue())) {
            return n.intValue();
        }
        throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.map." + key + " = " + v + "; a whole number is expected");
    }
}
