package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.CuspCondition;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldMargin;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.report.Csv;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;
import org.ferromap.report.OperatingPointCharts;

/**
 * Operating points at the study's source: every steady state of the balance, the folds, the
 * margin to the jump and the cusp condition, with the graphical method's picture: the
 * magnetizing branch's fundamental V-I curve against the capacitor line.
 */
public final class PointsSection {

    private PointsSection() {
    }

    /**
     * What the section shows.
     *
     * @param circuit       the circuit
     * @param points        its steady states, ascending in flux
     * @param folds         its folds in source voltage
     * @param margin        distance to the jump-up fold
     * @param cusp          the cusp condition
     * @param foldFreeConductance total shunt conductance at which the fold pair vanishes, S (NaN when not found)
     */
    public record Data(EquivalentCircuit circuit, List<OperatingPoint> points, List<Fold> folds, FoldMargin margin,
            CuspCondition cusp, double foldFreeConductance) { }

    /** One steady state in points.json / points.csv. */
    public record PointJson(String kind, boolean stable, double terminalVoltage, double terminalVoltagePu, double flux,
            double current, double phaseDeg, boolean capacitive) { }

    /** One fold in points.json. */
    public record FoldJson(String direction, double sourcePeak, double sourcePu, double flux, double terminalVoltage) { }

    /** points.json. */
    public record PointsJson(double sourcePeak, List<PointJson> points, List<FoldJson> folds, FoldMargin margin,
            CuspCondition cusp) { }

    public static void write(Notebook nb, Path notebook, String title, Data d) {
        EquivalentCircuit c = d.circuit();
        nb.section("points", "Operating points at the study's source");
        nb.text("Every single-harmonic steady state at E = " + Fmt.si(c.sourcePeak(), "V") + " peak ("
                + Fmt.pu(c.sourcePeak() / c.ratedPeak()) + "). Stable points are where the source rises with the flux "
                + "along the branch; the unstable middle point separates the basins of the other two.");
        List<List<String>> rows = new ArrayList<>();
        List<PointJson> pj = new ArrayList<>();
        int k = 1;
        for (OperatingPoint p : d.points()) {
            rows.add(List.of(String.valueOf(k++), p.kind().label() + (p.atFold() ? " (at a fold)" : ""), p.stable() ? "yes" : "no",
                    Fmt.si(p.voltage(), "V"), Fmt.pu(p.voltagePerUnit()), Fmt.sig(p.flux(), 4) + " Wb-turn",
                    Fmt.si(p.current(), "A"), Fmt.deg(p.voltagePhase()), p.capacitive() ? "capacitive" : "inductive"));
            pj.add(new PointJson(p.kind().label(), p.stable(), p.voltage(), p.voltagePerUnit(), p.flux(), p.current(),
                    Math.toDegrees(p.voltagePhase()), p.capacitive()));
        }
        nb.table(List.of("#", "kind", "stable", "terminal voltage (peak)", "per unit", "flux (peak)", "current I1 (peak)",
                "phase to source", "loop"), rows);
        List<List<String>> frows = new ArrayList<>();
        List<FoldJson> fj = new ArrayList<>();
        for (Fold f : d.folds()) {
            frows.add(List.of(f.direction().label(), Fmt.si(f.sourcePeak(), "V"), Fmt.pu(f.sourcePerUnit()),
                    Fmt.sig(f.flux(), 4) + " Wb-turn", Fmt.si(f.voltage(), "V")));
            fj.add(new FoldJson(f.direction().label(), f.sourcePeak(), f.sourcePerUnit(), f.flux(), f.voltage()));
        }
        if (frows.isEmpty()) {
            nb.text("The branch has no fold: one steady state at every source voltage.");
        } else {
            nb.text("Folds of the branch in source voltage:");
            nb.table(List.of("fold", "source (peak)", "per unit", "flux (peak)", "terminal voltage (peak)"), frows);
        }
        FoldMargin m = d.margin();
        nb.text("Margin: " + m.note() + (m.hasFold() ? "; jump-up fold at " + Fmt.si(m.jumpUpSourcePeak(), "V") + " = "
                + Fmt.sig(m.ratio(), 4) + " times the source" : "") + ".");
        CuspCondition cu = d.cusp();
        nb.text("Cusp condition: " + (cu.bistable() ? "bistable" : "not bistable") + "; minimum capacitance for a fold pair "
                + Fmt.si(cu.minimumCapacitance(), "F") + " (C/C_min = " + Fmt.sig(cu.capacitanceRatio(), 4)
                + "); total shunt conductance that removes the fold pair " + Fmt.si(d.foldFreeConductance(), "S")
                + (d.foldFreeConductance() > 0 ? " (" + Fmt.si(1 / d.foldFreeConductance(), "Ohm") + " in all)" : "")
                + ", the circuit has " + Fmt.si(d.circuit().conductance(), "S") + ".");
        Path dir = Figures.folder(notebook, "points");
        List<List<?>> prow = new ArrayList<>();
        for (PointJson p : pj) {
            prow.add(List.of(p.kind(), p.stable(), p.terminalVoltage(), p.terminalVoltagePu(), p.flux(), p.current(),
                    p.phaseDeg(), p.capacitive()));
        }
        Csv.write(dir.resolve("points.csv"), List.of("kind", "stable", "terminal voltage (V peak)", "terminal voltage (pu)",
                "flux (Wb-turn peak)", "current I1 (A peak)", "phase to source (deg)", "capacitive"), prow);
        Json.write(new PointsJson(c.sourcePeak(), pj, fj, m, cu), dir.resolve("points.json"));
        double[][] curve = OperatingPointCharts.graphical(title, c, d.points(), dir, "graphical-method");
        List<List<?>> crow = new ArrayList<>();
        for (int i = 0; i < curve[0].length; i++) {
            crow.add(List.of(curve[0][i], curve[1][i] * 1e3));
        }
        Csv.write(dir.resolve("graphical-method.csv"), List.of("fundamental current (A peak)", "voltage (V peak)"), crow);
        Json.write(new Picture(curve[0], scale(curve[1], 1e3), pj), dir.resolve("graphical-method.json"));
        nb.figure("points/graphical-method", "The graphical method: the magnetizing branch's fundamental voltage against its "
                + "fundamental current, crossed by the capacitor lines of the lossless loop; the steady states the balance "
                + "found (losses included) marked by kind", List.of("points/graphical-method.csv",
                        "points/graphical-method.json", "points/points.csv", "points/points.json"));
        nb.end();
    }

    private record Picture(double[] currentA, double[] voltageV, List<PointJson> points) { }

    private static double[] scale(double[] v, double f) {
        double[] o = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            o[i] = v[i] * f;
        }
        return o;
    }
}
