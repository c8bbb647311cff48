package org.ferromap.cli.run;

import org.ferromap.balance.BalanceAxis;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.SweepParameter;

/** The continuation axis of a study parameter, as the branch and folds commands use them. */
final class Axes {

    private Axes() {
    }

    static BalanceAxis of(SweepParameter p) {
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

    /** A default range around the study's value v: v/5 to 5v, or for the source up to past the jump-up fold. */
    static double[] around(double v) {
        return new double[] {v / 5, v * 5};
    }
}
