package org.ferromap.units;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A per-unit base for one winding or one loop, on peaks: flux follows from the voltage as
 * lambda = V/omega, impedance from voltage over current.
 *
 * @param voltage base voltage, peak V
 * @param current base current, peak A
 * @param omega angular frequency of the base, rad/s
 */
public record PerUnitBase(double voltage, double current, double omega) {

    public PerUnitBase {
        for (double v : new double[] {voltage, current, omega}) {
            if (!(v > 0) || Double.isInfinite(v)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "per-unit base (" + voltage + " V, " + current + " A, " + omega
                                + " rad/s) must be finite and positive");
            }
        }
    }

    /** Base from rms voltage and current, the usual nameplate statement. */
    public static PerUnitBase fromRms(double voltageRms, double currentRms, double omega) {
        return new PerUnitBase(voltageRms * Constants.SQRT2, currentRms * Constants.SQRT2, omega);
    }

    /** Base flux linkage V/omega, Wb-turn. */
    public double flux() {
        return voltage / omega;
    }

    /** Base impedance V/I, ohm (peak over peak equals rms over rms). */
    public double impedance() {
        return voltage / current;
    }

    /** Base inductance Z/omega, H. */
    public double inductance() {
        return impedance() / omega;
    }

    /** Base capacitance 1/(omega Z), F. */
    public double capacitance() {
        return 1.0 / (omega * impedance());
    }

    /** Base power, the rating per phase, VA: Vrms Irms = Vpk Ipk / 2. */
    public double power() {
        return voltage * current / 2.0;
    }
}
