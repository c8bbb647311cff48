package org.ferromap.balance;

/**
 * One single-harmonic steady state of an equivalent circuit at its source voltage.
 *
 * @param flux peak flux linkage Lambda, Wb-turn
 * @param voltage peak voltage across the magnetizing branch, w Lambda, V
 * @param voltagePerUnit {@code voltage} over the circuit's rated peak, per unit
 * @param current peak of the fundamental magnetizing current I1(Lambda), A
 * @param voltagePhase phase of the magnetizing-branch voltage relative to the source, rad in
 *        (-pi, pi]; near 0 on a stiff source, near pi on the ferroresonant branch (series loop)
 * @param stable whether the averaged (slow-flow) equations are stable there; with zero loss a
 *        stable point is a centre of the averaged flow (neutral at first order)
 * @param kind normal, unstable or ferroresonant (see {@link PointKind})
 * @param slowFlowRate largest real part of the slow-flow eigenvalues, 1/s: negative when stable
 * @param capacitive whether the loop is net capacitive there (magnetizing admittance above the
 *        capacitor's, I1 &gt; w^2 C Lambda)
 * @param atFold whether the source sits on a fold (a double root); such a point is not stable
 */
public record OperatingPoint(
        double flux,
        double voltage,
        double voltagePerUnit,
        double current,
        double voltagePhase,
        boolean stable,
        PointKind kind,
        double slowFlowRate,
        boolean capacitive,
        boolean atFold) {
}
