package org.ferromap.maps;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.MapAxis;
import org.ferromap.study.MapSettings;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;

/**
 * How to compare core designs ({@code analyses: compare:}, docs/STUDY-FORMAT.md). The overvoltage
 * maps of every design share these axes (absolute values, SI) and one colour scale. Immutable;
 * change with the {@code withX} copies.
 *
 * @param with     the other studies, relative to the study's folder (notebook use; the command
 *                 line names its studies itself)
 * @param x        the horizontal axis of the maps (default cable length, see {@link #defaults})
 * @param y        the vertical axis
 * @param margins  supply voltages (pu) at which the fold-based limits are given; default 1.0, 1.05, 1.1
 */
public record ComparisonSettings(List<Path> with, AxisSpec x, AxisSpec y, double[] margins) {

    /**
     * One map axis in SI.
     *
     * @param parameter what is swept
     * @param from      first value, SI (V rms for source-line-voltage, V peak for source, m for cable-length)
     * @param to        last value, SI
     * @param steps     values, 2 to 400
     * @param log       whether spaced on a log scale
     */
    public record AxisSpec(SweepParameter parameter, double from, double to, int steps, boolean log) {
        public AxisSpec {
            if (steps < 2 || steps > 400) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "comparison map steps = " + steps + "; allowed 2 to 400");
            }
        }

        /** The engine's axis, in SI. */
        public Axis axis() {
            String unit = switch (parameter.dimension()) {
                case LENGTH -> "m";
                case VOLTAGE -> "V";
                case CAPACITANCE -> "F";
                case RESISTANCE -> "ohm";
                case ACTIVE_POWER -> "W";
                case FREQUENCY -> "Hz";
                case ANGLE -> "rad";
                default -> "";
            };
            return new Axis(parameter.studyName(), unit, from, to, steps, log ? Axis.Scale.LOG : Axis.Scale.LINEAR);
        }

        public AxisSpec withSteps(int n) {
            return new AxisSpec(parameter, from, to, n, log);
        }
    }

    public ComparisonSettings {
        with = List.copyOf(with);
        margins = margins.clone();
        if (x == null || y == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "a core comparison needs both map axes");
        }
    }

    @Override
    public double[] margins() {
        return margins.clone();
    }

    /**
     * Default axes from the first study: cable length from 5 m to twice the installed length (at
     * least 1 km), log scale, 40 steps, against the supply from 0.8 to 1.2 times the study's, 17
     * steps: short cables, where the designs' limits lie, and the installed case.
     */
    public static ComparisonSettings defaults(Study first) {
        LimitSettings.requireEquipment(first);
        double l = first.equipment().cableLength();
        double v = first.equipment().sourceLineVoltage();
        AxisSpec x = new AxisSpec(SweepParameter.CABLE_LENGTH, 5.0, Math.max(2 * l, 1000.0), 40, true);
        AxisSpec y = new AxisSpec(SweepParameter.SOURCE_LINE_VOLTAGE, 0.8 * v, 1.2 * v, 17, false);
        return new ComparisonSettings(List.of(), x, y, LimitSettings.DEFAULT_MARGINS);
    }

    /** The axes of the first study's {@code map:} section (two axes needed) instead of the defaults. */
    public ComparisonSettings withStudyMap(Study first) {
        MapSettings m = first.map();
        if (m == null || m.y() == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, first.file() + ": use-map needs a map: section with two axes");
        }
        StudyParameters p = new StudyParameters(first);
        return new ComparisonSettings(with, spec(p, m.x()), spec(p, m.y()), margins);
    }

    /** The study's {@code analyses: compare:} block over the defaults. */
    public static ComparisonSettings from(Study study) {
        ComparisonSettings d = defaults(study);
        AnalysisBlock b = AnalysisBlock.of(study, "compare");
        b.allowOnly("with", "steps", "margins", "use-map");
        if (b.flag("use-map", false)) {
            if (study.map() == null || study.map().y() == null) {
                b.problem("use-map", true, "needs a map: section with two axes in the study", MessageKey.BAD_REQUEST);
            } else {
                d = d.withStudyMap(study);
            }
        }
        List<Path> with = new ArrayList<>();
        Path dir = study.file() == null || study.file().getParent() == null ? Path.of(".") : study.file().getParent();
        for (String f : b.texts("with", List.of())) {
            with.add(dir.resolve(f));
        }
        double[] steps = b.numbers("steps", new double[] {d.x.steps(), d.y.steps()});
        int nx = d.x.steps();
        int ny = d.y.steps();
        if (b.has("steps")) {
            if (steps.length != 2 || !(steps[0] >= 2 && steps[0] <= 400 && steps[1] >= 2 && steps[1] <= 400)) {
                b.problem("steps", b.raw("steps"), "is not allowed; expected [nx, ny], each 2 to 400", MessageKey.OUT_OF_RANGE);
            } else {
                nx = (int) steps[0];
                ny = (int) steps[1];
            }
        }
        double[] margins = b.numbers("margins", d.margins);
        for (double mg : margins) {
            if (!(mg > 0 && mg < 3)) {
                b.problem("margins", mg, "is not allowed; expected per-unit voltages between 0 and 3", MessageKey.OUT_OF_RANGE);
            }
        }
        b.throwIfAny();
        return new ComparisonSettings(with, d.x.withSteps(nx), d.y.withSteps(ny), margins);
    }

    public ComparisonSettings withSteps(int nx, int ny) {
        return new ComparisonSettings(with, x.withSteps(nx), y.withSteps(ny), margins);
    }

    public ComparisonSettings withWith(List<Path> w) {
        return new ComparisonSettings(w, x, y, margins);
    }

    private static AxisSpec spec(StudyParameters p, MapAxis a) {
        double scale = a.perUnit() ? p.valueOf(a.parameter()) : 1.0;
        return new AxisSpec(a.parameter(), a.from() * scale, a.to() * scale, a.steps(), a.scale() == MapAxis.Scale.LOG);
    }
}
