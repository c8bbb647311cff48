package org.ferromap.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.FoldCurveResult;
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

/** Fold curves of the single-harmonic balance in a plane of two parameters, with cusps and labelled regions. */
@Command(name = "folds", header = "Trace fold curves and cusps of the LC balance in a plane of two parameters.", description = {
    "Trace the folds of the single-harmonic LC balance in the plane of two parameters: P1 (--vary) over",
    "[--from, --to] and P2 (--and) over [--and-from, --and-to] (default: a decade centred on the study's",
    "value). Cusps are located; the regions between the curves are labelled one state, bistable or",
    "ferroresonant-only from the steady states at a point inside each. Chart, CSV and JSON under",
    "<out>/<study>/folds. Values as in study files ('60 kV peak', '0.5 uF', '3 km')."})
final class FoldsCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Option(names = "--vary", required = true, paramLabel = "P1", description = "Parameter the folds are in (as for branch).")
    String vary;

    @Option(names = "--from", required = true, paramLabel = "Q", description = "One end of the P1 range.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "Q", description = "The other end of the P1 range.")
    String to;

    @Option(names = "--and", required = true, paramLabel = "P2", description = "Second parameter, along which the folds are followed.")
    String and;

    @Option(names = "--and-from", paramLabel = "Q", description = "One end of the P2 range (default: the study's value / sqrt(10)).")
    String andFrom;

    @Option(names = "--and-to", paramLabel = "Q", description = "The other end of the P2 range (default: the study's value * sqrt(10)).")
    String andTo;

    /** JSON contract of {@code folds --json}: SI, the source as a peak voltage. */
    record FoldsJson(String study, String p1, String p1Unit, String p2, String p2Unit, double p1From, double p1To,
                     double p2From, double p2To, double studyP1, double studyP2, List<FoldCurveResult.CurvePoint> curve,
                     List<FoldCurveResult.Cusp> cusps, List<FoldCurveResult.Region> regions,
                     List<FoldCurveResult.Segment> segments) {

        static FoldsJson of(String title, double s1, double s2, FoldCurveResult r) {
            return new FoldsJson(title, r.p1(), r.p1Unit(), r.p2(), r.p2Unit(), r.p1From(), r.p1To(), r.p2From(), r.p2To(),
                    s1, s2, r.curve(), r.cusps(), r.regions(), r.segments());
        }
    }

    @Override
    int work() {
        if ((andFrom == null) != (andTo == null)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "give both --and-from and --and-to, or neither (a decade round the study's value)");
        }
        Study s = study.read();
        StudyParameters sp = new StudyParameters(s);
        SweepParameter p1 = sp.parameter(vary);
        SweepParameter p2 = sp.parameter(and);
        if (p1 == p2) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--vary and --and name the same parameter " + vary + "; choose two");
        }
        BalanceAxis a1 = SweepAxes.axis(p1);
        BalanceAxis a2 = SweepAxes.axis(p2);
        double lo1 = SweepAxes.value(from, p1, "--from");
        double hi1 = SweepAxes.value(to, p1, "--to");
        a1.checkRange(Math.min(lo1, hi1), Math.max(lo1, hi1));
        double own1 = sp.valueOf(p1);
        double own2 = sp.valueOf(p2);
        double lo2;
        double hi2;
        if (andFrom != null) {
            lo2 = SweepAxes.value(andFrom, p2, "--and-from");
            hi2 = SweepAxes.value(andTo, p2, "--and-to");
        } else {
            if (!(own2 > 0) || Double.isInfinite(own2)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "the study's " + p2.studyName() + " is " + own2 + " " + a2.unit()
                        + ": no default range can be centred on it; give --and-from and --and-to");
            }
            lo2 = own2 / Math.sqrt(10);
            hi2 = own2 * Math.sqrt(10);
        }
        a2.checkRange(Math.min(lo2, hi2), Math.max(lo2, hi2));
        FoldCurveResult r = new BalanceContinuation().foldCurves(a1, a2, (x, y) -> sp.circuit(p1, x, p2, y),
                lo1, hi1, lo2, hi2, own1, own2);
        FoldsJson json = FoldsJson.of(s.title(), own1, own2, r);
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("folds"))) {
            BalanceCharts.folds(s.title(), r, own1, own2, f.staging(), "folds");
            BalanceCharts.foldsCsv(r, f.file("folds.csv"));
            Json.write(json, f.file("folds.json"));
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(json));
            return Main.OK;
        }
        out().println(s.title());
        out().printf(Locale.ROOT, "  folds in %s (%.6g to %.6g %s) along %s (%.6g to %.6g %s)%n", r.p1(), r.p1From(), r.p1To(),
                r.p1Unit(), r.p2(), r.p2From(), r.p2To(), r.p2Unit());
        out().printf(Locale.ROOT, "  %d fold curve(s), %d points%n", r.segments().size(), r.curve().size());
        for (FoldCurveResult.Cusp c : r.cusps()) {
            out().printf(Locale.ROOT, "  cusp at %s = %.6g %s, %s = %.6g %s, flux %.6g Wb-turn peak%n", r.p1(), c.p1(), r.p1Unit(),
                    r.p2(), c.p2(), r.p2Unit(), c.flux());
        }
        for (FoldCurveResult.Region g : r.regions()) {
            out().printf(Locale.ROOT, "  region %-18s %4.1f %% of the window, e.g. at %s = %.6g %s, %s = %.6g %s%n", g.label(),
                    100 * g.share(), r.p1(), g.p1(), r.p1Unit(), r.p2(), g.p2(), r.p2Unit());
        }
        out().println("  written: " + dir);
        return Main.OK;
    }
}
