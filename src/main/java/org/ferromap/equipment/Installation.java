package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;

/**
 * One open-phase scenario as built: a balanced supply, a cable run and a transformer bank at its
 * far end, with one or two phases open at the supply end.
 *
 * @param sourceLineVoltage supply line-to-line voltage, V rms, &gt; 0
 * @param sourceAngle angle phi of the supply's phase a, e_a = E sin(w t + phi), rad
 * @param frequency supply frequency, Hz, &gt; 0
 * @param transformer the bank
 * @param cable the cable's capacitances per length
 * @param cableLength length of the run, m, &gt; 0
 * @param openPhases the open-phase case
 */
public record Installation(
        double sourceLineVoltage,
        double sourceAngle,
        double frequency,
        Transformer transformer,
        Cable cable,
        double cableLength,
        OpenPhaseCase openPhases) {

    public Installation {
        if (!(sourceLineVoltage > 0) || Double.isInfinite(sourceLineVoltage)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "source line voltage = " + sourceLineVoltage
                    + " V is not allowed; expected a finite value > 0");
        }
        if (!Double.isFinite(sourceAngle)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "source angle = " + sourceAngle + " rad must be finite");
        }
        if (!(frequency > 0) || Double.isInfinite(frequency)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "frequency = " + frequency
                    + " Hz is not allowed; expected a finite value > 0");
        }
        if (!(cableLength > 0) || Double.isInfinite(cableLength)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "cable length = " + cableLength
                    + " m is not allowed; expected a finite value > 0");
        }
        if (transformer == null || cable == null || openPhases == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "an installation needs a transformer, a cable and an open-phase case");
        }
    }

    /** Supply angular frequency, rad/s. */
    public double omega() {
        return Constants.omega(frequency);
    }

    /** Supply phase-to-neutral peak voltage, V: sqrt(2) V_line / sqrt(3). */
    public double sourcePhasePeak() {
        return sourceLineVoltage * Constants.SQRT2 / Constants.SQRT3;
    }

    /** Ccs of the whole run, F. */
    public double coreToSheath() {
        return cable.coreToSheath() * cableLength;
    }

    /** Ccc of the whole run, F. */
    public double coreToCore() {
        return cable.coreToCore() * cableLength;
    }

    /** The linear loop of this case with the whole run's capacitances, F. */
    public OpenPhaseLoop loop() {
        return openPhases.loop(transformer.connection(), coreToSheath(), coreToCore());
    }

    public Installation withCableLength(double metres) {
        return new Installation(sourceLineVoltage, sourceAngle, frequency, transformer, cable, metres, openPhases);
    }

    public Installation withSourceLineVoltage(double volts) {
        return new Installation(volts, sourceAngle, frequency, transformer, cable, cableLength, openPhases);
    }

    public Installation withOpenPhases(OpenPhaseCase c) {
        return new Installation(sourceLineVoltage, sourceAngle, frequency, transformer, cable, cableLength, c);
    }

    public Installation withTransformer(Transformer t) {
        return new Installation(sourceLineVoltage, sourceAngle, frequency, t, cable, cableLength, openPhases);
    }

    public Installation withCable(Cable c) {
        return new Installation(sourceLineVoltage, sourceAngle, frequency, transformer, c, cableLength, openPhases);
    }
}
