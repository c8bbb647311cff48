package org.ferromap.cli.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.TreeSet;
import org.ferromap.study.Study;
import org.junit.jupiter.api.Test;

class NotebookRunTest {

    /** Every analysis a study may list (Study.ANALYSIS_NAMES) has a notebook step. */
    @Test
    void everyAnalysisAStudyMayListHasASection() {
        assertEquals(new TreeSet<>(Study.ANALYSIS_NAMES), new TreeSet<>(NotebookRun.ANALYSES.keySet()));
    }
}
