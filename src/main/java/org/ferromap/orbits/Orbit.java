package org.ferromap.orbits;

/**
 * A periodic orbit found by shooting, with its Floquet multipliers and their accuracy figures.
 *
 * @param state state on the section t = 0 mod T, system units (per unit for the circuit)
 * @param period least period, forcing periods
 * @param symmetric whether it was found as a fixed point of the half-period map (a symmetric orbit)
 * @param monodromy dP^period/dz at the state, row-major n by n
 * @param multipliers Floquet multipliers: eigenvalues of {@code monodromy}
 * @param sectionMultipliers multipliers of the map solved (the half-period map for symmetric
 *        orbits, whose squares are {@code multipliers}; otherwise equal to {@code multipliers})
 * @param residual |S(z) - z| of the map solved at the returned state, system units
 * @param traceIntegral integral of trace J over {@code period} forcing periods
 * @param liouvilleDefect |det M - exp(traceIntegral)| / exp(traceIntegral): Liouville's identity
 *        as a relative accuracy figure for the monodromy
 * @param multiplierChange largest change of a multiplier when the integration tolerance is made 100
 *        times tighter, dimensionless; NaN when not checked
 * @param iterations Newton iterations spent
 */
public record Orbit(double[] state, int period, boolean symmetric, double[] monodromy, FloquetMultipliers multipliers,
        FloquetMultipliers sectionMultipliers, double residual, double traceIntegral, double liouvilleDefect,
        double multiplierChange, int iterations) {

    public Orbit {
        state = state.clone();
        monodromy = monodromy.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    @Override
    public double[] monodromy() {
        return monodromy.clone();
    }

    /** State component j, system units. */
    public double state(int j) {
        return state[j];
    }

    /** Whether every Floquet multiplier lies inside the unit circle. */
    public boolean stable() {
        return multipliers.stable();
    }
}
