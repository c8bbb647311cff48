package org.ferromap.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.orbits.CircuitOrbits;
import org.ferromap.orbits.CircuitSystem;
import org.ferromap.orbits.SweepReport;
import org.ferromap.orbits.SweepRun;
import org.ferromap.orbits.SweepSample;
import org.ferromap.orbits.SweepSettings;
import org.ferromap.report.Csv;
import org.ferromap.report.Json;
import org.ferromap.report.OrbitCharts;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** The brute-force bifurcation diagram: up and down sweeps carrying the state, samples once a period. */
@Command(name = "sweep", header = "Brute-force bifurcation diagram: up and down sweeps carrying the state, sampled once a period.",
        description = {
    "Brute-force bifurcation diagram: the circuit simulated at each of --steps values of one parameter, up "
            + "through the range and back down, from each initial state, carrying the settled state from one value to "
            + "the next (so hysteresis shows); after a transient the state is sampled once a source period (t = 0 mod T).",
    "With --with-orbits the continued periodic orbits and their bifurcations are drawn over the samples.",
    "A chart (PNG, SVG, PDF), CSV and JSON go to <out>/<study>/sweep. Exit 0 with a result, 1 when a computation "
            + "fails, 2 for a bad request (nothing is written)."})
final class SweepCommand extends BaseCommand {

    /** Most values a sweep accepts: beyond this the runs take hours and the chart shows no more. */
    static final int MAX_STEPS = 2000;
    /**
     * Most source periods a sweep may simulate in all (runs times transients and samples): about two
     * hundred times the default request; beyond it a run takes hours, which is a request to reconsider.
     */
    static final long MAX_PERIODS = 50_000_000L;
    /** Samples counted as equal for the period column, per unit of the rated flux and voltage (far above the 1e-9 integration tolerance, far below the split of a doubled orbit a step past the doubling). */
    static final double PERIOD_TOLERANCE = 1e-4;

    @Mixin
    StudyOptions study;

    @Mixin
    VaryOptions vary;

    @Option(names = "--steps", required = true, paramLabel = "N", description = "Parameter values, both ends included (2 to " + MAX_STEPS + ").")
    int steps;

    @Option(names = "--initial-states", paramLabel = "N", defaultValue = "" + OrbitsCommand.DEFAULT_INITIAL_STATES,
            description = "Initial states, each swept up and down (1 to " + StartStates.MAX + "; default ${DEFAULT-VALUE}): "
                    + "the de-energized terminal, then states spread in amplitude and phase.")
    int initialStates;

    @Option(names = "--transient", paramLabel = "PERIODS", defaultValue = "300", description = "Source periods discarded "
            + "at each value after the first of a run (0 to 100000; default ${DEFAULT-VALUE}); near a bifurcation the "
            + "approach is slow, so raise it to sharpen the diagram there.")
    int transientPeriods;

    @Option(names = "--first-transient", paramLabel = "PERIODS", defaultValue = "500", description = "Source periods "
            + "discarded at the first value of each run, from the initial state (0 to 100000; default ${DEFAULT-VALUE}).")
    int firstTransient;

    @Option(names = "--samples", paramLabel = "PERIODS", defaultValue = "32", description =
        "Samples kept per value, one a source period (1 to 4096; default ${DEFAULT-VALUE}).")
    int samples;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads, 1 to 64 (default: the processors "
            + "available, at most one per run). Runs are independent: any count gives the same result.")
    Integer threads;

    @Option(names = "--with-orbits", description = "Also continue the periodic orbits over the range (as the orbits "
            + "verb, periods 1 to 8, settled at the lower end of the range, where the upward runs start) and draw them "
            + "with their bifurcations over the samples.")
    boolean withOrbits;

    /** JSON contract of {@code sweep --json} (SI; the source voltage in V peak). */
    record SweepJson(String study, String parameter, String unit, double from, double to, int steps, List<double[]> initialStates,
                     Settings settings, List<SweepSample> samples, List<RunJson> runs, OrbitsPart orbits, Units units) { }

    /** The sweep settings used. */
    record Settings(int firstTransient, int transientPeriods, int samples, double tolerance) { }

    /**
     * One run.
     *
     * @param initialState index into {@code initialStates}
     * @param direction "up" or "down"
     * @param parameters the values in the order visited, SI
     * @param periods least period seen in the samples at each value (samples equal within
     *        1e-4 per unit); 0 when none up to half the samples (quasi-periodic, chaotic or
     *        still settling); null where the integration failed
     */
    record RunJson(int initialState, String direction, double[] parameters, List<Integer> periods) { }

    /** The continued orbits drawn with --with-orbits. */
    record OrbitsPart(double start, List<ContinuedOrbits.PointJson> points, List<ContinuedOrbits.BifurcationJson> bifurcations,
                      List<ContinuedOrbits.BranchJson> branches) { }

    /** Units of the fields. */
    record Units(String parameter, String flux, String voltage, String periods) { }

    @Override
    int work() {
        if (steps < 2 || steps > MAX_STEPS) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--steps " + steps + " is not allowed; expected 2 to " + MAX_STEPS);
        }
        OrbitsCommand.checkInitialStates(initialStates);
        if (transientPeriods < 0 || transientPeriods > 100_000 || firstTransient < 0 || firstTransient > 100_000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--transient " + transientPeriods + " / --first-transient " + firstTransient
                    + " is not allowed; expected 0 to 100000 source periods");
        }
        if (samples < 1 || samples > 4096) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--samples " + samples + " is not allowed; expected 1 to 4096");
        }
        if (threads != null && (threads < 1 || threads > 64)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--threads " + threads + " is not allowed; expected 1 to 64");
        }
        long work = 2L * initialStates * (firstTransient + (long) (steps - 1) * transientPeriods + (long) steps * samples);
        if (work > MAX_PERIODS) {
            throw new FerromapException(MessageKey.TOO_LARGE, "the sweep would simulate " + work + " source periods (2 runs per "
                    + "initial state, transients and samples at each value); at most " + MAX_PERIODS
                    + " are accepted: fewer --steps, --initial-states, --transient or --samples");
        }
        Study s = study.read();
        VaryOptions.Range range = vary.resolve(s);
        double[] values = range.values(steps);
        EquivalentCircuit base = range.circuit(values[0]);
        List<double[]> initial = StartStates.spread(base, initialStates);
        int runs = 2 * initialStates;
        int t = threads != null ? threads : Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), runs));
        SweepSettings settings = SweepSettings.DEFAULTS.withTransients(firstTransient, transientPeriods).withRecordedPeriods(samples)
                .withThreads(Math.min(t, 64));
        List<SweepRun> result = CircuitOrbits.sweep(range.circuits(), values, initial, settings);
        SweepReport report = CircuitOrbits.sweepReport(base, range.name(), range.unitLabel(), result);
        List<RunJson> runList = new ArrayList<>();
        for (SweepRun r : result) {
            List<Integer> periods = new ArrayList<>();
            for (int i = 0; i < r.parameters().length; i++) {
                periods.add(Double.isNaN(r.samples()[i][0][0]) ? null : r.period(i, PERIOD_TOLERANCE));
            }
            runList.add(new RunJson(r.initialState(), r.upward() ? "up" : "down", r.parameters(), periods));
        }
        ContinuedOrbits orbits = null;
        OrbitsPart part = null;
        if (withOrbits) {
            double p0 = range.from(); // where the upward runs start: the orbits then include the attractor they follow
            orbits = ContinuedOrbits.explore(range, p0, StartStates.spread(range.circuit(p0), initialStates), 1, 8,
                    OrbitsCommand.DEFAULT_MAX_POINTS, false);
            part = new OrbitsPart(p0, orbits.points(), orbits.bifurcations(), orbits.branches());
        }
        SweepJson json = new SweepJson(s.title(), range.name(), range.unitLabel(), range.from(), range.to(), steps, initial,
                new Settings(firstTransient, transientPeriods, samples, settings.tolerance()), report.samples(), runList, part,
                new Units(range.unitLabel(), "Wb-turn", "V", "source periods"));

        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("sweep"))) {
            double[] px = new double[report.samples().size()];
            double[] py = new double[px.length];
            for (int i = 0; i < px.length; i++) {
                px[i] = report.samples().get(i).parameter();
                py[i] = report.samples().get(i).voltage();
            }
            OrbitCharts.diagram(withOrbits ? "Bifurcation diagram with the continued orbits" : "Bifurcation diagram (brute force)",
                    range.words(), range.unit(), "terminal voltage at t = 0 mod T", orbits == null ? List.of() : orbits.sectionCurves(),
                    orbits == null ? List.of() : orbits.sectionMarks(), new OrbitCharts.Cloud(px, py), f.staging(), "bifurcation-diagram");
            CircuitSystem sys = CircuitSystem.of(base);
            List<List<?>> sampleRows = new ArrayList<>();
            for (SweepRun r : result) {
                for (int i = 0; i < r.parameters().length; i++) {
                    for (double[] z : r.samples()[i]) {
                        if (Double.isFinite(z[0]) && Double.isFinite(z[1])) {
                            sampleRows.add(List.of(r.initialState(), r.upward() ? "up" : "down", r.parameters()[i], sys.flux(z[0]),
                                    sys.voltage(z[1])));
                        }
                    }
                }
            }
            Csv.write(f.file("sweep-samples.csv"), List.of("initial state", "direction", range.name() + " (" + range.unitLabel() + ")",
                    "flux at t = 0 mod T (Wb-turn)", "voltage at t = 0 mod T (V)"), sampleRows);
            if (orbits != null) {
                orbits.writeCsv(f);
            }
            Json.write(json, f.file("sweep.json"));
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(json));
            return Main.OK;
        }
        var o = out();
        o.println(s.title());
        o.printf("  brute-force sweep of %s from %s to %s %s in %d values, %d initial state%s up and down, %d samples a value%n",
                range.name(), ContinuedOrbits.g(range.from(), 6), ContinuedOrbits.g(range.to(), 6), range.unitLabel(), steps,
                initialStates, initialStates == 1 ? "" : "s",
                samples);
        for (RunJson r : runList) {
            o.printf("    run %d %-4s periods seen: %s%n", r.initialState(), r.direction(), periodSummary(r));
        }
        if (orbits != null) {
            orbits.print(o);
        }
        o.println("  written: " + dir);
        return Main.OK;
    }

    /** "1 from 4.7, 2 from 4.88, ..." : where the period seen changes along the run. */
    private static String periodSummary(RunJson r) {
        StringBuilder sb = new StringBuilder();
        Integer last = -1;
        for (int i = 0; i < r.parameters().length; i++) {
            Integer p = r.periods().get(i);
            if (!java.util.Objects.equals(p, last)) {
                if (sb.length() > 0) {
                    sb.append(", ");
                }
                sb.append(p == null ? "failed" : p == 0 ? "none" : String.valueOf(p)).append(" from ")
                        .append(ContinuedOrbits.g(r.parameters()[i], 5));
                last = p;
            }
        }
        return sb.toString();
    }
}
