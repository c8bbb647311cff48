package org.ferromap.cli.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.ferromap.study.Study;
import org.junit.jupiter.api.Test;

class NotebookRunTest {

    /** Every analysis a study may list has a notebook step, in the study format's own order (docs/STUDY-FORMAT.md). */
    @Test
    void everyAnalysisAStudyMayListHasASection() {
        assertEquals(Study.ANALYSIS_NAMES, List.copyOf(NotebookRun.ANALYSES.keySet()));
    }
}
