package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

/** What the single-phase simulation records besides its verdict: the event record and the section. */
class SimulatorRecordTest {

    /** The peer's circuit at 10 kV, where it settles on its normal state (no chaotic transient). */
    static final EquivalentCircuit CIRCUIT = SimulationBenchmark.peerCircuit(10e3);

    @Test
    void eventRecordStartsAtTheSwitchingStateAndFollowsTheTrajectory() {
        double flux = 20.0;
        double volt = -3000.0;
        SimulationSettings s = SimulationSettings.defaults().withInitialState(flux, volt).withEventPeriods(3);
        SimulationResult r = Simulator.simulate(CIRCUIT, s);
        Waveform ev = r.event();
        int spp = s.samplesPerPeriod();
        assertEquals(3 * spp + 1, ev.size());
        assertEquals(0.0, ev.time()[0], 0.0);
        assertEquals(flux, ev.flux()[0], 0.0);
        assertEquals(volt, ev.voltage()[0], 0.0);
        double period = 1 / 60.0;
        assertEquals(3 * period, ev.time()[ev.size() - 1], 1e-12);
        for (int k = 1; k <= 3; k++) {
            // the record at t = k T is the stroboscopic sample k of the same trajectory, read from the
            // dense output (7th order) of the step that ends there: 1e-7 of the rated peak
            assertEquals(r.strobeVoltage()[k], ev.voltage()[k * spp], 1e-7 * CIRCUIT.ratedPeak());
            assertEquals(r.strobeFlux()[k], ev.flux()[k * spp], 1e-7 * CIRCUIT.ratedPeak() / CIRCUIT.omega());
        }
    }

    @Test
    void sectionOfAPeriodicStateIsItsOrbit() {
        SimulationResult r = Simulator.simulate(CIRCUIT, SimulationSettings.defaults());
        assertTrue(r.certified(), r.reason());
        assertEquals(r.period(), r.section().size());
        // the orbit's point starts the settled window, and the trajectory's last sample is near it
        assertEquals(r.window().voltage()[0], r.section().voltage()[0], 0.0);
        assertEquals(r.window().flux()[0], r.section().flux()[0], 0.0);
        int last = r.strobeVoltage().length - 1;
        // within the certifier's capture radius (0.25 pu)
        assertEquals(r.section().voltage()[0], r.strobeVoltage()[last], OrbitCertifier.CAPTURE_RADIUS * CIRCUIT.ratedPeak());
    }

    @Test
    void noEventRecordWhenNoneIsAsked() {
        SimulationResult r = Simulator.simulate(EquivalentCircuit.of(1.0, 1.0, 1.0, 0.0, new PolynomialCurve(1, 0.1, 3))
                .withCoreLossResistance(5.0), SimulationSettings.defaults().withEventPeriods(0).withMaxPeriods(50));
        assertEquals(0, r.event().size());
    }
}
