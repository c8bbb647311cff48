package org.ferromap.report.sections;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.maps.MapGrid;
import org.ferromap.maps.StudyMapResult;
import org.ferromap.report.Csv;
import org.ferromap.report.Json;
import org.ferromap.report.MapChart;
import org.ferromap.report.MapReport;
import org.ferromap.report.Notebook;

/** The study map: its layers as charts, and the simulated waveform of a representative cell of each category. */
public final class MapSection {

    private MapSection() {
    }

    /**
     * A cell picked to show what its category means in the time domain.
     *
     * @param label     marker label on the map, e.g. {@code A}
     * @param category  the cell's balance category
     * @param x         the cell's x, in the x axis's unit
     * @param y         the cell's y, in the y axis's unit
     * @param scenario  which switching event was simulated and why
     * @param ratedPeak the cell circuit's 1 pu, V peak
     * @param result    the simulation
     */
    public record Representative(String label, String category, double x, double y, String scenario, double ratedPeak,
            SimulationResult result) { }

    public static void write(Notebook nb, Path notebook, StudyMapResult r, List<Representative> reps) {
        nb.section("map", "Map over " + r.plane().x().parameter().studyName() + " and " + r.plane().y().parameter().studyName());
        nb.text("x: " + r.plane().x().axis().describe() + "; y: " + r.plane().y().axis().describe() + ".");
        stats(nb, "Balance layer", r.balance());
        stats(nb, "Time-domain layer (" + r.settings().ensemble().describe() + ")", r.time());
        if (r.settings().refine()) {
            nb.text("Adaptive refinement was on: blocks whose corners agree are filled from the nearest corner; a feature "
                    + "thinner than the coarse lattice (8 cells) lying between agreeing corners can be missed.");
        }
        Path dir = Figures.folder(notebook, "map");
        List<MapChart.Marker> markers = new ArrayList<>();
        for (Representative p : reps) {
            markers.add(new MapChart.Marker(p.label(), p.x(), p.y(), new Color(0, 114, 178)));
        }
        for (MapReport.Figure f : MapReport.write(r, dir, markers)) {
            List<String> files = f.dataFiles().stream().map(s -> "map/" + s).toList();
            nb.figure("map/" + f.baseName(), f.caption(), files);
        }
        nb.text("The whole map, every layer per cell: map/map.csv and map/map.json.");
        if (!reps.isEmpty()) {
            nb.heading("Waveforms of representative cells");
            List<List<String>> rows = new ArrayList<>();
            List<List<?>> csv = new ArrayList<>();
            for (Representative p : reps) {
                rows.add(List.of(p.label(), p.category(), Fmt.sig(p.x(), 5) + " " + r.plane().x().unit(), Fmt.sig(p.y(), 5) + " "
                        + r.plane().y().unit(), p.scenario(), p.result().mode().label(), Fmt.pu(p.result().peakPerUnit())));
                csv.add(List.of(p.label(), p.category(), p.x(), p.y(), p.scenario(), p.result().mode().label(),
                        p.result().peakPerUnit()));
            }
            nb.table(List.of("cell", "balance category", "x", "y", "switching simulated", "settled mode", "peak"), rows);
            Csv.write(dir.resolve("representatives.csv"), List.of("cell", "category", "x (" + r.plane().x().unit() + ")",
                    "y (" + r.plane().y().unit() + ")", "scenario", "mode", "peak (pu)"), csv);
            Json.write(reps.stream().map(p -> new RepJson(p.label(), p.category(), p.x(), p.y(), p.scenario(),
                    p.result().mode().label(), p.result().peakPerUnit())).toList(), dir.resolve("representatives.json"));
            for (Representative p : reps) {
                SimulationSection.waveform(nb, notebook, "map", "waveform-" + p.label().toLowerCase(Locale.ROOT),
                        "Cell " + p.label() + " (" + p.category() + ")", p.ratedPeak(), p.result(),
                        "Cell " + p.label() + ", " + p.category() + " in the balance: " + p.scenario()
                                + "; settled in " + p.result().mode().label() + " (" + p.result().reason() + ")");
            }
        }
        nb.end();
    }

    private record RepJson(String cell, String category, double x, double y, String scenario, String mode, double peakPu) { }

    private static void stats(Notebook nb, String what, MapGrid g) {
        if (g == null) {
            return;
        }
        var s = g.stats();
        nb.text(String.format(Locale.ROOT, "%s: %d cells, %d computed, %d reused from an interrupted run, %d inferred by "
                + "refinement, in %.1f s.", what, s.cells(), s.computed(), s.reused(), s.inferred(), s.seconds()));
    }
}
