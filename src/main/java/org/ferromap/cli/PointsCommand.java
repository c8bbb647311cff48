package org.ferromap.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.CriticalLength;
import org.ferromap.balance.CriticalLengthResult;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldDirection;
import org.ferromap.balance.FoldMargin;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.LinearCriterion;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.Csv;
import org.ferromap.report.Json;
import org.ferromap.report.OperatingPointCharts;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Every steady state of the single-harmonic balance at the study's source voltage, the folds and the margin. */
@Command(name = "points", header = "Steady states, folds and jump margin of the LC balance at the study voltage.", description = {
    "Operating points of the LC balance at the study's source voltage (the graphical method):",
    "every steady state with its stability and kind, the jump-up and jump-down folds in source",
    "voltage, the margin to the jump, and for equipment studies the critical cable length.",
    "Writes a chart (PNG, SVG, PDF), CSV and JSON under <out>/<study>/points."})
final class PointsCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Option(names = "--k", paramLabel = "K", description = {
        "Threshold K on Xc/Xm for the linear cable-length criterion (equipment studies).",
        "Default: the fundamental linear resonance of the loop, K = Leq/Lm [derived, DOMAIN §4];",
        "the often quoted K = 40 is Hopkinson 1965 [from memory]. Both are always listed."})
    Double k;

    /** JSON contract of {@code points --json}. */
    record PointsJson(String study, List<PointJson> operatingPoints, List<FoldJson> folds, CircuitJson equivalentCircuit,
                      MarginJson margin, String exactness, List<LengthJson> criticalLength, LengthFromFolds criticalLengthFromFolds) { }

    /** An operating point: peak Wb-turn, peak V. */
    record PointJson(double flux, double voltage, double voltagePu, boolean stable, String kind) { }

    /** A fold: peak source V at the fold, flux Wb-turn. */
    record FoldJson(double source, double sourcePu, double flux, String jump) { }

    /** The circuit the balance solved, SI (coreLossResistance null when lossless). */
    record CircuitJson(double source, double seriesCapacitance, double shuntCapacitance, Double coreLossResistance,
                       Double loadResistance, double frequency, double ratedPeak, String magnetizing) { }

    /** Margin from the source to the jump-up fold. */
    record MarginJson(double ratio, double headroom, String note) { }

    /** The linear criterion with one threshold. */
    record LengthJson(double threshold, String thresholdSource, double ratio, double criticalLength, boolean withinLimit) { }

    /** Lengths from the computed folds (NaN/null where none in the range searched). */
    record LengthFromFolds(double cuspLength, double jumpDownLength, double jumpUpLength, double jumpUpExitLength,
                           double searchedFrom, double searchedTo, String note) { }

    /** Cable lengths searched for fold-based limits, m (10 m to 100 km covers distribution practice). */
    private static final double MIN_LENGTH = 10;
    private static final double MAX_LENGTH = 100e3;

    @Override
    int work() {
        if (k != null && !(k > 0 && Double.isFinite(k))) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--k " + k + " is not allowed; K must be a positive number");
        }
        Study s = study.read();
        EquivalentCircuit c = s.circuit();
        SingleHarmonicBalance bal = new SingleHarmonicBalance();
        List<OperatingPoint> pts = bal.operatingPoints(c);
        List<Fold> folds = bal.folds(c);
        FoldMargin margin = bal.margin(c);

        List<PointJson> pj = pts.stream().map(p -> new PointJson(p.flux(), p.voltage(), p.voltagePerUnit(), p.stable(),
                p.kind().label())).toList();
        List<FoldJson> fj = folds.stream().map(f -> new FoldJson(f.sourcePeak(), f.sourcePerUnit(), f.flux(),
                f.direction() == FoldDirection.JUMP_UP ? "up" : "down")).toList();
        CircuitJson cj = new CircuitJson(c.sourcePeak(), c.seriesCapacitance(), c.shuntCapacitance(),
                Double.isInfinite(c.coreLossResistance()) ? null : c.coreLossResistance(),
                Double.isInfinite(c.loadResistance()) ? null : c.loadResistance(), c.omega() / (2 * Math.PI), c.ratedPeak(),
                c.magnetizing().describe());
        List<LengthJson> lengths = new ArrayList<>();
        LengthFromFolds fromFolds = null;
        if (s.isEquipmentForm()) {
            List<LinearCriterion> crits = new ArrayList<>();
            crits.add(k != null ? LinearCriterion.linearResonance().withThreshold(k) : LinearCriterion.linearResonance());
            crits.add(LinearCriterion.hopkinson());
            for (LinearCriterion lc : crits) {
                LinearCriterion.Result r = lc.evaluate(s.equipment());
                lengths.add(new LengthJson(r.threshold(), r.thresholdSource(), r.ratio(), r.criticalLength(), r.withinLimit()));
            }
            StudyParameters sp = new StudyParameters(s);
            CriticalLengthResult cl = new CriticalLength().find(len -> sp.circuit(SweepParameter.CABLE_LENGTH, len),
                    MIN_LENGTH, MAX_LENGTH, c.sourcePeak());
            fromFolds = new LengthFromFolds(cl.cuspLength(), cl.jumpDownLength(), cl.jumpUpLength(), cl.jumpUpExitLength(),
                    MIN_LENGTH, MAX_LENGTH, cl.note());
        }
        PointsJson result = new PointsJson(s.title(), pj, fj, cj, new MarginJson(margin.ratio(), margin.headroom(), margin.note()),
                s.exactness().explanation(), lengths, fromFolds);

        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("points"))) {
            double[][] curve = OperatingPointCharts.graphical(s.title(), c, pts, f.staging(), "graphical-method");
            List<List<?>> rows = new ArrayList<>();
            for (int i = 0; i < curve[0].length; i++) {
                rows.add(List.of(curve[0][i], curve[1][i] * 1e3));
            }
            Csv.write(f.file("graphical-method.csv"), List.of("fundamental current (A peak)", "voltage (V peak)"), rows);
            List<List<?>> prow = new ArrayList<>();
            for (OperatingPoint p : pts) {
                prow.add(List.of(p.flux(), p.voltage(), p.voltagePerUnit(), p.current(), p.stable(), p.kind().label()));
            }
            Csv.write(f.file("operating-points.csv"), List.of("flux (Wb-turn peak)", "voltage (V peak)", "voltage (pu)",
                    "fundamental current (A peak)", "stable", "kind"), prow);
            Json.write(result, f.file("points.json"));
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(result));
            return Main.OK;
        }
        var o = out();
        o.println(s.title());
        o.println("  equivalent circuit: " + s.exactness().explanation());
        o.printf("    source %.4g V peak, Cs %.4g F, Cg %.4g F, Rc %s, Rload %s, rated %.4g V peak%n", c.sourcePeak(),
                c.seriesCapacitance(), c.shuntCapacitance(), ohms(c.coreLossResistance()), ohms(c.loadResistance()), c.ratedPeak());
        o.println("    magnetizing: " + c.magnetizing().describe());
        o.println("  operating points:");
        for (OperatingPoint p : pts) {
            o.printf("    %-14s flux %10.4g Wb-turn   voltage %10.4g V peak (%.3f pu)  %s%n", p.kind().label(), p.flux(),
                    p.voltage(), p.voltagePerUnit(), p.stable() ? "stable" : "unstable");
        }
        o.println("  folds in source voltage:");
        if (folds.isEmpty()) {
            o.println("    none: no bistability (the cusp condition is not met)");
        }
        for (Fold f : folds) {
            o.printf("    jump %-4s at source %10.4g V peak (%.3f pu)%n", f.direction() == FoldDirection.JUMP_UP ? "up" : "down",
                    f.sourcePeak(), f.sourcePerUnit());
        }
        o.println("  margin to the jump-up fold: " + (Double.isNaN(margin.ratio()) ? "-" : String.format("%.3f x the source", margin.ratio()))
                + (margin.note() == null || margin.note().isEmpty() ? "" : " (" + margin.note() + ")"));
        for (LengthJson l : lengths) {
            o.printf("  linear criterion Xc/Xm >= %.3g (%s): critical length %.4g m, installed ratio %.3g -> %s%n", l.threshold(),
                    l.thresholdSource(), l.criticalLength(), l.ratio(), l.withinLimit() ? "within" : "BEYOND the limit");
        }
        if (fromFolds != null) {
            o.printf("  from the computed folds (lengths %.0f m to %.0f km searched): %s%n", MIN_LENGTH, MAX_LENGTH / 1e3, fromFolds.note());
            o.println("    bistability begins (cusp): " + metres(fromFolds.cuspLength())
                    + "; ferroresonant state exists at the source from: " + metres(fromFolds.jumpDownLength())
                    + "; normal state lost from: " + metres(fromFolds.jumpUpLength())
                    + (Double.isNaN(fromFolds.jumpUpExitLength()) ? "" : " to " + metres(fromFolds.jumpUpExitLength())));
        }
        o.println("  written: " + dir);
        return Main.OK;
    }

    private static String metres(double m) {
        return Double.isNaN(m) ? "not within the range" : String.format("%.4g m", m);
    }

    private static String ohms(double r) {
        return Double.isInfinite(r) ? "none" : String.format("%.4g ohm", r);
    }
}
