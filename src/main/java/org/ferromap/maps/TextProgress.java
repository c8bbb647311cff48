package org.ferromap.maps;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.LongSupplier;

/**
 * The two text progress displays: a bar redrawn in place (terminal) or plain lines (every 5 % but
 * at most one a second, and at least every 10 s). Counting is lock-free; drawing is synchronized and throttled.
 */
final class TextProgress implements ProgressListener {

    private static final long BAR_INTERVAL_NANOS = 200_000_000L;   // redraw at most 5 times a second
    private static final long LINE_INTERVAL_NANOS = 10_000_000_000L; // a plain line at least every 10 s
    private static final long LINE_MIN_GAP_NANOS = 1_000_000_000L;   // and at most one a second (short passes)
    private static final int LINE_PERCENT_STEP = 5;
    private static final int BAR_WIDTH = 24;

    private final PrintWriter out;
    private final boolean bar;
    private final LongSupplier clock;
    private final AtomicLong done = new AtomicLong();
    private volatile long lastDraw;
    private String label = "";
    private long total;
    private long passStart;
    private int lastPercentShown;
    private int lastBarLength;

    TextProgress(PrintWriter out, boolean bar, LongSupplier clock) {
        this.out = out;
        this.bar = bar;
        this.clock = clock;
    }

    @Override
    public synchronized void passStarted(int pass, String label, long cellsToCompute, long cellsReused) {
        this.label = label;
        this.total = cellsToCompute;
        this.done.set(0);
        this.passStart = clock.getAsLong();
        this.lastDraw = passStart;
        this.lastPercentShown = 0;
        String reused = cellsReused > 0 ? ", " + cellsReused + " reused from an earlier run" : "";
        if (bar) {
            lastBarLength = 0;
            if (cellsReused > 0) {
                out.println("map " + label + ": " + cellsReused + " cells reused from an earlier run");
            }
            draw(passStart);
        } else {
            out.println("map " + label + ": " + cellsToCompute + " cells to compute" + reused);
            out.flush();
        }
    }

    @Override
    public void cellsDone(long cells) {
        long d = done.addAndGet(cells);
        long now = clock.getAsLong();
        if (bar) {
            if (now - lastDraw >= BAR_INTERVAL_NANOS) {
                synchronized (this) {
                    if (now - lastDraw >= BAR_INTERVAL_NANOS) {
                        draw(now);
                    }
                }
            }
            return;
        }
        if (lineDue(percent(d), now)) {
            synchronized (this) {
                if (lineDue(percent(d), now)) {
                    line(now, done.get());
                }
            }
        }
    }

    @Override
    public synchronized void passFinished(int pass) {
        long now = clock.getAsLong();
        if (bar) {
            draw(now);
            out.println();
        } else if (lastPercentShown < 100) {
            line(now, done.get());
        }
        out.flush();
    }

    @Override
    public synchronized void stopping(int unitsInProgress) {
        out.println();
        out.println("map: stopping; finishing " + unitsInProgress + " tile(s) in progress, finished tiles are saved");
        out.flush();
    }

    @Override
    public synchronized void mapFinished(MapStats s) {
        out.println(String.format(Locale.ROOT, "map: %d cells: %d computed, %d reused, %d inferred, in %s",
                s.cells(), s.computed(), s.reused(), s.inferred(), duration(s.seconds())));
        out.flush();
    }

    private boolean lineDue(int percent, long now) {
        long since = now - lastDraw;
        return since >= LINE_INTERVAL_NANOS
                || (percent >= lastPercentShown + LINE_PERCENT_STEP && since >= LINE_MIN_GAP_NANOS);
    }

    private int percent(long d) {
        return total <= 0 ? 100 : (int) Math.min(100, 100 * d / total);
    }

    private void line(long now, long d) {
        lastDraw = now;
        lastPercentShown = percent(d);
        out.println("map " + label + ": " + lastPercentShown + "% (" + d + "/" + total + " cells" + speed(now, d) + ")");
        out.flush();
    }

    private void draw(long now) {
        lastDraw = now;
        long d = done.get();
        int p = percent(d);
        int filled = (int) ((long) BAR_WIDTH * p / 100);
        String text = "map " + label + " [" + "#".repeat(filled) + ".".repeat(BAR_WIDTH - filled) + "] " + p + "% "
                + d + "/" + total + " cells" + speed(now, d);
        int pad = Math.max(0, lastBarLength - text.length());
        out.print("\r" + text + " ".repeat(pad));
        lastBarLength = text.length();
        out.flush();
    }

    private String speed(long now, long d) {
        double seconds = (now - passStart) * 1e-9;
        if (d == 0 || seconds <= 0) {
            return "";
        }
        double rate = d / seconds;
        String eta = d >= total ? "" : ", ETA " + duration((total - d) / rate);
        return String.format(Locale.ROOT, ", %.0f cells/s%s", rate, eta);
    }

    /** h:mm:ss or m:ss. */
    static String duration(double seconds) {
        long s = Math.round(seconds);
        long h = s / 3600;
        long m = (s % 3600) / 60;
        long r = s % 60;
        return h > 0 ? String.format(Locale.ROOT, "%d:%02d:%02d", h, m, r) : String.format(Locale.ROOT, "%d:%02d", m, r);
    }
}
