package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.report.Csv;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;

/** This study beside others: the same figures of the balance side by side. */
public final class CompareSection {

    private CompareSection() {
    }

    /**
     * One study's figures.
     *
     * @param file           the study file
     * @param title          its title
     * @param exactness      how faithful its circuit is
     * @param sourcePu       its source, pu of rated peak
     * @param states         the stable steady states at its source (kinds)
     * @param worstPeakPu    the highest stable terminal voltage, pu
     * @param jumpUpPu       source at the jump-up fold, pu (NaN without one)
     * @param marginRatio    jump-up fold over the source (NaN without one)
     * @param capacitanceRatio C / C_min
     * @param dampingResistance total shunt resistance that removes the fold pair, ohm
     */
    public record Row(String file, String title, String exactness, double sourcePu, String states, double worstPeakPu,
            double jumpUpPu, double marginRatio, double capacitanceRatio, double dampingResistance) { }

    public static void write(Notebook nb, Path notebook, List<Row> rows) {
        nb.section("compare", "Comparison with other studies");
        List<List<String>> t = new ArrayList<>();
        List<List<?>> csv = new ArrayList<>();
        for (Row r : rows) {
            t.add(List.of(r.file(), r.title(), r.states(), Fmt.pu(r.worstPeakPu()), Fmt.pu(r.jumpUpPu()),
                    Fmt.sig(r.marginRatio(), 4), Fmt.sig(r.capacitanceRatio(), 4), Fmt.si(r.dampingResistance(), "Ohm"),
                    r.exactness()));
            csv.add(List.of(r.file(), r.title(), r.states(), r.worstPeakPu(), r.jumpUpPu(), r.marginRatio(),
                    r.capacitanceRatio(), r.dampingResistance(), r.exactness()));
        }
        nb.table(List.of("study file", "title", "stable states", "worst peak", "jump-up fold", "jump-up / source",
                "C / C_min", "damping resistance for no fold pair", "exactness"), t);
        Path dir = Figures.folder(notebook, "compare");
        Csv.write(dir.resolve("compare.csv"), List.of("file", "title", "states", "worst peak (pu)", "jump-up fold (pu)",
                "jump-up / source", "C / C_min", "damping resistance (ohm)", "exactness"), csv);
        Json.write(rows, dir.resolve("compare.json"));
        nb.text("Data: compare/compare.csv and compare/compare.json.");
        nb.end();
    }
}
