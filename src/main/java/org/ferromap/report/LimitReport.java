package org.ferromap.report;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.ferromap.maps.LimitRow;
import org.ferromap.maps.LimitTableResult;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The cable-length limit table as files and as a notebook section: a chart of the limit against
 * rating per cable type (and connection, voltage class, open-phase case), the linear criterion
 * dashed in the same colour; CSV with every column; JSON of the whole result.
 */
public final class LimitReport {

    private LimitReport() {
    }

    /** Writes {prefix}.png/.svg/.pdf, {prefix}.csv and {prefix}.json into dir; returns the data file names. */
    public static List<String> write(LimitTableResult r, Path dir, String prefix) {
        chart(r).ifPresent(c -> ChartFiles.save(c, dir, prefix));
        List<String> header = new ArrayList<>(List.of("rating (VA)", "voltage class (V rms line)", "connection", "cable",
                "open phases", "exciting current (fraction)", "exciting current source", "no-load loss (W)",
                "no-load loss source", "exactness", "driven", "cusp length (m)"));
        List<LimitRow> rows = r.rows();
        int nm = rows.isEmpty() ? 0 : rows.get(0).limits().size();
        for (int k = 0; k < nm; k++) {
            header.add(String.format(Locale.ROOT, "limit at %.3g pu (m)", rows.get(0).limits().get(k).margin()));
        }
        header.addAll(List.of("linear criterion K", "linear criterion length (m)", "linear resonance length (m)",
                "check length (m)", "check events", "check off predicted state", "check confirmed", "note"));
        List<List<?>> out = new ArrayList<>();
        for (LimitRow row : rows) {
            List<Object> c = new ArrayList<>(List.of(row.rating(), row.voltage(), row.connection(), row.cable(), row.openPhases(),
                    row.excitingCurrent(), row.excitingCurrentSource(), row.noLoadLoss(), row.noLoadLossSource(), row.exactness(),
                    row.driven(), Formats.lengthCell(row.cuspLength())));
            for (LimitRow.MarginLimit m : row.limits()) {
                c.add(Formats.lengthCell(m.length()));
            }
            c.add(row.linearK());
            c.add(Formats.lengthCell(row.linearLength()));
            c.add(Formats.lengthCell(row.linearResonanceLength()));
            LimitRow.Check ch = row.check();
            c.add(ch == null ? null : ch.length());
            c.add(ch == null ? null : ch.events());
            c.add(ch == null ? null : ch.offBranch());
            c.add(ch == null ? null : ch.confirmed());
            c.add(row.note());
            out.add(c);
        }
        Csv.write(dir.resolve(prefix + ".csv"), header, out);
        Json.write(r, dir.resolve(prefix + ".json"));
        return List.of(prefix + ".csv", prefix + ".json");
    }

    /** The notebook section (files written by {@link #write} with the same prefix). */
    public static void section(LimitTableResult r, Notebook nb, String prefix) {
        nb.section(prefix, "Cable-length limits");
        nb.text("Limit: " + r.limitDefinition());
        nb.text("Beside it, the linear criterion: " + r.linearCriterion() + "; and the loop's linear resonance "
                + "(K = L_eq/Lm).");
        List<String> header = new ArrayList<>(List.of("rating", "voltage", "connection", "cable", "open", "I0", "P0"));
        List<LimitRow> rows = r.rows();
        if (!rows.isEmpty()) {
            for (LimitRow.MarginLimit m : rows.get(0).limits()) {
                header.add(String.format(Locale.ROOT, "limit at %.3g pu", m.margin()));
            }
        }
        header.addAll(List.of("linear K", "linear resonance", "check", "exactness"));
        List<List<String>> cells = new ArrayList<>();
        for (LimitRow row : rows) {
            List<String> c = new ArrayList<>(List.of(Formats.kva(row.rating()), Formats.kv(row.voltage()), row.connection(),
                    row.cable(), Integer.toString(row.openPhases()), Formats.percent(row.excitingCurrent()),
                    Formats.num(row.noLoadLoss()) + " W"));
            for (LimitRow.MarginLimit m : row.limits()) {
                c.add(Formats.length(m.length()));
            }
            c.add(Formats.length(row.linearLength()) + " (K " + Formats.num(row.linearK()) + ")");
            c.add(Formats.length(row.linearResonanceLength()));
            LimitRow.Check ch = row.check();
            c.add(ch == null ? "-" : ch.confirmed() ? "confirmed (" + ch.events() + " events)"
                    : ch.offBranch() + " of " + ch.events() + " off the predicted state");
            c.add(row.exactness());
            cells.add(c);
        }
        nb.table(header, cells);
        if (chart(r).isPresent()) {
            nb.figure(prefix, "Longest cable without a ferroresonant state at rated voltage, against rating (solid); the "
                    + "linear criterion dashed in the same colour", List.of(prefix + ".csv", prefix + ".json"));
        }
        nb.text("Where the figures come from:");
        nb.list(r.sources());
        nb.list(r.notes());
        nb.end();
    }

    /** The chart, or empty when no row has a finite limit. */
    static java.util.Optional<XYChart> chart(LimitTableResult r) {
        Map<String, List<LimitRow>> groups = new LinkedHashMap<>();
        for (LimitRow row : r.rows()) {
            String key = String.format(Locale.ROOT, "%s, %s, %d open, %s", row.cable(), row.connection(), row.openPhases(),
                    Formats.kv(row.voltage()));
            groups.computeIfAbsent(key, k -> new ArrayList<>()).add(row);
        }
        double k = r.rows().isEmpty() ? Double.NaN : r.rows().get(0).linearK();
        XYChart c = ChartFiles.xyChart("Cable-length limit at rated voltage (dashed: linear criterion, K = " + Formats.num(k) + ")",
                "transformer rating (kVA)", "cable length (m)");
        c.getStyler().setXAxisLogarithmic(true);
        c.getStyler().setYAxisLogarithmic(true);
        c.getStyler().setXAxisLogarithmicDecadeOnly(false);
        c.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideS);
        c.getStyler().setChartTitleFont(new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.BOLD, 13));
        int colour = 0;
        boolean any = false;
        for (Map.Entry<String, List<LimitRow>> g : groups.entrySet()) {
            List<Double> xs = new ArrayList<>();
            List<Double> ys = new ArrayList<>();
            List<Double> ls = new ArrayList<>();
            for (LimitRow row : g.getValue()) {
                double l = row.ratedLimit().length();
                if (Double.isFinite(l) && l > 0 && Double.isFinite(row.linearLength()) && row.linearLength() > 0) {
                    xs.add(row.rating() / 1e3);
                    ys.add(l);
                    ls.add(row.linearLength());
                }
            }
            if (xs.isEmpty()) {
                continue;
            }
            any = true;
            Color col = ChartFiles.PALETTE[colour++ % ChartFiles.PALETTE.length];
            XYSeries s = c.addSeries(g.getKey(), xs, ys);
            s.setLineColor(col);
            s.setMarkerColor(col);
            s.setMarker(SeriesMarkers.CIRCLE);
            s.setLineStyle(ChartFiles.solid());
            XYSeries lin = c.addSeries(g.getKey() + ", linear K", xs, ls);
            lin.setLineColor(col);
            lin.setMarker(SeriesMarkers.NONE);
            lin.setLineStyle(ChartFiles.dashed());
            lin.setShowInLegend(false);
        }
        return any ? java.util.Optional.of(c) : java.util.Optional.empty();
    }
}
