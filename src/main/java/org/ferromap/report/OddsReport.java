package org.ferromap.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.ferromap.maps.OddsResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The probability of ferroresonance as files and as a notebook section: the estimate and its
 * confidence interval as runs accumulate, the runs by switching angle and residual flux coloured
 * by outcome, CSV of every run, JSON of the whole result.
 */
public final class OddsReport {

    private OddsReport() {
    }

    /** Writes {prefix}-estimate.*, {prefix}-runs.* (charts and CSV) and {prefix}.json; returns the data file names. */
    public static List<String> write(OddsResult r, Path dir, String prefix) {
        ChartFiles.save(estimate(r), dir, prefix + "-estimate");
        ChartFiles.save(runs(r), dir, prefix + "-runs");
        List<List<?>> rows = new ArrayList<>();
        for (OddsResult.Run run : r.runList()) {
            rows.add(List.of(run.index(), run.angle(), run.residualFlux(), run.mode(), run.period(), run.peakPerUnit()));
        }
        Csv.write(dir.resolve(prefix + "-runs.csv"), List.of("run", "switching angle (rad)", "residual flux (pu)", "mode",
                "period (source periods)", "peak (pu)"), rows);
        Json.write(r, dir.resolve(prefix + ".json"));
        return List.of(prefix + "-runs.csv", prefix + ".json");
    }

    /** The notebook section (files written by {@link #write} with the same prefix). */
    public static void section(OddsResult r, Notebook nb, String prefix) {
        nb.section(prefix, "Probability of ferroresonance");
        nb.text(String.format(Locale.ROOT, "%d of %d switching events ended in ferroresonance: probability %.3g, %s %.3g %% "
                        + "confidence interval [%.3g, %.3g] (half-width %.3g). Seed %d.", r.ferroresonant(), r.runs(),
                r.probability(), r.interval().method(), 100 * r.interval().confidence(), r.interval().lower(),
                r.interval().upper(), r.interval().halfWidth(), r.seed()));
        List<List<String>> modes = new ArrayList<>();
        r.counts().forEach((m, c) -> modes.add(List.of(m, Integer.toString(c))));
        nb.table(List.of("settled mode", "runs"), modes);
        List<List<String>> need = new ArrayList<>();
        for (OddsResult.Needed n : r.needed()) {
            need.add(List.of(String.format(Locale.ROOT, "+-%.3g", n.halfWidth()), Long.toString(n.runs())));
        }
        nb.text(String.format(Locale.ROOT, "Runs needed for a half-width h: n = z^2 p (1 - p) / h^2 with z = %.4g and the planning "
                + "value p = %.3g (the point of the interval nearest 1/2).", r.z(), r.planningProbability()));
        nb.table(List.of("half-width", "runs needed"), need);
        nb.figure(prefix + "-estimate", "Estimate and confidence interval as runs accumulate", List.of(prefix + "-runs.csv",
                prefix + ".json"));
        nb.figure(prefix + "-runs", "Every run by switching angle and residual flux, coloured by the settled mode",
                List.of(prefix + "-runs.csv", prefix + ".json"));
        nb.list(r.notes());
        nb.end();
    }

    static XYChart estimate(OddsResult r) {
        XYChart c = ChartFiles.xyChart("Probability of ferroresonance", "runs", "probability");
        int n = r.running().size();
        double[] x = new double[n];
        double[] p = new double[n];
        double[] lo = new double[n];
        double[] hi = new double[n];
        for (int k = 0; k < n; k++) {
            OddsResult.Checkpoint cp = r.running().get(k);
            x[k] = cp.runs();
            p[k] = cp.probability();
            lo[k] = cp.lower();
            hi[k] = cp.upper();
        }
        XYSeries s = c.addSeries("estimate", x, p);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineStyle(ChartFiles.solid());
        XYSeries l = c.addSeries(String.format(Locale.ROOT, "%.3g %% interval (%s)", 100 * r.interval().confidence(),
                r.interval().method()), x, lo);
        l.setMarker(SeriesMarkers.NONE);
        l.setLineStyle(ChartFiles.dashed());
        l.setLineColor(ChartFiles.PALETTE[1]);
        XYSeries h = c.addSeries("upper bound", x, hi);
        h.setMarker(SeriesMarkers.NONE);
        h.setLineStyle(ChartFiles.dashed());
        h.setLineColor(ChartFiles.PALETTE[1]);
        h.setShowInLegend(false);
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(1.0);
        return c;
    }

    static XYChart runs(OddsResult r) {
        XYChart c = ChartFiles.xyChart("Switching events by outcome", "switching angle (deg)", "residual flux (pu of rated peak)");
        Map<String, List<double[]>> byMode = new LinkedHashMap<>();
        for (OddsResult.Run run : r.runList()) {
            byMode.computeIfAbsent(run.mode(), k -> new ArrayList<>()).add(new double[] {Math.toDegrees(run.angle()),
                run.residualFlux()});
        }
        for (Map.Entry<String, List<double[]>> e : byMode.entrySet()) {
            double[] x = e.getValue().stream().mapToDouble(a -> a[0]).toArray();
            double[] y = e.getValue().stream().mapToDouble(a -> a[1]).toArray();
            ChartFiles.markers(c, e.getKey() + " (" + x.length + ")", x, y, ModeColours.of(e.getKey()));
        }
        c.getStyler().setXAxisMin(0.0);
        c.getStyler().setXAxisMax(360.0);
        c.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideE);
        return c;
    }
}
