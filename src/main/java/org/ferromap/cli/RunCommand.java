package org.ferromap.cli;

import org.ferromap.cli.run.NotebookRun;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.study.Study;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** The main job: every analysis the study lists, written as one notebook. */
@Command(name = "run", description = {
    "Run every analysis the study lists (analyses:) and write the notebook <out>/<study>/index.html:",
    "inputs, the equivalent circuit and its exactness, operating points, branch and fold charts, maps,",
    "waveforms of representative cells, cautions and assumptions; CSV and JSON beside every chart.",
    "The notebook folder is replaced only when complete. Progress goes to stderr.",
    "Exit 0 done, 1 a computation failed or was stopped, 2 bad input (nothing written)."})
final class RunCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: one per processor).")
    Integer threads;

    @Override
    int work() {
        Study s = study.read();
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        new LocalPoolExecutor(n); // checks the thread count (BAD_REQUEST below 1) before anything runs
        study.folderFor("run"); // refuses an output root where <out>/<study> is a file
        long t0 = System.nanoTime();
        NotebookRun.Outcome o = NotebookRun.run(s, study.name(), study.out, n, err());
        double seconds = (System.nanoTime() - t0) * 1e-9;
        if (study.json) {
            out().println(org.ferromap.report.Json.text(new RunJson(o.index().toString(), o.failed(), seconds)));
        } else {
            out().println(s.title());
            out().printf("  notebook: %s (%.0f s)%n", o.index(), seconds);
            if (!o.failed().isEmpty()) {
                out().println("  failed: " + String.join(", ", o.failed()) + " (the notebook says why)");
            }
        }
        return o.failed().isEmpty() ? Main.OK : Main.FAILED;
    }

    /** {@code run --json}: where the notebook is, which analyses failed, how long it took (s). */
    record RunJson(String notebook, java.util.List<String> failed, double seconds) { }
}
