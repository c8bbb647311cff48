package org.ferromap.report;

import de.erichseifert.vectorgraphics2d.Document;
import de.erichseifert.vectorgraphics2d.Processor;
import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.pdf.PDFProcessor;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A heat map on numeric axes (linear or log) with curves and points drawn over it: the chart
 * XChart's heat map cannot make. Cells are drawn as one raster scaled into the plot (cells are
 * uniform on screen because axis values are uniform in the axis's own scale), overlays as
 * vectors. Saved as PNG at 300 dpi, SVG and PDF.
 *
 * <p>Immutable description; build with {@link #builder()}.
 */
public final class MapChart {

    /** A curve drawn over the map, in data coordinates. */
    public record Overlay(String label, double[] x, double[] y, Color color, boolean dashed) { }

    /** A labelled point drawn over the map (a cusp, a representative cell). */
    public record Marker(String label, double x, double y, Color color) { }

    /** What colours the cells. */
    public sealed interface Layer permits Categorical, Continuous { }

    /**
     * Categories per cell (row-major, x fastest); -1 means no data (drawn light grey).
     *
     * @param cells category index per cell
     * @param names legend names per category
     * @param colors colour per category
     */
    public record Categorical(byte[] cells, String[] names, Color[] colors) implements Layer { }

    /**
     * A number per cell on a colour scale with a colour bar; NaN cells are drawn light grey.
     *
     * @param cells value per cell, row-major
     * @param min value at the bottom of the scale
     * @param max value at the top
     * @param label colour-bar title with unit
     */
    public record Continuous(double[] cells, double min, double max, String label) implements Layer { }

    private static final Color NO_DATA = new Color(235, 235, 235);
    private static final int WIDTH = 820;
    private static final int HEIGHT = 600;

    private final String title;
    private final String xTitle;
    private final String yTitle;
    private final double[] xs;
    private final double[] ys;
    private final boolean xLog;
    private final boolean yLog;
    private final Layer layer;
    private final List<Overlay> overlays;
    private final List<Marker> markers;

    private MapChart(Builder b) {
        this.title = b.title;
        this.xTitle = b.xTitle;
        this.yTitle = b.yTitle;
        this.xs = b.xs.clone();
        this.ys = b.ys.clone();
        this.xLog = b.xLog;
        this.yLog = b.yLog;
        this.layer = b.layer;
        this.overlays = List.copyOf(b.overlays);
        this.markers = List.copyOf(b.markers);
        int n = xs.length * ys.length;
        int have = layer instanceof Categorical c ? c.cells().length : ((Continuous) layer).cells().length;
        if (have != n) {
            throw new IllegalArgumentException("layer has " + have + " cells, axes give " + n);
        }
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Writes name.png (300 dpi), name.svg and name.pdf into dir. */
    public List<Path> save(Path dir, String name) {
        List<Path> out = new ArrayList<>();
        try {
            Path png = dir.resolve(name + ".png");
            writePng(png);
            out.add(png);
            Path svg = dir.resolve(name + ".svg");
            writeVector(svg, new SVGProcessor());
            out.add(svg);
            Path pdf = dir.resolve(name + ".pdf");
            writeVector(pdf, new PDFProcessor(true));
            out.add(pdf);
        } catch (IOException | RuntimeException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot write map chart " + dir.resolve(name) + ": " + e.getMessage(), e);
        }
        return out;
    }

    private void writePng(Path file) throws IOException {
        double scale = ChartFiles.PNG_DPI / 72.0;
        BufferedImage img = new BufferedImage((int) (WIDTH * scale), (int) (HEIGHT * scale), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.scale(scale, scale);
        paint(g);
        g.dispose();
        ImageWriter w = ImageIO.getImageWritersByFormatName("png").next();
        ImageWriteParam param = w.getDefaultWriteParam();
        IIOMetadata meta = w.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(img), param);
        double dotsPerMm = ChartFiles.PNG_DPI / 25.4;
        IIOMetadataNode h = new IIOMetadataNode("HorizontalPixelSize");
        h.setAttribute("value", Double.toString(1.0 / dotsPerMm));
        IIOMetadataNode v = new IIOMetadataNode("VerticalPixelSize");
        v.setAttribute("value", Double.toString(1.0 / dotsPerMm));
        IIOMetadataNode dim = new IIOMetadataNode("Dimension");
        dim.appendChild(h);
        dim.appendChild(v);
        IIOMetadataNode root = new IIOMetadataNode("javax_imageio_1.0");
        root.appendChild(dim);
        meta.mergeTree("javax_imageio_1.0", root);
        try (ImageOutputStream ios = ImageIO.createImageOutputStream(Files.newOutputStream(file))) {
            w.setOutput(ios);
            w.write(meta, new IIOImage(img, null, meta), param);
        } finally {
            w.dispose();
        }
    }

    private void writeVector(Path file, Processor processor) throws IOException {
        VectorGraphics2D g = new VectorGraphics2D();
        paint(g);
        Document doc = processor.getDocument(g.getCommands(), new PageSize(0, 0, WIDTH, HEIGHT));
        try (OutputStream os = Files.newOutputStream(file)) {
            doc.writeTo(os);
        }
    }

    /** Paints the chart into a WIDTH x HEIGHT point canvas. */
    void paint(Graphics2D g) {
        g.setColor(Color.WHITE);
        g.fill(new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        Font base = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
        g.setFont(base);
        double left = 78;
        double top = 44;
        double right = 170;
        double bottom = 62;
        Rectangle2D plot = new Rectangle2D.Double(left, top, WIDTH - left - right, HEIGHT - top - bottom);

        // title
        g.setColor(Color.BLACK);
        g.setFont(base.deriveFont(Font.BOLD, 15f));
        drawCentered(g, title, WIDTH / 2.0, 26);
        g.setFont(base);

        // cells as one raster, nearest-neighbour scaled into the plot
        int nx = xs.length;
        int ny = ys.length;
        BufferedImage cells = new BufferedImage(nx, ny, BufferedImage.TYPE_INT_RGB);
        for (int iy = 0; iy < ny; iy++) {
            for (int ix = 0; ix < nx; ix++) {
                cells.setRGB(ix, ny - 1 - iy, cellColor(iy * nx + ix).getRGB());
            }
        }
        double[] xr = edges(xs, xLog);
        double[] yr = edges(ys, yLog);
        AffineTransform at = new AffineTransform();
        at.translate(plot.getX(), plot.getY());
        if (g instanceof VectorGraphics2D) {
            // Vector viewers smooth embedded rasters; enlarge by nearest neighbour first so cell
            // edges stay sharp wherever the file is opened.
            int f = Math.max(1, (int) Math.ceil(2 * plot.getWidth() / nx));
            int fy = Math.max(1, (int) Math.ceil(2 * plot.getHeight() / ny));
            BufferedImage big = new BufferedImage(nx * f, ny * fy, BufferedImage.TYPE_INT_RGB);
            Graphics2D bg = big.createGraphics();
            bg.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
            bg.drawImage(cells, 0, 0, nx * f, ny * fy, null);
            bg.dispose();
            cells = big;
            at.scale(plot.getWidth() / (nx * f), plot.getHeight() / (ny * fy));
        } else {
            g.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_NEAREST_NEIGHBOR);
            at.scale(plot.getWidth() / nx, plot.getHeight() / ny);
        }
        g.drawImage(cells, at, null);

        // overlays clipped to the plot
        var clip = g.getClip();
        g.clip(plot);
        for (Overlay o : overlays) {
            g.setColor(o.color());
            g.setStroke(o.dashed()
                    ? new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {7f, 4f}, 0f)
                    : new BasicStroke(2.2f));
            Path2D path = new Path2D.Double();
            boolean started = false;
            for (int i = 0; i < o.x().length; i++) {
                if (!Double.isFinite(o.x()[i]) || !Double.isFinite(o.y()[i])) {
                    started = false;
                    continue;
                }
                double px = sx(o.x()[i], xr, plot);
                double py = sy(o.y()[i], yr, plot);
                if (started) {
                    path.lineTo(px, py);
                } else {
                    path.moveTo(px, py);
                    started = true;
                }
            }
            g.draw(path);
        }
        for (Marker m : markers) {
            double px = sx(m.x(), xr, plot);
            double py = sy(m.y(), yr, plot);
            g.setColor(m.color());
            g.fill(new Ellipse2D.Double(px - 5, py - 5, 10, 10));
            g.setColor(Color.BLACK);
            g.setStroke(new BasicStroke(1f));
            g.draw(new Ellipse2D.Double(px - 5, py - 5, 10, 10));
            g.drawString(m.label(), (float) px + 8, (float) py - 6);
        }
        g.setClip(clip);

        // frame and axes
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1f));
        g.draw(plot);
        FontMetrics fm = g.getFontMetrics();
        for (double t : ticks(xr[0], xr[1], xLog)) {
            double px = sx(t, xr, plot);
            g.draw(new Line2D.Double(px, plot.getMaxY(), px, plot.getMaxY() + 5));
            drawCentered(g, format(t), px, plot.getMaxY() + 8 + fm.getAscent());
        }
        for (double t : ticks(yr[0], yr[1], yLog)) {
            double py = sy(t, yr, plot);
            g.draw(new Line2D.Double(plot.getX() - 5, py, plot.getX(), py));
            String s = format(t);
            g.drawString(s, (float) (plot.getX() - 8 - fm.stringWidth(s)), (float) (py + fm.getAscent() / 2.0 - 1));
        }
        drawCentered(g, xTitle, plot.getCenterX(), HEIGHT - 18);
        AffineTransform saved = g.getTransform();
        g.translate(20, plot.getCenterY());
        g.rotate(-Math.PI / 2);
        drawCentered(g, yTitle, 0, 0);
        g.setTransform(saved);

        // legend or colour bar
        double lx = plot.getMaxX() + 18;
        if (layer instanceof Categorical c) {
            double ly = plot.getY() + 4;
            for (int k = 0; k < c.names().length; k++) {
                g.setColor(c.colors()[k]);
                g.fill(new Rectangle2D.Double(lx, ly, 16, 12));
                g.setColor(Color.BLACK);
                g.draw(new Rectangle2D.Double(lx, ly, 16, 12));
                g.drawString(c.names()[k], (float) lx + 22, (float) ly + 11);
                ly += 20;
            }
            ly = legendForOverlays(g, lx, ly + 10);
        } else {
            Continuous c = (Continuous) layer;
            double barTop = plot.getY() + 20;
            double barH = plot.getHeight() * 0.6;
            g.drawString(c.label(), (float) lx, (float) plot.getY() + 10);
            for (int k = 0; k < 100; k++) {
                g.setColor(Palette.scale(1.0 - k / 99.0));
                g.fill(new Rectangle2D.Double(lx, barTop + barH * k / 100.0, 18, barH / 100.0 + 0.6));
            }
            g.setColor(Color.BLACK);
            g.draw(new Rectangle2D.Double(lx, barTop, 18, barH));
            for (double t : ticks(c.min(), c.max(), false)) {
                double f = (t - c.min()) / (c.max() - c.min());
                double py = barTop + barH * (1 - f);
                g.draw(new Line2D.Double(lx + 18, py, lx + 22, py));
                g.drawString(format(t), (float) lx + 25, (float) (py + 4));
            }
            legendForOverlays(g, lx, barTop + barH + 24);
        }
    }

    private double legendForOverlays(Graphics2D g, double lx, double ly) {
        for (Overlay o : overlays) {
            if (o.label() == null || o.label().isEmpty()) {
                continue;
            }
            g.setColor(o.color());
            g.setStroke(new BasicStroke(2.2f));
            g.draw(new Line2D.Double(lx, ly + 6, lx + 16, ly + 6));
            g.setColor(Color.BLACK);
            g.setStroke(new BasicStroke(1f));
            g.drawString(o.label(), (float) lx + 22, (float) ly + 11);
            ly += 20;
        }
        return ly;
    }

    private Color cellColor(int i) {
        if (layer instanceof Categorical c) {
            int k = c.cells()[i];
            return k < 0 || k >= c.colors().length ? NO_DATA : c.colors()[k];
        }
        Continuous c = (Continuous) layer;
        double v = c.cells()[i];
        if (!Double.isFinite(v)) {
            return NO_DATA;
        }
        double f = c.max() > c.min() ? (v - c.min()) / (c.max() - c.min()) : 0.5;
        return Palette.scale(Math.max(0, Math.min(1, f)));
    }

    /** Outer edges of the cell range: half a cell beyond the first and last values, in the axis's own scale. */
    static double[] edges(double[] v, boolean log) {
        if (v.length == 1) {
            return log ? new double[] {v[0] / 1.1, v[0] * 1.1} : new double[] {v[0] - 0.5, v[0] + 0.5};
        }
        if (log) {
            double r = Math.sqrt(v[1] / v[0]);
            return new double[] {v[0] / r, v[v.length - 1] * r};
        }
        double h = (v[1] - v[0]) / 2;
        return new double[] {v[0] - h, v[v.length - 1] + h};
    }

    private double sx(double x, double[] r, Rectangle2D p) {
        return p.getX() + p.getWidth() * frac(x, r, xLog);
    }

    private double sy(double y, double[] r, Rectangle2D p) {
        return p.getMaxY() - p.getHeight() * frac(y, r, yLog);
    }

    private static double frac(double v, double[] r, boolean log) {
        return log ? Math.log(v / r[0]) / Math.log(r[1] / r[0]) : (v - r[0]) / (r[1] - r[0]);
    }

    /** Tick values: 1-2-5 steps on linear axes, decades (with 2 and 5 when few) on log axes. */
    static List<Double> ticks(double lo, double hi, boolean log) {
        List<Double> t = new ArrayList<>();
        if (!(hi > lo)) {
            t.add(lo);
            return t;
        }
        if (log) {
            int d0 = (int) Math.floor(Math.log10(lo));
            int d1 = (int) Math.ceil(Math.log10(hi));
            double[] mult = d1 - d0 <= 2 ? new double[] {1, 2, 5} : new double[] {1};
            for (int d = d0; d <= d1; d++) {
                for (double m : mult) {
                    double v = m * Math.pow(10, d);
                    if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) {
                        t.add(v);
                    }
                }
            }
            return t;
        }
        double raw = (hi - lo) / 6;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
        for (double v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) {
            t.add(Math.abs(v) < step * 1e-9 ? 0.0 : v);
        }
        return t;
    }

    static String format(double v) {
        double a = Math.abs(v);
        if (a != 0 && (a >= 1e5 || a < 1e-3)) {
            return String.format(Locale.ROOT, "%.3g", v);
        }
        String s = String.format(Locale.ROOT, "%.4f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }

    private static void drawCentered(Graphics2D g, String s, double cx, double baseline) {
        FontMetrics fm = g.getFontMetrics();
        g.drawString(s, (float) (cx - fm.stringWidth(s) / 2.0), (float) baseline);
    }

    /** Builder for {@link MapChart}. */
    public static final class Builder {
        private String title = "";
        private String xTitle = "";
        private String yTitle = "";
        private double[] xs;
        private double[] ys;
        private boolean xLog;
        private boolean yLog;
        private Layer layer;
        private final List<Overlay> overlays = new ArrayList<>();
        private final List<Marker> markers = new ArrayList<>();

        public Builder title(String t) {
            title = t;
            return this;
        }

        /** Axis values at cell centres, uniform in the axis's scale. */
        public Builder x(String axisTitle, double[] values, boolean log) {
            xTitle = axisTitle;
            xs = values;
            xLog = log;
            return this;
        }

        public Builder y(String axisTitle, double[] values, boolean log) {
            yTitle = axisTitle;
            ys = values;
            yLog = log;
            return this;
        }

        public Builder layer(Layer l) {
            layer = l;
            return this;
        }

        public Builder overlay(Overlay o) {
            overlays.add(o);
            return this;
        }

        public Builder marker(Marker m) {
            markers.add(m);
            return this;
        }

        public MapChart build() {
            return new MapChart(this);
        }
    }
}
