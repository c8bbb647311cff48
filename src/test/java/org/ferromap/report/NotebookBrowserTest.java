package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.opentest4j.AssertionFailedError;

class NotebookBrowserTest {

    @TempDir
    Path tmp;

    @Test
    void notebookWithAChartLoadsInChromium() throws Exception {
        var c = ChartFiles.xyChart("t", "x", "y");
        c.addSeries("s", new double[] {0, 1, 2}, new double[] {0, 1, 4});
        ChartFiles.save(c, tmp, "chart");
        new Notebook("check").section("a", "A").figure("chart", "a chart", List.of()).end().write(tmp);
        HeadlessBrowser.assertPageLoadsCleanly(tmp.resolve("index.html"));
    }

    /** The check must be able to fail: a missing image is reported. */
    @Test
    void aBrokenImageIsCaught() throws Exception {
        HeadlessBrowser.chromium();
        new Notebook("check").section("a", "A").figure("missing", "gone", List.of()).end().write(tmp);
        Files.deleteIfExists(tmp.resolve("missing.png"));
        assertThrows(AssertionFailedError.class, () -> HeadlessBrowser.assertPageLoadsCleanly(tmp.resolve("index.html")));
    }
}
