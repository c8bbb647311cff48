package org.ferromap.balance;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Settings of the single-harmonic balance.
 *
 * @param scanPointsPerDecade grid density of the flux scan that brackets folds of curves without
 *        a closed form; default 16 (fold pairs closer than one grid step are still caught by a
 *        local minimum search of the slope sign)
 * @param tangencyTolerance relative distance of the source from a fold voltage, in E^2, inside
 *        which the two meeting steady states are reported as one point at the fold; default 1e-10
 * @param closedForms use the closed forms of polynomial curves; default true. False sends
 *        polynomials through the general numerical path (tests and cross-checks)
 */
public record BalanceSettings(int scanPointsPerDecade, double tangencyTolerance, boolean closedForms) {

    public static final BalanceSettings DEFAULTS = new BalanceSettings(16, 1e-10, true);

    public BalanceSettings {
        if (scanPointsPerDecade < 4 || scanPointsPerDecade > 1000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "scan points per decade = " + scanPointsPerDecade + " is not allowed; expected 4 to 1000");
        }
        if (!(tangencyTolerance >= 0 && tangencyTolerance < 1e-3)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "tangency tolerance = " + tangencyTolerance + " is not allowed; expected 0 <= t < 1e-3");
        }
    }

    public BalanceSettings withScanPointsPerDecade(int n) {
        return new BalanceSettings(n, tangencyTolerance, closedForms);
    }

    public BalanceSettings withTangencyTolerance(double t) {
        return new BalanceSettings(scanPointsPerDecade, t, closedForms);
    }

    public BalanceSettings withClosedForms(boolean use) {
        return new BalanceSettings(scanPointsPerDecade, tangencyTolerance, use);
    }
}
