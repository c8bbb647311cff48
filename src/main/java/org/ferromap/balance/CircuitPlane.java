package org.ferromap.balance;

import org.ferromap.circuit.EquivalentCircuit;

/**
 * The equivalent circuit as a function of two parameters (SI, in the units of their
 * {@link BalanceAxis}), the input of fold-curve continuation; one-parameter branches use it with
 * the second value ignored. Implementations must be pure (same values, same circuit), may throw
 * {@link org.ferromap.errors.FerromapException} for values outside the physical range, and must
 * keep the magnetizing curve (only the linear loop elements may change).
 */
@FunctionalInterface
public interface CircuitPlane {

    /** The circuit at first parameter p and second parameter q. */
    EquivalentCircuit at(double p, double q);

    /** A one-parameter family seen as a plane whose second parameter changes nothing. */
    static CircuitPlane of(java.util.function.DoubleFunction<EquivalentCircuit> family) {
        return (p, q) -> family.apply(p);
    }
}
