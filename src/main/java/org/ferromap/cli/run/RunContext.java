package org.ferromap.cli.run;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.report.Notebook;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;

/** What the analyses of one notebook run share. Not thread-safe; one per run. */
final class RunContext {

    final Study study;
    final StudyParameters params;
    final String studyName;
    final Path outRoot;
    final int threads;
    final PrintWriter progress;
    final List<String> notes = new ArrayList<>();
    final List<Runnable> afterCommit = new ArrayList<>();
    Notebook notebook;
    Path folder;

    RunContext(Study study, String studyName, Path outRoot, int threads, PrintWriter progress) {
        this.study = study;
        this.params = new StudyParameters(study);
        this.studyName = studyName;
        this.outRoot = outRoot;
        this.threads = threads;
        this.progress = progress;
    }

    /** Adds a note to the notebook's assumptions and notes. */
    void note(String s) {
        notes.add(s);
    }

    /** The folder holding the study file (relative paths in settings are resolved from it). */
    Path studyFolder() {
        Path f = study.file();
        Path parent = f == null ? null : f.toAbsolutePath().getParent();
        return parent == null ? Path.of("").toAbsolutePath() : parent;
    }
}
