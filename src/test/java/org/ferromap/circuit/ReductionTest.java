package org.ferromap.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import org.ferromap.equipment.Cable;
import org.ferromap.equipment.CompositeCurve;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.ScaledCurve;
import org.ferromap.equipment.Transformer;
import org.junit.jupiter.api.Test;

class ReductionTest {

    private static final PolynomialCurve WINDING = new PolynomialCurve(1.0 / 790.0, 1e-16, 9);

    private static Installation site(Connection c, CoreType core, Cable cable, OpenPhaseCase open) {
        Transformer t = new Transformer(500e3, 34.5e3, 60, c, core, 0.008, 450, WINDING);
        return new Installation(34.5e3, 0.0, 60, t, cable, 2500, open);
    }

    /** DOMAIN.md §1.2: which reductions are exact, which linear only, and multi-legged cores. */
    @Test
    void exactnessFollowsTheDomainNotes() {
        OpenPhaseCase one = OpenPhaseCase.ONE;
        OpenPhaseCase two = OpenPhaseCase.TWO;
        CoreType sep = CoreType.SEPARATE_PHASE_CORES;
        assertEquals(Exactness.EXACT, Reduction.exactness(Connection.GROUNDED_WYE, sep, one));
        assertEquals(Exactness.EXACT, Reduction.exactness(Connection.GROUNDED_WYE, sep, two));
        assertEquals(Exactness.EXACT, Reduction.exactness(Connection.UNGROUNDED_WYE, sep, two));
        assertEquals(Exactness.EXACT, Reduction.exactness(Connection.DELTA, sep, two));
        assertEquals(Exactness.LINEAR_ONLY, Reduction.exactness(Connection.UNGROUNDED_WYE, sep, one));
        assertEquals(Exactness.LINEAR_ONLY, Reduction.exactness(Connection.DELTA, sep, one));
        for (Connection c : Connection.values()) {
            assertEquals(Exactness.CORE_COUPLING_IGNORED, Reduction.exactness(c, CoreType.THREE_LEGGED, one));
            assertEquals(Exactness.CORE_COUPLING_IGNORED, Reduction.exactness(c, CoreType.FIVE_LEGGED, two));
        }
    }

    @Test
    void loopCurvesAreFormedAsTheTableSays() {
        Cable screened = Cable.screened(0.2554e-9);
        CoreType sep = CoreType.SEPARATE_PHASE_CORES;
        assertSame(WINDING, Reduction.reduce(site(Connection.GROUNDED_WYE, sep, Cable.belted(0.3e-9, 0.09e-9),
                OpenPhaseCase.ONE)).circuit().magnetizing());
        assertTrue(Reduction.reduce(site(Connection.UNGROUNDED_WYE, sep, screened, OpenPhaseCase.ONE))
                .circuit().magnetizing() instanceof ScaledCurve);
        assertTrue(Reduction.reduce(site(Connection.DELTA, sep, screened, OpenPhaseCase.TWO))
                .circuit().magnetizing() instanceof ScaledCurve);
    }

    /**
     * The source is the supply itself (phase peak sqrt(2) V_line / sqrt(3)) and ratedPeak is the loop
     * voltage at rated winding excitation: ratio 1, 1.5, sqrt(3) (Reduction notes [der]).
     */
    @Test
    void sourceIsTheSupplyAndRatedPeakFollowsTheLoop() {
        Cable screened = Cable.screened(0.2554e-9);
        double vph = 34.5e3 * Math.sqrt(2) / Math.sqrt(3);
        ReducedCircuit y = Reduction.reduce(site(Connection.UNGROUNDED_WYE, CoreType.SEPARATE_PHASE_CORES, screened, OpenPhaseCase.ONE));
        assertEquals(vph, y.circuit().sourcePeak(), 1e-9);
        assertEquals(1.5 * vph, y.circuit().ratedPeak(), 1e-9);
        ReducedCircuit d = Reduction.reduce(site(Connection.DELTA, CoreType.SEPARATE_PHASE_CORES, screened, OpenPhaseCase.TWO));
        assertEquals(Math.sqrt(3) * vph, d.circuit().ratedPeak(), 1e-9);
        assertEquals(Math.sqrt(2) * 34.5e3, d.circuit().ratedPeak(), 1e-9); // = rated delta-winding peak
        ReducedCircuit g = Reduction.reduce(site(Connection.GROUNDED_WYE, CoreType.SEPARATE_PHASE_CORES,
                Cable.belted(0.3e-9, 0.09e-9), OpenPhaseCase.ONE));
        assertEquals(vph, g.circuit().ratedPeak(), 1e-9);
        assertTrue(y.explanation().contains("linear"), y.explanation());
    }

    /** DOMAIN.md §1.2: grounded wye, separate cores, screened cable: no drive at all. */
    @Test
    void groundedWyeOnScreenedCableHasNoSource() {
        ReducedCircuit g = Reduction.reduce(site(Connection.GROUNDED_WYE, CoreType.SEPARATE_PHASE_CORES,
                Cable.screened(0.2554e-9), OpenPhaseCase.ONE));
        assertFalse(g.loop().driven());
        assertEquals(0.0, g.circuit().sourcePeak(), 0.0);
        assertEquals(0.2554e-9 * 2500, g.circuit().seriesCapacitance(), 1e-18);
        assertEquals(0.0, g.circuit().shuntCapacitance(), 0.0);
    }

    @Test
    void angleIsNormalised() {
        assertEquals(-Math.PI / 3, Reduction.normalizeAngle(2 * Math.PI / 3 - Math.PI), 1e-15);
        assertEquals(Math.PI, Reduction.normalizeAngle(-Math.PI), 1e-15);
        assertEquals(0.5, Reduction.normalizeAngle(0.5 + 4 * Math.PI), 1e-14);
    }

    // ---- The following need the curve classes (ScaledCurve, CompositeCurve) implemented; until
    // ---- the curves branch is merged they are skipped by the assumption below, then run by themselves.

    /** True once ScaledCurve and CompositeCurve evaluate (the curves work item). */
    static boolean curvesAvailable() {
        try {
            CompositeCurve.floatingWye(WINDING).current(1.0);
            new ScaledCurve(WINDING, 1.5, 1.0).current(1.0);
            return true;
        } catch (UnsupportedOperationException pending) {
            return false;
        }
    }

    /**
     * In the linear range every loop curve has L_eq = k Lm with k from DOMAIN.md §1.2: 1.5 for
     * ungrounded primaries (including the floating-wye composite, lambda(i) + lambda(i/2) -> 1.5 Lm i,
     * and two delta windings in parallel, L_D/2 = 1.5 Lm), 1 for grounded wye. Compared at the origin,
     * where the polynomial's slope is exactly a. Tolerance 1e-9 relative: curve arithmetic only.
     */
    @Test
    void loopCurvesHaveTheTableInductanceInTheLinearRange() {
        assumeTrue(curvesAvailable(), "needs the curves branch (ScaledCurve, CompositeCurve)");
        Cable screened = Cable.screened(0.2554e-9);
        for (Connection c : Connection.values()) {
            for (OpenPhaseCase open : new OpenPhaseCase[] {OpenPhaseCase.ONE, OpenPhaseCase.TWO}) {
                Installation in = site(c, CoreType.SEPARATE_PHASE_CORES, screened, open);
                // For delta, the winding curve is at line voltage: its wye-equivalent Lm is L_D / 3.
                double lmWye = c == Connection.DELTA ? 790.0 / 3 : 790.0;
                double k = c == Connection.GROUNDED_WYE ? 1.0 : 1.5;
                SaturationCurve loop = Reduction.loopCurve(in.transformer(), open);
                assertEquals(k * lmWye, loop.differentialInductance(0.0), 1e-9 * k * lmWye, c + " " + open);
            }
        }
        SaturationCurve fw = Reduction.loopCurve(site(Connection.UNGROUNDED_WYE, CoreType.SEPARATE_PHASE_CORES,
                screened, OpenPhaseCase.TWO).transformer(), OpenPhaseCase.TWO);
        assertTrue(fw instanceof CompositeCurve);
        // Floating wye: lambda_eq(i) = lambda(i) + lambda(i/2) [der], checked deep in saturation too.
        double i = 3.0;
        assertEquals(WINDING.fluxLinkage(i) + WINDING.fluxLinkage(i / 2), fw.fluxLinkage(i), 1e-9 * fw.fluxLinkage(i));
    }
}
