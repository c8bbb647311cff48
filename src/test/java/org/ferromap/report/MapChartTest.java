package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MapChartTest {

    @TempDir
    Path tmp;

    @Test
    void writesThreeFormsWithTheCellsVisible() throws Exception {
        int nx = 20;
        int ny = 10;
        byte[] cat = new byte[nx * ny];
        for (int i = 0; i < cat.length; i++) {
            cat[i] = (byte) ((i % nx) < nx / 2 ? 0 : 2);
        }
        double[] xs = new double[nx];
        double[] ys = new double[ny];
        for (int i = 0; i < nx; i++) {
            xs[i] = 1 + i;
        }
        for (int i = 0; i < ny; i++) {
            ys[i] = Math.pow(10, -7 + i * 0.2);
        }
        MapChart c = MapChart.builder().title("t").x("x", xs, false).y("y", ys, true)
                .layer(new MapChart.Categorical(cat, new String[] {"safe", "at risk", "ferroresonant only"},
                        new Color[] {Palette.SAFE, Palette.AT_RISK, Palette.FERRO_ONLY}))
                .overlay(new MapChart.Overlay("fold", new double[] {1, 20}, new double[] {1e-7, 1e-5}, Color.BLACK, false))
                .build();
        List<Path> files = c.save(tmp, "map");
        assertEquals(3, files.size());
        var img = ImageIO.read(tmp.resolve("map.png").toFile());
        assertTrue(img.getWidth() > 3000, "300 dpi raster: " + img.getWidth());
        // a pixel well inside the left half of the plot is the safe colour
        int rgb = img.getRGB((int) (img.getWidth() * 0.2), (int) (img.getHeight() * 0.5));
        assertEquals(Palette.SAFE.getRGB(), rgb);
        assertTrue(Files.readString(tmp.resolve("map.svg")).contains("<svg"));
        assertTrue(Files.readString(tmp.resolve("map.pdf"), java.nio.charset.StandardCharsets.ISO_8859_1).startsWith("%PDF"));
    }

    @Test
    void logTicksAreDecades() {
        assertEquals(List.of(1e-7, 1e-6, 1e-5, 1e-4), MapChart.ticks(0.9e-7, 1.1e-4, true));
    }
}
