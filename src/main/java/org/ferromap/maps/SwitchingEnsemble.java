package org.ferromap.maps;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A fixed set of switching events simulated on one circuit: {@code angles} source angles at
 * switching, 2 pi k / angles for k = 0 .. angles-1, each with every residual flux (0 once, each
 * r &gt; 0 as +r and -r), the terminal voltage zero at switching (the open phase was dead).
 *
 * <p>Mirror symmetry: saturation curves are odd, so the event at angle phi + pi with residual flux
 * -r is the mirror image (lambda, v) -&gt; (-lambda, -v) of the event at phi with +r: same mode,
 * same peak. With an even number of angles only the first half is simulated and each result
 * counts for its mirror too.
 *
 * @param angles         switching angles, 1 to 720
 * @param residualFluxes residual flux magnitudes at switching, per unit of the circuit's rated peak
 *                       flux (ratedPeak / omega), each in [0, 2)
 * @param simulation     how each event is simulated (its source angle and initial state are set per event)
 */
public record SwitchingEnsemble(int angles, double[] residualFluxes, SimulationSettings simulation) {

    /** Longest simulation of one event by default, source periods: lightly damped cases certify within a few hundred. */
    public static final int DEFAULT_MAX_PERIODS = 600;

    /**
     * Residual flux assumed by default, per unit of rated peak flux: 0.8 [cp, from memory: residual
     * flux of transformer cores is commonly taken up to about 80 % of rated flux; no single source].
     */
    public static final double DEFAULT_RESIDUAL_FLUX = 0.8;

    public SwitchingEnsemble {
        if (angles < 1 || angles > 720) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "switching angles = " + angles + " is not allowed; expected 1 to 720");
        }
        if (residualFluxes == null || residualFluxes.length == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "give at least one residual flux (0 for none)");
        }
        residualFluxes = residualFluxes.clone();
        for (double r : residualFluxes) {
            if (!(r >= 0 && r < 2)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, "residual flux " + r
                        + " pu is not allowed; expected a magnitude from 0 to below 2 pu of the rated peak flux");
            }
        }
        if (simulation == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "an ensemble needs its simulation settings");
        }
    }

    /** The default simulation of one event: the documented defaults, at most 600 periods, tolerance 1e-8. */
    public static SimulationSettings defaultSimulation() {
        return SimulationSettings.defaults().withMaxPeriods(DEFAULT_MAX_PERIODS).withTolerance(1e-8);
    }

    /** 8 angles, residual flux 0 and +-0.8 pu, the default simulation. */
    public static SwitchingEnsemble defaults() {
        return new SwitchingEnsemble(8, new double[] {0, DEFAULT_RESIDUAL_FLUX}, defaultSimulation());
    }

    @Override
    public double[] residualFluxes() {
        return residualFluxes.clone();
    }

    public SwitchingEnsemble withAngles(int n) {
        return new SwitchingEnsemble(n, residualFluxes, simulation);
    }

    public SwitchingEnsemble withResidualFluxes(double... r) {
        return new SwitchingEnsemble(angles, r, simulation);
    }

    public SwitchingEnsemble withSimulation(SimulationSettings s) {
        return new SwitchingEnsemble(angles, residualFluxes, s);
    }

    /** Signed residual fluxes at one angle, pu: 0, then +r, -r for each r &gt; 0. */
    public double[] signedFluxes() {
        List<Double> out = new ArrayList<>();
        for (double r : residualFluxes) {
            if (!out.contains(r)) {
                out.add(r);
                if (r != 0) {
                    out.add(-r);
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Number of switching events. */
    public int events() {
        return angles * signedFluxes().length;
    }

    /** One line for reports. */
    public String describe() {
        return angles + " switching angles x residual flux " + java.util.Arrays.toString(signedFluxes()) + " pu = " + events()
                + " events, at most " + simulation.maxPeriods() + " periods each";
    }

    /** Whether a settled mode is ferroresonance (anything but the normal state; undetermined apart). */
    public static boolean isFerroresonant(SteadyMode m) {
        return m == SteadyMode.FUNDAMENTAL || m == SteadyMode.SUBHARMONIC || m == SteadyMode.QUASI_PERIODIC
                || m == SteadyMode.CHAOTIC;
    }

    /**
     * One simulated event.
     *
     * @param angle source angle at switching, rad
     * @param residualFlux residual flux at switching, pu of rated peak flux
     * @param mode settled mode
     * @param period period in source periods (0 when not periodic)
     * @param peakPerUnit peak terminal voltage in the settled window, pu of rated peak
     * @param phase phase of the fundamental relative to the source, rad (NaN unless period 1)
     * @param mirrored whether the result was taken from the mirror event
     */
    public record Event(double angle, double residualFlux, SteadyMode mode, int period, double peakPerUnit, double phase,
                        boolean mirrored) { }

    /**
     * What an ensemble settled into.
     *
     * @param events every event, angle-major (all fluxes of angle 0 first)
     * @param counts events per mode label (every mode listed, zeros included)
     * @param ferroresonant events ending in a ferroresonant mode
     * @param undetermined events with no verdict
     * @param worstIndex index of the ferroresonant event with the highest peak, else of the highest peak; -1 if none
     */
    public record Outcome(List<Event> events, Map<String, Integer> counts, int ferroresonant, int undetermined, int worstIndex) {

        /** Whether every event settled in the normal state. */
        public boolean allNormal() {
            return ferroresonant == 0 && undetermined == 0;
        }

        /** The worst event, or null. */
        public Event worst() {
            return worstIndex < 0 ? null : events.get(worstIndex);
        }
    }

    /** Simulates every event of the ensemble on the circuit. */
    public Outcome run(EquivalentCircuit circuit, CellExecutor executor) {
        double[] fl = signedFluxes();
        int nf = fl.length;
        boolean mirror = angles % 2 == 0;
        int simulatedAngles = mirror ? angles / 2 : angles;
        double fluxBase = circuit.ratedPeak() / circuit.omega();
        List<SimulationResult> sims = IndexedRuns.map(simulatedAngles * nf, i -> {
            double angle = 2 * Math.PI * (i / nf) / angles;
            double flux = fl[i % nf] * fluxBase;
            return Simulator.simulate(circuit, simulation.withSourceAngle(angle).withInitialState(flux, 0.0));
        }, executor, 1);
        List<Event> events = new ArrayList<>(angles * nf);
        for (int k = 0; k < angles; k++) {
            for (int j = 0; j < nf; j++) {
                boolean mirrored = k >= simulatedAngles;
                int src = mirrored ? (k - simulatedAngles) * nf + mirrorIndex(fl, j) : k * nf + j;
                SimulationResult r = sims.get(src);
                events.add(new Event(2 * Math.PI * k / angles, fl[j], r.mode(), r.period(), r.peakPerUnit(), r.fundamentalPhase(),
                        mirrored));
            }
        }
        return summarise(events);
    }

    /** Index of -fl[j] among the signed fluxes. */
    private static int mirrorIndex(double[] fl, int j) {
        for (int i = 0; i < fl.length; i++) {
            if (fl[i] == -fl[j]) {
                return i;
            }
        }
        return j;
    }

    /** Counts and the worst event of a list of events. */
    public static Outcome summarise(List<Event> events) {
        Map<SteadyMode, Integer> byMode = new EnumMap<>(SteadyMode.class);
        for (SteadyMode m : SteadyMode.values()) {
            byMode.put(m, 0);
        }
        int ferro = 0;
        int undetermined = 0;
        int worst = -1;
        boolean worstFerro = false;
        double worstPeak = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < events.size(); i++) {
            Event e = events.get(i);
            byMode.merge(e.mode(), 1, Integer::sum);
            boolean f = isFerroresonant(e.mode());
            if (f) {
                ferro++;
            }
            if (e.mode() == SteadyMode.UNDETERMINED) {
                undetermined++;
            }
            double p = Double.isNaN(e.peakPerUnit()) ? Double.NEGATIVE_INFINITY : e.peakPerUnit();
            if ((f && !worstFerro) || (f == worstFerro && p > worstPeak) || worst < 0) {
                worst = i;
                worstFerro = f;
                worstPeak = p;
            }
        }
        Map<String, Integer> counts = new LinkedHashMap<>();
        byMode.forEach((m, c) -> counts.put(m.label(), c));
        return new Outcome(List.copyOf(events), counts, ferro, undetermined, worst);
    }
}
