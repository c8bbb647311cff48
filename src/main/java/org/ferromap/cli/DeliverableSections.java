package org.ferromap.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.CellExecutor;
import org.ferromap.maps.ComparisonResult;
import org.ferromap.maps.ComparisonSettings;
import org.ferromap.maps.CoreComparison;
import org.ferromap.maps.DampingResult;
import org.ferromap.maps.DampingSettings;
import org.ferromap.maps.DampingSizing;
import org.ferromap.maps.LimitSettings;
import org.ferromap.maps.LimitTable;
import org.ferromap.maps.LimitTableResult;
import org.ferromap.maps.OddsResult;
import org.ferromap.maps.OddsSettings;
import org.ferromap.maps.SwitchingOdds;
import org.ferromap.report.ComparisonReport;
import org.ferromap.report.DampingReport;
import org.ferromap.report.LimitReport;
import org.ferromap.report.Notebook;
import org.ferromap.report.OddsReport;
import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;

/**
 * The four deliverables as self-contained sections: each computes its result (maps), writes its
 * charts, CSV and JSON into a folder with a fixed file prefix (report), and, given a notebook,
 * adds its section there. The commands call them with a fresh output folder; the notebook calls
 * them for each of {@code limits}, {@code compare}, {@code damping}, {@code odds} that a study's
 * {@code analyses:} lists, with the settings written there.
 */
public final class DeliverableSections {

    /** The analyses these sections serve, as study files name them. */
    public static final List<String> NAMES = List.of("limits", "compare", "damping", "odds");

    private DeliverableSections() {
    }

    /** The section of one analysis with the study's own settings; {@code nb} may be null. */
    public static Object section(String analysis, Study study, CellExecutor executor, Path dir, Notebook nb) {
        return switch (analysis) {
            case "limits" -> limits(study, LimitSettings.from(study), executor, dir, nb);
            case "compare" -> compare(study, executor, dir, nb);
            case "damping" -> damping(study, DampingSettings.from(study), executor, dir, nb);
            case "odds" -> odds(study, OddsSettings.from(study), executor, dir, nb);
            default -> throw new FerromapException(MessageKey.BAD_REQUEST, "'" + analysis + "' is not a deliverable section; "
                    + "expected one of " + String.join(", ", NAMES));
        };
    }

    public static LimitTableResult limits(Study study, LimitSettings settings, CellExecutor executor, Path dir, Notebook nb) {
        LimitTableResult r = LimitTable.compute(study, settings, executor);
        LimitReport.write(r, dir, "limits");
        if (nb != null) {
            LimitReport.section(r, nb, "limits");
        }
        return r;
    }

    /** The comparison of a study with the studies its {@code analyses: compare: with:} names. */
    public static ComparisonResult compare(Study study, CellExecutor executor, Path dir, Notebook nb) {
        ComparisonSettings settings = ComparisonSettings.from(study);
        if (settings.with().isEmpty()) {
            throw new FerromapException(MessageKey.MISSING_KEY, study.file() + ": analyses.compare.with is missing; name the "
                    + "study files of the other core designs, e.g. with: [other-core.yaml]");
        }
        List<Study> studies = new ArrayList<>();
        studies.add(study);
        for (Path p : settings.with()) {
            studies.add(StudyReader.read(p));
        }
        return compare(studies, settings, executor, dir, nb);
    }

    public static ComparisonResult compare(List<Study> studies, ComparisonSettings settings, CellExecutor executor, Path dir, Notebook nb) {
        ComparisonResult r = CoreComparison.compare(studies, settings, executor);
        ComparisonReport.write(r, dir, "compare");
        if (nb != null) {
            ComparisonReport.section(r, nb, "compare");
        }
        return r;
    }

    public static DampingResult damping(Study study, DampingSettings settings, CellExecutor executor, Path dir, Notebook nb) {
        DampingResult r = DampingSizing.size(study, settings, executor);
        DampingReport.write(r, dir, "damping");
        if (nb != null) {
            DampingReport.section(r, nb, "damping");
        }
        return r;
    }

    public static OddsResult odds(Study study, OddsSettings settings, CellExecutor executor, Path dir, Notebook nb) {
        OddsResult r = SwitchingOdds.estimate(study, settings, executor);
        OddsReport.write(r, dir, "odds");
        if (nb != null) {
            OddsReport.section(r, nb, "odds");
        }
        return r;
    }
}
