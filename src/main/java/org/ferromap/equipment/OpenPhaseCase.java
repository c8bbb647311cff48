package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * How many phases are open at the source end of the cable (single-phase switching or fuses):
 * each open phase keeps its cable, so its core floats on the cable capacitance against the
 * transformer's magnetizing branch. Phase a opens first; with two open, a and b.
 *
 * @param openPhases 1 or 2
 */
public record OpenPhaseCase(int openPhases) {

    /** One phase open. */
    public static final OpenPhaseCase ONE = new OpenPhaseCase(1);
    /** Two phases open. */
    public static final OpenPhaseCase TWO = new OpenPhaseCase(2);

    public OpenPhaseCase {
        if (openPhases != 1 && openPhases != 2) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "open phases = " + openPhases + " is not allowed; expected 1 or 2");
        }
    }

    /**
     * The table of DOMAIN.md §1.2 [der] for this case, r = ccc / ccs:
     *
     * <pre>
     * primary, case                      E_eq (pu)     C_eq            L_eq     loop source
     * delta or ungrounded wye, 1 open    0.5/(1+2r)    2Ccc + Ccs      1.5 Lm    +E_a
     * delta or ungrounded wye, 2 open    1/(1+r)       2(Ccc + Ccs)    1.5 Lm    -E_c
     * grounded wye, 1 open               r/(1+2r)      2Ccc + Ccs      Lm        -E_a
     * grounded wye, 2 open (each)        r/(1+r)       Ccc + Ccs       Lm        +E_c
     * </pre>
     *
     * The loop-source column is derived here from the same nodal equations (supply phases
     * E_a, E_b = E_a e^{-j120}, E_c = E_a e^{+j120}); it matters only for switching instants.
     *
     * @param connection primary connection
     * @param ccs core-to-sheath capacitance of one open core, F (or F/m), &gt; 0
     * @param ccc core-to-core capacitance, F (or F/m), &gt;= 0
     */
    public OpenPhaseLoop loop(Connection connection, double ccs, double ccc) {
        if (!(ccs > 0) || !(ccc >= 0) || Double.isInfinite(ccs) || Double.isInfinite(ccc)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "cable capacitances Ccs = " + ccs + ", Ccc = " + ccc
                    + " are not allowed; expected Ccs > 0 and Ccc >= 0");
        }
        double third = 2.0 * Math.PI / 3.0;
        double ceq;
        double series;
        double k;
        double shift;
        if (connection.isUngrounded()) {
            k = 1.5;
            if (openPhases == 1) {
                ceq = 2 * ccc + ccs;
                series = 0.5 * ccs;             // E_eq C_eq = Ccs / 2
                shift = 0.0;
            } else {
                ceq = 2 * (ccc + ccs);
                series = 2 * ccs;               // E_eq C_eq = 2 Ccs
                shift = third - Math.PI;        // -E_c
            }
        } else {
            k = 1.0;
            if (openPhases == 1) {
                ceq = 2 * ccc + ccs;
                series = ccc;                   // E_eq C_eq = Ccc
                shift = Math.PI;                // -E_a
            } else {
                ceq = ccc + ccs;
                series = ccc;                   // E_eq C_eq = Ccc
                shift = third;                  // +E_c
            }
        }
        return new OpenPhaseLoop(series / ceq, shift, ceq, k, series, ceq - series);
    }
}
