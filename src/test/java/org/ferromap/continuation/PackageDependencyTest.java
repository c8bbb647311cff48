package org.ferromap.continuation;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The engine knows nothing of circuits: its sources name no ferromap package but errors (ARCHITECTURE.md). */
class PackageDependencyTest {

    private static final Pattern OURS = Pattern.compile("org\\.ferromap\\.(\\w+)");

    @Test
    void usesOnlyErrorsFromFerromap() throws IOException {
        Path dir = Path.of("src/main/java/org/ferromap/continuation");
        List<String> offences = new ArrayList<>();
        try (Stream<Path> files = Files.list(dir)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
                Matcher m = OURS.matcher(Files.readString(file));
                while (m.find()) {
                    String pkg = m.group(1);
                    if (!pkg.equals("continuation") && !pkg.equals("errors")) {
                        offences.add(file.getFileName() + " -> " + pkg);
                    }
                }
            }
        }
        assertTrue(offences.isEmpty(), "continuation reaches other packages: " + offences);
    }
}
