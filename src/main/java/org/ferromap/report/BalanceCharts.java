package org.ferromap.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.BalanceContinuation;
import org.ferromap.balance.BranchResult;
import org.ferromap.balance.FoldCurveResult;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Charts and tables of balance continuation results: the branch diagram (magnetizing-branch
 * voltage peak against the parameter, stable solid, unstable dashed, folds and the study's own
 * value marked) and the fold curves in a parameter plane (cusps marked, regions labelled), each
 * with a CSV of every computed point. Draws results only; never runs a solver.
 */
public final class BalanceCharts {

    private static final Color STABLE = ChartFiles.PALETTE[0];
    private static final Color UNSTABLE = ChartFiles.PALETTE[1];
    private static final Color MARK = ChartFiles.PALETTE[6];
    private static final Color STUDY = new Color(120, 120, 120);

    private BalanceCharts() {
    }

    /**
     * The branch diagram: name.png, name.svg, name.pdf in dir.
     *
     * @param title chart title (the study's)
     * @param r the branch
     * @param studyValue the study's own value of the parameter, its unit (NaN or outside the
     *        range: not marked)
     */
    public static List<Path> branch(String title, BranchResult r, double studyValue, Path dir, String name) {
        DisplayUnit xu = DisplayUnit.of(r.unit(), Math.max(Math.abs(r.from()), Math.abs(r.to())));
        double vMax = 0;
        for (BranchResult.Point p : r.points()) {
            vMax = Math.max(vMax, p.voltage());
        }
        DisplayUnit yu = DisplayUnit.of("V", vMax);
        String h = r.harmonics() == 1 ? "single-harmonic" : r.harmonics() + " harmonics";
        XYChart c = ChartFiles.xyChart(fit("Branch in " + r.parameter() + " (" + h + "): " + title),
                r.parameter() + " (" + xu.label() + ")", "magnetizing voltage (" + yu.label() + " peak)");
        List<BranchResult.Point> pts = r.points();
        int start = 0;
        int stableRuns = 0;
        int unstableRuns = 0;
        boolean shownStable = false;
        boolean shownUnstable = false;
        while (start < pts.size()) {
            boolean stable = pts.get(start).stable();
            int end = start;
            while (end + 1 < pts.size() && pts.get(end + 1).stable() == stable) {
                end++;
            }
            // Each run ends on the first point of the next so the drawn branch has no gaps.
            int last = Math.min(end + 1, pts.size() - 1);
            double[] x = new double[last - start + 1];
            double[] y = new double[x.length];
            for (int k = start; k <= last; k++) {
                x[k - start] = xu.scale(pts.get(k).parameter());
                y[k - start] = yu.scale(pts.get(k).voltage());
            }
            if (x.length == 1) {
                x = new double[] {x[0], x[0]};
                y = new double[] {y[0], y[0]};
            }
            int nth = stable ? ++stableRuns : ++unstableRuns;
            XYSeries s = c.addSeries((stable ? "stable" : "unstable") + (nth > 1 ? " " + nth : ""), x, y);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(stable ? STABLE : UNSTABLE);
            s.setLineStyle(stable ? ChartFiles.solid() : ChartFiles.dashed());
            boolean show = stable ? !shownStable : !shownUnstable;
            s.setShowInLegend(show);
            if (stable) {
                shownStable = true;
            } else {
                shownUnstable = true;
            }
            start = end + 1;
        }
        if (!r.folds().isEmpty()) {
            double[] fx = new double[r.folds().size()];
            double[] fy = new double[fx.length];
            for (int k = 0; k < fx.length; k++) {
                fx[k] = xu.scale(r.folds().get(k).parameter());
                fy[k] = yu.scale(r.folds().get(k).voltage());
            }
            XYSeries s = c.addSeries("folds", fx, fy);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.DIAMOND);
            s.setMarkerColor(MARK);
        }
        if (!r.branchPoints().isEmpty()) {
            double[] bx = new double[r.branchPoints().size()];
            double[] by = new double[bx.length];
            for (int k = 0; k < bx.length; k++) {
                bx[k] = xu.scale(r.branchPoints().get(k).parameter());
                by[k] = yu.scale(r.branchPoints().get(k).voltage());
            }
            XYSeries s = c.addSeries("branch points", bx, by);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.SQUARE);
            s.setMarkerColor(ChartFiles.PALETTE[2]);
        }
        if (studyValue >= r.from() && studyValue <= r.to() && !pts.isEmpty()) {
            double top = yu.scale(vMax) * 1.05;
            XYSeries s = c.addSeries("study value", new double[] {xu.scale(studyValue), xu.scale(studyValue)}, new double[] {0, top});
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(STUDY);
            s.setLineStyle(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {2f, 3f}, 0f));
        }
        c.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideSE);
        return ChartFiles.save(c, dir, name);
    }

    /** Every point of the branch, then its folds and branch points, as CSV. */
    public static void branchCsv(BranchResult r, Path file) {
        List<List<?>> rows = new ArrayList<>();
        for (BranchResult.Point p : r.points()) {
            rows.add(List.of("point", p.parameter(), p.flux(), p.voltage(), p.peakFlux(), p.stable(), p.unstableDirections()));
        }
        for (BranchResult.Special s : r.folds()) {
            rows.add(List.of("fold", s.parameter(), s.flux(), s.voltage(), "", "", ""));
        }
        for (BranchResult.Special s : r.branchPoints()) {
            rows.add(List.of("branch point", s.parameter(), s.flux(), s.voltage(), "", "", ""));
        }
        Csv.write(file, List.of("kind", r.parameter() + " (" + r.unit() + ")", "flux (Wb-turn peak, fundamental)",
                "voltage (V peak)", "peak flux (Wb-turn)", "stable", "unstable directions"), rows);
    }

    /**
     * The fold curves in the (P1, P2) plane: name.png, name.svg, name.pdf in dir, cusps marked,
     * regions labelled at their probe points, the study's point marked when inside the window.
     */
    public static List<Path> folds(String title, FoldCurveResult r, double studyP1, double studyP2, Path dir, String name) {
        DisplayUnit xu = DisplayUnit.of(r.p1Unit(), Math.max(Math.abs(r.p1From()), Math.abs(r.p1To())));
        DisplayUnit yu = DisplayUnit.of(r.p2Unit(), Math.max(Math.abs(r.p2From()), Math.abs(r.p2To())));
        XYChart c = ChartFiles.xyChart(fit("Fold curves: " + title),
                r.p1() + " (" + xu.label() + ")", r.p2() + " (" + yu.label() + ")");
        boolean logX = BalanceContinuation.logarithmic(r.p1From(), r.p1To());
        boolean logY = BalanceContinuation.logarithmic(r.p2From(), r.p2To());
        c.getStyler().setXAxisLogarithmic(logX);
        c.getStyler().setYAxisLogarithmic(logY);
        c.getStyler().setXAxisMin(xu.scale(r.p1From()));
        c.getStyler().setXAxisMax(xu.scale(r.p1To()));
        c.getStyler().setYAxisMin(yu.scale(r.p2From()));
        c.getStyler().setYAxisMax(yu.scale(r.p2To()));
        boolean any = false;
        for (int seg = 0; seg < r.segments().size(); seg++) {
            List<double[]> xy = new ArrayList<>();
            for (FoldCurveResult.CurvePoint p : r.curve()) {
                if (p.segment() == seg) {
                    xy.add(new double[] {xu.scale(p.p1()), yu.scale(p.p2())});
                }
            }
            if (xy.size() < 2) {
                continue;
            }
            double[] x = new double[xy.size()];
            double[] y = new double[xy.size()];
            for (int k = 0; k < x.length; k++) {
                x[k] = xy.get(k)[0];
                y[k] = xy.get(k)[1];
            }
            XYSeries s = c.addSeries(seg == 0 ? "folds" : "folds " + (seg + 1), x, y);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineColor(STABLE);
            s.setLineStyle(ChartFiles.solid());
            s.setShowInLegend(seg == 0);
            any = true;
        }
        if (!r.cusps().isEmpty()) {
            double[] x = new double[r.cusps().size()];
            double[] y = new double[x.length];
            for (int k = 0; k < x.length; k++) {
                x[k] = xu.scale(r.cusps().get(k).p1());
                y[k] = yu.scale(r.cusps().get(k).p2());
            }
            XYSeries s = c.addSeries("cusps", x, y);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.DIAMOND);
            s.setMarkerColor(MARK);
            any = true;
        }
        if (studyP1 >= r.p1From() && studyP1 <= r.p1To() && studyP2 >= r.p2From() && studyP2 <= r.p2To()) {
            XYSeries s = c.addSeries("study", new double[] {xu.scale(studyP1)}, new double[] {yu.scale(studyP2)});
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.CROSS);
            s.setMarkerColor(STUDY);
            any = true;
        }
        if (!any) {
            // An empty chart still needs one series to draw its axes.
            XYSeries s = c.addSeries("no folds in the window", new double[] {xu.scale(r.p1From())}, new double[] {yu.scale(r.p2From())});
            s.setMarker(SeriesMarkers.NONE);
        }
        for (FoldCurveResult.Region region : r.regions()) {
            c.addAnnotation(new AnnotationText(region.label(), xu.scale(region.p1()), yu.scale(region.p2()), false));
        }
        c.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideNE);
        return ChartFiles.save(c, dir, name);
    }

    /** A title short enough for the chart's width (about 75 characters). */
    private static String fit(String title) {
        return title.length() <= 75 ? title : title.substring(0, 72) + "...";
    }

    /** Every fold-curve point, then the cusps, as CSV. */
    public static void foldsCsv(FoldCurveResult r, Path file) {
        List<List<?>> rows = new ArrayList<>();
        for (FoldCurveResult.CurvePoint p : r.curve()) {
            rows.add(List.of("fold", p.p1(), p.p2(), p.flux(), p.segment()));
        }
        for (FoldCurveResult.Cusp p : r.cusps()) {
            rows.add(List.of("cusp", p.p1(), p.p2(), p.flux(), p.segment()));
        }
        Csv.write(file, List.of("kind", r.p1() + " (" + r.p1Unit() + ")", r.p2() + " (" + r.p2Unit() + ")",
                "flux (Wb-turn peak, fundamental)", "curve"), rows);
    }

    /** A display unit for an SI unit: a prefix chosen from the size of the values. */
    record DisplayUnit(String label, double factor) {

        double scale(double v) {
            return v / factor;
        }

        static DisplayUnit of(String unit, double largest) {
            return switch (unit) {
                case "V" -> largest >= 1e3 ? new DisplayUnit("kV", 1e3) : new DisplayUnit("V", 1);
                case "F" -> largest >= 1e-7 || largest == 0 ? new DisplayUnit("uF", 1e-6)
                        : largest >= 1e-10 ? new DisplayUnit("nF", 1e-9) : new DisplayUnit("pF", 1e-12);
                case "ohm" -> largest >= 1e6 ? new DisplayUnit("MOhm", 1e6) : largest >= 1e3 ? new DisplayUnit("kOhm", 1e3)
                        : new DisplayUnit("ohm", 1);
                case "m" -> largest >= 1e3 ? new DisplayUnit("km", 1e3) : new DisplayUnit("m", 1);
                case "W" -> largest >= 1e4 ? new DisplayUnit("kW", 1e3) : new DisplayUnit("W", 1);
                default -> new DisplayUnit(unit, 1);
            };
        }
    }
}
