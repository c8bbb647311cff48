package org.ferromap.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.NetworkResult;
import org.ferromap.circuit.NetworkSimulationSettings;
import org.ferromap.circuit.StateLayout;
import org.ferromap.circuit.SwitchPlan;
import org.ferromap.circuit.ThreePhaseNetwork;
import org.ferromap.dynamics.SettledState;
import org.ferromap.dynamics.NetworkSimulator;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.dynamics.Spectrum;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.dynamics.Waveform;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.Installation;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.report.SimulationCharts;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;
import org.ferromap.units.Form;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * Simulates the open-phase event in the time domain and classifies the state it settles into.
 * Circuit studies (and equipment studies with {@code --reduced}) run the single-phase equivalent
 * circuit; equipment studies run the full three-phase network built from the installation, with
 * the open-phase case's poles opening at {@code --open-at}. Writes charts and CSV under
 * {@code <out>/<study>/simulate}; bad input exits 2 before anything is written, an integration
 * failure is a result (mode "undetermined" with the reason, exit 0).
 */
@Command(name = "simulate", description = {
    "Simulate the switching event in the time domain and classify the settled state (normal, fundamental, "
            + "subharmonic, quasi-periodic, chaotic or undetermined).",
    "Circuit studies and --reduced run the single-phase circuit from the switching instant; equipment studies "
            + "run the full three-phase network, energized, opening the open-phase case's poles (a; a and b) at "
            + "--open-at.",
    "Charts (PNG, SVG, PDF) and CSV go to <out>/<study>/simulate. Exit 0 with a result (an integration failure "
            + "is the result \"undetermined\"), 2 for bad input (nothing is written)."})
final class SimulateCommand extends BaseCommand {

    /** Default periods of the single-phase run when the study names none (it stops once a periodic state is certified). */
    static final int DEFAULT_PERIODS_SINGLE = 2000;
    /** Default periods of the three-phase run when the study names none (it stops once the state repeats). */
    static final int DEFAULT_PERIODS_NETWORK = 400;
    /** Most periods accepted. */
    static final int MAX_PERIODS = 1_000_000;
    /** Samples a period of the three-phase record (a power of two, for the spectrum). */
    static final int NETWORK_SAMPLES_PER_PERIOD = 128;
    /** Most periods analysed at the end of a three-phase run. */
    static final int NETWORK_WINDOW_PERIODS = 64;
    /** Most transient periods discarded after the opening before classification starts. */
    static final int TRANSIENT_PERIODS = 20;

    @Mixin
    StudyOptions study;

    @Option(names = "--periods", paramLabel = "N",
            description = "Most source periods to simulate, >= 1; the run stops sooner once the state repeats "
                    + "(default: the study's analyses.simulate.cycles, else " + DEFAULT_PERIODS_SINGLE
                    + " for the single-phase circuit and " + DEFAULT_PERIODS_NETWORK + " for the three-phase network).")
    Integer periods;

    @Option(names = "--source-angle", paramLabel = "DEG",
            description = "Source angle at t = 0 in degrees (a plain number), or with a unit (30 deg, 0.5 rad). "
                    + "Circuit studies: the circuit's source at switching; equipment studies: the supply's phase a "
                    + "(the reduced loop adds its own shift). Default: the study's.")
    String sourceAngle;

    @Option(names = "--initial-flux", paramLabel = "Q",
            description = "Flux linkage at switching, single-phase circuit only: Wb-turn (12 Wb-turn) or per unit of "
                    + "the rated peak flux (0.8 pu). Default 0.")
    String initialFlux;

    @Option(names = "--initial-voltage", paramLabel = "Q",
            description = "Terminal voltage at switching, single-phase circuit only: V (5 kV) or per unit of the "
                    + "rated peak (0.5 pu). Default 0.")
    String initialVoltage;

    @Option(names = "--open-at", paramLabel = "T",
            description = "Three-phase network: when the poles are commanded to open, as a time (5 ms) or in source "
                    + "cycles (0.25 cycles). Default 1 cycle.")
    String openAt;

    @Option(names = "--at-current-zero",
            description = "Three-phase network: each commanded pole opens at the next zero of its current "
                    + "(a breaker or fuse) instead of at the command (an ideal disconnector).")
    boolean atCurrentZero;

    @Option(names = "--reduced",
            description = "Equipment studies: simulate the reduced single-phase circuit instead of the three-phase network.")
    boolean reduced;

    @Option(names = "--no-charts",
            description = "Write the CSV and JSON only, no PNG, SVG or PDF (faster for scripted runs).")
    boolean noCharts;

    @Option(names = "--rtol", paramLabel = "X",
            description = "Relative tolerance of the integration, in [1e-12, 1e-3] (default 1e-9 single-phase, "
                    + "1e-8 three-phase).")
    Double rtol;

    /**
     * The JSON contract of {@code simulate --json} (SI units, angles in degrees where named so).
     *
     * @param study the study's title
     * @param model "single-phase" or "three-phase"
     * @param mode normal, fundamental, subharmonic, quasi-periodic, chaotic or undetermined
     * @param period period of the settled state in source periods, 0 when none
     * @param peakVoltage largest |v| over the settled window, V (null when nothing settled)
     * @param peakVoltagePu the same per unit of {@code perUnitBase}
     * @param lyapunov largest Lyapunov exponent per source period; null when not computed
     * @param section [flux (Wb-turn), voltage (V)] stroboscopic samples of the settled window
     * @param reason how the mode was decided, or why it is undetermined
     * @param method which indicators decided
     * @param certified whether Newton on the period map certified a stable periodic orbit (single-phase only)
     * @param multipliers Floquet multipliers [re, im] of a certified orbit over one period of it
     * @param zeroOneK K of the 0-1 test; null when not computed
     * @param lineShare share of the spectrum's power in its strongest lines (three-phase); null otherwise
     * @param fundamentalPhaseDeg phase of the fundamental against the (loop) source, deg; null unless period 1
     * @param observed which voltage the figures are of
     * @param perUnitBase the voltage that is 1 pu, V peak
     * @param exactness how faithful the simulated model is to the study
     * @param reduction the study's reduction explained (equipment studies), null for circuit studies
     * @param periods source periods asked for
     * @param periodsSimulated source periods integrated
     * @param rhsEvaluations right-hand-side evaluations spent
     * @param sourceAngleDeg source angle used at t = 0, deg
     * @param openingTimes instant each pole opened, s (phases a, b, c; null for a pole that stayed closed);
     *        empty for the single-phase circuit
     * @param opening how the poles open ("at command", "at current zero"), null single-phase
     * @param folder where the charts and CSV were written
     */
    record SimulateJson(String study, String model, String mode, int period, double peakVoltage, double peakVoltagePu,
                        double lyapunov, List<double[]> section, String reason, String method, boolean certified,
                        List<double[]> multipliers, double zeroOneK, double lineShare, double fundamentalPhaseDeg,
                        String observed, double perUnitBase, String exactness, String reduction, int periods,
                        int periodsSimulated, long rhsEvaluations, double sourceAngleDeg, Double[] openingTimes,
                        String opening, String folder) {

        SimulateJson {
            // boxed, so that a closed pole's NaN is written as null like every other missing number
            openingTimes = openingTimes == null ? new Double[0] : openingTimes.clone();
        }

        SimulateJson withFolder(String f) {
            return new SimulateJson(study, model, mode, period, peakVoltage, peakVoltagePu, lyapunov, section, reason,
                    method, certified, multipliers, zeroOneK, lineShare, fundamentalPhaseDeg, observed, perUnitBase,
                    exactness, reduction, periods, periodsSimulated, rhsEvaluations, sourceAngleDeg, openingTimes,
                    opening, f);
        }
    }

    /** Data for the four charts. */
    private record Charts(double[] eventTime, List<SimulationCharts.Trace> event, List<SimulationCharts.Mark> marks,
                          double[] settledTime, List<SimulationCharts.Trace> settled, String fluxName, Waveform section,
                          Spectrum spectrum, double frequency) { }

    private record Outcome(SimulateJson json, Charts charts) { }

    @Override
    int work() {
        Study s = study.read();
        boolean threePhase = s.isEquipmentForm() && !reduced;
        checkOptions(s, threePhase);
        int n = periods(s, threePhase);
        Outcome o = threePhase ? network(s, n) : circuit(s, n);
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("simulate"))) {
            writeCharts(s.title(), o.charts(), f.staging(), !noCharts);
            Json.write(o.json().withFolder(f.target().toString()), f.file("simulate.json"));
            dir = f.commit();
        }
        SimulateJson j = o.json().withFolder(dir.toString());
        if (study.json) {
            out().println(Json.text(j));
        } else {
            printSummary(j);
        }
        return Main.OK;
    }

    // ------------------------------------------------------------------ input

    /** Every check that needs no simulation, so bad input fails before anything runs or is written. */
    private void checkOptions(Study s, boolean threePhase) {
        if (reduced && !s.isEquipmentForm()) {
            throw new FerromapException(MessageKey.BAD_REQUEST,
                    "--reduced applies to equipment studies; " + study.study + " gives the circuit directly");
        }
        if (threePhase && (initialFlux != null || initialVoltage != null)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--initial-flux and --initial-voltage apply to the "
                    + "single-phase circuit (circuit studies, or --reduced); the three-phase network starts from the "
                    + "energized bank and opens at --open-at");
        }
        if (!threePhase && (openAt != null || atCurrentZero)) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--open-at and --at-current-zero apply to the "
                    + "three-phase network of an equipment study; the single-phase circuit starts at the switching "
                    + "instant (choose the point on wave with --source-angle)");
        }
        if (rtol != null && !(rtol >= 1e-12 && rtol <= 1e-3)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "--rtol = " + rtol + " is not allowed; expected a value in [1e-12, 1e-3]");
        }
        if (periods != null && (periods < 1 || periods > MAX_PERIODS)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--periods = " + periods
                    + " is not allowed; expected a whole number of source periods from 1 to " + MAX_PERIODS);
        }
        if (s.isEquipmentForm() ? !s.reduction().loop().driven() : s.circuit().sourcePeak() == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "nothing to simulate: the open phase has no drive"
                    + (s.isEquipmentForm()
                            ? " (a grounded-wye bank on screened cable, r = Ccc/Ccs = 0: the open phase is not coupled "
                                    + "to the supply and its voltage only decays)"
                            : " (the circuit's source is 0 V)"));
        }
        sourceAngleRad();
        if (!threePhase) {
            initialState(s.circuit());
        } else {
            openTime(s);
        }
    }

    /** The periods asked for, else the study's analyses.simulate.cycles, else the model's default. */
    private int periods(Study s, boolean threePhase) {
        if (periods != null) {
            return periods;
        }
        Object a = s.analyses().get("simulate");
        if (a instanceof Map<?, ?> m && m.get("cycles") instanceof Number c && c.intValue() >= 1
                && c.intValue() <= MAX_PERIODS && c.doubleValue() == c.intValue()) {
            return c.intValue();
        }
        return threePhase ? DEFAULT_PERIODS_NETWORK : DEFAULT_PERIODS_SINGLE;
    }

    /** --source-angle in rad, NaN when absent. A plain number is degrees. */
    private double sourceAngleRad() {
        if (sourceAngle == null) {
            return Double.NaN;
        }
        String t = sourceAngle.trim();
        double rad;
        try {
            rad = Math.toRadians(Double.parseDouble(t));
        } catch (NumberFormatException e) {
            try {
                rad = Quantities.angle(t);
            } catch (FerromapException q) {
                throw new FerromapException(MessageKey.BAD_QUANTITY, "--source-angle '" + sourceAngle
                        + "' is not an angle; expected a number of degrees (30) or an angle with its unit (30 deg, 0.5 rad)");
            }
        }
        if (!Double.isFinite(rad)) {
            throw new FerromapException(MessageKey.BAD_QUANTITY,
                    "--source-angle '" + sourceAngle + "' is not a finite angle; expected a number of degrees");
        }
        return rad;
    }

    /** {flux Wb-turn, voltage V} at switching from --initial-flux and --initial-voltage (pu of the circuit's rated peak). */
    private double[] initialState(EquivalentCircuit c) {
        double flux = 0;
        double volt = 0;
        if (initialFlux != null) {
            Quantity q = withUnit("--initial-flux", initialFlux, Dimension.FLUX_LINKAGE);
            flux = q.dimension() == Dimension.DIMENSIONLESS ? q.value() * c.ratedPeak() / c.omega() : q.value();
        }
        if (initialVoltage != null) {
            Quantity q = withUnit("--initial-voltage", initialVoltage, Dimension.VOLTAGE);
            if (q.form() == Form.RMS) {
                throw new FerromapException(MessageKey.BAD_QUANTITY, "--initial-voltage '" + initialVoltage
                        + "' is an rms value; an instantaneous voltage is written in V or pu (5 kV, 0.5 pu)");
            }
            volt = q.dimension() == Dimension.DIMENSIONLESS ? q.value() * c.ratedPeak() : q.value();
        }
        return new double[] {flux, volt};
    }

    /** A quantity of the given kind or in per unit ("pu" or "%" written out; a bare number is refused). */
    private static Quantity withUnit(String option, String text, Dimension kind) {
        Quantity q = Quantities.parse(text, kind, Dimension.DIMENSIONLESS);
        if (q.dimension() == Dimension.DIMENSIONLESS && !(text.contains("pu") || text.contains("p.u.") || text.contains("%"))) {
            throw new FerromapException(MessageKey.BAD_QUANTITY, option + " '" + text + "' has no unit; expected "
                    + kind.describe() + ", or per unit of the rated peak (0.8 pu)");
        }
        return q;
    }

    /** --open-at in s (default one source period), checked against the run's length. */
    private double openTime(Study s) {
        double f = s.equipment().frequency();
        double t = openAt == null ? 1.0 / f : Quantities.time(openAt, f);
        if (!(t >= 0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "--open-at '" + openAt + "' is before the start; expected a time >= 0 (5 ms, 0.25 cycles)");
        }
        int n = periods(s, true);
        if (periodsAfterOpening(t * f, n) < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, String.format(
                    "--open-at %s (%.4g cycles) leaves no whole period after the opening within the %d periods "
                            + "simulated; give more --periods or open earlier", openAt, t * f, n));
        }
        return t;
    }

    /** Whole periods left after the poles have opened (a current-zero opening can come half a period late). */
    private int periodsAfterOpening(double commandCycles, int n) {
        return n - (int) Math.ceil(commandCycles + (atCurrentZero ? 0.5 : 0.0) - 1e-9);
    }

    // ------------------------------------------------------------------ single-phase

    private Outcome circuit(Study s, int n) {
        EquivalentCircuit c = s.circuit();
        double angle = sourceAngleRad();
        if (!Double.isNaN(angle) && s.isEquipmentForm()) {
            angle += s.reduction().loop().sourceAngleShift();   // the supply's phase a, plus the loop's shift
        }
        double used = Double.isNaN(angle) ? c.sourceAngle() : angle;
        double[] z0 = initialState(c);
        double tol = rtol == null ? 1e-9 : rtol;
        SimulationSettings set = SimulationSettings.defaults()
                .withTransientPeriods(Math.min(TRANSIENT_PERIODS, n / 4)).withMaxPeriods(n).withTolerance(tol)
                .withInitialState(z0[0], z0[1]).withSourceAngle(used);
        SimulationResult r = Simulator.simulate(c, set);

        List<double[]> multipliers = new ArrayList<>();
        for (int i = 0; i < r.multiplierReal().length; i++) {
            multipliers.add(new double[] {r.multiplierReal()[i], r.multiplierImag()[i]});
        }
        String method = r.certified()
                ? "Newton on the period map certified a stable periodic orbit (Floquet multipliers inside the unit circle)"
                : r.period() > 0 ? "recurrence of the stroboscopic samples (relative 1e-6), orbit refined by Newton"
                : r.window().size() == 0 ? "none: no settled window to classify"
                : "largest Lyapunov exponent (Benettin) and 0-1 test on the stroboscopic voltage";
        String observed = s.isEquipmentForm()
                ? "terminal voltage of the reduced single-phase circuit: the loop voltage W of the reduction"
                : "terminal voltage of the single-phase circuit";
        SimulateJson j = new SimulateJson(s.title(), "single-phase", r.mode().label(), r.period(), r.peakVoltage(),
                r.peakPerUnit(), r.lyapunovPerPeriod(), pairs(r.section()), r.reason(), method, r.certified(),
                multipliers, r.zeroOneK(), Double.NaN, Math.toDegrees(r.fundamentalPhase()), observed, c.ratedPeak(),
                s.exactness().explanation(), s.isEquipmentForm() ? s.reduction().explanation() : null, n,
                r.periodsSimulated(), r.rhsEvaluations(), Math.toDegrees(used), new Double[0], null, null);

        // Charts: the event with the source for reference, the settled window.
        Waveform ev = r.event();
        double[] e = new double[ev.size()];
        for (int k = 0; k < e.length; k++) {
            e[k] = c.sourcePeak() * Math.sin(c.omega() * ev.time()[k] + used);
        }
        List<SimulationCharts.Trace> event = List.of(new SimulationCharts.Trace("v", "V", ev.voltage()),
                new SimulationCharts.Trace("source e", "V", e), new SimulationCharts.Trace("lambda", "Wb-turn", ev.flux()));
        Waveform w = r.window();
        List<SimulationCharts.Trace> settled = List.of(new SimulationCharts.Trace("v", "V", w.voltage()),
                new SimulationCharts.Trace("lambda", "Wb-turn", w.flux()));
        Charts ch = new Charts(ev.time(), event, List.of(), w.time(), settled, "lambda", r.section(), r.spectrum(),
                c.omega() / (2 * Math.PI));
        return new Outcome(j, ch);
    }

    // ------------------------------------------------------------------ three-phase

    private Outcome network(Study s, int n) {
        Installation in = s.equipment();
        double angle = sourceAngleRad();
        ThreePhaseNetwork net = ThreePhaseNetwork.of(in);
        if (!Double.isNaN(angle)) {
            net = net.withSourceAngle(angle);
        }
        double f = in.frequency();
        double tOpen = openTime(s);
        int after = periodsAfterOpening(tOpen * f, n);
        int transientPeriods = Math.min(TRANSIENT_PERIODS, after / 4);
        int window = Integer.highestOneBit(Math.max(1, Math.min(NETWORK_WINDOW_PERIODS, after - transientPeriods)));
        double tol = rtol == null ? 1e-8 : rtol;
        int[] phases = in.openPhases().openPhases() == 1 ? new int[] {0} : new int[] {0, 1};
        SwitchPlan plan = atCurrentZero ? SwitchPlan.openAtCurrentZero(tOpen, phases) : SwitchPlan.openAt(tOpen, phases);
        NetworkSimulationSettings ns = NetworkSimulationSettings.defaults()
                .withSamplesPerPeriod(NETWORK_SAMPLES_PER_PERIOD).withRecordedPeriods(window)
                .withRelativeTolerance(tol).withAbsoluteTolerance(tol);
        SimulationSettings cls = SimulationSettings.defaults().withTransientPeriods(transientPeriods).withMaxPeriods(n);
        double rated = in.transformer().ratedPhasePeak();

        String exactness = "full three-phase network, no reduction"
                + (in.transformer().core() != CoreType.SEPARATE_PHASE_CORES
                        ? "; multi-legged core coupling not represented (three separate cores simulated): "
                                + "the result may be far off" : "");
        String observed = "node-to-ground voltage of the open phase" + (phases.length > 1 ? "s (a and b)" : " (a)")
                + " at the transformer; section and spectrum of phase a";
        String opening = atCurrentZero ? "at current zero" : "at command";
        NetworkSimulator.Outcome out = NetworkSimulator.simulate(net, plan, in.openPhases(), ns, cls, rated);
        SettledState st = out.state();
        NetworkResult r = out.run();
        double[] opened = r == null ? new double[] {Double.NaN, Double.NaN, Double.NaN} : r.openingTimes().clone();
        SimulateJson j = new SimulateJson(s.title(), "three-phase", st.mode().label(), st.period(), st.peakVoltage(),
                st.peakPerUnit(), Double.NaN, pairs(st.section()), st.reason(), st.method(), false, List.of(),
                st.zeroOneK(), st.lineShare(), Math.toDegrees(st.fundamentalPhase()), observed, rated, exactness,
                s.reduction().explanation(), n, out.periodsSimulated(), r == null ? 0 : r.evaluations(),
                Math.toDegrees(net.sourceAngle()), boxed(opened), opening, null);
        if (r == null) {
            Charts none = new Charts(new double[0], List.of(), List.of(), new double[0], List.of(), "lambda_a",
                    Waveform.empty(), Spectrum.empty(), f);
            return new Outcome(j, none);
        }
        StateLayout layout = r.layout();
        List<SimulationCharts.Trace> event = new ArrayList<>();
        List<SimulationCharts.Trace> settled = new ArrayList<>();
        // The settled chart shows the last few periods: one orbit of a periodic state, at least 4 periods.
        int shown = st.period() > 0 ? st.period() * Math.max(1, (4 + st.period() - 1) / st.period()) : Math.min(8, window);
        shown = Math.min(shown, window);
        int samples = r.time().length - 1;
        int from = Math.max(0, samples - shown * NETWORK_SAMPLES_PER_PERIOD);
        for (int order : new int[] {3, 4, 5, 0, 1, 2}) {
            String name = layout.name(order);
            event.add(new SimulationCharts.Trace(name, layout.unit(order), r.eventWaveforms()[order]));
            settled.add(new SimulationCharts.Trace(name, layout.unit(order),
                    Arrays.copyOfRange(r.waveforms()[order], from, samples)));
        }
        List<SimulationCharts.Mark> marks = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            if (!Double.isNaN(opened[k])) {
                marks.add(new SimulationCharts.Mark("pole " + "abc".charAt(k) + " opens", opened[k]));
            }
        }
        Charts ch = new Charts(r.eventTime(), event, marks, Arrays.copyOfRange(r.time(), from, samples), settled,
                layout.name(0), st.section(), st.spectrum(), f);
        return new Outcome(j, ch);
    }

    // ------------------------------------------------------------------ output

    private static Double[] boxed(double[] v) {
        Double[] out = new Double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = v[i];
        }
        return out;
    }

    private static List<double[]> pairs(Waveform w) {
        List<double[]> out = new ArrayList<>(w.size());
        for (int k = 0; k < w.size(); k++) {
            out.add(new double[] {w.flux()[k], w.voltage()[k]});
        }
        return out;
    }

    private static void writeCharts(String title, Charts c, Path dir, boolean draw) {
        SimulationCharts.waveform("Switching event: " + title, c.eventTime(), c.event(), c.marks(), dir, "event", draw);
        SimulationCharts.waveform("Settled state: " + title, c.settledTime(), c.settled(), List.of(), dir, "settled",
                draw);
        String vName = c.fluxName().startsWith("lambda_") ? "v_a" : "v";
        SimulationCharts.section("Stroboscopic section: " + title, c.fluxName(), c.section().flux(), vName,
                c.section().voltage(), dir, "section", draw);
        SimulationCharts.spectrum("Spectrum of the settled " + vName + ": " + title, c.spectrum().frequency(),
                c.spectrum().amplitude(), c.frequency(), dir, "spectrum", draw);
    }

    private void printSummary(SimulateJson j) {
        var o = out();
        o.println(j.study() + ": simulated (" + j.model() + ", " + j.periodsSimulated() + " of " + j.periods()
                + " periods)");
        o.println("  mode: " + j.mode() + (j.period() > 0 ? " (period " + j.period() + ")" : ""));
        if (Double.isFinite(j.peakVoltage())) {
            o.printf("  peak voltage: %.4g kV = %.3f pu of %.4g kV peak (%s)%n", j.peakVoltage() / 1e3,
                    j.peakVoltagePu(), j.perUnitBase() / 1e3, j.observed());
        }
        o.println("  Lyapunov exponent: " + (Double.isFinite(j.lyapunov())
                ? String.format("%.4g per period", j.lyapunov()) : "not computed"));
        o.println("  decided by: " + j.method());
        o.println("  " + j.reason());
        o.println("  model: " + j.exactness());
        if (j.openingTimes().length == 3) {
            o.printf("  poles opened (%s) at: a %s, b %s, c %s%n", j.opening(), ms(j.openingTimes()[0]),
                    ms(j.openingTimes()[1]), ms(j.openingTimes()[2]));
        }
        o.println("  written: " + j.folder());
    }

    private static String ms(double t) {
        return Double.isNaN(t) ? "closed" : String.format("%.3f ms", t * 1e3);
    }
}
