package org.ferromap.dynamics;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.NetworkEquations;
import org.ferromap.circuit.NetworkResult;
import org.ferromap.circuit.NetworkSimulation;
import org.ferromap.circuit.NetworkSimulationSettings;
import org.ferromap.circuit.StateLayout;
import org.ferromap.circuit.SwitchPlan;
import org.ferromap.circuit.ThreePhaseNetwork;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.errors.FerromapException;

/**
 * Simulates the open-phase event on the full three-phase network and classifies the settled
 * state, stopping early once it repeats: the counterpart of {@link Simulator} for the network.
 *
 * <p>The run goes in chunks of whole source periods ({@link NetworkSimulation} runs, each
 * continuing from the last one's state with the poles as they were), and after each chunk asks
 * whether the stroboscopic samples repeat ({@link ModeRules#recurrence}, tolerance
 * {@link NetworkClassifier#RECURRENCE_TOLERANCE}); if so it stops. Otherwise it runs up to the
 * most periods allowed and classifies what it has ({@link NetworkClassifier}). The chunks are
 * stitched into one {@link NetworkResult} over the whole run: stroboscopic samples throughout,
 * the event record of the first chunk, the waveforms of the last periods.
 *
 * <p>An integration failure (step collapse, a curve failing mid-run) ends the run as
 * <b>undetermined</b> with the reason, keeping what was recorded before it; nothing is thrown for it.
 * Stateless and thread-safe: each call owns its equations.
 */
public final class NetworkSimulator {

    private NetworkSimulator() {
    }

    /**
     * What a network simulation gave.
     *
     * @param run the stitched record of the periods integrated (null when the first chunk failed)
     * @param state the classified settled state
     * @param periodsSimulated source periods integrated
     */
    public record Outcome(NetworkResult run, SettledState state, int periodsSimulated) { }

    /**
     * Simulates and classifies.
     *
     * @param network the network, energized at t = 0 (its source angle is phase a's at t = 0)
     * @param plan when the poles open (times from t = 0)
     * @param open the open-phase case the plan opens (for the loop voltage's phase rule)
     * @param settings integration settings: tolerances, samples a period (a power of two keeps the
     *        spectrum of a non-periodic window unwindowed in length), recorded periods (the window
     *        analysed at the end, and the chunk length), event periods; its {@code periods} is ignored
     * @param rules classification: {@code maxPeriods} the most periods simulated, transient periods
     *        after the last commanded opening, max order, thresholds
     * @param ratedPeak the voltage that is 1 per unit, V peak
     * @return the outcome; undetermined with the reason when the integration failed
     * @throws FerromapException only for invalid input
     */
    public static Outcome simulate(ThreePhaseNetwork network, SwitchPlan plan, OpenPhaseCase open,
            NetworkSimulationSettings settings, SimulationSettings rules, double ratedPeak) {
        int total = rules.maxPeriods();
        int window = Math.min(settings.recordedPeriods(), total);
        double period = network.period();
        // Whole periods until every commanded pole has opened (a current-zero opening may take half a period).
        double lastCommand = 0;
        boolean currentZero = false;
        for (int k = 0; k < 3; k++) {
            SwitchPlan.PoleCommand c = plan.pole(k);
            if (c.opens()) {
                lastCommand = Math.max(lastCommand, c.commandTime());
                currentZero |= c.opening() == SwitchPlan.Opening.AT_NEXT_CURRENT_ZERO;
            }
        }
        int opened = (int) Math.ceil(lastCommand / period + (currentZero ? 0.5 : 0.0) - 1e-9);
        int first = opened + rules.transientPeriods()
                + Math.max(window, Simulator.RECURRENCE_SPAN + rules.maxOrder());

        NetworkEquations eq = network.equations();
        StateLayout layout = network.stateLayout();
        double[] y = eq.energizedState(0.0);
        List<NetworkResult> chunks = new ArrayList<>();
        int done = 0;
        String failure = null;
        while (done < total) {
            int remaining = total - done;
            int length = done == 0 ? first : window;
            if (remaining - length < window) {
                length = remaining;     // the last chunk takes the rest, so the window is never cut short
            }
            NetworkSimulationSettings cs = settings.withPeriods(length).withRecordedPeriods(Math.min(window, length))
                    .withEventPeriods(done == 0 ? settings.eventPeriods() : 0);
            NetworkResult r;
            try {
                r = NetworkSimulation.run(eq, shifted(plan, done * period), y, cs);
            } catch (FerromapException e) {
                if (e.key().isInputError()) {
                    throw e;
                }
                failure = e.getMessage();
                break;
            } catch (RuntimeException e) {
                // a saturation curve or a library routine failed mid-run: the outcome, not a crash
                failure = "failure during the simulation: " + e;
                break;
            }
            chunks.add(r);
            done += length;
            y = layout.toScaled(r.finalState());
            NetworkResult all = stitch(chunks, period);
            if (done < total && repeats(all, rules)) {
                break;
            }
        }
        if (chunks.isEmpty()) {
            return new Outcome(null, failed(failure + " (in the first " + Math.min(first, total) + " periods)"), 0);
        }
        NetworkResult all = stitch(chunks, period);
        if (failure != null) {
            return new Outcome(all, failed("integration failed after " + done + " periods: " + failure), done);
        }
        return new Outcome(all, NetworkClassifier.classify(all, network, open, rules, ratedPeak), done);
    }

    /** Whether the record so far repeats after some p within the network's recurrence tolerance. */
    private static boolean repeats(NetworkResult r, SimulationSettings rules) {
        double lastOpening = Double.NaN;
        for (int k = 0; k < 3; k++) {
            if (r.isOpen(k)) {
                lastOpening = Double.isNaN(lastOpening) ? r.openingTimes()[k] : Math.max(lastOpening, r.openingTimes()[k]);
            }
        }
        if (Double.isNaN(lastOpening)) {
            return false;
        }
        int from = (int) Math.ceil(lastOpening / r.period() - 1e-9) + rules.transientPeriods();
        double[][] pu = NetworkClassifier.perUnitStrobes(r);
        return ModeRules.recurrence(pu, from, pu[0].length - 1, rules.maxOrder(),
                NetworkClassifier.RECURRENCE_TOLERANCE, Simulator.RECURRENCE_SPAN, NetworkClassifier.DISTINCT).periodic();
    }

    /** The plan with its command times measured from {@code offset}, s (commands past stay at 0). */
    private static SwitchPlan shifted(SwitchPlan plan, double offset) {
        if (offset == 0) {
            return plan;
        }
        List<SwitchPlan.PoleCommand> c = new ArrayList<>(3);
        for (int k = 0; k < 3; k++) {
            SwitchPlan.PoleCommand p = plan.pole(k);
            c.add(p.opens() ? new SwitchPlan.PoleCommand(Math.max(0.0, p.commandTime() - offset), p.opening()) : p);
        }
        return new SwitchPlan(c);
    }

    /**
     * One result over consecutive chunks: stroboscopic samples of all (times from the start of the
     * first), opening instants from the start, the event record of the first chunk, the recorded
     * window, peak, final state of the last, evaluations summed.
     */
    static NetworkResult stitch(List<NetworkResult> chunks, double period) {
        if (chunks.size() == 1) {
            return chunks.get(0);
        }
        NetworkResult head = chunks.get(0);
        NetworkResult last = chunks.get(chunks.size() - 1);
        int dim = head.layout().dimension();
        int samples = 1;
        for (NetworkResult c : chunks) {
            samples += c.strobeTimes().length - 1;
        }
        double[] times = new double[samples];
        double[][] strobes = new double[dim][samples];
        double[][] winding = new double[3][samples];
        double[] opened = {Double.NaN, Double.NaN, Double.NaN};
        int at = 0;
        double offset = 0;
        int evaluations = 0;
        for (NetworkResult c : chunks) {
            int n = c.strobeTimes().length;
            int skip = at == 0 ? 0 : 1;   // each chunk's first sample is the previous chunk's last
            for (int k = skip; k < n; k++) {
                times[at] = offset + c.strobeTimes()[k];
                for (int i = 0; i < dim; i++) {
                    strobes[i][at] = c.strobes()[i][k];
                }
                for (int w = 0; w < 3; w++) {
                    winding[w][at] = c.strobeWindingVoltages()[w][k];
                }
                at++;
            }
            for (int k = 0; k < 3; k++) {
                if (Double.isNaN(opened[k]) && c.isOpen(k)) {
                    opened[k] = offset + c.openingTimes()[k];
                }
            }
            evaluations += c.evaluations();
            offset += (n - 1) * period;
        }
        double lastStart = offset - (last.strobeTimes().length - 1) * period;
        double[] time = last.time().clone();
        for (int j = 0; j < time.length; j++) {
            time[j] += lastStart;
        }
        return new NetworkResult(head.layout(), period, opened, time, last.waveforms(), last.windingVoltages(),
                times, strobes, winding, last.peakOpenPhaseVoltage(), last.finalState(), evaluations,
                head.eventTime(), head.eventWaveforms(), head.eventWindingVoltages());
    }

    private static SettledState failed(String reason) {
        return new SettledState(SteadyMode.UNDETERMINED, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                Double.NaN, Double.NaN, Spectrum.empty(), Waveform.empty(), Waveform.empty(),
                NetworkClassifier.METHOD_NOT_PERIODIC, reason);
    }
}
