package org.ferromap.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.equipment.Cable;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.Transformer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/** The network built from an installation, and the event record of a network run. */
class NetworkOfInstallationTest {

    static final PolynomialCurve CURVE = new PolynomialCurve(0.0093, 4.9e-15, 9);

    static Installation installation(Connection c) {
        Transformer t = new Transformer(300e3, 11e3, 50, c, CoreType.SEPARATE_PHASE_CORES, 0.015, 600, CURVE);
        return new Installation(11e3, 0.3, 50, t, Cable.belted(0.3e-9, 0.1e-9), 3000, OpenPhaseCase.ONE);
    }

    /**
     * Each winding dissipates a third of the no-load loss P at its rated voltage, so its
     * resistance is 3 V_w^2 / P: V_line^2 / P for a wye winding (V_w = V_line / sqrt 3), 3 V_line^2 / P
     * for a delta winding (V_w = V_line) [der, DOMAIN.md §2 with the wye-equivalent R = V_line^2 / P].
     */
    @ParameterizedTest
    @EnumSource(Connection.class)
    void windingsCarryTheirShareOfTheNoLoadLoss(Connection c) {
        ThreePhaseNetwork n = ThreePhaseNetwork.of(installation(c));
        double expected = (c == Connection.DELTA ? 3 : 1) * 11e3 * 11e3 / 600;
        for (WindingBranch w : n.windings()) {
            assertEquals(expected, w.coreLossResistance(), 1e-9 * expected);
            assertEquals(CURVE, w.magnetizing());
        }
        // the whole run's capacitances, the supply's phase peak sqrt(2/3) V_line and its angle
        assertEquals(0.9e-6, n.coreToSheathCapacitance(), 1e-18);
        assertEquals(0.3e-6, n.coreToCoreCapacitance(), 1e-18);
        assertEquals(11e3 * Math.sqrt(2.0 / 3.0), n.sourcePeak(), 1e-9);
        assertEquals(0.3, n.sourceAngle(), 0.0);
        assertEquals(c, n.connection());
        assertEquals(2 * Math.PI * 50, n.omega(), 1e-12);
    }

    /**
     * The event record starts one period before the opening command and runs the asked periods
     * past it; before the command node a is tied to its source, so it reads e_a = E sin(w t + phi)
     * (the network's definition of the supply) to the integration tolerance.
     */
    @Test
    void eventRecordSpansTheOpening() {
        ThreePhaseNetwork n = ThreePhaseNetwork.of(installation(Connection.GROUNDED_WYE));
        double t0 = 0.035;
        int spp = 64;
        NetworkSimulationSettings s = NetworkSimulationSettings.defaults().withPeriods(10).withSamplesPerPeriod(spp)
                .withEventPeriods(3).withRelativeTolerance(1e-10).withAbsoluteTolerance(1e-10);
        NetworkResult r = NetworkSimulation.run(n, SwitchPlan.openAt(t0, 0), s);
        double period = 0.02;
        double[] t = r.eventTime();
        assertEquals(t0 - period, t[0], 1e-12);
        assertEquals(4 * spp + 1, t.length);
        assertEquals(t0 + 3 * period, t[t.length - 1], 1e-12);
        double[] va = r.eventWaveform("v_a");
        double e = n.sourcePeak();
        int checked = 0;
        for (int j = 0; j < t.length && t[j] < t0; j++) {
            // 1e-7 of E: integrated at 1e-10 and read from the dense output
            assertEquals(e * Math.sin(n.omega() * t[j] + n.sourceAngle()), va[j], 1e-7 * e);
            checked++;
        }
        assertTrue(checked >= spp, "a whole period before the command");
        // the same instants in the strobes and the record agree (t = k T falls on the record's grid)
        int k = 2;
        int j = (int) Math.round((k * period - t[0]) / period * spp);
        assertEquals(r.strobe("v_a")[k], va[j], 1e-7 * e);
    }

    @Test
    void noEventRecordWhenNoneIsAsked() {
        ThreePhaseNetwork n = ThreePhaseNetwork.of(installation(Connection.DELTA));
        NetworkResult r = NetworkSimulation.run(n, SwitchPlan.openAt(0.01, 0),
                NetworkSimulationSettings.defaults().withPeriods(3).withEventPeriods(0));
        assertEquals(0, r.eventTime().length);
    }
}
