package org.ferromap.circuit;

import org.ferromap.equipment.OpenPhaseLoop;

/**
 * The outcome of reducing an open-phase installation to the single-phase loop.
 *
 * @param circuit the equivalent circuit (its {@link EquivalentCircuit#exactness()} says how far to trust it)
 * @param loop the linear loop figures it was built from (E_eq, C_eq, L_eq / Lm, the series/shunt split), F
 * @param loopVoltageRatio loop voltage at rated excitation over the rated phase-to-neutral voltage:
 *        1 for grounded wye, 1.5 for ungrounded wye, sqrt(3) for delta (the loop then spans one
 *        delta winding); {@code circuit.ratedPeak()} is this ratio times the rated phase peak, so a
 *        loop voltage divided by ratedPeak is the excitation of the loop's windings in per unit
 * @param curveModel how the loop's magnetizing curve was formed from the winding curve
 * @param explanation one paragraph for reports: the case, the table row and the exactness
 */
public record ReducedCircuit(
        EquivalentCircuit circuit,
        OpenPhaseLoop loop,
        double loopVoltageRatio,
        String curveModel,
        String explanation) {
}
