package org.ferromap.report.sections;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.report.Notebook;

/** The assumptions the study took (its notes) and those of the methods, and the analyses not run. */
public final class AssumptionsSection {

    /** What every notebook's methods assume. */
    public static final List<String> METHOD_ASSUMPTIONS = List.of(
            "Steady states come from the single-harmonic balance (the graphical method, DOMAIN.md section 3): "
                    + "fold voltages are approximate, typically within a few percent of the time-domain ones, more for "
                    + "sharp knees.",
            "Time-domain runs integrate the single-phase equivalent circuit from the switching instant with the "
                    + "stated residual flux and classify the settled state (normal, fundamental, subharmonic, "
                    + "quasi-periodic, chaotic; undetermined when it could not be settled within the periods allowed).",
            "The magnetizing branch is single-valued (no hysteresis); the cable is lumped; switching is ideal.");

    private AssumptionsSection() {
    }

    /**
     * @param studyNotes the study's notes (assumptions taken while reading it)
     * @param runNotes   notes from this run (settings chosen, analyses skipped)
     */
    public static void write(Notebook nb, List<String> studyNotes, List<String> runNotes) {
        nb.section("assumptions", "Assumptions and notes");
        List<String> all = new ArrayList<>(studyNotes);
        all.addAll(METHOD_ASSUMPTIONS);
        nb.list(all);
        if (!runNotes.isEmpty()) {
            nb.text("Notes from this run:");
            nb.list(runNotes);
        }
        nb.end();
    }
}
