package org.ferromap.cli;

import org.ferromap.study.Study;
import org.ferromap.study.StudyException;
import org.ferromap.study.StudyReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** Validates a study and lists every problem with its path in the file. */
@Command(name = "check", header = "Validate a study file and list every problem with its path.", description = {
    "Validate a study file: every problem is listed with its path in the file.",
    "Exit 0 when the study can be used, 2 when it has problems."})
final class CheckCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Override
    int work() {
        try {
            Study s = StudyReader.read(study.study);
            out().println(study.study + ": valid (" + (s.isEquipmentForm() ? "equipment" : "circuit") + " form)");
            out().println("  study: " + s.title());
            out().println("  equivalent circuit: " + s.exactness().explanation());
            for (String n : s.notes()) {
                out().println("  note: " + n);
            }
            return Main.OK;
        } catch (StudyException e) {
            err().println(e.getMessage());
            return Main.BAD_INPUT;
        }
    }
}
