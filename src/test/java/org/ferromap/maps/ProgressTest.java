package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class ProgressTest {

    /**
     * Plain lines come every 5 % of a pass [cp: log-friendly progress], with the rate and the time
     * left from a fake clock: 20 cells per second, 1000 cells, 10 cells per step.
     */
    @Test
    void plainLinesEveryFivePercent() {
        StringWriter s = new StringWriter();
        AtomicLong now = new AtomicLong();
        TextProgress p = new TextProgress(new PrintWriter(s), false, now::get);
        p.passStarted(0, "all cells", 1000, 0);
        for (int i = 0; i < 100; i++) {
            now.addAndGet(500_000_000L); // 0.5 s per 10 cells
            p.cellsDone(10);
        }
        p.passFinished(0);
        String[] lines = s.toString().split("\n");
        assertEquals(1 + 20, lines.length, s.toString()); // header, then 5 %, 10 %, ... 100 %
        assertEquals("map all cells: 1000 cells to compute", lines[0]);
        assertEquals("map all cells: 50% (500/1000 cells, 20 cells/s, ETA 0:25)", lines[10]);
        assertEquals("map all cells: 100% (1000/1000 cells, 20 cells/s)", lines[20]);
    }

    /** A pass shorter than a second prints its header and its end only, not twenty lines [cp]. */
    @Test
    void shortPassesStayQuiet() {
        StringWriter s = new StringWriter();
        AtomicLong now = new AtomicLong();
        TextProgress p = new TextProgress(new PrintWriter(s), false, now::get);
        p.passStarted(2, "refinement level 2 (blocks of 2)", 100, 0);
        for (int i = 0; i < 100; i++) {
            now.addAndGet(1_000_000L);
            p.cellsDone(1);
        }
        p.passFinished(2);
        String[] lines = s.toString().split("\n");
        assertEquals(2, lines.length, s.toString());
        assertTrue(lines[1].startsWith("map refinement level 2 (blocks of 2): 100% (100/100 cells"), lines[1]);
    }

    /** A slow pass still prints a line at least every 10 s [cp]. */
    @Test
    void plainLinesAtLeastEveryTenSeconds() {
        StringWriter s = new StringWriter();
        AtomicLong now = new AtomicLong();
        TextProgress p = new TextProgress(new PrintWriter(s), false, now::get);
        p.passStarted(1, "refinement level 1 (blocks of 4)", 10_000, 50);
        now.addAndGet(11_000_000_000L);
        p.cellsDone(1); // 0.01 %, but 11 s since the last line
        String[] lines = s.toString().split("\n");
        assertEquals(2, lines.length, s.toString());
        assertTrue(lines[0].contains("50 reused"), lines[0]);
        assertTrue(lines[1].startsWith("map refinement level 1 (blocks of 4): 0% (1/10000 cells"), lines[1]);
    }

    /** The terminal bar redraws one line in place with a carriage return and ends it with a newline [cp]. */
    @Test
    void terminalBarRedrawsInPlace() {
        StringWriter s = new StringWriter();
        AtomicLong now = new AtomicLong();
        TextProgress p = new TextProgress(new PrintWriter(s), true, now::get);
        p.passStarted(0, "coarse lattice (stride 8)", 200, 0);
        now.addAndGet(1_000_000_000L);
        p.cellsDone(100);
        now.addAndGet(1_000_000_000L);
        p.cellsDone(100);
        p.passFinished(0);
        String out = s.toString();
        assertEquals(1, out.chars().filter(c -> c == '\n').count(), out);
        assertTrue(out.contains("\rmap coarse lattice (stride 8) [############............] 50% 100/200 cells, 100 cells/s, ETA 0:01"),
                out);
        assertTrue(out.endsWith("100% 200/200 cells, 100 cells/s\n"), out);
    }

    /** Durations print as m:ss or h:mm:ss [cp]. */
    @Test
    void durations() {
        assertEquals("0:05", TextProgress.duration(5));
        assertEquals("2:03", TextProgress.duration(123));
        assertEquals("1:01:01", TextProgress.duration(3661));
    }
}
