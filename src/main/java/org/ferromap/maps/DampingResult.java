package org.ferromap.maps;

import java.util.List;
import java.util.Map;

/**
 * The smallest damping load that removes the risky region, confirmed by simulation, and the
 * arrester's duty (DOMAIN.md §7). Conductances are the loop's (the single-phase circuit's
 * terminal), S; powers are three-phase at the transformer's rated primary voltage, W.
 *
 * @param study                the study's title
 * @param length               cable length, m (NaN for circuit studies)
 * @param voltage              supply line-to-line voltage, V rms (equipment) or source peak, V (circuit)
 * @param sourcePeak           the loop's source peak, V
 * @param existingConductance  the loop's own shunt conductance (core loss and any load), S
 * @param cuspConductance      G_min: the total conductance at and above which the loop has no fold pair, S
 * @param cuspMethod           how G_min was found: closed form, numerical cusp condition, or bisection on the fold scan
 * @param bistableAsBuilt      whether the loop as built has a fold pair
 * @param addedConductance     G_min less the existing conductance (0 when none is needed), S
 * @param loadPower            the added conductance as a balanced three-phase resistive load at rated voltage, W
 *                             (NaN for circuit studies)
 * @param loadPercent          the same in percent of the transformer's rating (NaN for circuit studies)
 * @param phaseResistance      the same as a wye-equivalent resistor per phase at the primary, ohm (NaN for circuit studies)
 * @param loopResistance       1 / added conductance, the resistance across the loop's terminal, ohm
 * @param voltageConductance   the smallest total conductance with no stable ferroresonant state at this
 *                             source voltage alone, S (at most G_min; NaN when G_min leaves a
 *                             ferroresonant single branch): for information, a voltage rise or another
 *                             switching sequence can still reach the ferroresonant branch below G_min
 * @param voltageAdded         that less the existing conductance, S
 * @param voltageLoadPower     that as a three-phase load at rated voltage, W (NaN for circuit studies)
 * @param steps                the simulation steps: as built (if asked), at G_min, then increased stepwise
 * @param recommended          the first step with every event in the normal state; null if none within the steps
 * @param arrester             the arrester's duty during the worst as-built event; null when no arrester was given
 * @param ensemble             the switching events of each step
 * @param notes                what the figures assume
 */
public record DampingResult(
        String study,
        double length,
        double voltage,
        double sourcePeak,
        double existingConductance,
        double cuspConductance,
        String cuspMethod,
        boolean bistableAsBuilt,
        double addedConductance,
        double loadPower,
        double loadPercent,
        double phaseResistance,
        double loopResistance,
        double voltageConductance,
        double voltageAdded,
        double voltageLoadPower,
        List<Step> steps,
        Step recommended,
        Arrester arrester,
        String ensemble,
        List<String> notes) {

    public DampingResult {
        steps = List.copyOf(steps);
        notes = List.copyOf(notes);
    }

    /**
     * One confirmation step.
     *
     * @param label             what the step is (as built, cusp value, cusp value x 1.25^k)
     * @param totalConductance  the loop's total shunt conductance, S
     * @param addedConductance  over the existing, S
     * @param loadPower         as a three-phase load at rated voltage, W (NaN for circuit studies)
     * @param events            switching events simulated (mirror images counted)
     * @param counts            events per settled mode
     * @param ferroresonant     events ending ferroresonant (fundamental, subharmonic, quasi-periodic, chaotic)
     * @param undetermined      events with no verdict
     * @param worstMode         mode of the worst event
     * @param worstPeakPu       peak of the worst event, pu of the loop's rated peak
     * @param clear             whether every event settled in the normal state
     */
    public record Step(String label, double totalConductance, double addedConductance, double loadPower, int events,
                       Map<String, Integer> counts, int ferroresonant, int undetermined, String worstMode, double worstPeakPu,
                       boolean clear) { }

    /**
     * The arrester's duty.
     *
     * @param ratedVoltage       Ur, V rms
     * @param referenceVoltage   V_ref, V peak
     * @param referenceCurrent   I_ref, A
     * @param alpha              exponent
     * @param energyRating       kJ per kV of Ur (NaN when not given)
     * @param sources            where the defaults came from
     * @param eventAngle         switching angle of the event simulated, rad
     * @param eventResidualFlux  its residual flux, pu
     * @param peakWithoutArrester the event's peak without the arrester, pu of the loop's rated peak
     * @param duty               what the arrester absorbed; null when its simulation failed
     * @param failure            why the simulation failed; null when it did not
     */
    public record Arrester(double ratedVoltage, double referenceVoltage, double referenceCurrent, double alpha,
                           double energyRating, List<String> sources, double eventAngle, double eventResidualFlux,
                           double peakWithoutArrester, ArresterDuty.Result duty, String failure) { }
}
