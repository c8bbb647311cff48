package org.ferromap.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The options every study verb shares: the study file, where outputs go, JSON on stdout. */
final class StudyOptions {

    @Parameters(index = "0", paramLabel = "STUDY", description = "Study file (YAML).")
    Path study;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "notebooks-out",
            description = "Folder that receives <study>/... outputs (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--json", description = "Print the result as one JSON object on stdout.")
    boolean json;

    /** Reads and assembles the study; every problem in it is reported together (exit 2). */
    Study read() {
        return StudyReader.read(study);
    }

    /** The study's short name: the file name without extension. */
    String name() {
        String f = study.getFileName().toString();
        int dot = f.lastIndexOf('.');
        return dot > 0 ? f.substring(0, dot) : f;
    }

    /** Where a verb's files go: {@code <out>/<study>/<verb>}. */
    Path folderFor(String verb) {
        Path base = out.resolve(name());
        if (Files.exists(base) && !Files.isDirectory(base)) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, base + " exists and is not a folder; choose another --out");
        }
        return base.resolve(verb);
    }
}
