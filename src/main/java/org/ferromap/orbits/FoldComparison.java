package org.ferromap.orbits;

import org.ferromap.balance.CircuitParameter;
/**
 * One fold located three ways, side by side: the single-harmonic balance, the multi-harmonic
 * balance and the exact periodic orbit (shooting and continuation). The relative differences are
 * taken against the exact fold. Values are in the parameter's SI unit; a method that was not run
 * or found no fold gives NaN.
 *
 * @param parameter the parameter (its enum name)
 * @param singleHarmonic fold from the single-harmonic balance
 * @param multiHarmonic fold from the multi-harmonic balance
 * @param exact fold of the periodic orbit
 * @param singleHarmonicDifference (singleHarmonic - exact) / exact
 * @param multiHarmonicDifference (multiHarmonic - exact) / exact
 */
public record FoldComparison(String parameter, double singleHarmonic, double multiHarmonic, double exact,
        double singleHarmonicDifference, double multiHarmonicDifference) {

    /** The comparison of three fold locations, differences computed. */
    public static FoldComparison of(CircuitParameter parameter, double singleHarmonic, double multiHarmonic, double exact) {
        return new FoldComparison(parameter.name(), singleHarmonic, multiHarmonic, exact, (singleHarmonic - exact) / exact,
                (multiHarmonic - exact) / exact);
    }

    /**
     * The exact fold nearest to an estimate (from a balance) among the folds of orbit branches.
     *
     * @return the fold's parameter, or NaN when the branches have none
     */
    public static double nearestExactFold(java.util.List<OrbitBranch> branches, double estimate) {
        double best = Double.NaN;
        for (OrbitBranch b : branches) {
            for (LocatedBifurcation f : b.bifurcations(BifurcationType.FOLD)) {
                if (Double.isNaN(best) || Math.abs(f.parameter() - estimate) < Math.abs(best - estimate)) {
                    best = f.parameter();
                }
            }
        }
        return best;
    }
}
