package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.report.Csv;
import org.ferromap.report.EquipmentCharts;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;

/** The magnetizing curve held for the equivalent circuit, with its defining points. */
public final class CurveSection {

    private CurveSection() {
    }

    /** curve.json: the curve's description and defining points (Wb-turn, A peak). */
    public record CurveJson(String curve, List<SaturationCurve.CurvePoint> points) { }

    public static void write(Notebook nb, Path notebook, String title, SaturationCurve c) {
        nb.section("curve", "Magnetizing curve");
        nb.text("The curve held: " + c.describe() + ". Air-core inductance " + Fmt.si(c.airCoreInductance(), "H") + ".");
        Path dir = Figures.folder(notebook, "curve");
        EquipmentCharts.saturation(title, c, dir, "saturation-curve");
        List<List<?>> rows = new ArrayList<>();
        for (SaturationCurve.CurvePoint p : c.definingPoints()) {
            rows.add(List.of(p.flux(), p.current()));
        }
        Csv.write(dir.resolve("saturation-curve.csv"), List.of("flux (Wb-turn peak)", "current (A peak)"), rows);
        Json.write(new CurveJson(c.describe(), c.definingPoints()), dir.resolve("saturation-curve.json"));
        nb.figure("curve/saturation-curve", "The magnetizing curve of the equivalent circuit (peak flux linkage against "
                + "peak current) with the points that define it", List.of("curve/saturation-curve.csv",
                        "curve/saturation-curve.json"));
        nb.end();
    }
}
