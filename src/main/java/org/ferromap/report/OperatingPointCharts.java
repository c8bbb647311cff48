package org.ferromap.report;

import java.awt.Color;
import java.nio.file.Path;
import java.util.List;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.PointKind;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.SaturationCurve;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The graphical method (DOMAIN.md §3): the magnetizing branch's fundamental voltage against its
 * fundamental current, V = w Lambda against I1(Lambda), crossed by the capacitor lines
 * I = w C V -/+ w Cs E of the lossless loop. The operating points the balance found (losses
 * included) are marked by kind.
 */
public final class OperatingPointCharts {

    private OperatingPointCharts() {
    }

    /** Writes the chart as name.png/.svg/.pdf; returns the sampled curve for the CSV. */
    public static double[][] graphical(String title, EquivalentCircuit c, List<OperatingPoint> points, Path dir, String name) {
        double w = c.omega();
        double cTot = c.totalCapacitance();
        double drive = w * c.seriesCapacitance() * c.sourcePeak();
        SaturationCurve m = c.magnetizing();
        double vTop = 1.5 * c.ratedPeak();
        for (OperatingPoint p : points) {
            vTop = Math.max(vTop, 1.25 * p.voltage());
        }
        int n = 400;
        double[] vi = new double[n + 1];
        double[] ii = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            double v = vTop * k / n;
            vi[k] = v / 1e3;
            ii[k] = m.fundamentalCurrent(v / w);
        }
        double iTop = w * cTot * vTop;
        XYChart ch = ChartFiles.xyChart("Graphical method (fundamental-frequency balance)", "fundamental current (A peak)", "voltage across the magnetizing branch (kV peak)");
        XYSeries curve = ch.addSeries("magnetizing branch, fundamental", ii, vi);
        curve.setMarker(SeriesMarkers.NONE);
        curve.setLineStyle(ChartFiles.solid());
        XYSeries l1 = ch.addSeries("capacitor line, I = wCV - wCsE", new double[] {-drive, iTop - drive}, new double[] {0, vTop / 1e3});
        l1.setMarker(SeriesMarkers.NONE);
        l1.setLineStyle(ChartFiles.dashed());
        XYSeries l2 = ch.addSeries("capacitor line, I = wCV + wCsE", new double[] {drive, iTop + drive}, new double[] {0, vTop / 1e3});
        l2.setMarker(SeriesMarkers.NONE);
        l2.setLineStyle(ChartFiles.dashed());
        for (PointKind kind : PointKind.values()) {
            List<OperatingPoint> ps = points.stream().filter(p -> p.kind() == kind).toList();
            if (ps.isEmpty()) {
                continue;
            }
            double[] x = ps.stream().mapToDouble(OperatingPoint::current).toArray();
            double[] y = ps.stream().mapToDouble(p -> p.voltage() / 1e3).toArray();
            ChartFiles.markers(ch, kind.label() + " point", x, y, colour(kind));
        }
        ch.getStyler().setXAxisMin(Math.min(-drive, 0) * 1.05);
        ch.getStyler().setXAxisMax(Math.max(ii[n], drive) * 1.05);
        ch.getStyler().setYAxisMin(0.0);
        ch.getStyler().setYAxisMax(vTop / 1e3);
        ch.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideSE);
        ChartFiles.save(ch, dir, name);
        return new double[][] {ii, vi};
    }

    /** The colour of a point kind in every chart. */
    public static Color colour(PointKind k) {
        return switch (k) {
            case NORMAL -> Palette.SAFE.darker();
            case UNSTABLE -> Color.GRAY;
            case FERRORESONANT -> Palette.FERRO_ONLY;
        };
    }
}
