package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.ferromap.cli.Main;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code ferromap run} in-process on a small study listing every analysis, then the notebook
 * opened in headless Chromium: every image loads and no script fails. Also checks that every
 * figure has its CSV and JSON beside it and that nothing but the finished notebook is left.
 */
class RunNotebookBrowserTest {

    @TempDir
    Path tmp;

    /** A ninth-power core with enough loss that every event settles within a few dozen periods; settings kept small. */
    static final String STUDY = """
            study: Notebook check, ninth-power core
            frequency: 60 Hz
            circuit:
              source: 30 kV peak
              series-capacitance: 0.1 uF
              shunt-capacitance: 10 nF
              core-loss-resistance: 50 kOhm
              magnetizing:
                polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}
            analyses:
              points:
              curve:
              branch:
              folds: {and-from: 20 nF, and-to: 400 nF}
              simulate: {cycles: 120}
              map: {layers: [balance, peak, time, folds], angles: 2, residual-flux: [0], max-periods: 150}
              limits:
              odds: {runs: 3, max-periods: 150}
              damping: {angles: 2, residual-flux: [0], max-steps: 1, max-periods: 150}
              compare: {with: other.yaml}
            map:
              x: {parameter: source, from: 10 kV peak, to: 60 kV peak, steps: 7}
              y: {parameter: series-capacitance, from: 20 nF, to: 400 nF, steps: 5, scale: log}
            """;

    @Test
    void theNotebookOfEveryAnalysisLoadsCleanlyInChromium() throws Exception {
        Path study = tmp.resolve("check.yaml");
        Files.writeString(study, STUDY);
        Files.writeString(tmp.resolve("other.yaml"), STUDY.replace("0.1 uF", "0.2 uF").replace("Notebook check", "Other"));
        Path out = tmp.resolve("out");
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.execute(new PrintWriter(o, true), new PrintWriter(e, true), "run", study.toString(), "--out",
                out.toString(), "--threads", "2");
        assertEquals(Main.OK, code, e.toString());
        Path index = out.resolve("check").resolve("index.html");
        String html = Files.readString(index);
        for (String id : List.of("cautions", "inputs", "circuit", "assumptions", "points", "curve", "branch", "folds",
                "simulate", "map", "odds", "damping")) {
            assertTrue(html.contains("<section id=\"" + id + "\""), "section " + id);
        }
        assertTrue(html.contains("limits: skipped"), "a circuit study has no cable: limits is skipped with a note");
        assertTrue(html.contains("compare: skipped"), "core comparisons need equipment studies: skipped with a note");

        // every figure links its CSV and JSON, and every linked file exists
        Matcher m = Pattern.compile("href=\"([^\"]+)\"").matcher(html);
        int links = 0;
        while (m.find()) {
            assertTrue(Files.isRegularFile(index.getParent().resolve(m.group(1))), "linked file " + m.group(1));
            links++;
        }
        Matcher fig = Pattern.compile("<figure>.*?</figure>", Pattern.DOTALL).matcher(html);
        int figures = 0;
        while (fig.find()) {
            assertTrue(fig.group().contains(".csv\"") && fig.group().contains(".json\""), "CSV and JSON beside " + fig.group());
            figures++;
        }
        assertTrue(figures >= 15 && links > 3 * figures, figures + " figures, " + links + " links");
        try (Stream<Path> left = Files.list(out)) {
            assertEquals(List.of(out.resolve("check")), left.toList(), "no staging folder or resume tiles left behind");
        }
        assertFalse(html.contains("-failed\""), "no analysis failed");

        HeadlessBrowser.assertPageLoadsCleanly(index);
    }
}
