package org.ferromap.circuit;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.Transformer;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The full three-phase lumped network of the open-phase event (DOMAIN.md §1.2 before reduction):
 * a balanced source, a three-pole switch at the source end of the cable, the cable as a
 * capacitance matrix at the transformer-side nodes, and a bank of three windings.
 *
 * <pre>
 *   source phase k --pole k--+-- node k --Ccs-- ground
 *                            |     |
 *                            |    Ccc to each other node (belted cable; 0 when screened)
 *                            |
 *                         winding(s): grounded wye  k - ground
 *                                     ungrounded wye k - neutral
 *                                     delta          a-b, b-c, c-a
 * </pre>
 *
 * Source: e_k(t) = E sin(omega t + phi - 2 pi k / 3), k = 0, 1, 2 for phases a, b, c. Each winding
 * is a {@link WindingBranch}: the magnetizing curve, core loss and load in parallel, in the
 * winding's own flux linkage and current (delta windings sit between line terminals).
 *
 * <p><b>The ungrounded-wye neutral.</b> The neutral has no cable capacitance. With
 * {@code neutralCapacitance = 0} (the default) it is treated as a node that carries no charge:
 * its voltage follows from the current balance at every instant (see {@link NetworkEquations}),
 * which is the exact limit of a vanishing stray capacitance and adds no fast dynamics of its own.
 * A positive value models a stray capacitance from the neutral to ground as one more state.
 * Physically it is of the order of the winding's capacitance to the tank, far below the cable's;
 * {@link #SUGGESTED_NEUTRAL_FRACTION} of Ccs is a value whose effect stays near 0.02 % of the
 * open-phase voltage (the network tests show halving, doubling or removing it moves the peak by
 * less than 0.1 %). A stray capacitance makes the equations stiff (it charges through the core-loss
 * resistance in 1/(3 G/Cn), and rings against the saturated windings), the smaller the stiffer:
 * at 1e-3 Ccs the explicit integrator needs several times the steps of the quasi-static neutral,
 * which is why the quasi-static neutral is the default.
 *
 * <p><b>Cost note.</b> Even without stray capacitance, an ungrounded wye with core loss has one
 * fast mode: the common (zero-sequence) flux of the three windings relaxes at R/L, which for a
 * saturated core and a high core-loss resistance is thousands of times the source frequency. The
 * explicit integrator follows it with short steps during saturation: accuracy is kept, run time
 * grows (up to some 1e5 evaluations per period for R/X_m ~ 200 in deep saturation).
 *
 * <p>SI throughout. Immutable; {@code withX} methods return changed copies.
 *
 * @param omega angular frequency of the source, rad/s, &gt; 0
 * @param sourcePeak peak phase-to-neutral source voltage E, V, &gt; 0 (the per-unit voltage base)
 * @param sourceAngle phi, the angle of phase a at t = 0, rad
 * @param coreToSheathCapacitance Ccs, each core to its sheath (ground), F, &gt; 0
 * @param coreToCoreCapacitance Ccc, between each pair of cores, F, &gt;= 0 (0 for screened cable)
 * @param connection primary connection of the bank
 * @param windings the three windings: phases a, b, c for wye primaries; a-b, b-c, c-a for delta
 * @param neutralCapacitance stray capacitance neutral to ground, F, &gt;= 0; only used for an
 *        ungrounded-wye primary; 0 selects the quasi-static neutral
 */
public record ThreePhaseNetwork(
        double omega,
        double sourcePeak,
        double sourceAngle,
        double coreToSheathCapacitance,
        double coreToCoreCapacitance,
        Connection connection,
        List<WindingBranch> windings,
        double neutralCapacitance) {

    /** Phase names in state order. */
    static final String[] PHASES = {"a", "b", "c"};

    /**
     * A suggested neutral stray capacitance as a fraction of Ccs, for studies that want the
     * neutral as a state: 1e-3. Small enough that halving, doubling or removing it moves the
     * open-phase voltage by less than 0.1 % (shown in the network tests), large enough to keep the
     * added stiffness moderate (each halving roughly doubles the integration cost).
     * A modelling choice, no source.
     */
    public static final double SUGGESTED_NEUTRAL_FRACTION = 1e-3;

    public ThreePhaseNetwork {
        requireFinitePositive("omega", omega, "rad/s");
        requireFinitePositive("source peak", sourcePeak, "V");
        if (!Double.isFinite(sourceAngle)) {
            throw bad("source angle", sourceAngle, "a finite angle in rad");
        }
        requireFinitePositive("core-to-sheath capacitance", coreToSheathCapacitance, "F");
        if (!(coreToCoreCapacitance >= 0) || Double.isInfinite(coreToCoreCapacitance)) {
            throw bad("core-to-core capacitance", coreToCoreCapacitance, "a finite value >= 0 F");
        }
        if (connection == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "the bank has no primary connection");
        }
        if (windings == null || windings.size() != 3) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the bank needs exactly 3 windings; got "
                    + (windings == null ? "none" : windings.size()));
        }
        for (WindingBranch w : windings) {
            if (w == null) {
                throw new FerromapException(MessageKey.MISSING_KEY, "a winding of the bank is missing");
            }
        }
        windings = List.copyOf(windings);
        if (!(neutralCapacitance >= 0) || Double.isInfinite(neutralCapacitance)) {
            throw bad("neutral stray capacitance", neutralCapacitance, "a finite value >= 0 F");
        }
    }

    /** A network with three identical windings, source angle 0 and the quasi-static neutral. */
    public static ThreePhaseNetwork of(double omega, double sourcePeak, double ccs, double ccc,
            Connection connection, WindingBranch winding) {
        return new ThreePhaseNetwork(omega, sourcePeak, 0.0, ccs, ccc, connection,
                List.of(winding, winding, winding), 0.0);
    }

    /**
     * The network of an installation: the supply's phase-to-neutral peak and phase-a angle, the
     * whole run's Ccs and Ccc, the bank's connection, and on each of the three windings the
     * transformer's winding curve (as connected) with the winding's core-loss resistance
     * R_w = 3 V_w^2 / P (each winding dissipates a third of the no-load loss P at its rated rms
     * voltage V_w; infinite when P = 0), unloaded, with the quasi-static neutral. A multi-legged
     * core is represented as three separate cores: its magnetic coupling is not modelled here either.
     */
    public static ThreePhaseNetwork of(Installation in) {
        Transformer t = in.transformer();
        double vw = t.windingVoltage();
        double rw = t.noLoadLoss() > 0 ? 3.0 * vw * vw / t.noLoadLoss() : Double.POSITIVE_INFINITY;
        WindingBranch w = WindingBranch.withLoss(t.phaseCurve(), rw);
        return new ThreePhaseNetwork(in.omega(), in.sourcePhasePeak(), in.sourceAngle(), in.coreToSheath(),
                in.coreToCore(), t.connection(), List.of(w, w, w), 0.0);
    }

    /** r = Ccc / Ccs, the cable's core-to-core ratio (DOMAIN.md §1.2). */
    public double capacitanceRatio() {
        return coreToCoreCapacitance / coreToSheathCapacitance;
    }

    /** Source period 2 pi / omega, s. */
    public double period() {
        return 2 * Math.PI / omega;
    }

    /** The per-unit bases of the integrated equations. */
    public NetworkPerUnit perUnit() {
        return new NetworkPerUnit(sourcePeak, omega, coreToSheathCapacitance);
    }

    /** Whether the neutral voltage is a state (ungrounded wye with a positive stray capacitance). */
    public boolean hasNeutralState() {
        return connection == Connection.UNGROUNDED_WYE && neutralCapacitance > 0;
    }

    /** Number of state components: 3 flux linkages, 3 node voltages, and the neutral when it is a state. */
    public int dimension() {
        return hasNeutralState() ? 7 : 6;
    }

    /** Name of winding {@code w}: the phase for wye primaries, the terminal pair ("ab", "bc", "ca") for delta. */
    public String windingName(int w) {
        return connection == Connection.DELTA ? PHASES[w] + PHASES[(w + 1) % 3] : PHASES[w];
    }

    /**
     * The state layout: lambda_w (Wb-turn, scale V/omega) for the three windings, v_a, v_b, v_c
     * (V, scale E), then v_n (V, scale E) when the neutral is a state.
     */
    public StateLayout stateLayout() {
        NetworkPerUnit pu = perUnit();
        List<StateLayout.Component> c = new ArrayList<>();
        for (int w = 0; w < 3; w++) {
            c.add(new StateLayout.Component("lambda_" + windingName(w), "Wb-turn", pu.flux()));
        }
        for (int k = 0; k < 3; k++) {
            c.add(new StateLayout.Component("v_" + PHASES[k], "V", pu.voltage()));
        }
        if (hasNeutralState()) {
            c.add(new StateLayout.Component("v_n", "V", pu.voltage()));
        }
        return new StateLayout(c);
    }

    /** Fresh equations with every pole closed. One instance per integration: it holds the pole states. */
    public NetworkEquations equations() {
        return new NetworkEquations(this);
    }

    /**
     * The SI state of the energized bank at time t, every pole closed: node voltages on the source,
     * flux linkages on their sinusoidal steady state without offset (plus, for an ungrounded wye,
     * the common flux that makes the winding currents sum to zero), neutral at its consistent value.
     */
    public double[] energizedState(double t) {
        NetworkEquations eq = equations();
        return stateLayout().toSi(eq.energizedState(omega * t));
    }

    public ThreePhaseNetwork withOmega(double v) {
        return new ThreePhaseNetwork(v, sourcePeak, sourceAngle, coreToSheathCapacitance, coreToCoreCapacitance,
                connection, windings, neutralCapacitance);
    }

    public ThreePhaseNetwork withSourcePeak(double v) {
        return new ThreePhaseNetwork(omega, v, sourceAngle, coreToSheathCapacitance, coreToCoreCapacitance,
                connection, windings, neutralCapacitance);
    }

    public ThreePhaseNetwork withSourceAngle(double rad) {
        return new ThreePhaseNetwork(omega, sourcePeak, rad, coreToSheathCapacitance, coreToCoreCapacitance,
                connection, windings, neutralCapacitance);
    }

    public ThreePhaseNetwork withCoreToSheathCapacitance(double f) {
        return new ThreePhaseNetwork(omega, sourcePeak, sourceAngle, f, coreToCoreCapacitance,
                connection, windings, neutralCapacitance);
    }

    public ThreePhaseNetwork withCoreToCoreCapacitance(double f) {
        return new ThreePhaseNetwork(omega, sourcePeak, sourceAngle, coreToSheathCapacitance, f,
                connection, windings, neutralCapacitance);
    }

    public ThreePhaseNetwork withConnection(Connection c) {
        return new ThreePhaseNetwork(omega, sourcePeak, sourceAngle, coreToSheathCapacitance, coreToCoreCapacitance,
                c, windings, neutralCapacitance);
    }

    public ThreePhaseNetwork withWindings(List<WindingBranch> w) {
        return new ThreePhaseNetwork(omega, sourcePeak, sourceAngle, coreToSheathCapacitance, coreToCoreCapacitance,
                connection, w, neutralCapacitance);
    }

    /** The same winding on all three phases. */
    public ThreePhaseNetwork withWindings(WindingBranch w) {
        return withWindings(List.of(w, w, w));
    }

    public ThreePhaseNetwork withNeutralCapacitance(double f) {
        return new ThreePhaseNetwork(omega, sourcePeak, sourceAngle, coreToSheathCapacitance, coreToCoreCapacitance,
                connection, windings, f);
    }

    private static void requireFinitePositive(String what, double v, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw bad(what, v, "a finite value > 0 " + unit);
        }
    }

    private static FerromapException bad(String what, double v, String allowed) {
        return new FerromapException(MessageKey.OUT_OF_RANGE, what + " = " + v + " is not allowed; expected " + allowed);
    }
}
