package org.ferromap.cli.run;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.cli.DeliverableSections;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.ComparisonSettings;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;

/**
 * {@code compare}: this study's core design beside others ({@code with}: study files relative to
 * this study's folder), ranked (docs/DELIVERABLES.md), settings as docs/STUDY-FORMAT.md gives them
 * ({@link ComparisonSettings#from}). The files are read when planning, so a missing or bad one
 * ends the run before anything is written; circuit-form studies are noted and skipped.
 */
final class CompareAnalysis implements Analysis {

    @Override
    public String name() {
        return "compare";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings raw = AnalysisSettings.of(name(), settings, List.of("with", "steps", "margins", "use-map"));
        List<String> files = raw.texts("with");
        if (files.isEmpty()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.compare needs 'with': the study file(s) to compare with");
        }
        List<Study> studies = new ArrayList<>();
        studies.add(ctx.study);
        for (String f : files) {
            Path p = ctx.studyFolder().resolve(f);
            if (!Files.isRegularFile(p)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.compare.with: " + p + " is not a file");
            }
            studies.add(StudyReader.read(p));
        }
        for (Study s : studies) {
            if (!s.isEquipmentForm()) {
                ctx.note("compare: skipped; a core comparison needs equipment studies (" + s.title() + " gives the circuit only)");
                return null;
            }
        }
        ComparisonSettings cs = ComparisonSettings.from(ctx.study);
        return c -> DeliverableSections.compare(studies, cs, new LocalPoolExecutor(c.threads), c.folder, c.notebook);
    }
}
