package org.ferromap.cli;

import java.nio.file.Path;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.BinomialInterval;
import org.ferromap.maps.DampingSettings;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.OddsResult;
import org.ferromap.maps.OddsSettings;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;
import org.ferromap.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** The probability of ferroresonance over random switching instants and residual flux. */
@Command(name = "odds", header = "Probability of ferroresonance over random switching instants and residual flux.",
        description = {
    "Monte Carlo over the switching instant and the residual flux, the same for a seed whatever the thread count, "
            + "with a confidence interval (Clopper-Pearson or Wilson) and the runs needed for a precision; with "
            + "--precision, runs are added up to that number. Settings: the study's analyses.odds block, then these "
            + "options.",
    "Charts (PNG, SVG, PDF), CSV and JSON go to <out>/<study>/odds. Exit 0 with a result, 1 when a computation "
            + "fails, 2 for a bad study or request (nothing is written)."})
final class OddsCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Mixin
    ThreadOptions threads;

    @Option(names = "--runs", paramLabel = "N", description = "Runs (default: the study's, else 200).")
    Integer runs;

    @Option(names = "--seed", paramLabel = "S", description = "Seed (default: the study's, else 1).")
    Long seed;

    @Option(names = "--precision", paramLabel = "P", description = {"Wanted half-width of the interval, e.g. 0.05; runs are",
        "added up to the number the normal approximation asks for (at most --max-runs)."})
    Double precision;

    @Option(names = "--confidence", paramLabel = "C", description = "Confidence level (default 0.95).")
    Double confidence;

    @Option(names = "--method", paramLabel = "M", description = "Interval: clopper-pearson (default) or wilson.")
    String method;

    @Option(names = "--max-runs", paramLabel = "N", description = "Most runs in all (default 20000).")
    Integer maxRuns;

    @Option(names = "--residual-flux", paramLabel = "R", description = "Largest residual flux, pu of rated peak flux (default 0.8).")
    Double residualFlux;

    @Mixin
    LoopPointOptions point;

    @Override
    int work() {
        Study s = study.read();
        OddsSettings settings = OddsSettings.from(s);
        if (maxRuns != null) {
            settings = settings.withMaxRuns(maxRuns);
        }
        if (runs != null) {
            if (runs < 1 || runs > settings.maxRuns()) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, "--runs " + runs + " is not allowed; expected 1 to max runs ("
                        + settings.maxRuns() + ")");
            }
            settings = settings.withRuns(runs);
        }
        if (seed != null) {
            settings = settings.withSeed(seed);
        }
        if (precision != null) {
            settings = settings.withPrecision(precision);
        }
        if (confidence != null) {
            settings = settings.withConfidence(confidence);
        }
        if (method != null) {
            BinomialInterval.Method m = BinomialInterval.Method.of(method);
            if (m == null) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "--method " + method + " is not allowed; expected clopper-pearson or wilson");
            }
            settings = settings.withMethod(m);
        }
        if (residualFlux != null) {
            settings = settings.withResidualFlux(residualFlux);
        }
        Double length = point.length(s);
        if (length != null) {
            settings = settings.withLength(length);
        }
        Double voltage = point.voltage(s);
        if (voltage != null) {
            settings = settings.withVoltage(voltage);
        }
        LocalPoolExecutor ex = threads.executor();
        OddsResult r;
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("odds"))) {
            r = DeliverableSections.odds(s, settings, ex, f.staging(), null);
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(r));
            return Main.OK;
        }
        var o = out();
        o.println(s.title());
        o.printf("  %d of %d runs ferroresonant: probability %.3g, %.3g %% %s interval [%.3g, %.3g] (half-width %.3g), seed %d%n",
                r.ferroresonant(), r.runs(), r.probability(), 100 * r.interval().confidence(), r.interval().method(),
                r.interval().lower(), r.interval().upper(), r.interval().halfWidth(), r.seed());
        o.println("  settled modes: " + r.counts());
        for (OddsResult.Needed n : r.needed()) {
            o.printf("  runs needed for +-%.3g: %d%n", n.halfWidth(), n.runs());
        }
        if (r.precisionReached() != null) {
            o.println("  precision " + r.precision() + (r.precisionReached() ? " reached" : " NOT reached (max runs)"));
        }
        for (String n : r.notes()) {
            o.println("  note: " + n);
        }
        o.println("  written: " + dir);
        return Main.OK;
    }
}
