package org.ferromap.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.PdfboxGraphicsEncoder;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.internal.chartpart.IChart;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Saves charts in the three forms people hand on: PNG at 300 dpi for documents, SVG for the web
 * notebook, PDF for print. Also the house style every chart starts from.
 */
public final class ChartFiles {

    /** Print resolution for PNG output, dots per inch (common practice for figures in reports). */
    public static final int PNG_DPI = 300;

    /** Series colours that stay distinct in grey print and for common colour-vision deficiencies (Okabe-Ito). */
    public static final Color[] PALETTE = {
        new Color(0, 114, 178), new Color(213, 94, 0), new Color(0, 158, 115), new Color(204, 121, 167),
        new Color(230, 159, 0), new Color(86, 180, 233), new Color(0, 0, 0), new Color(240, 228, 66)
    };

    private ChartFiles() {
    }

    /** A new XY chart in the house style. */
    public static XYChart xyChart(String title, String xTitle, String yTitle) {
        XYChart c = new XYChartBuilder().width(800).height(560).title(title).xAxisTitle(xTitle).yAxisTitle(yTitle).build();
        var s = c.getStyler();
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotGridLinesColor(new Color(225, 225, 225));
        s.setLegendPosition(Styler.LegendPosition.InsideNE);
        s.setLegendBorderColor(new Color(200, 200, 200));
        s.setChartTitleFont(new Font(Font.SANS_SERIF, Font.BOLD, 15));
        s.setSeriesColors(PALETTE);
        s.setAntiAlias(true);
        c.getStyler().setMarkerSize(6);
        return c;
    }

    /** A dashed stroke for unstable branches. */
    public static BasicStroke dashed() {
        return new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f);
    }

    /** A solid stroke for stable branches. */
    public static BasicStroke solid() {
        return new BasicStroke(2.0f);
    }

    /** Adds a marker-only series. */
    public static void markers(XYChart c, String name, double[] x, double[] y, Color color) {
        var s = c.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(org.knowm.xchart.XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(SeriesMarkers.CIRCLE);
        s.setMarkerColor(color);
    }

    /**
     * Writes name.png (300 dpi), name.svg and name.pdf into dir. Returns the files written.
     */
    public static List<Path> save(IChart chart, Path dir, String name) {
        List<Path> out = new ArrayList<>();
        Path base = dir.resolve(name);
        try {
            BitmapEncoder.saveBitmapWithDPI(chart, base.toString(), BitmapEncoder.BitmapFormat.PNG, PNG_DPI);
            out.add(dir.resolve(name + ".png"));
            VectorGraphicsEncoder.saveVectorGraphic(chart, base.toString(), VectorGraphicsEncoder.VectorGraphicsFormat.SVG);
            out.add(dir.resolve(name + ".svg"));
            PdfboxGraphicsEncoder.savePdfboxGraphics(chart, base + ".pdf");
            out.add(dir.resolve(name + ".pdf"));
        } catch (IOException | RuntimeException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot write chart " + base + ": " + e.getMessage(), e);
        }
        return out;
    }
}
