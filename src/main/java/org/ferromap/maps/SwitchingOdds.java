package org.ferromap.maps;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.Simulator;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.study.Study;

/**
 * The probability of ferroresonance over random switching instants and residual flux: a Monte
 * Carlo estimate with a confidence interval ({@link BinomialInterval}) and the runs needed for a
 * wanted precision.
 *
 * <p>Reproducible: run i draws from {@code new SplittableRandom(mix(seed, i))}, with mix the
 * SplitMix64 finaliser [pub: G. L. Steele, D. Lea and C. H. Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014] applied to seed + (i + 1) times the golden-ratio increment,
 * and the runs are evaluated on the map engine, each into its own slot. So the result depends on
 * the seed and the number of runs only, not on the thread count or the order the runs finish in,
 * and adding runs for a precision keeps the first ones unchanged.
 */
public final class SwitchingOdds {

    private static final long GOLDEN = 0x9E3779B97F4A7C15L;
    /** Half-widths for which the runs needed are always listed. */
    static final double[] COMMON_HALF_WIDTHS = {0.1, 0.05, 0.02, 0.01};
    /** Most checkpoints kept for the running-estimate chart. */
    static final int CHECKPOINTS = 200;

    private SwitchingOdds() {
    }

    /** The two draws of run {@code index}: {angle in [0, 2 pi), residual flux in [-r, r) pu}. */
    public static double[] draws(long seed, int index, double residualFlux) {
        SplittableRandom r = new SplittableRandom(mix(seed + (index + 1L) * GOLDEN));
        double angle = 2 * Math.PI * r.nextDouble();
        double flux = residualFlux * (2 * r.nextDouble() - 1);
        return new double[] {angle, flux};
    }

    /** SplitMix64 finaliser (Steele, Lea and Flood 2014). */
    static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    /** Estimates the probability for a study at the settings' length and voltage. */
    public static OddsResult estimate(Study study, OddsSettings settings, CellExecutor executor) {
        EquivalentCircuit c = DampingSizing.circuit(study, settings.length(), settings.voltage());
        double length = study.isEquipmentForm() ? (Double.isNaN(settings.length()) ? study.equipment().cableLength() : settings.length())
                : Double.NaN;
        double voltage = study.isEquipmentForm()
                ? (Double.isNaN(settings.voltage()) ? study.equipment().sourceLineVoltage() : settings.voltage()) : c.sourcePeak();
        List<String> notes = new ArrayList<>();
        notes.add("Equivalent circuit: " + study.exactness().explanation());
        return estimate(study.title(), c, length, voltage, settings, executor, notes);
    }

    /** Estimates the probability for a circuit. */
    public static OddsResult estimate(String title, EquivalentCircuit circuit, double length, double voltage, OddsSettings s,
                                      CellExecutor executor, List<String> extraNotes) {
        List<OddsResult.Run> runs = new ArrayList<>(batch(circuit, s, 0, s.runs(), executor));
        int first = runs.size();
        int k = ferroresonant(runs);
        BinomialInterval.Interval ci = BinomialInterval.of(k, runs.size(), s.confidence(), s.method());
        List<String> notes = new ArrayList<>(extraNotes);
        if (!Double.isNaN(s.precision()) && ci.halfWidth() > s.precision()) {
            long want = BinomialInterval.runsNeeded(planning(ci), s.precision(), s.confidence());
            int total = (int) Math.min(want, s.maxRuns());
            if (total > runs.size()) {
                runs.addAll(batch(circuit, s, runs.size(), total, executor));
                notes.add(String.format("%d runs added after the first %d to reach the half-width %.3g asked for%s", total - first,
                        first, s.precision(), want > s.maxRuns() ? " (capped at max-runs " + s.maxRuns() + ")" : ""));
                k = ferroresonant(runs);
                ci = BinomialInterval.of(k, runs.size(), s.confidence(), s.method());
            }
        }
        int n = runs.size();
        Map<String, Integer> counts = new LinkedHashMap<>();
        for (SteadyMode m : SteadyMode.values()) {
            counts.put(m.label(), 0);
        }
        int undetermined = 0;
        for (OddsResult.Run r : runs) {
            counts.merge(r.mode(), 1, Integer::sum);
            if (r.mode().equals(SteadyMode.UNDETERMINED.label())) {
                undetermined++;
            }
        }
        double planning = planning(ci);
        List<OddsResult.Needed> needed = new ArrayList<>();
        for (double h : COMMON_HALF_WIDTHS) {
            needed.add(new OddsResult.Needed(h, BinomialInterval.runsNeeded(planning, h, s.confidence())));
        }
        if (!Double.isNaN(s.precision())) {
            boolean listed = false;
            for (double h : COMMON_HALF_WIDTHS) {
                listed |= h == s.precision();
            }
            if (!listed) {
                needed.add(new OddsResult.Needed(s.precision(), BinomialInterval.runsNeeded(planning, s.precision(), s.confidence())));
            }
        }
        List<OddsResult.Checkpoint> running = new ArrayList<>();
        int step = Math.max(1, n / CHECKPOINTS);
        int kk = 0;
        for (int i = 0; i < n; i++) {
            kk += isFerro(runs.get(i)) ? 1 : 0;
            int m = i + 1;
            if (m % step == 0 || m == n) {
                BinomialInterval.Interval ic = BinomialInterval.of(kk, m, s.confidence(), s.method());
                running.add(new OddsResult.Checkpoint(m, (double) kk / m, ic.lower(), ic.upper()));
            }
        }
        notes.add("Switching instant uniform over the source period; residual flux uniform in [-" + s.residualFlux() + ", "
                + s.residualFlux() + "] pu of rated peak flux; terminal voltage zero at switching. Real breakers favour some "
                + "instants (pre-strike, current zero): the estimate is for random switching.");
        notes.add("Undetermined runs count as ferroresonant (" + undetermined + " of " + n + "), the conservative side.");
        if (undetermined > 0) {
            notes.add("Without the undetermined runs the estimate would be " + String.format("%.4g", (double) (k - undetermined)
                    / Math.max(1, n - undetermined)) + ".");
        }
        return new OddsResult(title, length, voltage, s.seed(), n, first, k, undetermined, counts, (double) k / n, ci,
                s.precision(), Double.isNaN(s.precision()) ? null : ci.halfWidth() <= s.precision(), planning,
                BinomialInterval.z(s.confidence()), needed, s.residualFlux(), runs, running, notes);
    }

    /** The point of the interval nearest 1/2: where p(1-p) is largest, so the runs needed are not underestimated. */
    static double planning(BinomialInterval.Interval ci) {
        return Math.max(ci.lower(), Math.min(ci.upper(), 0.5));
    }

    private static List<OddsResult.Run> batch(EquivalentCircuit c, OddsSettings s, int from, int to, CellExecutor executor) {
        double fluxBase = c.ratedPeak() / c.omega();
        return IndexedRuns.map(to - from, j -> {
            int i = from + j;
            double[] d = draws(s.seed(), i, s.residualFlux());
            SimulationResult r = Simulator.simulate(c, s.simulation().withSourceAngle(d[0]).withInitialState(d[1] * fluxBase, 0.0));
            return new OddsResult.Run(i, d[0], d[1], r.mode().label(), r.period(), r.peakPerUnit());
        }, executor, 1);
    }

    private static boolean isFerro(OddsResult.Run r) {
        SteadyMode m = mode(r.mode());
        return SwitchingEnsemble.isFerroresonant(m) || m == SteadyMode.UNDETERMINED;
    }

    private static int ferroresonant(List<OddsResult.Run> runs) {
        int k = 0;
        for (OddsResult.Run r : runs) {
            k += isFerro(r) ? 1 : 0;
        }
        return k;
    }

    private static SteadyMode mode(String label) {
        for (SteadyMode m : SteadyMode.values()) {
            if (m.label().equals(label)) {
                return m;
            }
        }
        return SteadyMode.UNDETERMINED;
    }
}
