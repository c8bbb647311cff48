package org.ferromap.maps;

import java.io.PrintWriter;

/**
 * Hears how a map advances. A map runs in passes (one without refinement; the coarse lattice and
 * each refinement level with it); within a pass, units finish in any order on any thread, so
 * {@link #cellsDone} must be thread-safe.
 */
public interface ProgressListener {

    /** Hears nothing. */
    ProgressListener NONE = new ProgressListener() {
        @Override
        public void passStarted(int pass, String label, long cellsToCompute, long cellsReused) {
        }

        @Override
        public void cellsDone(long cells) {
        }

        @Override
        public void passFinished(int pass) {
        }
    };

    /**
     * A pass begins.
     *
     * @param pass           0, 1, ...
     * @param label          what the pass does, e.g. {@code coarse lattice (stride 8)}
     * @param cellsToCompute cells this pass will evaluate
     * @param cellsReused    cells of this pass loaded from resume tiles instead
     */
    void passStarted(int pass, String label, long cellsToCompute, long cellsReused);

    /** {@code cells} more cells of the current pass were evaluated. Called from worker threads. */
    void cellsDone(long cells);

    /** The pass ended (all its cells evaluated). */
    void passFinished(int pass);

    /** A stop was requested (Ctrl-C); {@code unitsInProgress} tiles are being finished and saved. */
    default void stopping(int unitsInProgress) {
    }

    /** The map is complete. */
    default void mapFinished(MapStats stats) {
    }

    /**
     * The listener for a command line writing to {@code out} (stderr): a progress bar redrawn in
     * place when a terminal is attached ({@code System.console() != null}), plain lines otherwise
     * (logs, CI).
     */
    static ProgressListener forStream(PrintWriter out) {
        return System.console() != null ? terminal(out) : lines(out);
    }

    /** A progress bar redrawn in place with a carriage return: percent, cells/s, time left. */
    static ProgressListener terminal(PrintWriter out) {
        return new TextProgress(out, true, System::nanoTime);
    }

    /** Plain lines: one every 5 % of a pass (at most one a second) and at least one every 10 s. */
    static ProgressListener lines(PrintWriter out) {
        return new TextProgress(out, false, System::nanoTime);
    }
}
