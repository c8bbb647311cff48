package org.ferromap.report;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ferromap.maps.Axis;
import org.ferromap.maps.ComparisonResult;
import org.ferromap.maps.LimitRow;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * A core comparison as files and as a notebook section: the magnetizing curves overlaid in per
 * unit, one overvoltage map per design on the same axes and colour scale (the installed case
 * marked), the designs and the ranking as CSV, and the whole result as JSON.
 */
public final class ComparisonReport {

    private ComparisonReport() {
    }

    /** Writes {prefix}-curves.*, {prefix}-map-N.* (N from 1), {prefix}-designs.csv, {prefix}-ranking.csv, {prefix}.json. */
    public static List<String> write(ComparisonResult r, Path dir, String prefix) {
        ChartFiles.save(curves(r), dir, prefix + "-curves");
        List<ComparisonResult.Design> ds = r.designs();
        for (int i = 0; i < ds.size(); i++) {
            map(r, ds.get(i)).save(dir, prefix + "-map-" + (i + 1));
        }
        List<String> header = new ArrayList<>(List.of("rank", "study", "rating (VA)", "exciting current (fraction)",
                "no-load loss (W)", "installed length (m)", "supply (V rms line)", "installed case", "worst stable state (pu)",
                "jump-up fold (V peak)", "jump-up fold / source", "jump-down fold (V peak)", "cusp length (m)"));
        int nm = ds.get(0).limits().size();
        for (LimitRow.MarginLimit m : ds.get(0).limits()) {
            header.add(String.format(Locale.ROOT, "limit at %.3g pu (m)", m.margin()));
        }
        header.addAll(List.of("G_min at installed length (S)", "damping load (W)", "map share at risk", "curve"));
        List<List<?>> rows = new ArrayList<>();
        for (ComparisonResult.Design d : ds) {
            List<Object> c = new ArrayList<>(List.of(d.rank(), d.study(), d.rating(), d.excitingCurrent(), d.noLoadLoss(),
                    d.length(), d.lineVoltage(), d.category(), d.worstPeakPu(), d.jumpUpSourcePeak(), d.jumpUpMargin(),
                    d.jumpDownSourcePeak(), Formats.lengthCell(d.cuspLength())));
            for (int k = 0; k < nm; k++) {
                c.add(Formats.lengthCell(d.limits().get(k).length()));
            }
            c.addAll(List.of(d.cuspConductance(), d.dampingLoad(), d.riskShare(), d.curve()));
            rows.add(c);
        }
        Csv.write(dir.resolve(prefix + "-designs.csv"), header, rows);
        List<List<?>> rank = new ArrayList<>();
        for (ComparisonResult.Ranked k : r.ranking()) {
            rank.add(List.of(k.rank(), k.study(), String.join("; ", k.reasons())));
        }
        Csv.write(dir.resolve(prefix + "-ranking.csv"), List.of("rank", "study", "reasons"), rank);
        List<List<?>> curve = new ArrayList<>();
        for (ComparisonResult.Design d : ds) {
            for (int k = 0; k < d.curveFluxPu().length; k++) {
                curve.add(List.of(d.study(), d.curveFluxPu()[k], d.curveCurrentPu()[k]));
            }
        }
        Csv.write(dir.resolve(prefix + "-curves.csv"), List.of("study", "flux (pu of rated peak)", "current (pu of rated peak)"),
                curve);
        Json.write(r, dir.resolve(prefix + ".json"));
        return List.of(prefix + "-designs.csv", prefix + "-ranking.csv", prefix + "-curves.csv", prefix + ".json");
    }

    /** The notebook section (files written by {@link #write} with the same prefix). */
    public static void section(ComparisonResult r, Notebook nb, String prefix) {
        nb.section(prefix, "Core comparison");
        List<List<String>> rank = new ArrayList<>();
        for (ComparisonResult.Ranked k : r.ranking()) {
            rank.add(List.of(Integer.toString(k.rank()), k.study(), String.join("; ", k.reasons())));
        }
        nb.table(List.of("rank", "design", "why"), rank);
        nb.text("Ranking criteria, in order (the first that separates two designs decides):");
        nb.list(r.criteria());
        List<String> header = new ArrayList<>(List.of("design", "I0", "P0", "installed case", "worst stable", "jump-up / source",
                "cusp length"));
        for (LimitRow.MarginLimit m : r.designs().get(0).limits()) {
            header.add(String.format(Locale.ROOT, "limit at %.3g pu", m.margin()));
        }
        header.addAll(List.of("damping load", "map at risk"));
        List<List<String>> rows = new ArrayList<>();
        for (ComparisonResult.Design d : r.designs()) {
            List<String> c = new ArrayList<>(List.of(d.study(), Formats.percent(d.excitingCurrent()), Formats.num(d.noLoadLoss()) + " W",
                    d.category(), Formats.num(d.worstPeakPu()) + " pu", Formats.num(d.jumpUpMargin()), Formats.length(d.cuspLength())));
            for (LimitRow.MarginLimit m : d.limits()) {
                c.add(Formats.length(m.length()));
            }
            c.add(Formats.kw(d.dampingLoad()));
            c.add(Formats.percent(d.riskShare()));
            rows.add(c);
        }
        nb.table(header, rows);
        nb.figure(prefix + "-curves", "Magnetizing curves of the designs, per unit of each winding's rated peak flux and current",
                List.of(prefix + "-curves.csv", prefix + ".json"));
        for (int i = 0; i < r.designs().size(); i++) {
            nb.figure(prefix + "-map-" + (i + 1), "Worst stable state (pu), " + r.designs().get(i).study()
                    + ": same axes and colour scale for every design; the installed case marked",
                    List.of(prefix + "-designs.csv", prefix + ".json"));
        }
        nb.list(r.notes());
        nb.end();
    }

    static XYChart curves(ComparisonResult r) {
        XYChart c = ChartFiles.xyChart("Magnetizing curves", "peak flux linkage (pu of rated peak flux)",
                "peak current (pu of rated peak current)");
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setXAxisMin(0.0);
        c.getStyler().setXAxisDecimalPattern("0.0#");
        c.getStyler().setXAxisTickMarkSpacingHint(120);
        c.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideNW);
        for (ComparisonResult.Design d : r.designs()) {
            List<Double> x = new ArrayList<>();
            List<Double> y = new ArrayList<>();
            for (int k = 0; k < d.curveFluxPu().length; k++) {
                if (d.curveCurrentPu()[k] > 0) {
                    x.add(d.curveFluxPu()[k]);
                    y.add(d.curveCurrentPu()[k]);
                }
            }
            XYSeries s = c.addSeries(d.study(), x, y);
            s.setMarker(SeriesMarkers.NONE);
            s.setLineStyle(ChartFiles.solid());
        }
        return c;
    }

    static MapChart map(ComparisonResult r, ComparisonResult.Design d) {
        Scale sx = Scale.of(r.x());
        Scale sy = Scale.of(r.y());
        double[] cells = new double[d.mapPeakPu().size()];
        for (int i = 0; i < cells.length; i++) {
            Double v = d.mapPeakPu().get(i);
            cells[i] = v == null ? Double.NaN : v;
        }
        MapChart.Builder b = MapChart.builder().title("Worst stable state: " + d.name())
                .x(sx.title, sx.values(r.x()), r.x().scale() == Axis.Scale.LOG)
                .y(sy.title, sy.values(r.y()), r.y().scale() == Axis.Scale.LOG)
                .layer(new MapChart.Continuous(cells, r.scaleMin(), r.scaleMax(), "peak (pu)"));
        double mx = installed(r.x(), d) / sx.factor;
        double my = installed(r.y(), d) / sy.factor;
        if (Double.isFinite(mx) && Double.isFinite(my) && within(r.x(), mx * sx.factor) && within(r.y(), my * sy.factor)) {
            b.marker(new MapChart.Marker("installed", mx, my, Color.WHITE));
        }
        return b.build();
    }

    private static double installed(Axis a, ComparisonResult.Design d) {
        return switch (a.name()) {
            case "cable-length" -> d.length();
            case "source-line-voltage" -> d.lineVoltage();
            default -> Double.NaN;
        };
    }

    private static boolean within(Axis a, double v) {
        return v >= Math.min(a.from(), a.to()) && v <= Math.max(a.from(), a.to());
    }

    /** Display scaling of an SI axis: km for long lengths, kV for voltages. */
    private record Scale(String title, double factor) {
        static Scale of(Axis a) {
            double top = Math.max(Math.abs(a.from()), Math.abs(a.to()));
            return switch (a.unit()) {
                case "m" -> top >= 5000 ? new Scale(a.name() + " (km)", 1e3) : new Scale(a.name() + " (m)", 1);
                case "V" -> new Scale(a.name() + " (kV)", 1e3);
                default -> new Scale(a.name() + (a.unit().isEmpty() ? "" : " (" + a.unit() + ")"), 1);
            };
        }

        double[] values(Axis a) {
            double[] v = a.values();
            for (int i = 0; i < v.length; i++) {
                v[i] /= factor;
            }
            return v;
        }
    }
}
