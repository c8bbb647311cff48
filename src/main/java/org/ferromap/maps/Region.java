package org.ferromap.maps;

import java.util.function.DoubleUnaryOperator;

/** A region of the parameter plane given analytically, to compare a map's boundaries with. */
@FunctionalInterface
public interface Region {

    /** Whether the point {@code (x, y)} (axis units) lies in the region. */
    boolean contains(double x, double y);

    /** The points above the curve {@code y = g(x)} (strictly). */
    static Region above(DoubleUnaryOperator g) {
        return (x, y) -> y > g.applyAsDouble(x);
    }

    /** The points where {@code f(x, y) > 0}. */
    static Region positive(java.util.function.DoubleBinaryOperator f) {
        return (x, y) -> f.applyAsDouble(x, y) > 0;
    }
}
