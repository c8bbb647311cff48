package org.ferromap.report;

import java.nio.file.Path;
import java.util.List;
import org.ferromap.equipment.SaturationCurve;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** Charts of equipment data: the saturation curve as given and as held. */
public final class EquipmentCharts {

    private EquipmentCharts() {
    }

    /**
     * The curve held (a line from the origin to 30 % past the last defining point) with its
     * defining points marked. Flux in Wb-turn peak against current in A peak.
     */
    public static List<Path> saturation(String title, SaturationCurve c, Path dir, String name) {
        List<SaturationCurve.CurvePoint> pts = c.definingPoints();
        double top = pts.isEmpty() ? 1 : pts.get(pts.size() - 1).flux() * 1.3;
        int n = 300;
        double[] i = new double[n + 1];
        double[] lam = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            lam[k] = top * k / n;
            i[k] = c.current(lam[k]);
        }
        XYChart ch = ChartFiles.xyChart("Magnetizing curve held for the study", "current (A peak)", "flux linkage (Wb-turn peak)");
        XYSeries line = ch.addSeries("curve held: " + c.describe(), i, lam);
        line.setMarker(SeriesMarkers.NONE);
        line.setLineStyle(ChartFiles.solid());
        double[] pi = new double[pts.size()];
        double[] pl = new double[pts.size()];
        for (int k = 0; k < pts.size(); k++) {
            pi[k] = pts.get(k).current();
            pl[k] = pts.get(k).flux();
        }
        if (pts.size() > 0) {
            ChartFiles.markers(ch, "defining points", pi, pl, ChartFiles.PALETTE[1]);
        }
        ch.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideSE);
        return ChartFiles.save(ch, dir, name);
    }
}
