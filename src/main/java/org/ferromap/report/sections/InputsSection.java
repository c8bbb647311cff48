package org.ferromap.report.sections;

import java.util.List;
import org.ferromap.report.Notebook;
import org.ferromap.study.Study;

/** The inputs: what the study is, and the study file exactly as read. */
public final class InputsSection {

    private InputsSection() {
    }

    /**
     * @param nb        the notebook
     * @param s         the study
     * @param fileName  the study file's name
     * @param fileText  the study file's text as read (null when not available)
     * @param analyses  the analyses the study asks for, in order
     */
    public static void write(Notebook nb, Study s, String fileName, String fileText, List<String> analyses) {
        nb.section("inputs", "Inputs");
        if (!s.description().isBlank()) {
            nb.text(s.description().strip());
        }
        nb.text("Study file " + fileName + " (" + (s.isEquipmentForm() ? "equipment" : "circuit") + " form); analyses asked for: "
                + (analyses.isEmpty() ? "none" : String.join(", ", analyses)) + ".");
        if (fileText != null) {
            nb.code(fileText);
        }
        nb.end();
    }
}
