package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SimulationChartsTest {

    @TempDir
    Path tmp;

    @Test
    void thinningKeepsEveryExtremeInOrder() {
        int n = 10_000;
        double[] x = new double[n];
        double[] y = new double[n];
        Random rnd = new Random(3);
        for (int j = 0; j < n; j++) {
            x[j] = j;
            y[j] = rnd.nextGaussian();
        }
        y[4321] = 9;     // one spike up and one down must survive
        y[777] = -9;
        double[][] t = SimulationCharts.thinned(x, y);
        assertTrue(t[0].length <= SimulationCharts.MAX_POINTS_DRAWN);
        assertEquals(x[0], t[0][0], 0.0);
        assertEquals(x[n - 1], t[0][t[0].length - 1], 0.0);
        assertEquals(9, Arrays.stream(t[1]).max().getAsDouble(), 0.0);
        assertEquals(-9, Arrays.stream(t[1]).min().getAsDouble(), 0.0);
        for (int j = 1; j < t[0].length; j++) {
            assertTrue(t[0][j] > t[0][j - 1], "time order kept");
        }
        double[][] small = SimulationCharts.thinned(new double[] {0, 1}, new double[] {2, 3});
        assertEquals(2, small[0].length);
    }

    @Test
    void csvKeepsEverySampleWhenNoChartIsDrawn() throws Exception {
        double[] t = {0, 1e-3, 2e-3};
        List<Path> files = SimulationCharts.waveform("w", t,
                List.of(new SimulationCharts.Trace("v_a", "V", new double[] {1, 2, 3}),
                        new SimulationCharts.Trace("lambda_a", "Wb-turn", new double[] {4, 5, 6})),
                List.of(new SimulationCharts.Mark("pole a opens", 1e-3)), tmp, "event", false);
        assertEquals(List.of(tmp.resolve("event.csv")), files);
        assertEquals("time (s),v_a (V),lambda_a (Wb-turn)\r\n0,1,4\r\n0.001,2,5\r\n0.002,3,6\r\n",
                Files.readString(tmp.resolve("event.csv")));
        assertFalse(Files.exists(tmp.resolve("event.png")));
        SimulationCharts.spectrum("s", new double[0], new double[0], 50, tmp, "spectrum", true);
        assertEquals("frequency (Hz),amplitude (V peak)\r\n", Files.readString(tmp.resolve("spectrum.csv")));
        assertFalse(Files.exists(tmp.resolve("spectrum.png")), "nothing to draw");
    }
}
