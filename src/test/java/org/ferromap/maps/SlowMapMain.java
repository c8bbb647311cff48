package org.ferromap.maps;

import java.io.PrintWriter;
import java.nio.file.Path;

/** Child process for the Ctrl-C test: a slow map with a tile store, run until killed. */
public final class SlowMapMain {

    /** 40 x 40 cells in tiles of 4: 100 tiles of 16 cells. */
    static final MapRequest REQUEST = new MapRequest(Axis.linear("x", "", 0, 1, 40), Axis.linear("y", "", 0, 1, 40), 4);

    private SlowMapMain() {
    }

    /** Same values whatever the delay, so the fast copy in the parent shares its fingerprint. */
    static class Slow implements CellFunction {
        private final long sleepMillis;

        Slow() {
            this(5);
        }

        Slow(long sleepMillis) {
            this.sleepMillis = sleepMillis;
        }

        @Override
        public int width() {
            return 1;
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            if (sleepMillis > 0) {
                try {
                    Thread.sleep(sleepMillis);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
            out[offset] = Math.exp(x) * Math.sin(3 * y);
        }

        @Override
        public String fingerprint() {
            return "slow exp sin";
        }
    }

    public static void main(String[] args) {
        PrintWriter err = new PrintWriter(System.err, true);
        MapRunner.run(REQUEST, new Slow(), new LocalPoolExecutor(2), TileStore.at(Path.of(args[0])),
                ProgressListener.lines(err), RefinementSettings.OFF);
        err.println("finished (should have been stopped)");
    }
}
