package org.ferromap.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.BranchResult;
import org.ferromap.balance.StartState;
import org.ferromap.continuation.StopReason;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.BalanceCharts;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** A branch of the LC balance in one parameter, by continuation, with its folds and stability. */
@Command(name = "branch", header = "Follow one steady state of the LC balance as a parameter varies, through its folds.", description = {
    "Follow the steady state of the LC balance as one parameter varies over a range (continuation through",
    "the folds), with stability, folds and branch points; chart (PNG, SVG, PDF), CSV and JSON under",
    "<out>/<study>/branch. The branch starts at the study's own value (clamped into the range) on the",
    "normal state, or on the upper (ferroresonant) one with --start upper, and is followed both ways.",
    "Values as in study files: '60 kV peak' (the source must say peak or rms), '0.5 uF', '3 km'."})
final class BranchCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Option(names = "--vary", required = true, paramLabel = "PARAM",
            description = "Parameter to vary: source, series-capacitance, shunt-capacitance, core-loss-resistance, "
                    + "load-resistance, frequency; for equipment studies also cable-length, source-line-voltage, no-load-loss.")
    String vary;

    @Option(names = "--from", required = true, paramLabel = "Q", description = "One end of the range.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "Q", description = "The other end of the range.")
    String to;

    @Option(names = "--harmonics", paramLabel = "H", defaultValue = "1",
            description = "Harmonics of the balance: 1 single-harmonic (default), more for the multi-harmonic balance (odd harmonics up to H).")
    int harmonics;

    @Option(names = "--start", paramLabel = "STATE", defaultValue = "normal",
            description = "State to start on at the study's value: normal (default) or upper (the ferroresonant state).")
    String start;

    /** JSON contract of {@code branch --json}: SI, the source as a peak voltage. */
    record BranchJson(String study, String parameter, String unit, int harmonics, String stability, double from, double to,
                      double studyValue, double start, StartState startState, String startKind, List<BranchResult.Point> points,
                      List<BranchResult.Special> folds, List<BranchResult.Special> branchPoints, StopReason increasingStop,
                      String increasingDetail, StopReason decreasingStop, String decreasingDetail, int rejectedSteps) {

        static BranchJson of(String title, double studyValue, BranchResult r) {
            return new BranchJson(title, r.parameter(), r.unit(), r.harmonics(), r.stability(), r.from(), r.to(), studyValue,
                    r.start(), r.startState(), r.startKind(), r.points(), r.folds(), r.branchPoints(), r.increasingStop(),
                    r.increasingDetail(), r.decreasingStop(), r.decreasingDetail(), r.rejectedSteps());
        }
    }

    @Override
    int work() {
        StartState state = switch (start.toLowerCase(Locale.ROOT)) {
            case "normal" -> StartState.NORMAL;
            case "upper" -> StartState.UPPER;
            default -> throw new FerromapException(MessageKey.BAD_REQUEST, "--start " + start + " is not allowed; expected normal or upper");
        };
        BalanceContinuation.checkHarmonics(harmonics);
        Study s = study.read();
        StudyParameters sp = new StudyParameters(s);
        SweepParameter p = sp.parameter(vary);
        BalanceAxis axis = SweepAxes.axis(p);
        double lo = SweepAxes.value(from, p, "--from");
        double hi = SweepAxes.value(to, p, "--to");
        axis.checkRange(Math.min(lo, hi), Math.max(lo, hi));
        double own = sp.valueOf(p);
        BranchResult r = new BalanceContinuation().branch(axis, v -> sp.circuit(p, v), lo, hi, own, harmonics, state);
        BranchJson json = BranchJson.of(s.title(), own, r);
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("branch"))) {
            BalanceCharts.branch(s.title(), r, own, f.staging(), "branch");
            BalanceCharts.branchCsv(r, f.file("branch.csv"));
            Json.write(json, f.file("branch.json"));
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(json));
            return Main.OK;
        }
        out().println(s.title());
        String asked = state == StartState.NORMAL ? "normal" : "ferroresonant";
        out().printf(Locale.ROOT, "  %s branch from %s to %s %s, %s, started at %.6g %s on the %s state%s%n", r.parameter(),
                num(r.from()), num(r.to()), r.unit(), r.harmonics() == 1 ? "single-harmonic" : r.harmonics() + " harmonics",
                r.start(), r.unit(), r.startKind(), r.startKind().equals(asked) ? ""
                        : " (the only stable state there; --start " + state.name().toLowerCase(Locale.ROOT) + " asked for another)");
        out().printf(Locale.ROOT, "  %d points, stability by %s%n", r.points().size(), r.stability());
        if (r.folds().isEmpty()) {
            out().println("  no fold in the range");
        }
        for (BranchResult.Special fold : r.folds()) {
            out().printf(Locale.ROOT, "  fold at %s = %.6g %s: flux %.6g Wb-turn peak, voltage %.6g V peak%n", r.parameter(),
                    fold.parameter(), r.unit(), fold.flux(), fold.voltage());
        }
        for (BranchResult.Special bp : r.branchPoints()) {
            out().printf(Locale.ROOT, "  branch point at %s = %.6g %s: flux %.6g Wb-turn peak%n", r.parameter(),
                    bp.parameter(), r.unit(), bp.flux());
        }
        out().println("  increasing run: " + r.increasingStop() + " (" + r.increasingDetail() + ")");
        out().println("  decreasing run: " + r.decreasingStop() + " (" + r.decreasingDetail() + ")");
        out().println("  written: " + dir);
        return Main.OK;
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
