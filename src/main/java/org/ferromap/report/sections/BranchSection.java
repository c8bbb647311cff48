package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.report.ChartFiles;
import org.ferromap.report.Notebook;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The branch of steady states as one parameter varies: terminal voltage against the parameter,
 * stable parts solid, unstable dashed, folds marked, the study's own value shown.
 */
public final class BranchSection {

    private BranchSection() {
    }

    /**
     * A sampled branch.
     *
     * @param parameter  the parameter's name
     * @param unit       the unit of {@code x}
     * @param x          parameter values along the branch (in branch order for a traced branch)
     * @param y          terminal voltage, pu of the rated peak
     * @param stable     stability of each sample
     * @param traced     true when consecutive samples follow the branch (drawn as lines), false
     *                   for a sweep that solves each value on its own (drawn as points)
     * @param foldX      parameter value at each fold
     * @param foldY      terminal voltage at each fold, pu
     * @param studyValue the study's own value of the parameter, in {@code unit}
     * @param note       one line on how the branch was obtained
     */
    public record Data(String parameter, String unit, double[] x, double[] y, boolean[] stable, boolean traced,
            double[] foldX, double[] foldY, double studyValue, String note) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("branch", "Branch of steady states in " + d.parameter());
        nb.text(d.note());
        XYChart ch = ChartFiles.xyChart("Steady states against " + d.parameter(), d.parameter() + " (" + d.unit() + ")",
                "terminal voltage (pu of rated peak)");
        if (d.traced()) {
            int start = 0;
            boolean[] shown = new boolean[2];
            int run = 0;
            for (int i = 1; i <= d.x().length; i++) {
                if (i == d.x().length || d.stable()[i] != d.stable()[start]) {
                    int end = Math.min(i + 1, d.x().length); // overlap one sample so the runs join
                    boolean st = d.stable()[start];
                    String name = (st ? "stable" : "unstable") + (run > 1 ? " " + run : "");
                    XYSeries s = ch.addSeries(name, java.util.Arrays.copyOfRange(d.x(), start, end),
                            java.util.Arrays.copyOfRange(d.y(), start, end));
                    s.setMarker(SeriesMarkers.NONE);
                    s.setLineStyle(st ? ChartFiles.solid() : ChartFiles.dashed());
                    s.setLineColor(st ? ChartFiles.PALETTE[0] : ChartFiles.PALETTE[1]);
                    s.setShowInLegend(!shown[st ? 0 : 1]);
                    shown[st ? 0 : 1] = true;
                    run++;
                    start = i;
                }
            }
        } else {
            for (boolean st : new boolean[] {true, false}) {
                List<Double> xs = new ArrayList<>();
                List<Double> ys = new ArrayList<>();
                for (int i = 0; i < d.x().length; i++) {
                    if (d.stable()[i] == st) {
                        xs.add(d.x()[i]);
                        ys.add(d.y()[i]);
                    }
                }
                if (!xs.isEmpty()) {
                    ChartFiles.markers(ch, st ? "stable" : "unstable", xs.stream().mapToDouble(Double::doubleValue).toArray(),
                            ys.stream().mapToDouble(Double::doubleValue).toArray(), ChartFiles.PALETTE[st ? 0 : 1]);
                }
            }
        }
        if (d.foldX().length > 0) {
            ChartFiles.markers(ch, "folds", d.foldX(), d.foldY(), ChartFiles.PALETTE[6]);
        }
        double[] yr = range(d.y());
        XYSeries study = ch.addSeries("study's value", new double[] {d.studyValue(), d.studyValue()}, yr);
        study.setMarker(SeriesMarkers.NONE);
        study.setLineStyle(ChartFiles.dashed());
        study.setLineColor(java.awt.Color.GRAY);
        ch.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideNW);
        ch.getStyler().setXAxisLogarithmic(!d.traced() && logWorthy(d.x()));
        double[] st = new double[d.x().length];
        for (int i = 0; i < st.length; i++) {
            st[i] = d.stable()[i] ? 1 : 0;
        }
        Figures.xy(nb, notebook, "branch", "branch", ch, "Terminal voltage of the steady states against " + d.parameter()
                + " (single-harmonic balance); folds marked, the study's value dashed",
                List.of(d.parameter() + " (" + d.unit() + ")", "terminal voltage (pu)", "stable (1/0)"),
                Figures.columns(d.x(), d.y(), st), d);
        nb.end();
    }

    private static double[] range(double[] y) {
        double lo = 0;
        double hi = 0;
        for (double v : y) {
            if (Double.isFinite(v)) {
                hi = Math.max(hi, v);
            }
        }
        return new double[] {lo, hi > 0 ? hi : 1};
    }

    /** Positive values spanning more than a decade read better on a log axis. */
    private static boolean logWorthy(double[] x) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (double v : x) {
            if (!(v > 0)) {
                return false;
            }
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        return x.length > 0 && hi / lo > 10;
    }
}
