package org.ferromap.report;

import java.awt.Color;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.maps.BalanceCell;
import org.ferromap.maps.FoldBoundaries;
import org.ferromap.maps.MapGrid;
import org.ferromap.maps.MapLayer;
import org.ferromap.maps.PlaneAxis;
import org.ferromap.maps.StudyMapResult;
import org.ferromap.maps.TimeDomainCell;

/**
 * Writes a study map: one chart per layer (PNG 300 dpi, SVG, PDF) with a CSV and a JSON file of
 * its values beside it, and {@code map.csv} / {@code map.json} with every layer per cell (the
 * {@code map --json} contract, {@link MapJson}). The fold curves and cusps are drawn over every
 * map chart and written to {@code fold-curves.csv} / {@code fold-curves.json}.
 */
public final class MapReport {

    /** Overlay colours: jump-up black, jump-down vermillion, the no-jump lines grey (Okabe-Ito). */
    private static final Color JUMP_UP = Color.BLACK;
    private static final Color JUMP_DOWN = new Color(213, 94, 0);
    private static final Color NO_JUMP = new Color(110, 110, 110);
    private static final Color CUSP = Color.WHITE;

    /** Worst-mode colours by {@link SteadyMode#ordinal()}. */
    private static final Color[] MODE_COLORS = {
        Palette.SAFE, Palette.FERRO_ONLY, new Color(204, 121, 167), new Color(0, 114, 178), new Color(40, 40, 40),
        new Color(190, 190, 190)};

    private MapReport() {
    }

    /** One axis in the JSON contract: its parameter name, display unit and sample values. */
    public record AxisJson(String name, String unit, double[] values) { }

    /**
     * One cell in the JSON contract.
     *
     * @param x             x sample, in the x axis's unit
     * @param y             y sample, in the y axis's unit
     * @param states        "safe", "at-risk" or "ferroresonant-only"; null without the balance layer or where it failed
     * @param peakVoltagePu peak of the worst stable balance state, per unit of the rated peak; null without it
     * @param ferroFraction share of switching events not ending in the normal state; null without the time layer
     * @param worstMode     worst settled mode of the events ("normal", "fundamental", ...); null without the time layer
     */
    public record CellJson(double x, double y, String states, double peakVoltagePu, double ferroFraction, String worstMode) { }

    /** The {@code map --json} contract and {@code map.json}. */
    public record MapJson(AxisJson x, AxisJson y, List<CellJson> cells) { }

    /** One fold curve in {@code fold-curves.json}. */
    public record CurveJson(String kind, double[] x, double[] y) { }

    /** {@code fold-curves.json}: the boundary polylines and cusps in the axes' units. */
    public record FoldsJson(String xUnit, String yUnit, List<CurveJson> curves, List<FoldBoundaries.Cusp> cusps) { }

    /** A chart written, for the notebook: base name (no extension), caption, data files beside it. */
    public record Figure(String baseName, String caption, List<String> dataFiles) { }

    /** The map as the JSON contract (also written as map.json). */
    public static MapJson json(StudyMapResult r) {
        PlaneAxis px = r.plane().x();
        PlaneAxis py = r.plane().y();
        double[] xs = px.axis().values();
        double[] ys = py.axis().values();
        List<CellJson> cells = new ArrayList<>(xs.length * ys.length);
        for (int iy = 0; iy < ys.length; iy++) {
            for (int ix = 0; ix < xs.length; ix++) {
                cells.add(cell(r, ix, iy, xs[ix], ys[iy]));
            }
        }
        return new MapJson(new AxisJson(px.parameter().studyName(), px.unit(), xs),
                new AxisJson(py.parameter().studyName(), py.unit(), ys), cells);
    }

    private static CellJson cell(StudyMapResult r, int ix, int iy, double x, double y) {
        String states = null;
        double peak = Double.NaN;
        if (r.balance() != null) {
            states = BalanceCell.categoryName(r.balance().value(ix, iy, 0));
            peak = r.balance().value(ix, iy, 1);
        }
        double fraction = Double.NaN;
        String worst = null;
        if (r.time() != null) {
            fraction = r.time().value(ix, iy, 0);
            SteadyMode m = TimeDomainCell.mode(r.time().value(ix, iy, 1));
            worst = m == null ? null : m.label();
        }
        return new CellJson(x, y, states, peak, fraction, worst);
    }

    /**
     * Writes every chart and data file of the map into {@code dir}.
     *
     * @param r       the map
     * @param dir     the folder (a staging folder of an {@link OutputFolder})
     * @param markers extra points to mark on the balance chart (e.g. the notebook's representative cells)
     * @return the charts written, in reading order
     */
    public static List<Figure> write(StudyMapResult r, Path dir, List<MapChart.Marker> markers) {
        List<Figure> out = new ArrayList<>();
        PlaneAxis px = r.plane().x();
        PlaneAxis py = r.plane().y();
        String xt = px.title();
        String yt = py.title();
        MapJson all = json(r);
        writeCombined(all, px, py, dir);
        boolean folds = r.folds() != null;
        if (folds) {
            writeFolds(r.folds(), px, py, dir);
        }
        List<String> foldFiles = folds ? List.of("fold-curves.csv", "fold-curves.json") : List.of();
        double[] xs = px.axis().values();
        double[] ys = py.axis().values();

        if (r.balance() != null && (r.layers().contains(MapLayer.BALANCE) || r.layers().contains(MapLayer.FOLDS))) {
            double[] cat = r.balance().layer(0);
            byte[] codes = new byte[cat.length];
            for (int i = 0; i < cat.length; i++) {
                codes[i] = Double.isNaN(cat[i]) ? -1 : (byte) cat[i];
            }
            MapChart.Builder b = base(r, "Steady states of the balance", xt, xs, yt, ys)
                    .layer(new MapChart.Categorical(codes, BalanceCell.CATEGORY_NAMES.toArray(new String[0]),
                            new Color[] {Palette.SAFE, Palette.AT_RISK, Palette.FERRO_ONLY}));
            markers.forEach(b::marker);
            b.build().save(dir, "balance-map");
            layerFiles(dir, "balance-map", px, py, r.balance(), new int[] {0}, new String[] {"states"}, true);
            List<String> files = new ArrayList<>(List.of("balance-map.csv", "balance-map.json"));
            files.addAll(foldFiles);
            out.add(new Figure("balance-map", "Which steady states the single-harmonic balance has in each cell: safe "
                    + "(normal only), at-risk (normal and ferroresonant coexist), ferroresonant-only"
                    + (folds ? "; fold curves and cusps located exactly drawn over it" : "")
                    + inferredNote(r.balance()), files));
        }
        if (r.balance() != null && r.layers().contains(MapLayer.PEAK)) {
            double[] peak = r.balance().layer(1);
            double[] range = range(peak, 1.0);
            base(r, "Peak of the worst stable state", xt, xs, yt, ys)
                    .layer(new MapChart.Continuous(peak, range[0], range[1], "peak (pu)")).build().save(dir, "peak-map");
            layerFiles(dir, "peak-map", px, py, r.balance(), new int[] {1}, new String[] {"peakVoltagePu"}, false);
            out.add(new Figure("peak-map", "Fundamental peak of the terminal voltage in the worst stable steady state, "
                    + "per unit of the rated peak (single-harmonic balance)" + inferredNote(r.balance()),
                    List.of("peak-map.csv", "peak-map.json")));
        }
        if (r.time() != null) {
            String ensemble = r.settings().ensemble().describe();
            base(r, "Share of switchings ending in ferroresonance", xt, xs, yt, ys)
                    .layer(new MapChart.Continuous(r.time().layer(0), 0, 1, "share")).build().save(dir, "ferro-fraction-map");
            int[] comps = {0, 1, 2, 3};
            String[] names = {"ferroFraction", "worstMode", "undeterminedFraction", "maxPeakPu"};
            layerFiles(dir, "ferro-fraction-map", px, py, r.time(), comps, names, false);
            out.add(new Figure("ferro-fraction-map", "Share of simulated switching events that do not settle in the "
                    + "normal state (" + ensemble + "; an undetermined outcome counts as not normal)"
                    + inferredNote(r.time()), List.of("ferro-fraction-map.csv", "ferro-fraction-map.json")));

            double[] worst = r.time().layer(1);
            byte[] codes = new byte[worst.length];
            for (int i = 0; i < worst.length; i++) {
                codes[i] = Double.isNaN(worst[i]) ? -1 : (byte) worst[i];
            }
            String[] modeNames = new String[SteadyMode.values().length];
            for (SteadyMode m : SteadyMode.values()) {
                modeNames[m.ordinal()] = m.label();
            }
            base(r, "Worst settled mode over the switchings", xt, xs, yt, ys)
                    .layer(new MapChart.Categorical(codes, modeNames, MODE_COLORS)).build().save(dir, "worst-mode-map");
            layerFiles(dir, "worst-mode-map", px, py, r.time(), new int[] {1}, new String[] {"worstMode"}, true);
            out.add(new Figure("worst-mode-map", "Worst mode any switching event settled in (" + ensemble + ")"
                    + inferredNote(r.time()), List.of("worst-mode-map.csv", "worst-mode-map.json")));
        }
        return out;
    }

    /** A chart with the axes and the fold overlays. */
    private static MapChart.Builder base(StudyMapResult r, String title, String xt, double[] xs, String yt, double[] ys) {
        MapChart.Builder b = MapChart.builder().title(title).x(xt, xs, r.plane().x().log()).y(yt, ys, r.plane().y().log());
        if (r.folds() == null) {
            return b;
        }
        boolean[] labelled = new boolean[FoldBoundaries.Kind.values().length];
        for (FoldBoundaries.Curve c : r.folds().curves()) {
            FoldBoundaries.Kind k = c.kind();
            String label = labelled[k.ordinal()] ? "" : k.label();
            labelled[k.ordinal()] = true;
            Color color = switch (k) {
                case JUMP_UP -> JUMP_UP;
                case JUMP_DOWN -> JUMP_DOWN;
                default -> NO_JUMP;
            };
            b.overlay(new MapChart.Overlay(label, c.x(), c.y(), color,
                    k == FoldBoundaries.Kind.JUMP_DOWN || k == FoldBoundaries.Kind.CAPACITIVE_TURN));
        }
        for (FoldBoundaries.Cusp c : r.folds().cusps()) {
            b.marker(new MapChart.Marker("cusp", c.x(), c.y(), CUSP));
        }
        return b;
    }

    private static String inferredNote(MapGrid g) {
        long n = g.inferredCount();
        return n == 0 ? "" : "; " + n + " of " + g.stats().cells() + " cells inferred by refinement from agreeing neighbours";
    }

    /** min..max of the finite values; half a unit either side when they are all equal; 0..floor when there are none. */
    static double[] range(double[] v, double floor) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            if (Double.isFinite(d)) {
                lo = Math.min(lo, d);
                hi = Math.max(hi, d);
            }
        }
        if (lo > hi) {
            return new double[] {0, floor};
        }
        if (hi - lo < 1e-9 * Math.max(1, Math.abs(hi))) {
            return new double[] {lo - 0.5, hi + 0.5};
        }
        return new double[] {lo, hi};
    }

    /** name.csv and name.json with x, y and the chosen components of each cell. */
    private static void layerFiles(Path dir, String name, PlaneAxis px, PlaneAxis py, MapGrid g, int[] comps,
            String[] names, boolean categorical) {
        List<String> header = new ArrayList<>();
        header.add("x: " + px.parameter().studyName() + " (" + px.unit() + ")");
        header.add("y: " + py.parameter().studyName() + " (" + py.unit() + ")");
        for (String n : names) {
            header.add(n);
        }
        header.add("inferred");
        double[] xs = px.axis().values();
        double[] ys = py.axis().values();
        List<List<?>> rows = new ArrayList<>(xs.length * ys.length);
        List<java.util.Map<String, Object>> json = new ArrayList<>(xs.length * ys.length);
        for (int iy = 0; iy < ys.length; iy++) {
            for (int ix = 0; ix < xs.length; ix++) {
                List<Object> row = new ArrayList<>(comps.length + 3);
                java.util.Map<String, Object> o = new java.util.LinkedHashMap<>();
                row.add(xs[ix]);
                row.add(ys[iy]);
                o.put("x", xs[ix]);
                o.put("y", ys[iy]);
                for (int k = 0; k < comps.length; k++) {
                    double v = g.value(ix, iy, comps[k]);
                    Object cell = v;
                    if (categorical || names[k].equals("worstMode")) {
                        cell = names[k].equals("states") ? BalanceCell.categoryName(v)
                                : TimeDomainCell.mode(v) == null ? null : TimeDomainCell.mode(v).label();
                    }
                    row.add(cell);
                    o.put(names[k], cell);
                }
                row.add(g.isInferred(ix, iy));
                o.put("inferred", g.isInferred(ix, iy));
                rows.add(row);
                json.add(o);
            }
        }
        Csv.write(dir.resolve(name + ".csv"), header, rows);
        java.util.Map<String, Object> doc = new java.util.LinkedHashMap<>();
        doc.put("x", new AxisJson(px.parameter().studyName(), px.unit(), xs));
        doc.put("y", new AxisJson(py.parameter().studyName(), py.unit(), ys));
        doc.put("cells", json);
        Json.write(doc, dir.resolve(name + ".json"));
    }

    private static void writeCombined(MapJson all, PlaneAxis px, PlaneAxis py, Path dir) {
        List<String> header = List.of("x: " + px.parameter().studyName() + " (" + px.unit() + ")",
                "y: " + py.parameter().studyName() + " (" + py.unit() + ")", "states", "peakVoltagePu", "ferroFraction",
                "worstMode");
        List<List<?>> rows = new ArrayList<>(all.cells().size());
        for (CellJson c : all.cells()) {
            List<Object> row = new ArrayList<>(6);
            row.add(c.x());
            row.add(c.y());
            row.add(c.states());
            row.add(c.peakVoltagePu());
            row.add(c.ferroFraction());
            row.add(c.worstMode());
            rows.add(row);
        }
        Csv.write(dir.resolve("map.csv"), header, rows);
        Json.write(all, dir.resolve("map.json"));
    }

    private static void writeFolds(FoldBoundaries.Result f, PlaneAxis px, PlaneAxis py, Path dir) {
        List<List<?>> rows = new ArrayList<>();
        List<CurveJson> curves = new ArrayList<>();
        int index = 0;
        for (FoldBoundaries.Curve c : f.curves()) {
            for (int i = 0; i < c.x().length; i++) {
                rows.add(List.of(index, c.kind().label(), c.x()[i], c.y()[i]));
            }
            curves.add(new CurveJson(c.kind().label(), c.x(), c.y()));
            index++;
        }
        for (FoldBoundaries.Cusp c : f.cusps()) {
            rows.add(List.of(-1, "cusp", c.x(), c.y()));
        }
        Csv.write(dir.resolve("fold-curves.csv"), List.of("curve", "kind", "x: " + px.parameter().studyName() + " ("
                + px.unit() + ")", "y: " + py.parameter().studyName() + " (" + py.unit() + ")"), rows);
        Json.write(new FoldsJson(px.unit(), py.unit(), curves, f.cusps()), dir.resolve("fold-curves.json"));
    }
}
