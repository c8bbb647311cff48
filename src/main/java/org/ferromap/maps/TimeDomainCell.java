package org.ferromap.maps;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.errors.FerromapException;
import org.ferromap.study.SweepParameter;

/**
 * The time-domain layer of a study map (DOMAIN.md §6): at each point of the plane, an ensemble of
 * switching events ({@link EnsembleSettings}) is simulated and each settled state classified.
 *
 * <p>Four components per cell:
 * <ol start="0">
 * <li>{@code ferroFraction}: share of the events that do not end in the normal state (0 to 1).
 * An undetermined verdict counts as not normal: the map cannot call a cell safe that it could not
 * settle. Its own share is component 2.</li>
 * <li>{@code worstMode}: code of the worst mode seen ({@link SteadyMode#ordinal()}: 0 normal,
 * 1 fundamental, 2 subharmonic, 3 quasi-periodic, 4 chaotic, 5 undetermined), ranked normal &lt;
 * undetermined &lt; fundamental &lt; subharmonic &lt; quasi-periodic &lt; chaotic (further from the
 * normal state is worse; undetermined only wins over normal).</li>
 * <li>{@code undeterminedFraction}: share of events the simulator could not classify.</li>
 * <li>{@code maxPeakPu}: largest settled peak voltage over the events, per unit of the rated
 * peak; NaN when none settled.</li>
 * </ol>
 *
 * <p>When one axis of the plane is the source angle, that axis sets the switching angle and the
 * ensemble varies the residual flux only.
 *
 * <p>Pure and thread-safe: {@link Simulator} is stateless and deterministic, members are run in a
 * fixed order, and the counts are exact integers, so results do not depend on threads.
 */
public final class TimeDomainCell implements CellFunction {

    /** Severity rank by {@link SteadyMode#ordinal()}: normal, fundamental, subharmonic, quasi-periodic, chaotic, undetermined. */
    private static final int[] RANK = {0, 2, 3, 4, 5, 1};

    private static final String VERSION = "time-domain-cell v1";

    private final StudyPlane plane;
    private final EnsembleSettings ensemble;
    private final boolean angleAxis;

    public TimeDomainCell(StudyPlane plane, EnsembleSettings ensemble) {
        this.plane = plane;
        this.ensemble = ensemble;
        this.angleAxis = plane.sweeps(SweepParameter.SOURCE_ANGLE);
    }

    /** The plane this cell function covers. */
    public StudyPlane plane() {
        return plane;
    }

    /** The events simulated per cell. */
    public EnsembleSettings ensemble() {
        return ensemble;
    }

    @Override
    public int width() {
        return 4;
    }

    @Override
    public void evaluate(double x, double y, double[] out, int offset) {
        EquivalentCircuit c;
        try {
            c = plane.circuit(x, y);
        } catch (FerromapException e) {
            out[offset] = Double.NaN;
            out[offset + 1] = Double.NaN;
            out[offset + 2] = Double.NaN;
            out[offset + 3] = Double.NaN;
            return;
        }
        double fluxBase = c.ratedPeak() / c.omega();
        double[] fluxes = ensemble.signedFluxes();
        int angles = angleAxis ? 1 : ensemble.angles();
        boolean mirror = !angleAxis && ensemble.usesMirror();
        int simulatedAngles = mirror ? angles / 2 : angles;
        int weight = mirror ? 2 : 1;
        SimulationSettings base = ensemble.simulation();
        int notNormal = 0;
        int undetermined = 0;
        int total = 0;
        int worst = SteadyMode.NORMAL.ordinal();
        double peak = Double.NaN;
        for (int k = 0; k < simulatedAngles; k++) {
            SimulationSettings atAngle = angleAxis ? base.withSourceAngle(Double.NaN) : base.withSourceAngle(ensemble.angle(k));
            for (double r : fluxes) {
                SimulationResult res = Simulator.simulate(c, atAngle.withInitialState(r * fluxBase, 0.0));
                SteadyMode m = res.mode();
                total += weight;
                if (m != SteadyMode.NORMAL) {
                    notNormal += weight;
                }
                if (m == SteadyMode.UNDETERMINED) {
                    undetermined += weight;
                }
                if (RANK[m.ordinal()] > RANK[worst]) {
                    worst = m.ordinal();
                }
                if (!(res.peakPerUnit() <= peak)) {
                    peak = Double.isNaN(res.peakPerUnit()) ? peak : res.peakPerUnit();
                }
            }
        }
        out[offset] = (double) notNormal / total;
        out[offset + 1] = worst;
        out[offset + 2] = (double) undetermined / total;
        out[offset + 3] = peak;
    }

    /** The mode of a worst-mode code, or null for NaN. */
    public static SteadyMode mode(double code) {
        return Double.isNaN(code) ? null : SteadyMode.values()[(int) code];
    }

    /** Whether mode a is worse than mode b in the ranking above. */
    public static boolean worse(SteadyMode a, SteadyMode b) {
        return RANK[a.ordinal()] > RANK[b.ordinal()];
    }

    @Override
    public String fingerprint() {
        return VERSION + "; " + plane.fingerprint() + "; " + ensemble.fingerprint();
    }

    @Override
    public String componentName(int k) {
        return switch (k) {
            case 0 -> "ferroFraction";
            case 1 -> "worstMode";
            case 2 -> "undeterminedFraction";
            default -> "maxPeakPu";
        };
    }
}
