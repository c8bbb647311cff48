package org.ferromap.cli;

import java.nio.file.Path;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.Json;
import org.ferromap.report.OrbitCharts;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Periodic orbits continued in one parameter, with Floquet multipliers and bifurcations. */
@Command(name = "orbits", header = "Periodic orbits continued in one parameter: Floquet multipliers, folds, period doublings, tori, pitchforks.",
        description = {
    "Periodic orbits of the equivalent circuit continued in one parameter over a range, with their Floquet "
            + "multipliers (stability) and the bifurcations on them: folds, period doublings, tori and symmetry-breaking "
            + "pitchforks, switching onto the doubled and the asymmetric branches.",
    "The orbits start from the states the circuit settles to (from --initial-states initial states, 300 source "
            + "periods at --start) and from the harmonic-balance steady states (the normal, unstable and ferroresonant "
            + "period-1 orbits) at --start and at both ends of the range. By default every period from 1 to 8 is "
            + "followed. For --vary source the folds are also compared with the single- and multi-harmonic balance.",
    "Charts (PNG, SVG, PDF: the peak voltage of each orbit, and its voltage on the section t = 0 mod T as the sweep "
            + "verb draws it), CSV and JSON go to <out>/<study>/orbits. Exit 0 with a result, 1 when a computation "
            + "fails, 2 for a bad request (nothing is written)."})
final class OrbitsCommand extends BaseCommand {

    /** Default count of initial states: the de-energized terminal and two spread states (a run of seconds to a minute). */
    static final int DEFAULT_INITIAL_STATES = 3;
    /** Default most points per branch: enough for a branch through two folds across the range, half the orbits package's cap. */
    static final int DEFAULT_MAX_POINTS = 200;

    @Mixin
    StudyOptions study;

    @Mixin
    VaryOptions vary;

    @Option(names = "--period", paramLabel = "K", description = "Only orbits of least period K source periods (1 to 8), "
            + "without branch switching to 2K (default: every period from 1 to --max-period, switching at doublings and "
            + "pitchforks).")
    Integer period;

    @Option(names = "--max-period", paramLabel = "K", defaultValue = "8", description = "Largest period followed when "
            + "--period is not given (1 to 8; default ${DEFAULT-VALUE}). Deep in a period-doubling cascade the period-8 "
            + "branches cost most of the run: 2 or 4 is much quicker.")
    int maxPeriod;

    @Option(names = "--initial-states", paramLabel = "N", defaultValue = "" + DEFAULT_INITIAL_STATES, description = "States "
            + "to settle from (1 to " + StartStates.MAX + "; default ${DEFAULT-VALUE}): the de-energized terminal, then states "
            + "spread in amplitude and phase. More find more coexisting orbits; each new one costs a continuation.")
    int initialStates;

    @Option(names = "--max-points", paramLabel = "N", defaultValue = "" + DEFAULT_MAX_POINTS, description = "Most points "
            + "per continued branch (20 to 5000; default ${DEFAULT-VALUE}). Branches of high period in a cascade wind for "
            + "long: this bounds the run time.")
    int maxPoints;

    @Option(names = "--start", paramLabel = "Q", description = "Where in the range the initial states settle and the "
            + "harmonic-balance seeds are taken (default: the study's own value when inside the range, else the middle).")
    String start;

    /** JSON contract of {@code orbits --json} (SI; the source voltage in V peak). */
    record OrbitsJson(String study, String parameter, String unit, double from, double to, double start, Integer period, int maxPeriod,
                      List<double[]> initialStates, List<ContinuedOrbits.PointJson> points,
                      List<ContinuedOrbits.BifurcationJson> bifurcations, List<ContinuedOrbits.BranchJson> branches,
                      List<ContinuedOrbits.FoldJson> foldComparison, String foldComparisonNote, Units units) { }

    /** Units of the fields. */
    record Units(String parameter, String period, String flux, String voltage, String multipliers) { }

    @Override
    int work() {
        if (period != null && (period < 1 || period > 8)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--period " + period + " is not allowed; expected 1 to 8 source periods");
        }
        if (maxPeriod < 1 || maxPeriod > 8) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--max-period " + maxPeriod
                    + " is not allowed; expected 1 to 8 source periods");
        }
        checkInitialStates(initialStates);
        checkMaxPoints(maxPoints);
        Study s = study.read();
        VaryOptions.Range range = vary.resolve(s);
        double p0 = startValue(range, start);
        List<double[]> initial = StartStates.spread(range.circuit(p0), initialStates);
        int min = period == null ? 1 : period;
        int max = period == null ? maxPeriod : period;
        ContinuedOrbits orbits = ContinuedOrbits.explore(range, p0, initial, min, max, maxPoints, true);

        OrbitsJson result = new OrbitsJson(s.title(), range.name(), range.unitLabel(), range.from(), range.to(), p0, period, max,
                initial, orbits.points(), orbits.bifurcations(), orbits.branches(), orbits.folds(), orbits.foldNote(),
                units(range));
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("orbits"))) {
            OrbitCharts.diagram("Periodic orbits and their bifurcations", range.words(), range.unit(), "peak terminal voltage",
                    orbits.peakCurves(), orbits.peakMarks(), null, f.staging(), "orbit-branches");
            OrbitCharts.diagram("Periodic orbits on the section t = 0 mod T", range.words(), range.unit(),
                    "terminal voltage at t = 0 mod T", orbits.sectionCurves(), orbits.sectionMarks(), null, f.staging(), "orbit-sections");
            orbits.writeCsv(f);
            Json.write(result, f.file("orbits.json"));
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(result));
            return Main.OK;
        }
        var o = out();
        o.println(s.title());
        o.printf("  periodic orbits in %s from %s to %s %s, settled at %s from %d initial state%s, %s%n", range.name(),
                ContinuedOrbits.g(range.from(), 6), ContinuedOrbits.g(range.to(), 6), range.unitLabel(), ContinuedOrbits.g(p0, 6),
                initialStates, initialStates == 1 ? "" : "s",
                period == null ? "periods 1 to " + maxPeriod : "period " + period + " only");
        orbits.print(o);
        o.println("  written: " + dir);
        return Main.OK;
    }

    static Units units(VaryOptions.Range range) {
        return new Units(range.unitLabel(), "source periods", "Wb-turn", "V", "dimensionless [re, im]");
    }

    static void checkMaxPoints(int n) {
        if (n < 20 || n > 5000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--max-points " + n + " is not allowed; expected 20 to 5000");
        }
    }

    static void checkInitialStates(int n) {
        if (n < 1 || n > StartStates.MAX) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--initial-states " + n + " is not allowed; expected 1 to "
                    + StartStates.MAX);
        }
    }

    /** The settling value: --start when given (inside the range), else the study's own value when inside, else the middle. */
    static double startValue(VaryOptions.Range range, String text) {
        if (text == null) {
            return range.contains(range.own()) ? range.own() : 0.5 * (range.from() + range.to());
        }
        double v = VaryOptions.bound("--start", text, range.parameter(), range.own());
        if (!range.contains(v)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--start " + text + " lies outside the range "
                    + ContinuedOrbits.g(range.from(), 6) + " to " + ContinuedOrbits.g(range.to(), 6) + " " + range.unitLabel());
        }
        return v;
    }
}
