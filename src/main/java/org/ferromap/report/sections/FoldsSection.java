package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.CuspCondition;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldCurveResult;
import org.ferromap.report.BalanceCharts;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;

/**
 * The folds and the cusp: the study's folds in a table with the cusp condition, and the fold
 * curves traced by continuation in a plane of two parameters (the folds command's chart,
 * {@link BalanceCharts#folds}) with the cusps and the regions they bound.
 */
public final class FoldsSection {

    private FoldsSection() {
    }

    /**
     * @param title               the study's title
     * @param folds               the study's folds in source voltage
     * @param cusp                the study's cusp condition
     * @param foldFreeConductance total shunt conductance at which the study's fold pair vanishes, S
     * @param conductance         the study's shunt conductance, S
     * @param curves              the fold curves in the plane
     * @param studyP1             the study's value of the first parameter, its unit
     * @param studyP2             the study's value of the second parameter
     */
    public record Data(String title, List<Fold> folds, CuspCondition cusp, double foldFreeConductance, double conductance,
            FoldCurveResult curves, double studyP1, double studyP2) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("folds", "Folds and cusps");
        if (d.folds().isEmpty()) {
            nb.text("At the study's values the branch has no fold pair: the steady state is unique at every source voltage.");
        } else {
            List<List<String>> rows = new ArrayList<>();
            for (Fold f : d.folds()) {
                rows.add(List.of(f.direction().label(), Fmt.si(f.sourcePeak(), "V"), Fmt.pu(f.sourcePerUnit()),
                        Fmt.si(f.voltage(), "V")));
            }
            nb.table(List.of("fold", "source (peak)", "source (pu)", "terminal voltage (peak)"), rows);
        }
        CuspCondition c = d.cusp();
        nb.text("Bistability needs a total capacitance above C_min = " + Fmt.si(c.minimumCapacitance(), "F")
                + " (the study has " + Fmt.sig(c.capacitanceRatio(), 4) + " times that); a total shunt conductance of "
                + Fmt.si(d.foldFreeConductance(), "S") + " or more removes the fold pair (the study has "
                + Fmt.si(d.conductance(), "S") + ").");
        FoldCurveResult r = d.curves();
        nb.text("Fold curves in " + r.p1() + " (" + Fmt.sig(r.p1From(), 4) + " to " + Fmt.sig(r.p1To(), 4) + " " + r.p1Unit()
                + ") along " + r.p2() + " (" + Fmt.sig(r.p2From(), 4) + " to " + Fmt.sig(r.p2To(), 4) + " " + r.p2Unit()
                + "), traced by continuation: " + r.segments().size() + " curve(s), " + r.curve().size() + " points, "
                + r.cusps().size() + " cusp(s).");
        List<List<String>> rows = new ArrayList<>();
        for (FoldCurveResult.Cusp k : r.cusps()) {
            rows.add(List.of("cusp", Fmt.sig(k.p1(), 5) + " " + r.p1Unit(), Fmt.sig(k.p2(), 5) + " " + r.p2Unit(),
                    k.located() ? "located" : "bracketed"));
        }
        for (FoldCurveResult.Region g : r.regions()) {
            rows.add(List.of("region: " + g.label(), Fmt.sig(g.p1(), 5) + " " + r.p1Unit(), Fmt.sig(g.p2(), 5) + " "
                    + r.p2Unit(), Fmt.percent(g.share()) + " of the window"));
        }
        if (!rows.isEmpty()) {
            nb.table(List.of("feature", r.p1(), r.p2(), "note"), rows);
        }
        Path dir = Figures.folder(notebook, "folds");
        BalanceCharts.folds(d.title(), r, d.studyP1(), d.studyP2(), dir, "folds");
        BalanceCharts.foldsCsv(r, dir.resolve("folds.csv"));
        Json.write(r, dir.resolve("folds.json"));
        nb.figure("folds/folds", "Fold curves of the single-harmonic balance in the plane of " + r.p1() + " and " + r.p2()
                + ", cusps marked and the regions between the curves labelled", List.of("folds/folds.csv", "folds/folds.json"));
        nb.end();
    }
}
