package org.ferromap.dynamics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.circuit.NetworkResult;
import org.ferromap.circuit.NetworkSimulation;
import org.ferromap.circuit.NetworkSimulationSettings;
import org.ferromap.circuit.SwitchPlan;
import org.ferromap.circuit.ThreePhaseNetwork;
import org.ferromap.circuit.WindingBranch;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.PolynomialCurve;
import org.junit.jupiter.api.Test;

/**
 * The chunked three-phase run against one uninterrupted run of the same network, and its
 * classification on the exact grounded-wye case. Equipment invented as input only: an 11 kV
 * bank, nine-power core, 3 km of belted cable with r = 1/3.
 */
class NetworkSimulatorTest {

    static final double W = 2 * Math.PI * 50;
    static final double E = 11e3 * Math.sqrt(2.0 / 3.0);

    static ThreePhaseNetwork network(double rc) {
        return ThreePhaseNetwork.of(W, E, 0.9e-6, 0.3e-6, Connection.GROUNDED_WYE,
                WindingBranch.withLoss(new PolynomialCurve(0.0093, 4.9e-15, 9), rc)).withSourceAngle(0.7);
    }

    @Test
    void chunksStitchIntoTheUninterruptedRun() {
        // Lightly damped (R = 2 MOhm a winding): no recurrence within 60 periods, so every chunk runs.
        ThreePhaseNetwork net = network(2e6);
        SwitchPlan plan = SwitchPlan.openAt(0.013, 0);
        double tol = 1e-10;
        NetworkSimulationSettings s = NetworkSimulationSettings.defaults().withSamplesPerPeriod(64).withRecordedPeriods(8)
                .withRelativeTolerance(tol).withAbsoluteTolerance(tol);
        SimulationSettings rules = SimulationSettings.defaults().withTransientPeriods(5).withMaxPeriods(60);
        NetworkSimulator.Outcome o = NetworkSimulator.simulate(net, plan, OpenPhaseCase.ONE, s, rules, E);
        assertEquals(60, o.periodsSimulated(), o.state().reason());
        NetworkResult whole = NetworkSimulation.run(net, plan, s.withPeriods(60));
        NetworkResult r = o.run();
        assertEquals(61, r.strobeTimes().length);
        assertEquals(0.013, r.openingTimes()[0], 1e-12);
        for (int k = 0; k <= 60; k++) {
            assertEquals(whole.strobeTimes()[k], r.strobeTimes()[k], 1e-12);
            for (int i = 0; i < 6; i++) {
                double scale = r.layout().scale(i);
                // 1e-6 pu: both integrate to 1e-10 but restart the step control at each chunk's start
                assertEquals(whole.strobes()[i][k], r.strobes()[i][k], 1e-6 * scale, "component " + i + " at " + k);
            }
        }
        // the last window at the end of the run, the event record from the first chunk
        assertEquals(whole.time()[0], r.time()[0], 1e-12);
        assertEquals(whole.time()[whole.time().length - 1], r.time()[r.time().length - 1], 1e-12);
        assertEquals(whole.eventTime().length, r.eventTime().length);
        assertEquals(whole.eventTime()[0], r.eventTime()[0], 1e-12);
    }

    @Test
    void stopsOnceTheStateRepeats() {
        // Heavily damped (R = 40 kOhm): settles within a few tens of periods.
        ThreePhaseNetwork net = network(4e4);
        NetworkSimulationSettings s = NetworkSimulationSettings.defaults().withSamplesPerPeriod(128).withRecordedPeriods(16);
        SimulationSettings rules = SimulationSettings.defaults().withTransientPeriods(10).withMaxPeriods(2000);
        NetworkSimulator.Outcome o = NetworkSimulator.simulate(net, SwitchPlan.openAt(0.0, 0), OpenPhaseCase.ONE, s,
                rules, E);
        assertTrue(o.periodsSimulated() < 2000, "stopped early");
        assertEquals(1, o.state().period(), o.state().reason());
        assertTrue(o.state().recurrenceResidual() <= NetworkClassifier.RECURRENCE_TOLERANCE);
        assertEquals(1, o.state().section().size());
        assertTrue(o.state().method().contains("recurrence"));
    }
}
