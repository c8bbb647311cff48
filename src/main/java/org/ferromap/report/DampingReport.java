package org.ferromap.report;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ferromap.maps.ArresterDuty;
import org.ferromap.maps.DampingResult;
import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Damping sizing as files and as a notebook section: the settled modes of the switching events
 * at each step (stacked bars), the arrester's voltage and current over one settled cycle, CSV of
 * the steps and the waveform, JSON of the whole result.
 */
public final class DampingReport {

    private DampingReport() {
    }

    /** Writes {prefix}-steps.*, {prefix}-arrester.* (when assessed), CSVs and {prefix}.json; returns the data file names. */
    public static List<String> write(DampingResult r, Path dir, String prefix) {
        List<String> files = new ArrayList<>();
        if (!r.steps().isEmpty()) {
            ChartFiles.save(steps(r), dir, prefix + "-steps");
        }
        List<List<?>> rows = new ArrayList<>();
        List<String> modes = r.steps().isEmpty() ? List.of() : new ArrayList<>(r.steps().get(0).counts().keySet());
        for (DampingResult.Step s : r.steps()) {
            List<Object> c = new ArrayList<>(List.of(s.label(), s.totalConductance(), s.addedConductance(), s.loadPower(), s.events()));
            for (String m : modes) {
                c.add(s.counts().get(m));
            }
            c.addAll(List.of(s.worstMode() == null ? "" : s.worstMode(), s.worstPeakPu(), s.clear()));
            rows.add(c);
        }
        List<String> header = new ArrayList<>(List.of("step", "total conductance (S)", "added conductance (S)",
                "load at rated voltage (W)", "events"));
        for (String m : modes) {
            header.add(m);
        }
        header.addAll(List.of("worst mode", "worst peak (pu)", "clear"));
        Csv.write(dir.resolve(prefix + "-steps.csv"), header, rows);
        files.add(prefix + "-steps.csv");
        DampingResult.Arrester a = r.arrester();
        if (a != null && a.duty() != null) {
            ChartFiles.save(arrester(a.duty()), dir, prefix + "-arrester");
            ArresterDuty.Result d = a.duty();
            List<List<?>> w = new ArrayList<>();
            for (int i = 0; i < d.time().length; i++) {
                w.add(List.of(d.time()[i], d.voltage()[i], d.current()[i]));
            }
            Csv.write(dir.resolve(prefix + "-arrester.csv"), List.of("time (s)", "arrester voltage (V)", "arrester current (A)"), w);
            files.add(prefix + "-arrester.csv");
        }
        Json.write(r, dir.resolve(prefix + ".json"));
        files.add(prefix + ".json");
        return files;
    }

    /** The notebook section (files written by {@link #write} with the same prefix). */
    public static void section(DampingResult r, Notebook nb, String prefix) {
        nb.section(prefix, "Damping (mitigation sizing)");
        String where = Double.isNaN(r.length()) ? String.format(Locale.ROOT, "source %s peak", Formats.kv(r.voltage()))
                : String.format(Locale.ROOT, "%s of cable, supply %s", Formats.length(r.length()), Formats.kv(r.voltage()));
        nb.text("Case: " + where + ". G_min from the cusp condition: " + Formats.num(r.cuspConductance()) + " S ("
                + r.cuspMethod() + "); the loop's own conductance " + Formats.num(r.existingConductance()) + " S"
                + (r.bistableAsBuilt() ? ", bistable as built." : ", no fold pair as built."));
        List<String> items = new ArrayList<>();
        items.add("Added conductance to reach G_min: " + Formats.num(r.addedConductance()) + " S"
                + (Double.isNaN(r.loadPower()) ? "" : " = a balanced three-phase resistive load of " + Formats.kw(r.loadPower())
                + " (" + Formats.num(r.loadPercent()) + " % of rating) at rated voltage, or "
                + Formats.num(r.phaseResistance()) + " ohm per phase (wye-equivalent) at the primary"));
        items.add("At this voltage alone no stable ferroresonant state is left from " + Formats.num(r.voltageConductance()) + " S"
                + (Double.isNaN(r.voltageLoadPower()) ? "" : " (" + Formats.kw(r.voltageLoadPower()) + ")")
                + ": for information; below G_min a voltage rise or another switching sequence can still reach it.");
        DampingResult.Step rec = r.recommended();
        items.add(rec == null ? "No step cleared every switching event: see the table and the notes."
                : "Recommended (first step with every event normal): " + rec.label() + ", total "
                + Formats.num(rec.totalConductance()) + " S" + (Double.isNaN(rec.loadPower()) ? "" : ", load " + Formats.kw(rec.loadPower())));
        nb.list(items);
        List<List<String>> rows = new ArrayList<>();
        for (DampingResult.Step s : r.steps()) {
            rows.add(List.of(s.label(), Formats.num(s.totalConductance()) + " S", Formats.kw(s.loadPower()),
                    s.ferroresonant() + " of " + s.events(), Integer.toString(s.undetermined()),
                    s.worstMode() == null ? "-" : s.worstMode(), Formats.num(s.worstPeakPu()), s.clear() ? "yes" : "no"));
        }
        nb.table(List.of("step", "conductance", "load", "ferroresonant", "undetermined", "worst mode", "worst peak (pu)", "clear"),
                rows);
        nb.text("Switching events of each step: " + r.ensemble() + ".");
        if (!r.steps().isEmpty()) {
            nb.figure(prefix + "-steps", "Settled states of the switching events at each step",
                    List.of(prefix + "-steps.csv", prefix + ".json"));
        }
        DampingResult.Arrester a = r.arrester();
        if (a != null) {
            if (a.duty() == null) {
                nb.caution("The arrester simulation failed: " + a.failure());
            } else {
                ArresterDuty.Result d = a.duty();
                nb.text(String.format(Locale.ROOT, "Arrester (Ur %s, V_ref %s peak, I_ref %s A, alpha %s) on the open phase during "
                                + "the worst as-built event (peak %s pu without it): %s J per cycle, %s W; %s J over %s s against %s J "
                                + "rated: %s.", Formats.kv(a.ratedVoltage()), Formats.kv(a.referenceVoltage()),
                        Formats.num(a.referenceCurrent()), Formats.num(a.alpha()), Formats.num(a.peakWithoutArrester()),
                        Formats.num(d.energyPerCycle()), Formats.num(d.meanPower()), Formats.num(d.eventEnergy()),
                        Formats.num(d.eventDuration()), Formats.num(d.capability()), d.note()));
                nb.figure(prefix + "-arrester", "Arrester voltage and current over one settled cycle",
                        List.of(prefix + "-arrester.csv", prefix + ".json"));
            }
            nb.list(a.sources());
        }
        nb.list(r.notes());
        nb.end();
    }

    static CategoryChart steps(DampingResult r) {
        CategoryChart c = new CategoryChartBuilder().width(800).height(560).title("Switching events at each damping step")
                .xAxisTitle("step").yAxisTitle("switching events").build();
        c.getStyler().setStacked(true);
        c.getStyler().setChartBackgroundColor(Color.WHITE);
        c.getStyler().setPlotBackgroundColor(Color.WHITE);
        c.getStyler().setLegendPosition(Styler.LegendPosition.OutsideE);
        List<String> labels = new ArrayList<>();
        for (DampingResult.Step s : r.steps()) {
            labels.add(s.label());
        }
        List<String> modes = new ArrayList<>(r.steps().get(0).counts().keySet());
        for (int m = 0; m < modes.size(); m++) {
            List<Integer> counts = new ArrayList<>();
            for (DampingResult.Step s : r.steps()) {
                counts.add(s.counts().get(modes.get(m)));
            }
            var s = c.addSeries(modes.get(m), labels, counts);
            s.setFillColor(ModeColours.of(modes.get(m)));
        }
        return c;
    }

    static XYChart arrester(ArresterDuty.Result d) {
        XYChart c = ChartFiles.xyChart("Arrester duty over one settled cycle", "time (ms)", "voltage (kV)");
        double[] t = new double[d.time().length];
        double[] v = new double[t.length];
        double[] i = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            t[k] = d.time()[k] * 1e3;
            v[k] = d.voltage()[k] / 1e3;
            i[k] = d.current()[k];
        }
        XYSeries sv = c.addSeries("arrester voltage (kV)", t, v);
        sv.setMarker(SeriesMarkers.NONE);
        XYSeries si = c.addSeries("arrester current (A, right axis)", t, i);
        si.setMarker(SeriesMarkers.NONE);
        si.setYAxisGroup(1);
        c.setYAxisGroupTitle(1, "current (A)");
        c.getStyler().setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        c.getStyler().putYAxisGroupDecimalPatternMap(1, "0.###E0");
        return c;
    }
}
