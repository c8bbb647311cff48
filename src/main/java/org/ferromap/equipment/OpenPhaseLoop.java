package org.ferromap.equipment;

/**
 * The linear single-loop reduction of an open-phase case (DOMAIN.md §1.2 [der]): a source
 * E_eq in series with C_eq and L_eq = k Lm, all in wye-equivalent terms, together with the split
 * of C_eq that keeps the real supply as the source.
 *
 * <p>The loop equation is j w C_eq W + W / (j w k Lm) = j w C_eq E_eq, W the loop voltage. Only
 * the product C_eq E_eq and the total C_eq matter, so the same loop is a source of the supply's
 * own amplitude (1 pu) feeding a series capacitance Cs = E_eq C_eq into a terminal that carries
 * a shunt capacitance Cg = (1 - E_eq) C_eq. That split keeps "source voltage" meaning the real
 * supply voltage in sweeps; it is possible because E_eq &lt;= 1 in every row.
 *
 * @param sourceFraction E_eq, per unit of the supply phase-to-neutral voltage, in [0, 1]
 * @param sourceAngleShift angle of the loop source relative to the supply's phase a, rad (the
 *        first open phase is a; the second, when two are open, is b; sequence a, b, c positive)
 * @param capacitance C_eq, F (or F/m when built from capacitances per length)
 * @param inductanceFactor k = L_eq / Lm in the linear range (1.5 ungrounded primaries, 1 grounded wye)
 * @param seriesCapacitance Cs = E_eq C_eq, same unit as {@code capacitance}
 * @param shuntCapacitance Cg = C_eq - Cs, same unit as {@code capacitance}
 */
public record OpenPhaseLoop(
        double sourceFraction,
        double sourceAngleShift,
        double capacitance,
        double inductanceFactor,
        double seriesCapacitance,
        double shuntCapacitance) {

    /** Whether the open phase is driven at all (false for grounded wye on screened cable). */
    public boolean driven() {
        return sourceFraction > 0;
    }
}
