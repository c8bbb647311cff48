package org.ferromap.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.report.Csv;
import org.ferromap.report.EquipmentCharts;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** The saturation curve the study holds: its defining points, a chart and CSV. */
@Command(name = "curve", header = "Show the magnetizing curve held for the study, with chart and CSV.", description = {
    "Show the magnetizing curve held for the study's equivalent circuit: its defining points",
    "(one per rms test point for test data), a chart (PNG, SVG, PDF) and CSV under <out>/<study>/curve."})
final class CurveCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    /** JSON contract of {@code curve --json}. */
    record CurveJson(String study, String curve, List<Point> points) { }

    /** One defining point: peak flux linkage, Wb-turn; peak current, A. */
    record Point(double flux, double current) { }

    @Override
    int work() {
        Study s = study.read();
        SaturationCurve c = s.circuit().magnetizing();
        List<Point> pts = new ArrayList<>();
        for (SaturationCurve.CurvePoint p : c.definingPoints()) {
            pts.add(new Point(p.flux(), p.current()));
        }
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("curve"))) {
            EquipmentCharts.saturation(s.title(), c, f.staging(), "saturation-curve");
            List<List<?>> rows = new ArrayList<>();
            for (Point p : pts) {
                rows.add(List.of(p.flux(), p.current()));
            }
            Csv.write(f.file("saturation-curve.csv"), List.of("flux (Wb-turn peak)", "current (A peak)"), rows);
            Json.write(new CurveJson(s.title(), c.describe(), pts), f.file("saturation-curve.json"));
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(new CurveJson(s.title(), c.describe(), pts)));
        } else {
            out().println(s.title());
            out().println("  curve: " + c.describe());
            out().printf("  %-22s %-18s%n", "flux (Wb-turn peak)", "current (A peak)");
            for (Point p : pts) {
                out().printf("  %-22.6g %-18.6g%n", p.flux(), p.current());
            }
            out().println("  written: " + dir);
        }
        return Main.OK;
    }
}
