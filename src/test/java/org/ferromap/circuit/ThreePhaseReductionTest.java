package org.ferromap.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.PolynomialCurve;
import org.hipparchus.ode.DenseOutputModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The full nonlinear network against the single-phase loop reduced by hand from DOMAIN.md §1.2
 * [der]: where the table says the reduction is exact, the two must give the same waveform;
 * where it is only linear, the test reports how far apart they land.
 *
 * <p>Equipment: an 11 kV bank (phase-to-neutral peak E = 8981 V at 50 Hz) with a nine-power
 * polynomial core, linear inductance 15 H (wye equivalent) and the saturating term equal to the
 * linear one at 1.2 times rated flux; cable 0.25 uF/km core to sheath. The numbers only have to
 * drive the core deep into saturation (peak magnetizing current tens of times its rated value), so
 * that the nonlinear reduction is really exercised; they are not test expectations.
 */
class ThreePhaseReductionTest {

    static final double W = 2 * Math.PI * 50;
    static final double E = 11e3 * Math.sqrt(2.0 / 3.0);
    /** Rated flux linkage of a wye winding, Wb-turn. */
    static final double LR = E / W;
    static final double PHI = 0.4;
    static final PolynomialCurve WYE_CURVE = new PolynomialCurve(1 / 15.0, (1 / 15.0) / Math.pow(1.2 * LR, 8), 9);
    /** A delta winding sees sqrt(3) E: same per-unit knee on its own base, 3x the inductance. */
    static final PolynomialCurve DELTA_CURVE = new PolynomialCurve(1 / 45.0,
            (1 / 45.0) / Math.pow(1.2 * Math.sqrt(3) * LR, 8), 9);

    /**
     * Tolerance of the exact cases: 1e-5 of E. Both sides are integrated to 1e-10 (network) and
     * 1e-11 (loop) relative over tens of periods of a saturating oscillation, which amplifies local
     * errors during each saturation spike; 1e-5 pu leaves that room and is still far below
     * anything an engineer would read off a waveform.
     */
    static final double EXACT_TOL = 1e-5 * E;

    static NetworkSimulationSettings settings(int periods) {
        return NetworkSimulationSettings.defaults().withPeriods(periods).withRecordedPeriods(periods)
                .withSamplesPerPeriod(64).withRelativeTolerance(1e-10).withAbsoluteTolerance(1e-10);
    }

    /**
     * Grounded wye, one phase open at an arbitrary instant, with core loss: exact from the opening
     * on. The loop: Cs = 2 Ccc to (e_b + e_c)/2 = -e_a/2, Cg = Ccs, the winding to ground.
     * Cable lengths 3 and 10 km with r = 0.3 put the open phase at about 1.3 and 1.5 pu.
     */
    @ParameterizedTest
    @ValueSource(doubles = {3.0, 10.0})
    void groundedWyeOneOpenIsExact(double km) {
        double ccs = 0.25e-6 * km;
        double r = 0.3;
        double rc = 1e5;
        ThreePhaseNetwork net = ThreePhaseNetwork.of(W, E, ccs, r * ccs, Connection.GROUNDED_WYE,
                WindingBranch.withLoss(WYE_CURVE, rc)).withSourceAngle(PHI);
        double t0 = 0.0123;
        int periods = 30;
        NetworkResult res = NetworkSimulation.run(net, SwitchPlan.openAt(t0, 0), settings(periods));
        assertEquals(t0, res.openingTimes()[0], 1e-12, "opening instant, s (event threshold 1e-10 rad)");

        ReducedLoop loop = new ReducedLoop(W, 2 * r * ccs, ccs, 1 / rc, E / 2, PHI + Math.PI, 0, 0, WYE_CURVE::current);
        // the energized grounded wye is in its exact sinusoidal steady state
        DenseOutputModel m = loop.integrate(t0, -LR * Math.cos(W * t0 + PHI), E * Math.sin(W * t0 + PHI),
                periods * res.period(), 1e-11, 1e-9);
        double d = maxDifference(res, "v_a", t0, m, t -> 0.0);
        double peak = res.peakOpenPhaseVoltage() / E;
        System.out.printf("grounded wye 1 open, %.0f km: peak %.3f pu, network vs loop max difference %.2e pu%n",
                km, peak, d / E);
        assertTrue(peak > 1.2, "the case must saturate the core to test the nonlinear reduction");
        assertTrue(d < EXACT_TOL, () -> "difference " + d / E + " pu");
    }

    /**
     * Grounded wye, two phases open with the two open phases in the same state (the table's
     * "each" row assumes it): loop Cs = Ccc to e_a, Cg = Ccs; the Ccc between the two open cores
     * carries nothing. Started symmetric with poles b and c already open.
     */
    @Test
    void groundedWyeTwoOpenSymmetricIsExact() {
        double ccs = 0.25e-6 * 10;
        double r = 0.3;
        double rc = 1e5;
        ThreePhaseNetwork net = ThreePhaseNetwork.of(W, E, ccs, r * ccs, Connection.GROUNDED_WYE,
                WindingBranch.withLoss(WYE_CURVE, rc)).withSourceAngle(PHI);
        NetworkEquations eq = net.equations();
        eq.openPole(1);
        eq.openPole(2);
        double[] y0 = eq.energizedState(0.0);
        double x0 = 1.4;   // per unit flux: starts in saturation
        double v0 = -0.3;
        y0[1] = x0;
        y0[2] = x0;
        y0[4] = v0;
        y0[5] = v0;
        int periods = 30;
        NetworkResult res = NetworkSimulation.run(eq, SwitchPlan.allClosed(), y0, settings(periods));
        ReducedLoop loop = new ReducedLoop(W, r * ccs, ccs, 1 / rc, E, PHI, 0, 0, WYE_CURVE::current);
        DenseOutputModel m = loop.integrate(0, x0 * LR, v0 * E, periods * res.period(), 1e-11, 1e-9);
        double db = maxDifference(res, "v_b", 0, m, t -> 0.0);
        double dc = maxDifference(res, "v_c", 0, m, t -> 0.0);
        System.out.printf("grounded wye 2 open symmetric: peak %.3f pu, max difference %.2e / %.2e pu%n",
                res.peakOpenPhaseVoltagePerUnit(), db / E, dc / E);
        assertTrue(db < EXACT_TOL && dc < EXACT_TOL, () -> "differences " + db / E + ", " + dc / E + " pu");
    }

    /**
     * Grounded wye, two phases opened together from the energized bank: the table's "each" loop
     * is exact only while the two open phases share one state. After a real opening they start
     * apart (different source values and fluxes) and, each being bistable, may settle in different
     * states (one ferroresonant, one not) held apart through the Ccc between them. Prints both
     * open phases' settled peaks against the symmetric loop's (started from the average of the two
     * at the opening); asserts only that the largest stays within a factor 3 of the loop's, since
     * no source gives the discrepancy.
     */
    @ParameterizedTest
    @ValueSource(doubles = {3.0, 10.0})
    void groundedWyeTwoOpenAfterARealOpeningNeedNotStaySymmetric(double km) {
        double ccs = 0.25e-6 * km;
        double r = 0.3;
        double rc = 1e5;
        ThreePhaseNetwork net = ThreePhaseNetwork.of(W, E, ccs, r * ccs, Connection.GROUNDED_WYE,
                WindingBranch.withLoss(WYE_CURVE, rc)).withSourceAngle(PHI);
        double t0 = 0.0123;
        int periods = 100;
        NetworkResult res = NetworkSimulation.run(net, SwitchPlan.openAt(t0, 1, 2),
                settings(periods).withRecordedPeriods(5).withSamplesPerPeriod(256));
        double th = W * t0 + PHI;
        double v0 = 0.5 * E * (Math.sin(th - 2 * Math.PI / 3) + Math.sin(th + 2 * Math.PI / 3));
        double l0 = -0.5 * LR * (Math.cos(th - 2 * Math.PI / 3) + Math.cos(th + 2 * Math.PI / 3));
        ReducedLoop loop = new ReducedLoop(W, r * ccs, ccs, 1 / rc, E, PHI, 0, 0, WYE_CURVE::current);
        DenseOutputModel m = loop.integrate(t0, l0, v0, periods * res.period(), 1e-11, 1e-9);
        double pb = 0;
        double pc = 0;
        double pl = 0;
        for (int j = 0; j < res.time().length; j++) {
            pb = Math.max(pb, Math.abs(res.waveform("v_b")[j]));
            pc = Math.max(pc, Math.abs(res.waveform("v_c")[j]));
            pl = Math.max(pl, Math.abs(m.getInterpolatedState(res.time()[j]).getPrimaryState()[1]));
        }
        System.out.printf("grounded wye 2 open, %.0f km, real opening: settled peaks v_b %.3f pu, v_c %.3f pu;"
                + " symmetric loop %.3f pu%n", km, pb / E, pc / E, pl / E);
        double ratio = Math.max(pb, pc) / pl;
        assertTrue(ratio < 3 && ratio > 1.0 / 3, "same order of magnitude");
    }

    /**
     * Ungrounded wye, two phases open and symmetric, lossless: the loop is Cs = 2 Ccc to e_a,
     * Cg = 2 Ccs, and the composite branch lambda_eq(I) = lambda(I) + lambda(I/2) from the pair
     * node back to e_a (the pair's windings in parallel, in series with winding a). Exact only
     * without loss: with core loss the series windings' L || R pairs do not combine into one.
     */
    @Test
    void ungroundedWyeTwoOpenSymmetricLosslessIsExactWithTheCompositeCurve() {
        double ccs = 0.25e-6 * 3;
        double r = 0.3;
        ThreePhaseNetwork net = ThreePhaseNetwork.of(W, E, ccs, r * ccs, Connection.UNGROUNDED_WYE,
                WindingBranch.lossless(WYE_CURVE)).withSourceAngle(PHI);
        NetworkEquations eq = net.equations();
        eq.openPole(1);
        eq.openPole(2);
        double[] y0 = eq.energizedState(0.0);
        double x0 = 1.2;   // at the knee
        double v0 = -0.2;
        // winding a carries the pair's current back: i_a = -2 i_b, so lambda_a = -lambda(2 i(x0))
        double lambdaA = -WYE_CURVE.fluxLinkage(2 * WYE_CURVE.current(x0 * LR)) / LR;
        y0[0] = lambdaA;
        y0[1] = x0;
        y0[2] = x0;
        y0[4] = v0;
        y0[5] = v0;
        int periods = 20;
        NetworkResult res = NetworkSimulation.run(eq, SwitchPlan.allClosed(), y0, settings(periods));
        CompositeInverse composite = new CompositeInverse(WYE_CURVE, 1.0, 0.5);
        ReducedLoop loop = new ReducedLoop(W, 2 * r * ccs, 2 * ccs, 0.0, E, PHI, E, PHI, composite);
        DenseOutputModel m = loop.integrate(0, (x0 - lambdaA) * LR, v0 * E, periods * res.period(), 1e-11, 1e-9);
        double db = maxDifference(res, "v_b", 0, m, t -> 0.0);
        double dc = maxDifference(res, "v_c", 0, m, t -> 0.0);
        double peakI = 0;
        for (double lam : res.waveform("lambda_b")) {
            peakI = Math.max(peakI, Math.abs(WYE_CURVE.current(lam)));
        }
        // the same loop with the composite replaced by the curve merely scaled to 1.5 times the
        // flux, lambda_eq(I) = 1.5 lambda(I), which agrees with it only in the linear range
        ReducedLoop scaled = new ReducedLoop(W, 2 * r * ccs, 2 * ccs, 0.0, E, PHI, E, PHI,
                lam -> WYE_CURVE.current(lam / 1.5));
        DenseOutputModel ms = scaled.integrate(0, (x0 - lambdaA) * LR, v0 * E, periods * res.period(), 1e-11, 1e-9);
        double dScaled = maxDifference(res, "v_b", 0, ms, t -> 0.0);
        System.out.printf("ungrounded wye 2 open symmetric lossless: peak %.3f pu, winding current up to %.1f x rated,"
                + " max difference %.2e / %.2e pu (with a merely scaled curve: %.2e pu)%n",
                res.peakOpenPhaseVoltagePerUnit(), peakI / (LR / 15), db / E, dc / E, dScaled / E);
        assertTrue(peakI > 3 * LR / 15, "the case must saturate the core to test the composite curve");
        assertTrue(db < EXACT_TOL && dc < EXACT_TOL, () -> "differences " + db / E + ", " + dc / E + " pu");
        // the comparison can tell the composite from a plain scaling: the latter misses by far more
        assertTrue(dScaled > 100 * EXACT_TOL, () -> "scaled-curve difference only " + dScaled / E + " pu");
    }

    /**
     * Delta, two phases open and symmetric, with core loss: windings a-b and c-a are in parallel
     * between e_a and the pair node, the b-c winding sees nothing. Loop: Cs = 2 Ccc to e_a,
     * Cg = 2 Ccs, branch current 2 i_d(lambda) + 2 G_d u back to e_a. Exact with loss, since the
     * two windings are in parallel, not in series.
     */
    @Test
    void deltaTwoOpenSymmetricIsExact() {
        double ccs = 0.25e-6 * 3;
        double r = 0.3;
        double rc = 1e5;
        ThreePhaseNetwork net = ThreePhaseNetwork.of(W, E, ccs, r * ccs, Connection.DELTA,
                WindingBranch.withLoss(DELTA_CURVE, rc)).withSourceAngle(PHI);
        NetworkEquations eq = net.equations();
        eq.openPole(1);
        eq.openPole(2);
        double[] y0 = eq.energizedState(0.0);
        double x0 = 2.5;   // per unit of E/omega; the delta's rated flux is sqrt(3) of that
        double v0 = 0.5;
        y0[0] = -x0;   // lambda_ab
        y0[1] = 0.0;   // lambda_bc
        y0[2] = x0;    // lambda_ca
        y0[4] = v0;
        y0[5] = v0;
        int periods = 30;
        NetworkResult res = NetworkSimulation.run(eq, SwitchPlan.allClosed(), y0, settings(periods));
        ReducedLoop loop = new ReducedLoop(W, 2 * r * ccs, 2 * ccs, 2 / rc, E, PHI, E, PHI,
                lam -> 2 * DELTA_CURVE.current(lam));
        DenseOutputModel m = loop.integrate(0, x0 * LR, v0 * E, periods * res.period(), 1e-11, 1e-9);
        double db = maxDifference(res, "v_b", 0, m, t -> 0.0);
        double dc = maxDifference(res, "v_c", 0, m, t -> 0.0);
        double peakI = 0;
        for (double lam : res.waveform("lambda_ca")) {
            peakI = Math.max(peakI, Math.abs(DELTA_CURVE.current(lam)));
        }
        System.out.printf("delta 2 open symmetric: peak %.3f pu, winding current up to %.1f x rated, max difference"
                + " %.2e / %.2e pu%n", res.peakOpenPhaseVoltagePerUnit(), peakI / (Math.sqrt(3) * LR / 45), db / E, dc / E);
        assertTrue(peakI > 5 * Math.sqrt(3) * LR / 45, "the case must saturate the core to test the reduction");
        assertTrue(db < EXACT_TOL && dc < EXACT_TOL, () -> "differences " + db / E + ", " + dc / E + " pu");
    }

    /**
     * Ungrounded wye and delta, one phase open: the table's reduction is exact only for the linear
     * network (the energized windings carry their own excitation). Reports the settled peak of the
     * loop voltage u = v_a - (e_b + e_c)/2 from the network and from the reduced loop with the
     * composite curve (wye: lambda(I) + lambda(I/2); delta: lambda_d(I/2)) and loss 1.5 Rc.
     *
     * <p>Asserted only loosely, and only for 1 and 3 km, where both settle on one fundamental
     * state: within a factor 1.25 of each other (no source gives the discrepancy; the band is a
     * loose bound around "exact when linear"). At 10 km the network falls into high-voltage states
     * that depend on the opening instant and even on the integration tolerance (a sign of
     * coexisting attractors and long chaotic transients) while the loop settles near 0.5 pu from
     * every instant tried: printed, not asserted.
     */
    @ParameterizedTest
    @ValueSource(strings = {"UNGROUNDED_WYE", "DELTA"})
    void oneOpenUngroundedReductionIsOnlyLinear(Connection connection) {
        boolean delta = connection == Connection.DELTA;
        double r = 0.3;
        double rcWye = 1e5;
        for (double km : new double[] {1, 3, 10}) {
            double ccs = 0.25e-6 * km;
            WindingBranch winding = delta ? WindingBranch.withLoss(DELTA_CURVE, 3 * rcWye)
                    : WindingBranch.withLoss(WYE_CURVE, rcWye);
            ThreePhaseNetwork net = ThreePhaseNetwork.of(W, E, ccs, r * ccs, connection, winding).withSourceAngle(PHI);
            double t0 = 0.0123;
            int periods = 80;
            int last = 10;
            NetworkResult res = NetworkSimulation.run(net, SwitchPlan.openAt(t0, 0),
                    settings(periods).withRecordedPeriods(last).withSamplesPerPeriod(256).withRelativeTolerance(1e-9)
                            .withAbsoluteTolerance(1e-9));
            double peakNet = 0;
            for (int j = 0; j < res.time().length; j++) {
                double u = res.waveform("v_a")[j] - 0.5 * (res.waveform("v_b")[j] + res.waveform("v_c")[j]);
                peakNet = Math.max(peakNet, Math.abs(u));
            }
            DoubleUnaryOperator branch = delta ? new CompositeInverse(DELTA_CURVE, 0.5, 0.0)
                    : new CompositeInverse(WYE_CURVE, 1.0, 0.5);
            ReducedLoop loop = new ReducedLoop(W, 2 * r * ccs, ccs, 1 / (1.5 * rcWye), E / 2, PHI + Math.PI,
                    E / 2, PHI + Math.PI, branch);
            // while energized u = 1.5 e_a, so the loop's flux starts at 1.5 times phase a's
            double tEnd = periods * res.period();
            DenseOutputModel m = loop.integrate(t0, -1.5 * LR * Math.cos(W * t0 + PHI), E * Math.sin(W * t0 + PHI),
                    tEnd, 1e-10, 1e-8);
            double peakLoop = 0;
            for (int j = 0; j <= last * 256; j++) {
                double t = tEnd - last * res.period() + j * res.period() / 256;
                double[] y = m.getInterpolatedState(Math.min(t, tEnd)).getPrimaryState();
                peakLoop = Math.max(peakLoop, Math.abs(y[1] - loop.returnVoltage(t)));
            }
            double ratio = peakLoop / peakNet;
            System.out.printf("%s 1 open, r = %.1f, %2.0f km: settled peak of u, network %.3f pu, reduced loop %.3f pu"
                    + " (loop/network %.3f); open node to ground %.3f pu%n", connection, r, km, peakNet / E,
                    peakLoop / E, ratio, res.peakOpenPhaseVoltagePerUnit());
            if (km < 5) {
                assertTrue(ratio < 1.25 && ratio > 0.8, () -> "loop/network peak ratio " + ratio);
            }
        }
    }

    /** Largest |network(t) - loop(t)| over the network's samples at or after t0, for the named node voltage. */
    static double maxDifference(NetworkResult res, String node, double t0, DenseOutputModel m, DoubleUnaryOperator offset) {
        double[] v = res.waveform(node);
        double max = 0;
        double tEnd = m.getFinalTime();
        for (int j = 0; j < res.time().length; j++) {
            double t = res.time()[j];
            if (t < t0 || t > tEnd) {
                continue;
            }
            double loop = m.getInterpolatedState(t).getPrimaryState()[1] + offset.applyAsDouble(t);
            max = Math.max(max, Math.abs(v[j] - loop));
        }
        return max;
    }
}
