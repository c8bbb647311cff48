package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.Waveform;
import org.ferromap.report.Json;
import org.ferromap.report.SimulationCharts;
import org.ferromap.report.ChartFiles;
import org.ferromap.report.Notebook;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/** One switching event simulated in the time domain, drawn as the simulate command draws it, and the verdict. */
public final class SimulationSection {

    private SimulationSection() {
    }

    /**
     * @param title     the study's title
     * @param label     what was simulated (switching angle, residual flux, limits)
     * @param circuit   the circuit simulated
     * @param angle     the source angle used, rad
     * @param result    the simulation
     */
    public record Data(String title, String label, EquivalentCircuit circuit, double angle, SimulationResult result) { }

    /** The verdict as a table row: mode, period, peak, certified, Lyapunov exponent, note. */
    public static List<String> verdict(SimulationResult r) {
        return List.of(r.mode().label(), r.period() > 0 ? String.valueOf(r.period()) : "-", Fmt.pu(r.peakPerUnit()),
                r.certified() ? "yes" : "no", Fmt.sig(r.lyapunovPerPeriod(), 3), r.reason());
    }

    /** Header of {@link #verdict}. */
    public static final List<String> VERDICT_HEADER = List.of("settled mode", "period (source periods)",
            "peak (pu)", "orbit certified", "largest Lyapunov exponent (per period)", "note");

    /**
     * The simulate command's charts ({@link SimulationCharts}): the switching event with the
     * source, the settled state, the stroboscopic section and the spectrum, each with its CSV and
     * a JSON of the same data.
     */
    public static void write(Notebook nb, Path notebook, Data d) {
        SimulationResult r = d.result();
        EquivalentCircuit c = d.circuit();
        nb.section("simulate", "Time-domain simulation");
        nb.text(d.label() + ".");
        nb.table(VERDICT_HEADER, List.of(verdict(r)));
        Path dir = Figures.folder(notebook, "simulate");
        Waveform ev = r.event();
        double[] e = new double[ev.size()];
        for (int k = 0; k < e.length; k++) {
            e[k] = c.sourcePeak() * Math.sin(c.omega() * ev.time()[k] + d.angle());
        }
        String t = d.title();
        if (ev.size() >= 2) {
            SimulationCharts.waveform("Switching event: " + t, ev.time(), List.of(new SimulationCharts.Trace("v", "V",
                    ev.voltage()), new SimulationCharts.Trace("source e", "V", e), new SimulationCharts.Trace("lambda",
                    "Wb-turn", ev.flux())), List.of(), dir, "event", true);
            Json.write(new WaveJson(ev.time(), ev.voltage(), ev.flux(), e), dir.resolve("event.json"));
            nb.figure("simulate/event", "The first periods after switching: terminal voltage and source",
                    List.of("simulate/event.csv", "simulate/event.json"));
        }
        Waveform w = r.window();
        if (w.size() >= 2) {
            SimulationCharts.waveform("Settled state: " + t, w.time(), List.of(new SimulationCharts.Trace("v", "V", w.voltage()),
                    new SimulationCharts.Trace("lambda", "Wb-turn", w.flux())), List.of(), dir, "settled", true);
            Json.write(new WaveJson(w.time(), w.voltage(), w.flux(), null), dir.resolve("settled.json"));
            nb.figure("simulate/settled", "The settled state (one orbit when periodic, the last periods otherwise)",
                    List.of("simulate/settled.csv", "simulate/settled.json"));
        }
        Waveform sec = r.section();
        if (sec.size() > 0) {
            SimulationCharts.section("Stroboscopic section: " + t, "lambda", sec.flux(), "v", sec.voltage(), dir, "section",
                    true);
            Json.write(new SectionJson(sec.flux(), sec.voltage()), dir.resolve("section.json"));
            nb.figure("simulate/section", "Flux linkage against voltage once a source period in the settled state: one "
                    + "point for the source period, p points for a subharmonic, a closed curve or a cloud otherwise",
                    List.of("simulate/section.csv", "simulate/section.json"));
        }
        if (r.spectrum().frequency().length >= 2) {
            double f0 = c.omega() / (2 * Math.PI);
            SimulationCharts.spectrum("Spectrum of the settled voltage: " + t, r.spectrum().frequency(),
                    r.spectrum().amplitude(), f0, dir, "spectrum", true);
            Json.write(new SpectrumJson(r.spectrum().frequency(), r.spectrum().amplitude()), dir.resolve("spectrum.json"));
            nb.figure("simulate/spectrum", "Amplitude spectrum of the settled terminal voltage",
                    List.of("simulate/spectrum.csv", "simulate/spectrum.json"));
        }
        nb.end();
    }

    private record WaveJson(double[] time, double[] voltage, double[] flux, double[] source) { }

    private record SectionJson(double[] flux, double[] voltage) { }

    private record SpectrumJson(double[] frequency, double[] amplitude) { }

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
