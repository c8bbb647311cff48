package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.List;
import org.ferromap.balance.CriticalLengthResult;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;

/** Critical cable lengths: where the folds of the balance cross the source as the cable grows (DOMAIN.md section 4). */
public final class LimitsSection {

    private LimitsSection() {
    }

    /**
     * @param result      the lengths found, m
     * @param studyLength the study's cable length, m
     * @param fromLength  shortest length searched, m
     * @param toLength    longest length searched, m
     */
    public record Data(CriticalLengthResult result, double studyLength, double fromLength, double toLength) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("limits", "Critical cable lengths");
        CriticalLengthResult r = d.result();
        nb.text("Searched from " + Fmt.si(d.fromLength(), "m") + " to " + Fmt.si(d.toLength(), "m") + " of cable, other values "
                + "as in the study (" + Fmt.si(d.studyLength(), "m") + "); each length's own source voltage is compared with "
                + "its folds. " + capitalised(r.note()) + ".");
        nb.table(List.of("limit", "cable length"), List.of(
                List.of("fold pair born (bistability begins)", Fmt.si(r.cuspLength(), "m")),
                List.of("jump-down fold reaches the source (a ferroresonant state exists)", Fmt.si(r.jumpDownLength(), "m")),
                List.of("jump-up fold reaches the source (the normal state is lost)", Fmt.si(r.jumpUpLength(), "m")),
                List.of("jump-up fold above the source again (normal state back)", Fmt.si(r.jumpUpExitLength(), "m"))));
        Json.write(d, Figures.folder(notebook, "limits").resolve("limits.json"));
        nb.text("Data: limits/limits.json.");
        nb.end();
    }

    private static String capitalised(String s) {
        return s == null || s.isEmpty() ? "" : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
