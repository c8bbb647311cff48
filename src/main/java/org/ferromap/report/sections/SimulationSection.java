package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.report.ChartFiles;
import org.ferromap.report.Notebook;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** One switching event simulated in the time domain: the settled waveform, the stroboscopic samples and the verdict. */
public final class SimulationSection {

    private SimulationSection() {
    }

    /**
     * @param label     what was simulated (switching angle, residual flux, limits)
     * @param ratedPeak the circuit's 1 pu, V peak
     * @param result    the simulation
     */
    public record Data(String label, double ratedPeak, SimulationResult result) { }

    /** The verdict as a table row: mode, period, peak, certified, Lyapunov exponent, note. */
    public static List<String> verdict(SimulationResult r) {
        return List.of(r.mode().label(), r.period() > 0 ? String.valueOf(r.period()) : "-", Fmt.pu(r.peakPerUnit()),
                r.certified() ? "yes" : "no", Fmt.sig(r.lyapunovPerPeriod(), 3), r.reason());
    }

    /** Header of {@link #verdict}. */
    public static final List<String> VERDICT_HEADER = List.of("settled mode", "period (source periods)",
            "peak (pu)", "orbit certified", "largest Lyapunov exponent (per period)", "note");

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("simulate", "Time-domain simulation");
        nb.text(d.label() + ".");
        nb.table(VERDICT_HEADER, List.of(verdict(d.result())));
        waveform(nb, notebook, "simulate", "waveform", "Settled terminal voltage", d.ratedPeak(), d.result(),
                "Terminal voltage over the settled window (one orbit for a periodic state, the last periods otherwise)");
        SimulationResult r = d.result();
        double[] k = new double[r.strobeVoltage().length];
        double[] v = new double[k.length];
        for (int i = 0; i < k.length; i++) {
            k[i] = i;
            v[i] = r.strobeVoltage()[i] / d.ratedPeak();
        }
        if (k.length > 0) {
            XYChart ch = ChartFiles.xyChart("Stroboscopic samples", "source period since switching",
                    "terminal voltage at the period start (pu)");
            ChartFiles.markers(ch, "once a period", k, v, ChartFiles.PALETTE[0]);
            ch.getStyler().setMarkerSize(3);
            Figures.xy(nb, notebook, "simulate", "strobes", ch, "The terminal voltage sampled once a source period from the "
                    + "switching instant: the transient closing in on the settled state (one point when periodic at the "
                    + "source period, p points for a subharmonic, a curve or a cloud otherwise)",
                    List.of("period", "voltage (pu)"), Figures.columns(k, v), new Strobes(k, v));
        }
        nb.end();
    }

    private record Strobes(double[] period, double[] voltagePu) { }

    /** A waveform chart of a result's settled window into {@code <section>/<name>}, shown in the notebook. */
    public static void waveform(Notebook nb, Path notebook, String section, String name, String title, double ratedPeak,
            SimulationResult r, String caption) {
        int n = r.window().size();
        if (n == 0) {
            nb.text("No settled window to draw (" + r.reason() + ").");
            return;
        }
        double[] t = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = r.window().time()[i] * 1e3;
            v[i] = r.window().voltage()[i] / ratedPeak;
        }
        XYChart ch = ChartFiles.xyChart(title + ": " + r.mode().label(), "time since switching (ms)",
                "terminal voltage (pu of rated peak)");
        ch.getStyler().setXAxisDecimalPattern("0.#");
        XYSeries s = ch.addSeries(r.mode().label(), t, v);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineStyle(ChartFiles.solid());
        List<List<?>> rows = new ArrayList<>(Figures.columns(t, v));
        Figures.xy(nb, notebook, section, name, ch, caption, List.of("time (ms)", "voltage (pu)"), rows,
                new Wave(t, v, r.mode().label(), r.peakPerUnit()));
    }

    private record Wave(double[] timeMs, double[] voltagePu, String mode, double peakPu) { }
}
