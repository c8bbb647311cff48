package org.ferromap.cli;

import java.nio.file.Path;
import org.ferromap.maps.LimitRow;
import org.ferromap.maps.LimitSettings;
import org.ferromap.maps.LimitTableResult;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Cable-length limit tables over ratings, connections, cables, voltage classes and open-phase cases. */
@Command(name = "limits", header = "Cable-length limit table per rating, connection, cable, voltage class and open-phase case.",
        description = {
    "For every rating x primary connection x cable x voltage class x open-phase case of the study's analyses.limits "
            + "block (by default: the study's rating x 0.25, 0.5, 1 and 2, its connection, cable and voltage, one and two "
            + "open phases), the longest cable with no ferroresonant steady state at rated voltage and at the margins "
            + "(1.0, 1.05 and 1.1 pu), from the folds of the balance, with the linear criterion (K = 40 by default) and the "
            + "loop's linear resonance beside it. Typical data per rating are named with their sources (docs/DELIVERABLES.md).",
    "Chart (PNG, SVG, PDF), CSV and JSON go to <out>/<study>/limits. Exit 0 with a table, 1 when a computation "
            + "fails, 2 for a bad study or request (nothing is written)."})
final class LimitsCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Mixin
    ThreadOptions threads;

    @Option(names = "--confirm", description = "Check each rated-voltage limit by simulating switching events at 0.95 of it "
            + "(4 angles; the study's analyses.limits.confirm block, when given, sets these).")
    boolean confirm;

    @Override
    int work() {
        Study s = study.read();
        LimitSettings settings = LimitSettings.from(s);
        if (confirm && settings.confirm() == null) {
            settings = settings.withConfirm(LimitSettings.Confirmation.defaults());
        }
        LocalPoolExecutor ex = threads.executor();
        LimitTableResult r;
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("limits"))) {
            r = DeliverableSections.limits(s, settings, ex, f.staging(), null);
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(r));
            return Main.OK;
        }
        var o = out();
        o.println(s.title());
        o.println("  limit: " + r.limitDefinition());
        o.printf("  %-9s %-9s %-15s %-14s %-4s", "rating", "voltage", "connection", "cable", "open");
        for (LimitRow.MarginLimit m : r.rows().get(0).limits()) {
            o.printf(" %-12s", String.format("at %.3g pu", m.margin()));
        }
        o.printf(" %-14s %-14s %s%n", "linear K", "lin. resonance", "check");
        for (LimitRow row : r.rows()) {
            o.printf("  %-9s %-9s %-15s %-14s %-4d", String.format("%.4g kVA", row.rating() / 1e3),
                    String.format("%.4g kV", row.voltage() / 1e3), row.connection(), row.cable(), row.openPhases());
            for (LimitRow.MarginLimit m : row.limits()) {
                o.printf(" %-12s", metres(m.length()));
            }
            LimitRow.Check c = row.check();
            o.printf(" %-14s %-14s %s%n", metres(row.linearLength()) + " (" + String.format("%.3g", row.linearK()) + ")",
                    metres(row.linearResonanceLength()), c == null ? "-" : c.confirmed() ? "confirmed"
                            : c.offBranch() + "/" + c.events() + " off the predicted state");
        }
        for (String src : r.sources()) {
            o.println("  source: " + src);
        }
        for (String n : r.notes()) {
            o.println("  note: " + n);
        }
        o.println("  written: " + dir);
        return Main.OK;
    }

    static String metres(double m) {
        if (Double.isInfinite(m)) {
            return "no limit";
        }
        return Double.isNaN(m) ? "-" : m >= 999.5 ? String.format("%.3g km", m / 1e3) : String.format("%.3g m", m);
    }
}
