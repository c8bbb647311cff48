package org.ferromap.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts of a time-domain simulation, each with a CSV of the same data beside it (SI columns):
 * the waveform around the switching event, the waveform of the settled state, the stroboscopic
 * section (flux linkage against voltage once a source period) and the amplitude spectrum. Charts
 * show ms, kV and Hz for reading; the CSV keeps s, V, Wb-turn and Hz.
 */
public final class SimulationCharts {

    /** Highest harmonic of the source frequency drawn on the spectrum chart (the CSV keeps every line). */
    public static final int SPECTRUM_HARMONICS = 20;

    /**
     * Most points drawn per series: longer series are thinned to the smallest and largest value
     * of each of half as many buckets, which keeps every peak and trough on the chart (the CSV
     * keeps every sample). Rendering time grows with the points drawn, not the pixels.
     */
    public static final int MAX_POINTS_DRAWN = 1000;

    /** Amplitudes below this fraction of the strongest line are drawn at it (log axis floor). */
    private static final double SPECTRUM_FLOOR = 1e-6;

    private SimulationCharts() {
    }

    /**
     * One named series against the shared time axis.
     *
     * @param name legend and CSV column name, e.g. "v_a"
     * @param unit SI unit of the values, e.g. "V"
     * @param values one value per time sample
     */
    public record Trace(String name, String unit, double[] values) { }

    /**
     * An instant marked on a waveform chart with a dashed vertical line (a pole opening).
     *
     * @param name legend entry, e.g. "pole a opens"
     * @param time s; NaN marks nothing
     */
    public record Mark(String name, double time) { }

    /**
     * Voltages (and other traces) against time: a chart in ms and kV and a CSV in s and SI.
     *
     * @param title chart title
     * @param time sample instants, s
     * @param traces the series drawn; those whose unit is "V" are plotted (in kV), every trace goes to the CSV
     * @param marks instants to mark with a vertical line (switching); those outside the record are skipped
     * @param dir folder to write into
     * @param name base file name
     * @param draw whether to draw the chart (PNG, SVG, PDF); the CSV is written either way
     * @return the files written
     */
    public static List<Path> waveform(String title, double[] time, List<Trace> traces, List<Mark> marks, Path dir,
            String name, boolean draw) {
        List<Path> files = new ArrayList<>();
        if (draw && time.length >= 2) {
            XYChart c = ChartFiles.xyChart(title, "time (ms)", "voltage (kV)");
            double[] ms = scaled(time, 1e3);
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (Trace t : traces) {
                if (!"V".equals(t.unit())) {
                    continue;
                }
                double[] kv = scaled(t.values(), 1e-3);
                for (double v : kv) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
                double[][] drawn = thinned(ms, kv);
                XYSeries s = c.addSeries(t.name(), drawn[0], drawn[1]);
                s.setMarker(SeriesMarkers.NONE);
                s.setLineStyle(ChartFiles.solid());
            }
            for (Mark mark : marks) {
                double m = mark.time();
                if (Double.isFinite(m) && m >= time[0] && m <= time[time.length - 1] && hi > lo) {
                    XYSeries s = c.addSeries(mark.name(), new double[] {m * 1e3, m * 1e3}, new double[] {lo, hi});
                    s.setMarker(SeriesMarkers.NONE);
                    s.setLineStyle(ChartFiles.dashed());
                    s.setLineColor(java.awt.Color.GRAY);
                }
            }
            c.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideS);
            files.addAll(ChartFiles.save(c, dir, name));
        }
        List<String> header = new ArrayList<>();
        header.add("time (s)");
        for (Trace t : traces) {
            header.add(t.name() + " (" + t.unit() + ")");
        }
        List<List<?>> rows = new ArrayList<>(time.length);
        for (int j = 0; j < time.length; j++) {
            List<Object> row = new ArrayList<>(traces.size() + 1);
            row.add(time[j]);
            for (Trace t : traces) {
                row.add(t.values()[j]);
            }
            rows.add(row);
        }
        Path csv = dir.resolve(name + ".csv");
        Csv.write(csv, header, rows);
        files.add(csv);
        return files;
    }

    /**
     * The stroboscopic section: flux linkage (Wb-turn) against voltage (chart in kV, CSV in V),
     * one marker per source period; {@code draw} as for {@link #waveform}.
     *
     * @param fluxName name of the flux quantity, e.g. "lambda_a"
     * @param voltageName name of the voltage quantity, e.g. "v_a"
     */
    public static List<Path> section(String title, String fluxName, double[] flux, String voltageName,
            double[] voltage, Path dir, String name, boolean draw) {
        List<Path> files = new ArrayList<>();
        if (draw && flux.length > 0) {
            XYChart c = ChartFiles.xyChart(title, fluxName + " (Wb-turn)", voltageName + " (kV)");
            ChartFiles.markers(c, "once a source period", flux, scaled(voltage, 1e-3), ChartFiles.PALETTE[0]);
            c.getStyler().setMarkerSize(flux.length > 200 ? 3 : 7);
            files.addAll(ChartFiles.save(c, dir, name));
        }
        List<List<?>> rows = new ArrayList<>(flux.length);
        for (int j = 0; j < flux.length; j++) {
            rows.add(List.of(flux[j], voltage[j]));
        }
        Path csv = dir.resolve(name + ".csv");
        Csv.write(csv, List.of(fluxName + " (Wb-turn)", voltageName + " (V)"), rows);
        files.add(csv);
        return files;
    }

    /**
     * The amplitude spectrum: chart up to {@link #SPECTRUM_HARMONICS} times the source frequency
     * on a log axis, CSV of every line (Hz, V peak); {@code draw} as for {@link #waveform}.
     *
     * @param sourceFrequency Hz, for the chart's range
     */
    public static List<Path> spectrum(String title, double[] frequency, double[] amplitude, double sourceFrequency,
            Path dir, String name, boolean draw) {
        List<Path> files = new ArrayList<>();
        int n = 0;
        double top = 0;
        while (n < frequency.length && frequency[n] <= SPECTRUM_HARMONICS * sourceFrequency) {
            top = Math.max(top, amplitude[n]);
            n++;
        }
        if (draw && n >= 2 && top > 0) {
            double[] f = new double[n];
            double[] kv = new double[n];
            for (int k = 0; k < n; k++) {
                f[k] = frequency[k];
                kv[k] = Math.max(amplitude[k], top * SPECTRUM_FLOOR) * 1e-3;
            }
            XYChart c = ChartFiles.xyChart(title, "frequency (Hz)", "amplitude (kV peak)");
            c.getStyler().setYAxisLogarithmic(true);
            double[][] drawn = thinned(f, kv);
            XYSeries s = c.addSeries("amplitude", drawn[0], drawn[1]);
            s.setMarker(n <= 200 ? SeriesMarkers.CIRCLE : SeriesMarkers.NONE);
            s.setLineStyle(ChartFiles.solid());
            c.getStyler().setLegendVisible(false);
            files.addAll(ChartFiles.save(c, dir, name));
        }
        List<List<?>> rows = new ArrayList<>(frequency.length);
        for (int k = 0; k < frequency.length; k++) {
            rows.add(List.of(frequency[k], amplitude[k]));
        }
        Path csv = dir.resolve(name + ".csv");
        Csv.write(csv, List.of("frequency (Hz)", "amplitude (V peak)"), rows);
        files.add(csv);
        return files;
    }

    /**
     * At most {@link #MAX_POINTS_DRAWN} points of (x, y): the first and last point, and in between
     * the smallest and the largest y of each bucket of consecutive samples, in their order.
     */
    static double[][] thinned(double[] x, double[] y) {
        int n = x.length;
        if (n <= MAX_POINTS_DRAWN) {
            return new double[][] {x, y};
        }
        int buckets = (MAX_POINTS_DRAWN - 2) / 2;
        double[] tx = new double[2 * buckets + 2];
        double[] ty = new double[tx.length];
        int m = 0;
        tx[m] = x[0];
        ty[m++] = y[0];
        for (int b = 0; b < buckets; b++) {
            int from = 1 + (int) ((long) b * (n - 2) / buckets);
            int to = 1 + (int) ((long) (b + 1) * (n - 2) / buckets);
            int lo = from;
            int hi = from;
            for (int j = from; j < to; j++) {
                if (y[j] < y[lo]) {
                    lo = j;
                }
                if (y[j] > y[hi]) {
                    hi = j;
                }
            }
            int a = Math.min(lo, hi);
            int z = Math.max(lo, hi);
            tx[m] = x[a];
            ty[m++] = y[a];
            tx[m] = x[z];
            ty[m++] = y[z];
        }
        tx[m] = x[n - 1];
        ty[m++] = y[n - 1];
        return new double[][] {java.util.Arrays.copyOf(tx, m), java.util.Arrays.copyOf(ty, m)};
    }

    private static double[] scaled(double[] v, double f) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i] * f;
        }
        return out;
    }
}
