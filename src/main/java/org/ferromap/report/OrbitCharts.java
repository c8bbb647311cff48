package org.ferromap.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Ellipse2D;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts of periodic orbits: continued branches (a voltage of each orbit against the parameter: its
 * peak, or its values on the stroboscopic section t = 0 mod T; stable solid, unstable dashed, a
 * colour per period) with the located bifurcations marked by type, and the brute-force bifurcation
 * diagram (stroboscopic samples as small dots) under them when a sweep is given. Values arrive in SI; axes take a decimal prefix
 * that keeps the numbers readable (kV, uF, km).
 */
public final class OrbitCharts {

    /** Dots of the brute-force diagram, pixels across (small enough for thousands of samples). */
    private static final double DOT = 2.2;
    /** Grey of the brute-force dots: under the coloured branches, visible in grey print. */
    private static final Color DOT_COLOUR = new Color(120, 120, 120);

    private OrbitCharts() {
    }

    /**
     * One curve of a continued branch: one iterate of its orbits on the section (a period-k branch
     * gives k curves, the states at t = 0, T, ..., (k-1)T), in branch order.
     *
     * @param branch index of the branch, for the legend grouping
     * @param period the orbits' period, source periods
     * @param parameter parameter per point, SI
     * @param voltage the voltage drawn per point (peak, or on the section), V
     * @param stable whether the orbit at each point is stable
     */
    public record Curve(int branch, int period, double[] parameter, double[] voltage, boolean[] stable) {

        public Curve {
            if (parameter.length != voltage.length || parameter.length != stable.length) {
                throw new IllegalArgumentException("curve arrays differ in length");
            }
            parameter = parameter.clone();
            voltage = voltage.clone();
            stable = stable.clone();
        }
    }

    /**
     * A located bifurcation to mark.
     *
     * @param branch index of the branch it lies on (a change of stability on that branch's curves
     *        is drawn at its parameter)
     * @param type "fold", "period-doubling", "torus" or "pitchfork"
     * @param parameter parameter value, SI
     * @param voltage the voltage drawn of the bifurcating orbit (as its curves), V
     */
    public record Mark(int branch, String type, double parameter, double voltage) { }

    /**
     * The brute-force samples.
     *
     * @param parameter parameter per sample, SI
     * @param voltage terminal voltage per sample at t = 0 mod T, V
     */
    public record Cloud(double[] parameter, double[] voltage) {

        public Cloud {
            if (parameter.length != voltage.length) {
                throw new IllegalArgumentException("cloud arrays differ in length");
            }
            parameter = parameter.clone();
            voltage = voltage.clone();
        }
    }

    /**
     * A display unit: the SI unit with a decimal prefix.
     *
     * @param label what the axis title shows, e.g. "kV"
     * @param factor SI value divided by this gives the displayed number
     */
    public record Scale(String label, double factor) {

        /**
         * The prefix that shows the largest magnitude between 1 and 1000 (lengths in m or km;
         * dimensionless values as they are).
         *
         * @param siUnit the SI unit ("V", "F", "ohm", "m", "W")
         * @param largest the largest magnitude to show, SI
         */
        public static Scale of(String siUnit, double largest) {
            if (siUnit == null || siUnit.isEmpty() || siUnit.equals("1") || !(largest > 0) || !Double.isFinite(largest)) {
                return new Scale(siUnit == null || siUnit.equals("1") ? "" : siUnit, 1.0);
            }
            if (siUnit.equals("m")) {
                return largest >= 1e3 ? new Scale("km", 1e3) : new Scale("m", 1.0);
            }
            String[] prefixes = {"p", "n", "u", "m", "", "k", "M", "G"};
            int e = (int) Math.floor(Math.log10(largest) / 3);
            e = Math.max(-4, Math.min(3, e));
            String prefix = prefixes[e + 4];
            // "kOhm", "MOhm" as the study format writes them
            String unit = siUnit.equals("ohm") && !prefix.isEmpty() ? "Ohm" : siUnit;
            return new Scale(prefix + unit, Math.pow(10, 3 * e));
        }
    }

    /**
     * Draws the branches, their bifurcations and (when given) the brute-force samples, and writes
     * name.png/.svg/.pdf into dir.
     *
     * @param title chart title
     * @param parameterName words for the parameter, e.g. "source peak voltage"
     * @param parameterUnit its SI unit
     * @param voltageName words for the voltage drawn, e.g. "peak terminal voltage"
     * @param curves branch curves (may be empty)
     * @param marks bifurcations (may be empty)
     * @param cloud brute-force samples, or null
     * @return the files written
     */
    public static List<Path> diagram(String title, String parameterName, String parameterUnit, String voltageName, List<Curve> curves,
            List<Mark> marks, Cloud cloud, Path dir, String name) {
        double xMax = 0;
        double yMax = 0;
        for (Curve c : curves) {
            xMax = Math.max(xMax, largest(c.parameter()));
            yMax = Math.max(yMax, largest(c.voltage()));
        }
        if (cloud != null) {
            xMax = Math.max(xMax, largest(cloud.parameter()));
            yMax = Math.max(yMax, largest(cloud.voltage()));
        }
        Scale xs = Scale.of(parameterUnit, xMax);
        Scale ys = Scale.of("V", yMax);
        XYChart ch = ChartFiles.xyChart(title, parameterName + axisUnit(xs), voltageName + axisUnit(ys));
        if (cloud != null && cloud.parameter().length > 0) {
            XYSeries s = ch.addSeries("brute force (once a period)", scaled(cloud.parameter(), xs), scaled(cloud.voltage(), ys));
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(new Dot());
            s.setMarkerColor(DOT_COLOUR);
        }
        Set<String> legend = new HashSet<>();
        int serial = 0;
        for (Curve c : curves) {
            int n = c.parameter().length;
            // Start of the current segment: an index, or a junction point carried over from the last change of stability.
            List<double[]> seg = new java.util.ArrayList<>();
            for (int i = 0; i < n; i++) {
                seg.add(new double[] {c.parameter()[i], c.voltage()[i]});
                boolean last = i == n - 1;
                if (!last && c.stable()[i + 1] == c.stable()[i]) {
                    continue;
                }
                double[] junction = null;
                if (!last) {
                    junction = junction(c, i, marks);
                    seg.add(junction);
                }
                boolean stable = c.stable()[i];
                String key = "period " + c.period() + (stable ? ", stable" : ", unstable");
                boolean first = legend.add(key);
                double[] x = new double[seg.size()];
                double[] y = new double[seg.size()];
                for (int k = 0; k < seg.size(); k++) {
                    x[k] = seg.get(k)[0] / xs.factor();
                    y[k] = seg.get(k)[1] / ys.factor();
                }
                XYSeries s = ch.addSeries(first ? key : key + " #" + (++serial), x, y);
                s.setMarker(SeriesMarkers.NONE);
                s.setLineColor(periodColour(c.period()));
                s.setLineStyle(stable ? ChartFiles.solid() : ChartFiles.dashed());
                s.setShowInLegend(first);
                seg.clear();
                if (junction != null) {
                    seg.add(junction);
                }
            }
        }
        for (String type : List.of("fold", "period-doubling", "torus", "pitchfork")) {
            List<Mark> ms = marks.stream().filter(m -> m.type().equals(type)).toList();
            if (ms.isEmpty()) {
                continue;
            }
            double[] x = new double[ms.size()];
            double[] y = new double[ms.size()];
            for (int k = 0; k < ms.size(); k++) {
                x[k] = ms.get(k).parameter() / xs.factor();
                y[k] = ms.get(k).voltage() / ys.factor();
            }
            XYSeries s = ch.addSeries(type.replace('-', ' '), x, y);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(markerOf(type));
            s.setMarkerColor(Color.BLACK);
        }
        ch.getStyler().setMarkerSize(9);
        ch.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideE);
        return ChartFiles.save(ch, dir, name);
    }

    /**
     * Where a curve changes stability between points i and i + 1: at the parameter of a
     * bifurcation of its branch lying between them (the voltage interpolated linearly), else halfway.
     */
    private static double[] junction(Curve c, int i, List<Mark> marks) {
        double p0 = c.parameter()[i];
        double p1 = c.parameter()[i + 1];
        double v0 = c.voltage()[i];
        double v1 = c.voltage()[i + 1];
        for (Mark m : marks) {
            if (m.branch() == c.branch() && p1 != p0 && (m.parameter() - p0) * (m.parameter() - p1) <= 0) {
                double t = (m.parameter() - p0) / (p1 - p0);
                return new double[] {m.parameter(), v0 + t * (v1 - v0)};
            }
        }
        return new double[] {0.5 * (p0 + p1), 0.5 * (v0 + v1)};
    }

    /** The line colour of a period in every orbit chart (Okabe-Ito; periods 1, 2, 4, 8 the most distinct). */
    public static Color periodColour(int period) {
        Color[] p = ChartFiles.PALETTE;
        return switch (period) {
            case 1 -> p[0];
            case 2 -> p[1];
            case 4 -> p[2];
            case 8 -> p[3];
            case 3 -> p[4];
            case 5 -> p[5];
            case 6 -> new Color(120, 90, 0);
            default -> p[6];
        };
    }

    private static Marker markerOf(String type) {
        return switch (type) {
            case "fold" -> SeriesMarkers.DIAMOND;
            case "period-doubling" -> SeriesMarkers.SQUARE;
            case "torus" -> SeriesMarkers.CIRCLE;
            default -> SeriesMarkers.TRIANGLE_UP;
        };
    }

    private static String axisUnit(Scale s) {
        return s.label().isEmpty() ? "" : " (" + s.label() + ")";
    }

    private static double largest(double[] v) {
        double m = 0;
        for (double d : v) {
            if (Double.isFinite(d)) {
                m = Math.max(m, Math.abs(d));
            }
        }
        return m;
    }

    private static double[] scaled(double[] v, Scale s) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] / s.factor();
        }
        return out;
    }

    /** A filled dot of fixed size, whatever the chart's marker size (the bifurcation marks stay large). */
    private static final class Dot extends Marker {
        @Override
        public void paint(Graphics2D g, double x, double y, int markerSize) {
            g.fill(new Ellipse2D.Double(x - DOT / 2, y - DOT / 2, DOT, DOT));
        }
    }
}
