package org.ferromap.orbits;

import java.util.List;

/**
 * A continued branch of periodic orbits: the points in order with their Floquet multipliers, the
 * bifurcations found between them, and why the run stopped.
 *
 * @param section the return map continued (P^k or the half-period map)
 * @param period the orbits' period, forcing periods
 * @param parameters parameter per point, units of the parameter
 * @param states state on the section per point, system units, [point][state]
 * @param multipliers Floquet multipliers over the period, per point
 * @param bifurcations located bifurcations in branch order
 * @param stopReason why the engine stopped (a {@code StopReason} name)
 * @param stopDetail where and why, in words
 */
public record OrbitBranch(Section section, int period, double[] parameters, double[][] states,
        List<FloquetMultipliers> multipliers, List<LocatedBifurcation> bifurcations, String stopReason, String stopDetail) {

    public OrbitBranch {
        parameters = parameters.clone();
        double[][] c = new double[states.length][];
        for (int i = 0; i < states.length; i++) {
            c[i] = states[i].clone();
        }
        states = c;
        multipliers = List.copyOf(multipliers);
        bifurcations = List.copyOf(bifurcations);
    }

    /** Number of points. */
    public int size() {
        return parameters.length;
    }

    /** Parameter at point i. */
    public double parameter(int i) {
        return parameters[i];
    }

    /** State component j at point i, system units. */
    public double state(int i, int j) {
        return states[i][j];
    }

    /** The bifurcations of one type, in branch order. */
    public List<LocatedBifurcation> bifurcations(BifurcationType type) {
        return bifurcations.stream().filter(b -> b.type() == type).toList();
    }

    @Override
    public double[] parameters() {
        return parameters.clone();
    }

    @Override
    public double[][] states() {
        double[][] c = new double[states.length][];
        for (int i = 0; i < states.length; i++) {
            c[i] = states[i].clone();
        }
        return c;
    }
}
