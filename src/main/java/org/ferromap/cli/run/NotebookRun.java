package org.ferromap.cli.run;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ferromap.errors.FerromapException;
import org.ferromap.report.Notebook;
import org.ferromap.report.OutputFolder;
import org.ferromap.report.sections.AssumptionsSection;
import org.ferromap.report.sections.CircuitSection;
import org.ferromap.report.sections.InputsSection;
import org.ferromap.study.Study;

/**
 * {@code ferromap run STUDY}: runs every analysis the study lists and writes the notebook,
 * {@code <out>/<study>/index.html}, with the inputs, the equivalent circuit and its exactness,
 * the assumptions, then one section per analysis in the order listed, each chart with its CSV and
 * JSON beside it. Everything is written into an {@link OutputFolder} and committed at the end, so
 * an interrupted run never leaves a half notebook.
 *
 * <p>Every analysis's settings are checked before anything is computed (exit 2, nothing written).
 * An analysis whose solver fails gets a section saying so and the rest of the notebook is still
 * written. To add an analysis: an {@link Analysis} here, a section class in
 * {@code report.sections}, and a line in {@link #ANALYSES}.
 */
public final class NotebookRun {

    /** The analyses this version runs, by study name. */
    static final Map<String, Analysis> ANALYSES = new LinkedHashMap<>();

    static {
        for (Analysis a : List.of(new PointsAnalysis(), new CurveAnalysis(), new BranchAnalysis(), new FoldsAnalysis(),
                new SimulateAnalysis(), new MapAnalysis(), new LimitsAnalysis(), new OddsAnalysis(), new DampingAnalysis(),
                new CompareAnalysis())) {
            ANALYSES.put(a.name(), a);
        }
    }

    /** What the notebook runs when the study lists no analyses. */
    static final List<String> DEFAULT_ANALYSES = List.of("points", "curve");

    private NotebookRun() {
    }

    /** How a run went. */
    public record Outcome(Path index, List<String> failed) { }

    /**
     * Runs the study's analyses and writes the notebook.
     *
     * @param study     the study
     * @param studyName the study's short name (file name without extension): the notebook folder's name
     * @param outRoot   the output root ({@code --out})
     * @param threads   worker threads
     * @param progress  where progress goes (stderr)
     * @return where index.html is and which analyses failed
     */
    public static Outcome run(Study study, String studyName, Path outRoot, int threads, PrintWriter progress) {
        RunContext ctx = new RunContext(study, studyName, outRoot, threads, progress);
        List<String> names = new ArrayList<>(study.analyses().keySet());
        if (names.isEmpty()) {
            names.addAll(DEFAULT_ANALYSES);
            ctx.note("the study lists no analyses: the notebook shows the operating points and the magnetizing curve");
        }
        List<String> planned = new ArrayList<>();
        List<Analysis.Step> steps = new ArrayList<>();
        for (String n : names) {
            Analysis a = ANALYSES.get(n);
            if (a == null) {
                ctx.note(n + ": skipped; this version of ferromap has no notebook section for it yet");
                continue;
            }
            Analysis.Step s = a.plan(ctx, study.analyses().get(n));
            if (s != null) {
                planned.add(n);
                steps.add(s);
            }
        }
        String text = null;
        Path file = study.file();
        if (file != null && Files.isRegularFile(file)) {
            try {
                text = Files.readString(file);
            } catch (IOException e) {
                ctx.note("the study file could not be read again for the inputs section: " + e.getMessage());
            }
        }
        List<String> failed = new ArrayList<>();
        Path index;
        try (OutputFolder out = OutputFolder.open(outRoot.resolve(studyName))) {
            ctx.folder = out.staging();
            ctx.notebook = new Notebook(study.title());
            InputsSection.write(ctx.notebook, study, file == null ? studyName : file.getFileName().toString(), text, names);
            CircuitSection.write(ctx.notebook, study);
            AssumptionsSection.write(ctx.notebook, study.notes(), ctx.notes);
            for (int i = 0; i < steps.size(); i++) {
                String n = planned.get(i);
                progress.println("run: " + n);
                progress.flush();
                long t0 = System.nanoTime();
                try {
                    steps.get(i).run(ctx);
                } catch (FerromapException e) {
                    if (e.key().isInputError() || e.key() == org.ferromap.errors.MessageKey.INTERRUPTED) {
                        throw e;
                    }
                    failed.add(n);
                    ctx.notebook.section(n + "-failed", n + ": failed");
                    ctx.notebook.caution("The " + n + " analysis failed: " + e.getMessage());
                    ctx.notebook.end();
                }
                progress.printf("run: %s done in %.1f s%n", n, (System.nanoTime() - t0) * 1e-9);
            }
            ctx.notebook.write(out.staging());
            Path dir = out.commit();
            index = dir.resolve("index.html");
        }
        for (Runnable r : ctx.afterCommit) {
            r.run();
        }
        return new Outcome(index, failed);
    }
}
