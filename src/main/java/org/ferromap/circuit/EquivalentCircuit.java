package org.ferromap.circuit;

import org.ferromap.equipment.SaturationCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The single-phase equivalent circuit (DOMAIN.md §1.1): a source e(t) = E_pk sin(w t + phi)
 * feeds a series capacitance Cs into a terminal where a shunt capacitance Cg, the core-loss
 * resistance, an optional load resistance and the magnetizing branch sit in parallel.
 *
 * <pre>
 *   dlambda/dt = v
 *   (Cs + Cg) dv/dt = Cs de/dt - G v - i(lambda),   G = 1/Rc + 1/Rload
 * </pre>
 *
 * SI throughout. Immutable; {@code withX} methods return changed copies so sweeps never mutate.
 *
 * @param omega angular frequency of the source, rad/s
 * @param sourcePeak E_pk, peak source voltage, V
 * @param sourceAngle phi, rad
 * @param seriesCapacitance Cs, F, &gt; 0
 * @param shuntCapacitance Cg, F, &gt;= 0
 * @param coreLossResistance Rc, ohm; {@code Double.POSITIVE_INFINITY} when lossless
 * @param loadResistance Rload, ohm; {@code Double.POSITIVE_INFINITY} when unloaded
 * @param magnetizing the magnetizing branch i(lambda)
 * @param exactness how faithfully this circuit stands for the network it was reduced from
 * @param ratedPeak the voltage that is 1 per unit at the terminal, peak V (the rated peak
 *        phase-to-neutral voltage for equipment studies, the source peak otherwise)
 */
public record EquivalentCircuit(
        double omega,
        double sourcePeak,
        double sourceAngle,
        double seriesCapacitance,
        double shuntCapacitance,
        double coreLossResistance,
        double loadResistance,
        SaturationCurve magnetizing,
        Exactness exactness,
        double ratedPeak) {

    public EquivalentCircuit {
        requirePositive("omega", omega);
        if (!(sourcePeak >= 0) || Double.isInfinite(sourcePeak)) {
            throw bad("source peak", sourcePeak, "a finite value >= 0 V");
        }
        requirePositive("series capacitance", seriesCapacitance);
        if (!(shuntCapacitance >= 0) || Double.isInfinite(shuntCapacitance)) {
            throw bad("shunt capacitance", shuntCapacitance, "a finite value >= 0 F");
        }
        if (!(coreLossResistance > 0)) {
            throw bad("core-loss resistance", coreLossResistance, "> 0 ohm (infinite when lossless)");
        }
        if (!(loadResistance > 0)) {
            throw bad("load resistance", loadResistance, "> 0 ohm (infinite when unloaded)");
        }
        if (magnetizing == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "the circuit has no magnetizing curve");
        }
        if (exactness == null) {
            exactness = Exactness.GIVEN;
        }
        requirePositive("rated peak voltage", ratedPeak);
    }

    /** A circuit given directly, lossless and unloaded unless changed, with its source peak as 1 pu. */
    public static EquivalentCircuit of(double omega, double sourcePeak, double cs, double cg, SaturationCurve curve) {
        return new EquivalentCircuit(omega, sourcePeak, 0.0, cs, cg, Double.POSITIVE_INFINITY,
                Double.POSITIVE_INFINITY, curve, Exactness.GIVEN, sourcePeak > 0 ? sourcePeak : 1.0);
    }

    /** Total terminal capacitance Cs + Cg, F. */
    public double totalCapacitance() {
        return seriesCapacitance + shuntCapacitance;
    }

    /** Total shunt conductance at the terminal, 1/Rc + 1/Rload, S. */
    public double conductance() {
        return 1.0 / coreLossResistance + 1.0 / loadResistance;
    }

    public EquivalentCircuit withOmega(double w) {
        return new EquivalentCircuit(w, sourcePeak, sourceAngle, seriesCapacitance, shuntCapacitance,
                coreLossResistance, loadResistance, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withSourcePeak(double v) {
        return new EquivalentCircuit(omega, v, sourceAngle, seriesCapacitance, shuntCapacitance,
                coreLossResistance, loadResistance, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withSourceAngle(double rad) {
        return new EquivalentCircuit(omega, sourcePeak, rad, seriesCapacitance, shuntCapacitance,
                coreLossResistance, loadResistance, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withSeriesCapacitance(double c) {
        return new EquivalentCircuit(omega, sourcePeak, sourceAngle, c, shuntCapacitance,
                coreLossResistance, loadResistance, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withShuntCapacitance(double c) {
        return new EquivalentCircuit(omega, sourcePeak, sourceAngle, seriesCapacitance, c,
                coreLossResistance, loadResistance, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withCoreLossResistance(double r) {
        return new EquivalentCircuit(omega, sourcePeak, sourceAngle, seriesCapacitance, shuntCapacitance,
                r, loadResistance, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withLoadResistance(double r) {
        return new EquivalentCircuit(omega, sourcePeak, sourceAngle, seriesCapacitance, shuntCapacitance,
                coreLossResistance, r, magnetizing, exactness, ratedPeak);
    }

    public EquivalentCircuit withMagnetizing(SaturationCurve curve) {
        return new EquivalentCircuit(omega, sourcePeak, sourceAngle, seriesCapacitance, shuntCapacitance,
                coreLossResistance, loadResistance, curve, exactness, ratedPeak);
    }

    public EquivalentCircuit withRatedPeak(double v) {
        return new EquivalentCircuit(omega, sourcePeak, sourceAngle, seriesCapacitance, shuntCapacitance,
                coreLossResistance, loadResistance, magnetizing, exactness, v);
    }

    private static void requirePositive(String what, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw bad(what, v, "a finite value > 0");
        }
    }

    private static FerromapException bad(String what, double v, String allowed) {
        return new FerromapException(MessageKey.OUT_OF_RANGE, what + " = " + v + " is not allowed; expected " + allowed);
    }
}
