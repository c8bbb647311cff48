package org.ferromap.orbits;

/**
 * A bifurcation found on a branch of periodic orbits, with what is needed to switch branches there.
 *
 * @param type what it is
 * @param parameter parameter value at the point, units of the parameter
 * @param period period of the orbit that bifurcates, forcing periods
 * @param section the return map the branch was continued on
 * @param state state on the section at the point, system units
 * @param multipliers multipliers of the section map at the point
 * @param critical the multiplier that crossed, as [re, im] (for a torus the one with im &gt; 0)
 * @param afterIndex index of the last branch point before it
 * @param located whether the location converged; false means the values are interpolated
 *        between the two branch points around it
 */
public record LocatedBifurcation(BifurcationType type, double parameter, int period, Section section, double[] state,
        FloquetMultipliers multipliers, double[] critical, int afterIndex, boolean located) {

    public LocatedBifurcation {
        state = state.clone();
        critical = critical.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    @Override
    public double[] critical() {
        return critical.clone();
    }

    /** The JSON record of the contract. */
    public OrbitBifurcation toRecord() {
        return new OrbitBifurcation(type.label(), parameter, period);
    }
}
