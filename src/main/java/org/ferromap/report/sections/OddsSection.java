package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.report.ChartFiles;
import org.ferromap.report.Notebook;
import org.knowm.xchart.XYChart;

/** The odds of ferroresonance over the switching instant: one simulation per source angle. */
public final class OddsSection {

    private OddsSection() {
    }

    /**
     * @param anglesDeg    source angle at switching of each run, deg
     * @param results      the runs
     * @param residualFlux residual flux at switching, pu of the rated peak flux
     * @param ratedPeak    the circuit's 1 pu, V peak
     */
    public record Data(double[] anglesDeg, List<SimulationResult> results, double residualFlux, double ratedPeak) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("odds", "Odds over the switching instant");
        Map<SteadyMode, Integer> count = new EnumMap<>(SteadyMode.class);
        for (SimulationResult r : d.results()) {
            count.merge(r.mode(), 1, Integer::sum);
        }
        int n = d.results().size();
        int normal = count.getOrDefault(SteadyMode.NORMAL, 0);
        nb.text(n + " switching angles evenly spread over a source period, residual flux " + Fmt.sig(d.residualFlux(), 3)
                + " pu: " + Fmt.percent((double) (n - normal) / n) + " do not settle in the normal state"
                + (count.containsKey(SteadyMode.UNDETERMINED) ? " (undetermined outcomes counted as not normal)" : "") + ".");
        List<List<String>> rows = new ArrayList<>();
        for (var e : count.entrySet()) {
            rows.add(List.of(e.getKey().label(), String.valueOf(e.getValue()), Fmt.percent((double) e.getValue() / n)));
        }
        nb.table(List.of("settled mode", "runs", "share"), rows);
        XYChart ch = ChartFiles.xyChart("Settled peak against the switching angle", "source angle at switching (deg)",
                "settled peak (pu of rated peak)");
        List<List<?>> csv = new ArrayList<>();
        for (SteadyMode m : SteadyMode.values()) {
            List<Double> xs = new ArrayList<>();
            List<Double> ys = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                SimulationResult r = d.results().get(i);
                if (r.mode() == m && Double.isFinite(r.peakPerUnit())) {
                    xs.add(d.anglesDeg()[i]);
                    ys.add(r.peakPerUnit());
                }
            }
            if (!xs.isEmpty()) {
                ChartFiles.markers(ch, m.label(), xs.stream().mapToDouble(Double::doubleValue).toArray(),
                        ys.stream().mapToDouble(Double::doubleValue).toArray(), ChartFiles.PALETTE[m.ordinal()]);
            }
        }
        List<RunJson> json = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            SimulationResult r = d.results().get(i);
            csv.add(List.of(d.anglesDeg()[i], r.mode().label(), r.period(), r.peakPerUnit()));
            json.add(new RunJson(d.anglesDeg()[i], r.mode().label(), r.period(), r.peakPerUnit()));
        }
        Figures.xy(nb, notebook, "odds", "odds", ch, "Peak of the settled state for each switching angle, by mode",
                List.of("angle (deg)", "mode", "period", "peak (pu)"), csv, json);
        nb.end();
    }

    private record RunJson(double angleDeg, String mode, int period, double peakPu) { }
}
