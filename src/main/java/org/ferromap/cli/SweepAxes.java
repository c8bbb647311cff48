package org.ferromap.cli;

import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.SweepParameter;
import org.ferromap.units.Constants;
import org.ferromap.units.Form;
import org.ferromap.units.Quantities;
import org.ferromap.units.Quantity;

/** The study's sweep parameters as continuation axes, and their values as the user writes them. */
final class SweepAxes {

    private SweepAxes() {
    }

    /** The continuation axis of a sweep parameter: exact rates for circuit quantities, differenced for equipment ones. */
    static BalanceAxis axis(SweepParameter p) {
        return switch (p) {
            case SOURCE -> BalanceAxis.of(CircuitParameter.SOURCE);
            case SERIES_CAPACITANCE -> BalanceAxis.of(CircuitParameter.SERIES_CAPACITANCE);
            case SHUNT_CAPACITANCE -> BalanceAxis.of(CircuitParameter.SHUNT_CAPACITANCE);
            case CORE_LOSS_RESISTANCE -> BalanceAxis.of(CircuitParameter.CORE_LOSS_RESISTANCE);
            case LOAD_RESISTANCE -> BalanceAxis.of(CircuitParameter.LOAD_RESISTANCE);
            case FREQUENCY -> BalanceAxis.frequency();
            case SOURCE_LINE_VOLTAGE -> BalanceAxis.differenced(p.studyName(), "V", false);
            case CABLE_LENGTH -> BalanceAxis.differenced(p.studyName(), "m", false);
            case NO_LOAD_LOSS -> BalanceAxis.differenced(p.studyName(), "W", true);
            case SOURCE_ANGLE -> throw new FerromapException(MessageKey.BAD_REQUEST,
                    "source-angle cannot be continued: the steady states do not depend on it; choose another parameter");
        };
    }

    /**
     * A value as written ("60 kV peak", "0.5 uF", "3 km") in SI for the parameter: the source is
     * a peak and must say peak or rms (as in study files); the supply line voltage is rms unless
     * written peak.
     *
     * @param option the option's name, for messages
     */
    static double value(String text, SweepParameter p, String option) {
        Quantity q;
        try {
            q = Quantities.parse(text, p.dimension());
        } catch (FerromapException e) {
            throw new FerromapException(e.key(), option + ": " + e.getMessage(), e);
        }
        if (p == SweepParameter.SOURCE) {
            if (q.form() == Form.UNSPECIFIED) {
                throw new FerromapException(MessageKey.BAD_QUANTITY, option + ": '" + text
                        + "' does not say peak or rms; write e.g. '28.17 kV peak' or '19.92 kV rms'");
            }
            return q.form() == Form.RMS ? q.value() * Constants.SQRT2 : q.value();
        }
        if (p == SweepParameter.SOURCE_LINE_VOLTAGE) {
            return q.form() == Form.PEAK ? q.value() / Constants.SQRT2 : q.value();
        }
        return q.value();
    }
}
