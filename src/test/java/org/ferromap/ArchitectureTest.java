package org.ferromap;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Holds the arrows of the house (DEVELOPERS.md): each package may use only the packages listed
 * here, so data flows study -> equipment -> circuit -> solvers -> maps -> report -> cli and never
 * back. Reads the import lines and fully qualified references of the main sources.
 */
class ArchitectureTest {

    private static final Map<String, Set<String>> ALLOWED = Map.ofEntries(
            Map.entry("errors", Set.of()),
            Map.entry("units", Set.of("errors")),
            Map.entry("equipment", Set.of("units", "errors")),
            Map.entry("circuit", Set.of("equipment", "units", "errors")),
            Map.entry("continuation", Set.of("errors")),
            Map.entry("balance", Set.of("circuit", "equipment", "continuation", "units", "errors")),
            Map.entry("dynamics", Set.of("circuit", "equipment", "units", "errors")),
            Map.entry("orbits", Set.of("dynamics", "continuation", "balance", "circuit", "equipment", "units", "errors")),
            Map.entry("study", Set.of("equipment", "circuit", "units", "errors")),
            Map.entry("maps", Set.of("balance", "continuation", "dynamics", "orbits", "circuit", "equipment", "study", "units", "errors")),
            Map.entry("report", Set.of("balance", "continuation", "dynamics", "orbits", "maps", "circuit", "equipment", "study", "units", "errors")),
            Map.entry("cli", Set.of("*")));

    /** Packages whose result types the report layer draws; it must not run their solvers. */
    private static final Pattern REF = Pattern.compile("org\\.ferromap\\.([a-z]+)\\.");

    @Test
    void packagesUseOnlyWhatTheyMay() throws IOException {
        Path root = Path.of("src/main/java/org/ferromap");
        List<String> violations = new ArrayList<>();
        try (Stream<Path> files = Files.walk(root)) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
                String pkg = root.relativize(f).getName(0).toString();
                if (f.getNameCount() - root.getNameCount() == 1) {
                    continue; // no classes at the root package
                }
                Set<String> allowed = ALLOWED.get(pkg);
                if (allowed == null) {
                    violations.add(pkg + ": package not declared in ArchitectureTest and DEVELOPERS.md");
                    continue;
                }
                if (allowed.contains("*")) {
                    continue;
                }
                Matcher m = REF.matcher(Files.readString(f));
                while (m.find()) {
                    String used = m.group(1);
                    if (!used.equals(pkg) && !allowed.contains(used)) {
                        violations.add(root.relativize(f) + " uses " + used);
                    }
                }
            }
        }
        assertTrue(violations.isEmpty(), "arrows reversed:\n" + String.join("\n", violations));
    }

    @Test
    void everyPackageSaysWhatItIsFor() throws IOException {
        Path root = Path.of("src/main/java/org/ferromap");
        List<String> missing = new ArrayList<>();
        try (Stream<Path> dirs = Files.list(root)) {
            for (Path d : dirs.filter(Files::isDirectory).toList()) {
                if (!Files.exists(d.resolve("package-info.java"))) {
                    missing.add(d.getFileName().toString());
                }
            }
        }
        assertTrue(missing.isEmpty(), "packages without package-info.java: " + missing);
    }
}
