package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.CuspCondition;
import org.ferromap.balance.Fold;
import org.ferromap.report.ChartFiles;
import org.ferromap.report.Notebook;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The folds and the cusp: the study's folds in a table, and the fold voltages as a second
 * parameter varies (the fold curves in the plane of that parameter and the source), with the
 * cusp where the two folds meet and the fold pair ends.
 */
public final class FoldsSection {

    private FoldsSection() {
    }

    /**
     * @param folds       the study's folds
     * @param cusp        the study's cusp condition
     * @param parameter   the second parameter's name
     * @param unit        its unit
     * @param q           its values
     * @param upPu        jump-up fold source at each value, pu of the rated peak (NaN without a fold pair)
     * @param downPu      jump-down fold source, pu (NaN without a fold pair)
     * @param studyValue  the study's value of the parameter
     * @param sourcePu    the study's source, pu
     * @param cuspQ       the parameter value where the fold pair is born (NaN when not found in the range)
     * @param cuspSourcePu the source there, pu
     * @param logQ        whether the parameter axis is logarithmic
     * @param foldFreeConductance total shunt conductance at which the study's fold pair vanishes, S
     * @param conductance the study's shunt conductance, S
     */
    public record Data(List<Fold> folds, CuspCondition cusp, String parameter, String unit, double[] q, double[] upPu,
            double[] downPu, double studyValue, double sourcePu, double cuspQ, double cuspSourcePu, boolean logQ,
            double foldFreeConductance, double conductance) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("folds", "Folds and cusp");
        if (d.folds().isEmpty()) {
            nb.text("At the study's values the branch has no fold pair: the steady state is unique at every source voltage.");
        } else {
            List<List<String>> rows = new ArrayList<>();
            for (Fold f : d.folds()) {
                rows.add(List.of(f.direction().label(), Fmt.si(f.sourcePeak(), "V"), Fmt.pu(f.sourcePerUnit()),
                        Fmt.si(f.voltage(), "V")));
            }
            nb.table(List.of("fold", "source (peak)", "source (pu)", "terminal voltage (peak)"), rows);
        }
        CuspCondition c = d.cusp();
        nb.text("Bistability needs a total capacitance above C_min = " + Fmt.si(c.minimumCapacitance(), "F")
                + " (the study has " + Fmt.sig(c.capacitanceRatio(), 4) + " times that); a total shunt conductance of "
                + Fmt.si(d.foldFreeConductance(), "S") + " or more removes the fold pair (the study has "
                + Fmt.si(d.conductance(), "S") + "). "
                + (Double.isNaN(d.cuspQ()) ? "The fold pair does not end inside the " + d.parameter() + " range drawn."
                        : "In " + d.parameter() + " the fold pair is born at " + Fmt.sig(d.cuspQ(), 4) + " " + d.unit()
                        + " with the folds at " + Fmt.pu(d.cuspSourcePu()) + " of source (the cusp)."));
        XYChart ch = ChartFiles.xyChart("Fold voltages against " + d.parameter(), d.parameter() + " (" + d.unit() + ")",
                "source at the fold (pu of rated peak)");
        double[][] upF = finite(d.q(), d.upPu());
        if (upF[0].length > 0) {
            XYSeries up = ch.addSeries("jump-up fold", upF[0], upF[1]);
            up.setMarker(SeriesMarkers.NONE);
            up.setLineStyle(ChartFiles.solid());
        }
        double[][] downF = finite(d.q(), d.downPu());
        if (downF[0].length > 0) {
            XYSeries down = ch.addSeries("jump-down fold", downF[0], downF[1]);
            down.setMarker(SeriesMarkers.NONE);
            down.setLineStyle(ChartFiles.dashed());
        }
        XYSeries src = ch.addSeries("study's source", new double[] {d.q()[0], d.q()[d.q().length - 1]},
                new double[] {d.sourcePu(), d.sourcePu()});
        src.setMarker(SeriesMarkers.NONE);
        src.setLineColor(java.awt.Color.GRAY);
        ChartFiles.markers(ch, "study", new double[] {d.studyValue()}, new double[] {d.sourcePu()}, ChartFiles.PALETTE[6]);
        if (!Double.isNaN(d.cuspQ())) {
            ChartFiles.markers(ch, "cusp", new double[] {d.cuspQ()}, new double[] {d.cuspSourcePu()}, ChartFiles.PALETTE[3]);
        }
        ch.getStyler().setXAxisLogarithmic(d.logQ());
        ch.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideNW);
        Figures.xy(nb, notebook, "folds", "fold-curves", ch, "Source voltage at the jump-up and jump-down folds as "
                + d.parameter() + " varies, other values as in the study: below the jump-down curve only the normal state "
                + "exists, between the curves both, above the jump-up curve only the ferroresonant one",
                List.of(d.parameter() + " (" + d.unit() + ")", "jump-up source (pu)", "jump-down source (pu)"),
                Figures.columns(d.q(), d.upPu(), d.downPu()), d);
        nb.end();
    }

    /** The points where y is finite (XChart draws no gaps). */
    static double[][] finite(double[] x, double[] y) {
        int n = 0;
        for (double v : y) {
            n += Double.isFinite(v) ? 1 : 0;
        }
        double[][] o = new double[2][n];
        int k = 0;
        for (int i = 0; i < y.length; i++) {
            if (Double.isFinite(y[i])) {
                o[0][k] = x[i];
                o[1][k++] = y[i];
            }
        }
        return o;
    }
}
