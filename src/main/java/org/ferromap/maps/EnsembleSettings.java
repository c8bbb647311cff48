package org.ferromap.maps;

import java.util.Arrays;
import java.util.Objects;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The switching events simulated in every cell of the time-domain layer: {@code angles} source
 * angles at switching, {@code 2 pi k / angles} rad for k = 0 .. angles - 1, each with every
 * residual flux: 0 once, and each positive value r twice, as +r and -r. Immutable; change with
 * the {@code withX} copies.
 *
 * <p>Mirror symmetry: the magnetizing curve is odd ({@code SaturationCurve}'s contract), so the
 * event switched at angle phi + pi with residual flux -r is the mirror image (lambda, v) -&gt;
 * (-lambda, -v) of the event switched at phi with +r: same mode, same peak. With {@code mirror}
 * on and an even number of angles, only the first half of the angles is simulated and each result
 * counts twice, halving the cost. The two halves then agree exactly; simulated separately they
 * agree up to rounding, which in a chaotic cell may change the verdict of a single member.
 *
 * @param angles         number of switching angles, 1 to 720; default 8
 * @param residualFluxes residual flux linkages at switching, per unit of the rated peak flux
 *                       (ratedPeak / omega), each 0 or positive and below 2; default {0, 0.8}
 * @param mirror         whether to use the mirror symmetry; default true
 * @param simulation     how each event is simulated; its source angle and initial state are set
 *                       per member. Default: {@link SimulationSettings#defaults()} with at most
 *                       {@value #DEFAULT_MAX_PERIODS} periods and relative tolerance 1e-8 (a map cell
 *                       needs the mode, not nine digits of the waveform)
 */
public record EnsembleSettings(int angles, double[] residualFluxes, boolean mirror, SimulationSettings simulation) {

    /** Longest simulation of one member by default, source periods: lightly damped cases certify within a few hundred. */
    public static final int DEFAULT_MAX_PERIODS = 600;

    /** 8 angles, residual flux 0 and +-0.8 pu, mirror on. */
    public static EnsembleSettings defaults() {
        return new EnsembleSettings(8, new double[] {0, 0.8}, true,
                SimulationSettings.defaults().withMaxPeriods(DEFAULT_MAX_PERIODS).withTolerance(1e-8));
    }

    public EnsembleSettings {
        Objects.requireNonNull(simulation, "simulation");
        if (angles < 1 || angles > 720) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "switching angles = " + angles + "; allowed 1 to 720");
        }
        if (residualFluxes == null || residualFluxes.length == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "give at least one residual flux (0 for none)");
        }
        residualFluxes = residualFluxes.clone();
        for (double r : residualFluxes) {
            if (!(r >= 0 && r < 2)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "residual flux " + r
                        + " pu is not allowed; give magnitudes from 0 to below 2 pu of the rated peak flux (each r > 0 is used as +r and -r)");
            }
        }
        for (int i = 0; i < residualFluxes.length; i++) {
            for (int j = 0; j < i; j++) {
                if (residualFluxes[i] == residualFluxes[j]) {
                    throw new FerromapException(MessageKey.BAD_REQUEST, "residual flux " + residualFluxes[i]
                            + " pu is listed twice");
                }
            }
        }
    }

    @Override
    public double[] residualFluxes() {
        return residualFluxes.clone();
    }

    /** A copy with another number of angles. */
    public EnsembleSettings withAngles(int n) {
        return new EnsembleSettings(n, residualFluxes, mirror, simulation);
    }

    /** A copy with other residual flux magnitudes (pu). */
    public EnsembleSettings withResidualFluxes(double... r) {
        return new EnsembleSettings(angles, r, mirror, simulation);
    }

    /** A copy with the mirror symmetry on or off. */
    public EnsembleSettings withMirror(boolean on) {
        return new EnsembleSettings(angles, residualFluxes, on, simulation);
    }

    /** A copy with other simulation settings. */
    public EnsembleSettings withSimulation(SimulationSettings s) {
        return new EnsembleSettings(angles, residualFluxes, mirror, s);
    }

    /** Signed residual fluxes of the members at one angle, pu: 0, then +r, -r for each r &gt; 0. */
    public double[] signedFluxes() {
        int n = 0;
        for (double r : residualFluxes) {
            n += r == 0 ? 1 : 2;
        }
        double[] out = new double[n];
        int k = 0;
        for (double r : residualFluxes) {
            out[k++] = r;
            if (r != 0) {
                out[k++] = -r;
            }
        }
        return out;
    }

    /** Members per cell (switching events counted, mirrored ones included). */
    public int members() {
        return angles * signedFluxes().length;
    }

    /** Members actually simulated per cell. */
    public int simulated() {
        return usesMirror() ? members() / 2 : members();
    }

    /** Whether the mirror symmetry is applied (on, and an even number of angles). */
    public boolean usesMirror() {
        return mirror && angles % 2 == 0;
    }

    /** The switching angle of member index k, rad. */
    public double angle(int k) {
        return 2 * Math.PI * k / angles;
    }

    /** A one-line description for reports. */
    public String describe() {
        return angles + " switching angles x residual flux " + Arrays.toString(signedFluxes()) + " pu = " + members()
                + " events per cell" + (usesMirror() ? " (" + simulated() + " simulated, the rest by mirror symmetry)" : "")
                + ", at most " + simulation.maxPeriods() + " periods each";
    }

    /** Stable text of every setting, for resume tiles. */
    String fingerprint() {
        StringBuilder s = new StringBuilder("angles ").append(angles).append(" flux");
        for (double r : residualFluxes) {
            s.append(' ').append(Long.toHexString(Double.doubleToLongBits(r)));
        }
        return s.append(" mirror ").append(usesMirror()).append(" sim ").append(simulation).toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof EnsembleSettings e && e.angles == angles && Arrays.equals(e.residualFluxes, residualFluxes)
                && e.mirror == mirror && e.simulation.equals(simulation);
    }

    @Override
    public int hashCode() {
        return Objects.hash(angles, Arrays.hashCode(residualFluxes), mirror, simulation);
    }

    @Override
    public String toString() {
        return "EnsembleSettings[" + describe() + "]";
    }
}
