package org.ferromap.circuit;

import org.ferromap.equipment.SaturationCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * One primary winding of a bank as the network sees it: the nonlinear magnetizing branch in
 * parallel with the core-loss resistance and an optional resistive load referred to the primary.
 * Everything is in the winding's own terms: for a delta primary the flux linkage and current of
 * the winding between two line terminals, for a wye primary those of the phase winding.
 *
 * @param magnetizing i(lambda) of this winding, flux linkage in Wb-turn, current in A
 * @param coreLossResistance ohm, &gt; 0; {@code Double.POSITIVE_INFINITY} when lossless
 * @param loadResistance ohm referred to the primary winding, &gt; 0; {@code Double.POSITIVE_INFINITY} when unloaded
 */
public record WindingBranch(SaturationCurve magnetizing, double coreLossResistance, double loadResistance) {

    public WindingBranch {
        if (magnetizing == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "a winding has no magnetizing curve");
        }
        if (!(coreLossResistance > 0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "core-loss resistance = " + coreLossResistance + " ohm; expected > 0 (infinite when lossless)");
        }
        if (!(loadResistance > 0)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "load resistance = " + loadResistance + " ohm; expected > 0 (infinite when unloaded)");
        }
    }

    /** A lossless, unloaded winding. */
    public static WindingBranch lossless(SaturationCurve magnetizing) {
        return new WindingBranch(magnetizing, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY);
    }

    /** An unloaded winding with core loss. */
    public static WindingBranch withLoss(SaturationCurve magnetizing, double coreLossResistance) {
        return new WindingBranch(magnetizing, coreLossResistance, Double.POSITIVE_INFINITY);
    }

    /** Total parallel conductance 1/Rc + 1/Rload, S. */
    public double conductance() {
        return 1.0 / coreLossResistance + 1.0 / loadResistance;
    }

    public WindingBranch withMagnetizing(SaturationCurve curve) {
        return new WindingBranch(curve, coreLossResistance, loadResistance);
    }

    public WindingBranch withCoreLossResistance(double ohm) {
        return new WindingBranch(magnetizing, ohm, loadResistance);
    }

    public WindingBranch withLoadResistance(double ohm) {
        return new WindingBranch(magnetizing, coreLossResistance, ohm);
    }
}
