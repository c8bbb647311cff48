package org.ferromap.equipment;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;
import org.ferromap.units.PerUnitBase;

/**
 * A three-phase distribution transformer bank as the open-phase studies need it: its nameplate,
 * its primary connection and core construction, its no-load test figures, and the magnetizing
 * curve of one primary winding.
 *
 * <p>The curve is that of one winding <em>as connected</em>, in absolute units (flux linkage in
 * Wb-turn, peak current in A): a delta winding sits at line voltage, a wye winding at phase
 * voltage. {@link #wyeEquivalentCurve()} gives its per-phase wye-equivalent (the terms of
 * DOMAIN.md §1.2's table and of the linear figures here: X_m, Lm, R); the reductions form their loop
 * curves from the winding curve itself. A curve given per unit of rated winding peak flux and
 * current converts through {@link #windingBase()} ({@link #withPerUnitCurve}).
 *
 * @param rating three-phase rating S, VA, &gt; 0
 * @param primaryVoltage rated primary line-to-line voltage, V rms, &gt; 0
 * @param ratedFrequency rated frequency, Hz, &gt; 0 (the exciting current is stated at it)
 * @param connection primary connection
 * @param core magnetic construction
 * @param excitingCurrent no-load current at rated voltage as a fraction of rated current
 *        (0.008 for 0.8 %), in (0, 1)
 * @param noLoadLoss three-phase no-load (core) loss at rated voltage, W, &gt;= 0; 0 = lossless
 * @param phaseCurve magnetizing curve of one primary winding as connected, absolute units
 */
public record Transformer(
        double rating,
        double primaryVoltage,
        double ratedFrequency,
        Connection connection,
        CoreType core,
        double excitingCurrent,
        double noLoadLoss,
        SaturationCurve phaseCurve) {

    public Transformer {
        positive("rating", rating, "VA");
        positive("primary voltage", primaryVoltage, "V rms line-to-line");
        positive("rated frequency", ratedFrequency, "Hz");
        if (connection == null || core == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "a transformer needs its connection and its core type");
        }
        if (!(excitingCurrent > 0 && excitingCurrent < 1)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "exciting current = " + excitingCurrent
                    + " of rated current is not allowed; expected a fraction between 0 and 1 (0.2 % to 2 % is typical)");
        }
        if (!(noLoadLoss >= 0) || Double.isInfinite(noLoadLoss)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "no-load loss = " + noLoadLoss
                    + " W is not allowed; expected a finite value >= 0 W");
        }
        if (phaseCurve == null) {
            throw new FerromapException(MessageKey.MISSING_KEY, "a transformer needs its magnetizing (saturation) curve");
        }
    }

    /** Rated voltage across one primary winding, V rms: line voltage for delta, phase voltage for wye. */
    public double windingVoltage() {
        return connection == Connection.DELTA ? primaryVoltage : primaryVoltage / Constants.SQRT3;
    }

    /** Rated current of one primary winding, A rms: S / (3 V_winding). */
    public double windingCurrent() {
        return rating / (3.0 * windingVoltage());
    }

    /** Rated angular frequency, rad/s. */
    public double ratedOmega() {
        return Constants.omega(ratedFrequency);
    }

    /** Per-unit base of one winding on peaks: sqrt(2) V_winding, sqrt(2) I_winding, rated omega. */
    public PerUnitBase windingBase() {
        return windingBase(rating, primaryVoltage, connection, ratedFrequency);
    }

    /** Per-unit base of one winding for the given nameplate, on peaks (see {@link #windingBase()}). */
    public static PerUnitBase windingBase(double rating, double primaryVoltage, Connection connection, double ratedFrequency) {
        double vw = connection == Connection.DELTA ? primaryVoltage : primaryVoltage / Constants.SQRT3;
        return PerUnitBase.fromRms(vw, rating / (3.0 * vw), Constants.omega(ratedFrequency));
    }

    /** Rated phase-to-neutral voltage, peak V: sqrt(2) V_line / sqrt(3). */
    public double ratedPhasePeak() {
        return primaryVoltage * Constants.SQRT2 / Constants.SQRT3;
    }

    /**
     * Linear magnetizing reactance per phase, wye-equivalent, ohm, at rated frequency:
     * X_m = V_line^2 / (I0 S), that is 1e5 V_kV^2 / (I0% S_kVA) (DOMAIN.md §4 [der]).
     */
    public double magnetizingReactance() {
        return primaryVoltage * primaryVoltage / (excitingCurrent * rating);
    }

    /** Linear magnetizing inductance Lm per phase, wye-equivalent, H: X_m / omega_rated. */
    public double magnetizingInductance() {
        return magnetizingReactance() / ratedOmega();
    }

    /**
     * Core-loss resistance per phase, wye-equivalent, ohm: each phase dissipates P/3 at
     * V_phase, so R = 3 V_phase^2 / P = V_line^2 / P; infinite when lossless.
     */
    public double coreLossResistance() {
        return noLoadLoss > 0 ? primaryVoltage * primaryVoltage / noLoadLoss : Double.POSITIVE_INFINITY;
    }

    /**
     * The magnetizing curve per phase in wye-equivalent terms. For wye windings it is the
     * winding curve; a delta winding at line voltage maps to lambda_Y = lambda_D / sqrt(3),
     * i_Y = sqrt(3) i_D (so L_Y = L_D / 3).
     */
    public SaturationCurve wyeEquivalentCurve() {
        if (connection != Connection.DELTA) {
            return phaseCurve;
        }
        return new ScaledCurve(phaseCurve, 1.0 / Constants.SQRT3, Constants.SQRT3);
    }

    /**
     * A copy whose winding curve is given per unit of the rated winding peak flux and current
     * ({@link #windingBase()}): i(lambda) = I_b i_pu(lambda / lambda_b).
     */
    public Transformer withPerUnitCurve(SaturationCurve perUnitCurve) {
        PerUnitBase b = windingBase();
        return withPhaseCurve(new ScaledCurve(perUnitCurve, b.flux(), b.current()));
    }

    public Transformer withPhaseCurve(SaturationCurve c) {
        return new Transformer(rating, primaryVoltage, ratedFrequency, connection, core, excitingCurrent, noLoadLoss, c);
    }

    public Transformer withConnection(Connection c) {
        return new Transformer(rating, primaryVoltage, ratedFrequency, c, core, excitingCurrent, noLoadLoss, phaseCurve);
    }

    public Transformer withCore(CoreType c) {
        return new Transformer(rating, primaryVoltage, ratedFrequency, connection, c, excitingCurrent, noLoadLoss, phaseCurve);
    }

    public Transformer withExcitingCurrent(double fraction) {
        return new Transformer(rating, primaryVoltage, ratedFrequency, connection, core, fraction, noLoadLoss, phaseCurve);
    }

    public Transformer withNoLoadLoss(double watts) {
        return new Transformer(rating, primaryVoltage, ratedFrequency, connection, core, excitingCurrent, watts, phaseCurve);
    }

    private static void positive(String what, double v, String unit) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    what + " = " + v + " is not allowed; expected a finite value > 0 " + unit);
        }
    }
}
