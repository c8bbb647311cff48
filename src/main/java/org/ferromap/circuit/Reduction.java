package org.ferromap.circuit;

import org.ferromap.equipment.Cable;
import org.ferromap.equipment.CompositeCurve;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.OpenPhaseLoop;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.ScaledCurve;
import org.ferromap.equipment.Transformer;
import org.ferromap.units.Constants;

/**
 * Reduces a cable-fed bank with one or two phases open at the supply end to the single-phase loop
 * of {@link EquivalentCircuit} (DOMAIN.md §1.2 [der]).
 *
 * <h2>The linear loop</h2>
 * Supply phases E_a, E_b, E_c (positive sequence), phase a open (and b, when two are open), each
 * open core keeping its cable: Ccs from the core to the sheath, Ccc between cores. Writing the
 * nodal equations of the open terminals (and of the floating neutral, for an ungrounded wye) and
 * eliminating all but one loop voltage W gives j w C_eq W + W / (j w L_eq) = j w C_eq E_eq with
 *
 * <pre>
 * primary, case                   W (loop voltage)         C_eq           E_eq C_eq    L_eq
 * ungrounded wye or delta, 1 open V_a - (E_b + E_c)/2      Ccs + 2Ccc     +Ccs/2 E_a   1.5 Lm
 * ungrounded wye or delta, 2 open V_a - E_c (V_a = V_b)    2Ccs + 2Ccc    -2Ccs E_c    1.5 Lm
 * grounded wye, 1 open            V_a                      Ccs + 2Ccc     -Ccc E_a     Lm
 * grounded wye, 2 open (each)     V_a                      Ccs + Ccc      +Ccc E_c     Lm
 * </pre>
 *
 * Example, ungrounded wye with a open: the neutral obeys 3 V_n = V_a + E_b + E_c, so the winding
 * voltage is U = (2 V_a + E_a)/3 and W = V_a + E_a/2 = 1.5 U; the node equation of a, j w (Ccs +
 * 2Ccc) V_a + j w Ccc E_a + U/(j w Lm) = 0, becomes j w (Ccs + 2Ccc) W + W/(j w 1.5 Lm) = j w
 * (Ccs/2) E_a. The loop is winding a (current i) in series with windings b and c in parallel (i/2
 * each): 1.5 Lm, carrying the winding current. A delta's two windings from the open terminal are
 * in parallel: L_D / 2 = 1.5 Lm with L_D = 3 Lm. With two phases open the same algebra holds with
 * the roles of open and closed windings exchanged.
 *
 * <h2>The split into series and shunt capacitance</h2>
 * Only C_eq and the product E_eq C_eq enter the loop, so the circuit keeps the real supply as its
 * source (peak = supply phase peak) and puts Cs = E_eq C_eq in series, Cg = (1 - E_eq) C_eq in
 * shunt: Cs + Cg = C_eq and Cs E = C_eq E_eq E. Possible because E_eq &lt;= 1 in every row; a
 * sweep of the source voltage is then a sweep of the supply voltage. (The physical reading for one
 * open phase of an ungrounded primary: half of Ccs couples to the supply, the rest plus 2 Ccc loads
 * the loop.) A grounded wye on screened cable (r = 0) has E_eq = 0: the circuit gets source 0 and
 * Cs = C_eq, Cg = 0, and {@link OpenPhaseLoop#driven()} is false.
 *
 * <h2>The magnetizing branch and the loss</h2>
 * <ul>
 *   <li>grounded wye, separate cores: the winding curve itself. EXACT (for two open phases, exact
 *       for the symmetric state V_a = V_b, which is the one the supply drives).</li>
 *   <li>ungrounded wye, 1 open: L_eq = 1.5 Lm as {@code new ScaledCurve(curve, 1.5, 1.0)}, flux
 *       scaled, current unchanged. LINEAR_ONLY: windings b and c carry their own excitation from
 *       the supply, so the loop is not closed in the nonlinear range (DOMAIN.md §1.2); simulate the
 *       three-phase network to confirm.</li>
 *   <li>ungrounded wye, 2 open: the floating-wye composite lambda_eq(i) = lambda(i) + lambda(i/2),
 *       {@link CompositeCurve#floatingWye}: winding c carries the loop current, a and b half each,
 *       and nothing else drives them. EXACT for the symmetric state. In the linear range it equals
 *       1.5 Lm; in saturation both terms approach the knee flux, so the composite's knee lies near
 *       twice the winding's knee flux (not 1.5 times, as the scaled curve would put it), and its
 *       air-core slope is 1.5 L_air. The 1.5 Lm scaled curve thus saturates early: conservative.</li>
 *   <li>delta, 1 or 2 open: the two delta windings from the open terminal(s) to the closed line in
 *       parallel, lambda_eq(i) = lambda_D(i/2), {@code new ScaledCurve(deltaCurve, 1.0, 2.0)}; 1.5 Lm
 *       in the linear range. EXACT for two open phases (both windings see exactly W); LINEAR_ONLY
 *       for one (each winding also sees half the closed line voltage).</li>
 *   <li>three- or five-legged cores: the same rows, but CORE_COUPLING_IGNORED: the shared yokes
 *       back-feed the open phase (DOMAIN.md §1.2 [mem: Mork 1999; Walling et al. 1993]), which needs
 *       a duality core model this reduction does not have.</li>
 * </ul>
 * The core-loss resistance per phase R = V_line^2 / P (3 V_phase^2 / P) combines like the
 * inductance: R_eq = 1.5 R for ungrounded primaries, R for grounded wye. That is exact for the
 * linear network; in saturation the split of current between each winding's resistance and
 * inductance differs from winding to winding, so the lumped R_eq is an approximation even in the
 * rows marked EXACT.
 *
 * <h2>Per unit</h2>
 * {@code ratedPeak} of the circuit is the loop voltage at which the loop's curve sits at the
 * winding's rated flux: the rated phase-to-neutral peak times 1 (grounded wye), 1.5 (ungrounded
 * wye) or sqrt(3) (delta, whose loop spans one winding). See {@link ReducedCircuit#loopVoltageRatio()}.
 */
public final class Reduction {

    private Reduction() {
    }

    /** Reduces with the supply's phase a at angle 0. */
    public static ReducedCircuit reduce(double sourceLineVoltage, double frequency, Transformer transformer,
                                        Cable cable, double length, OpenPhaseCase openPhases) {
        return reduce(new Installation(sourceLineVoltage, 0.0, frequency, transformer, cable, length, openPhases));
    }

    /** Reduces an installation, forming the loop's magnetizing curve from the transformer's winding curve. */
    public static ReducedCircuit reduce(Installation in) {
        return reduce(in, loopCurve(in.transformer(), in.openPhases()));
    }

    /**
     * Reduces an installation with a loop curve supplied by the caller (a fitted or measured loop
     * characteristic, or a linear stand-in for checks); everything else as {@link #reduce(Installation)}.
     */
    public static ReducedCircuit reduce(Installation in, SaturationCurve loopCurve) {
        Transformer t = in.transformer();
        Connection conn = t.connection();
        OpenPhaseLoop loop = in.loop();
        double ratio = loopVoltageRatio(conn);
        double rEq = loop.inductanceFactor() * t.coreLossResistance();

        double sourcePeak;
        double cs;
        double cg;
        if (loop.driven()) {
            sourcePeak = in.sourcePhasePeak();
            cs = loop.seriesCapacitance();
            cg = loop.shuntCapacitance();
        } else {
            sourcePeak = 0.0;
            cs = loop.capacitance();
            cg = 0.0;
        }
        Exactness exactness = exactness(conn, t.core(), in.openPhases());
        EquivalentCircuit circuit = new EquivalentCircuit(in.omega(), sourcePeak,
                normalizeAngle(in.sourceAngle() + loop.sourceAngleShift()), cs, cg, rEq,
                Double.POSITIVE_INFINITY, loopCurve, exactness, ratio * t.ratedPhasePeak());
        return new ReducedCircuit(circuit, loop, ratio, curveModel(conn, in.openPhases()),
                explain(in, loop, exactness));
    }

    /**
     * The loop's magnetizing curve for a case, from the transformer's winding curve (see the class
     * notes): the winding curve (grounded wye), 1.5 Lm scaled (ungrounded wye, 1 open), the
     * floating-wye composite (ungrounded wye, 2 open), two delta windings in parallel (delta).
     */
    public static SaturationCurve loopCurve(Transformer t, OpenPhaseCase open) {
        SaturationCurve winding = t.phaseCurve();
        return switch (t.connection()) {
            case GROUNDED_WYE -> winding;
            case UNGROUNDED_WYE -> open.openPhases() == 1
                    ? new ScaledCurve(winding, 1.5, 1.0)
                    : CompositeCurve.floatingWye(winding);
            case DELTA -> new ScaledCurve(winding, 1.0, 2.0);
        };
    }

    /** How faithful the reduction is for a connection, core and case (see the class notes). */
    public static Exactness exactness(Connection conn, CoreType core, OpenPhaseCase open) {
        if (core != CoreType.SEPARATE_PHASE_CORES) {
            return Exactness.CORE_COUPLING_IGNORED;
        }
        if (conn == Connection.GROUNDED_WYE || open.openPhases() == 2) {
            return Exactness.EXACT;
        }
        return Exactness.LINEAR_ONLY;
    }

    /**
     * The loop voltage W of the table in the class notes, read from the three-phase network: W =
     * v_a + sum_k w_k e_k, with v_a the open phase a's node voltage and e_k the supply phases;
     * returns {w_a, w_b, w_c}. Grounded wye: W = v_a (each open phase's own node). Ungrounded wye
     * or delta, one open: W = v_a - (e_b + e_c)/2; two open (a and b): W = v_a - e_c. The loop's
     * source is E_eq times the supply at its phase a angle plus {@link OpenPhaseLoop#sourceAngleShift()},
     * so on the normal (inductive) branch W's fundamental is in phase with it and on the
     * ferroresonant (capacitive) branch in antiphase.
     */
    public static double[] loopSourceWeights(Connection conn, OpenPhaseCase open) {
        if (conn == Connection.GROUNDED_WYE) {
            return new double[] {0, 0, 0};
        }
        return open.openPhases() == 1 ? new double[] {0, -0.5, -0.5} : new double[] {0, 0, -1};
    }

    /** Loop voltage at rated excitation over the rated phase-to-neutral voltage (see {@link ReducedCircuit}). */
    public static double loopVoltageRatio(Connection conn) {
        return switch (conn) {
            case GROUNDED_WYE -> 1.0;
            case UNGROUNDED_WYE -> 1.5;
            case DELTA -> Constants.SQRT3;
        };
    }

    private static String curveModel(Connection conn, OpenPhaseCase open) {
        return switch (conn) {
            case GROUNDED_WYE -> "Lm: the winding curve itself";
            case UNGROUNDED_WYE -> open.openPhases() == 1
                    ? "1.5 Lm: the winding curve with its flux scaled by 1.5"
                    : "floating-wye composite lambda(i) + lambda(i/2), 1.5 Lm in the linear range";
            case DELTA -> "two delta windings in parallel, lambda_D(i/2), 1.5 Lm (wye-equivalent) in the linear range";
        };
    }

    private static String explain(Installation in, OpenPhaseLoop loop, Exactness exactness) {
        Connection conn = in.transformer().connection();
        int open = in.openPhases().openPhases();
        String row = switch (conn) {
            case GROUNDED_WYE -> open == 1 ? "E_eq = r/(1+2r), C_eq = Ccs + 2Ccc, L_eq = Lm"
                    : "E_eq = r/(1+r), C_eq = Ccs + Ccc, L_eq = Lm (each open phase)";
            case UNGROUNDED_WYE, DELTA -> open == 1 ? "E_eq = 0.5/(1+2r), C_eq = Ccs + 2Ccc, L_eq = 1.5 Lm"
                    : "E_eq = 1/(1+r), C_eq = 2(Ccs + Ccc), L_eq = 1.5 Lm";
        };
        String connName = switch (conn) {
            case GROUNDED_WYE -> "grounded wye";
            case UNGROUNDED_WYE -> "ungrounded wye";
            case DELTA -> "delta";
        };
        return String.format("%s primary, %d open phase%s, r = %.3g: %s; here E_eq = %.4g pu, C_eq = %.4g uF%s. %s.",
                connName, open, open == 1 ? "" : "s", in.cable().ratio(), row, loop.sourceFraction(),
                loop.capacitance() * 1e6, loop.driven() ? "" : " (no drive: the open phase is not coupled to the supply)",
                capitalize(exactness.explanation()));
    }

    private static String capitalize(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    /** Angle in (-pi, pi]. */
    static double normalizeAngle(double a) {
        double x = Math.IEEEremainder(a, 2 * Math.PI);
        return x <= -Math.PI ? x + 2 * Math.PI : x;
    }
}
