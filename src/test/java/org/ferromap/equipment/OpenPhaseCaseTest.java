package org.ferromap.equipment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The rows of the table in DOMAIN.md §1.2 [der], written out here as closed forms in r. The
 * independent check of the table itself (a nodal solution of the three-phase network) is in
 * {@code org.ferromap.circuit.ReductionNetworkTest}. Tolerance 1e-14 relative: a few
 * floating-point operations.
 */
class OpenPhaseCaseTest {

    private static final double CCS = 0.75e-6;

    @ParameterizedTest
    @ValueSource(doubles = {0.0, 0.3, 0.25, 0.37})
    void rowsOfTheTable(double r) {
        double ccc = r * CCS;
        for (Connection conn : new Connection[] {Connection.DELTA, Connection.UNGROUNDED_WYE}) {
            OpenPhaseLoop one = OpenPhaseCase.ONE.loop(conn, CCS, ccc);
            check(one, 0.5 / (1 + 2 * r), 2 * ccc + CCS, 1.5);
            OpenPhaseLoop two = OpenPhaseCase.TWO.loop(conn, CCS, ccc);
            check(two, 1 / (1 + r), 2 * (ccc + CCS), 1.5);
        }
        OpenPhaseLoop g1 = OpenPhaseCase.ONE.loop(Connection.GROUNDED_WYE, CCS, ccc);
        check(g1, r / (1 + 2 * r), 2 * ccc + CCS, 1.0);
        OpenPhaseLoop g2 = OpenPhaseCase.TWO.loop(Connection.GROUNDED_WYE, CCS, ccc);
        check(g2, r / (1 + r), ccc + CCS, 1.0);
    }

    private static void check(OpenPhaseLoop loop, double eeq, double ceq, double k) {
        assertEquals(eeq, loop.sourceFraction(), 1e-14);
        assertEquals(ceq, loop.capacitance(), 1e-14 * ceq);
        assertEquals(k, loop.inductanceFactor(), 0.0);
        // The split keeps the loop: Cs + Cg = C_eq and Cs = E_eq C_eq (OpenPhaseLoop Javadoc).
        assertEquals(ceq, loop.seriesCapacitance() + loop.shuntCapacitance(), 1e-14 * ceq);
        assertEquals(eeq * ceq, loop.seriesCapacitance(), 1e-14 * ceq);
    }

    /** DOMAIN.md §1.2: "a grounded-wye bank of separate cores sees no drive at all" on screened cable. */
    @Test
    void groundedWyeOnScreenedCableIsNotDriven() {
        assertEquals(false, OpenPhaseCase.ONE.loop(Connection.GROUNDED_WYE, CCS, 0).driven());
        assertEquals(false, OpenPhaseCase.TWO.loop(Connection.GROUNDED_WYE, CCS, 0).driven());
        assertEquals(true, OpenPhaseCase.ONE.loop(Connection.DELTA, CCS, 0).driven());
    }

    @Test
    void onlyOneOrTwoPhasesMayBeOpen() {
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> new OpenPhaseCase(3)).key());
        assertEquals(MessageKey.OUT_OF_RANGE, assertThrows(FerromapException.class, () -> new OpenPhaseCase(0)).key());
    }
}
