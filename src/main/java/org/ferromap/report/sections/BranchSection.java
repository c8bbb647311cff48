package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ferromap.balance.BranchResult;
import org.ferromap.report.BalanceCharts;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;

/**
 * A branch of steady states followed through its folds as one parameter varies (the branch
 * command's chart, {@link BalanceCharts#branch}), with its CSV and JSON.
 */
public final class BranchSection {

    private BranchSection() {
    }

    /**
     * @param title      the study's title
     * @param result     the branch
     * @param studyValue the study's own value of the parameter, in the branch's unit
     */
    public record Data(String title, BranchResult result, double studyValue) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        BranchResult r = d.result();
        nb.section("branch", "Branch of steady states in " + r.parameter());
        nb.text(String.format(Locale.ROOT, "The %s steady state at the study's value, followed by continuation from %s to %s %s "
                + "(%s, stability by %s): %d points; stable parts solid, unstable dashed.", r.startKind(), Fmt.sig(r.from(), 4),
                Fmt.sig(r.to(), 4), r.unit(), r.harmonics() == 1 ? "single-harmonic balance" : r.harmonics() + " harmonics",
                r.stability(), r.points().size()));
        List<List<String>> rows = new ArrayList<>();
        for (BranchResult.Special f : r.folds()) {
            rows.add(List.of("fold", Fmt.sig(f.parameter(), 5) + " " + r.unit(), Fmt.si(f.voltage(), "V"), Fmt.sig(f.flux(), 4)
                    + " Wb-turn"));
        }
        for (BranchResult.Special b : r.branchPoints()) {
            rows.add(List.of("branch point", Fmt.sig(b.parameter(), 5) + " " + r.unit(), Fmt.si(b.voltage(), "V"),
                    Fmt.sig(b.flux(), 4) + " Wb-turn"));
        }
        if (rows.isEmpty()) {
            nb.text("No fold in the range: the branch is single-valued there.");
        } else {
            nb.table(List.of("point", r.parameter(), "voltage (peak)", "flux (peak)"), rows);
        }
        nb.text("Runs ended: increasing " + r.increasingStop() + " (" + r.increasingDetail() + "); decreasing "
                + r.decreasingStop() + " (" + r.decreasingDetail() + ").");
        Path dir = Figures.folder(notebook, "branch");
        BalanceCharts.branch(d.title(), r, d.studyValue(), dir, "branch");
        BalanceCharts.branchCsv(r, dir.resolve("branch.csv"));
        Json.write(r, dir.resolve("branch.json"));
        nb.figure("branch/branch", "Magnetizing-branch voltage of the steady states against " + r.parameter()
                + ", followed through the folds; the study's value marked", List.of("branch/branch.csv", "branch/branch.json"));
        nb.end();
    }
}
