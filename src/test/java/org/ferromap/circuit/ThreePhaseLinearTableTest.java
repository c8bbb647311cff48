package org.ferromap.circuit;

import org.ferromap.equipment.LinearCurve;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.equipment.Connection;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * With linear magnetizing branches, the settled open-phase voltage of the full network equals the
 * phasor solution of the reduced series loop of DOMAIN.md §1.2 [der]: source E_eq in series with
 * C_eq, feeding L_eq in parallel with the loss resistance reduced the same way as L_eq.
 */
class ThreePhaseLinearTableTest {

    static final double OMEGA = 2 * Math.PI * 50;
    /** 11 kV system: phase-to-neutral peak, V. */
    static final double E = 11e3 * Math.sqrt(2.0 / 3.0);
    /** 1 km of a 0.25 uF/km cable, F. */
    static final double CCS = 0.25e-6;
    /** Wye-equivalent magnetizing inductance Lm, H, and core-loss resistance, ohm (per phase). */
    static final double LM = 15.0;
    static final double RM = 30e3;

    /**
     * Rows of the table in DOMAIN.md §1.2 for r = 0 and r = 0.3. The loss resistance reduces like
     * the inductance (1.5 Rm for the ungrounded primaries), since each winding's L and R sit in
     * parallel and the reduction is a linear network identity.
     * Tolerance 1e-6 of E: integrator tolerance 1e-10, and the free oscillation damped below
     * e^-20 of its start after 60 periods (decay rate G_eq/(2 omega C_eq), slowest 0.054 per
     * radian in the two-open rows with r = 0.3; 377 radians simulated).
     */
    @ParameterizedTest
    @CsvSource({
            "GROUNDED_WYE, 1, 0.0", "GROUNDED_WYE, 1, 0.3",
            "GROUNDED_WYE, 2, 0.0", "GROUNDED_WYE, 2, 0.3",
            "UNGROUNDED_WYE, 1, 0.0", "UNGROUNDED_WYE, 1, 0.3",
            "UNGROUNDED_WYE, 2, 0.0", "UNGROUNDED_WYE, 2, 0.3",
            "DELTA, 1, 0.0", "DELTA, 1, 0.3",
            "DELTA, 2, 0.0", "DELTA, 2, 0.3"})
    void settledOpenPhaseVoltageMatchesTheReducedLoop(Connection connection, int open, double r) {
        boolean grounded = connection == Connection.GROUNDED_WYE;
        // winding inductance and resistance in the winding's own terms: a delta winding between
        // line terminals is 3x the wye equivalent
        double kWinding = connection == Connection.DELTA ? 3.0 : 1.0;
        WindingBranch winding = WindingBranch.withLoss(new LinearCurve(kWinding * LM), kWinding * RM);
        ThreePhaseNetwork net = ThreePhaseNetwork.of(OMEGA, E, CCS, r * CCS, connection, winding)
                .withSourceAngle(0.4);

        // DOMAIN.md §1.2 table: E_eq magnitude, C_eq, L_eq; the sign (phase) follows from which
        // energized phases drive the loop: E_a for two open phases, -(e_b + e_c)/2 = E_a/2 for one
        double eEq;
        double cEq;
        double lEq = grounded ? LM : 1.5 * LM;
        double rEq = grounded ? RM : 1.5 * RM;
        if (open == 1) {
            eEq = grounded ? -r / (1 + 2 * r) : 0.5 / (1 + 2 * r);
            cEq = (2 * r + 1) * CCS;
        } else {
            eEq = grounded ? r / (1 + r) : -1 / (1 + r);
            cEq = grounded ? (r + 1) * CCS : 2 * (r + 1) * CCS;
        }
        // phasors as Im(P e^{j omega t}); E_a = E e^{j phi}
        double phi = net.sourceAngle();
        double[] ea = {E * Math.cos(phi), E * Math.sin(phi)};
        double[] src = {eEq * ea[0], eEq * ea[1]};
        double[] yc = {0, OMEGA * cEq};
        double[] yl = {1 / rEq, -1 / (OMEGA * lEq)};
        double[] u = mul(src, div(yc, new double[] {yc[0] + yl[0], yc[1] + yl[1]}));

        SwitchPlan plan = open == 1 ? SwitchPlan.openAt(0.0123, 0) : SwitchPlan.openAt(0.0123, 1, 2);
        NetworkResult res = NetworkSimulation.run(net, plan,
                NetworkSimulationSettings.defaults().withPeriods(60).withRecordedPeriods(2).withRelativeTolerance(1e-10)
                        .withAbsoluteTolerance(1e-10));
        double[] va = res.waveform("v_a");
        double[] vb = res.waveform("v_b");
        double[] vc = res.waveform("v_c");
        double maxErr = 0;
        for (int j = 0; j < res.time().length; j++) {
            double t = res.time()[j];
            double expected = u[0] * Math.sin(OMEGA * t) + u[1] * Math.cos(OMEGA * t);
            double measured;
            if (open == 1) {
                measured = grounded ? va[j] : va[j] - 0.5 * (vb[j] + vc[j]);
            } else {
                measured = grounded ? vb[j] : vb[j] - va[j];
                // the two open phases settle on the same voltage
                maxErr = Math.max(maxErr, Math.abs(vb[j] - vc[j]));
            }
            maxErr = Math.max(maxErr, Math.abs(measured - expected));
            if (connection == Connection.UNGROUNDED_WYE) {
                // the windings divide u like inductances [der]: one open, winding a (L) in series
                // with b and c in parallel (L/2) carries 2/3 of u; two open, the pair (L/2) in
                // series with winding a (L) puts u/3 across winding b
                double across = open == 1 ? res.windingVoltages()[0][j] : res.windingVoltages()[1][j];
                double share = open == 1 ? 2.0 / 3.0 : 1.0 / 3.0;
                maxErr = Math.max(maxErr, Math.abs(across - share * expected));
            }
        }
        System.out.printf("%s %d open r=%.1f |U|=%.5f pu  max error %.2e pu%n", connection, open, r,
                Math.hypot(u[0], u[1]) / E, maxErr / E);
        double err = maxErr;
        assertTrue(err < 1e-6 * E, () -> "max error " + err / E + " pu");
    }

    private static double[] mul(double[] a, double[] b) {
        return new double[] {a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]};
    }

    private static double[] div(double[] a, double[] b) {
        double d = b[0] * b[0] + b[1] * b[1];
        return new double[] {(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d};
    }
}
