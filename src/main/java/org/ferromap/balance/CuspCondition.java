package org.ferromap.balance;

/**
 * Where bistability begins (DOMAIN.md §3, §7, derived): the two folds merge at a cusp. For
 * i = a lambda + b lambda^n, C_min = (a + (2 sqrt(n)/(n-1)) w G)/w^2 and
 * G_min = (w^2 C - a)(n-1)/(2 sqrt(n) w); other curves by bisection in C and in G on whether the
 * fold scan finds a fold pair, so the result always agrees with the folds reported.
 *
 * @param bistable whether this circuit has a fold pair (C &gt; C_min, equivalently G &lt; G_min)
 * @param minimumCapacitance C_min, F: the smallest total capacitance Cs + Cg with a fold pair at
 *        this conductance; NaN when no capacitance gives one
 * @param capacitanceRatio C / C_min: above 1 bistable
 * @param dampingConductance G_min, S: the total shunt conductance at and above which this
 *        circuit has no fold pair; 0 when it has none even without loss
 * @param cuspFlux peak flux linkage where the folds merge when C = C_min (Cs and G as given), Wb-turn
 * @param cuspSourcePeak source peak voltage at that cusp, V
 */
public record CuspCondition(
        boolean bistable,
        double minimumCapacitance,
        double capacitanceRatio,
        double dampingConductance,
        double cuspFlux,
        double cuspSourcePeak) {
}
