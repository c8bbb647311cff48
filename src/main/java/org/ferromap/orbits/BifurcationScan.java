package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Bifurcations along a given sequence of fixed points of a return map (a branch traced by any
 * means, or a trivial branch such as z = 0 of a linear equation): detection by the sign of the
 * multiplier test functions between consecutive points, location along the chord to a tolerance.
 */
public final class BifurcationScan {

    private BifurcationScan() {
    }

    /**
     * @param family the system at each parameter value
     * @param section the map the points are fixed points of
     * @param states fixed points in branch order, system units
     * @param parameters their parameter values, units of the parameter
     * @param settings shooting settings (integration and corrector tolerances)
     * @param locateTolerance accuracy of the located parameter relative to the largest |parameter|
     *        of the sequence
     * @return the bifurcations found, in branch order
     */
    public static List<LocatedBifurcation> along(DoubleFunction<? extends PeriodicSystem> family, Section section,
            double[][] states, double[] parameters, ShootingSettings settings, double locateTolerance) {
        if (states.length != parameters.length || states.length == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "need as many states as parameter values, at least one; got "
                    + states.length + " and " + parameters.length);
        }
        double scale = 0;
        for (double p : parameters) {
            scale = Math.max(scale, Math.abs(p));
        }
        int n = states[0].length;
        Shooting shooting = new Shooting(settings);
        BifurcationLocator locator = new BifurcationLocator(shooting, family, section, scale > 0 ? scale : 1.0, n,
                locateTolerance);
        List<BifurcationLocator.Sample> samples = new ArrayList<>();
        for (int i = 0; i < states.length; i++) {
            samples.add(locator.sample(states[i], parameters[i], Double.NaN));
        }
        return locator.scan(samples);
    }
}
