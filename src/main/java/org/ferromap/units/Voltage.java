package org.ferromap.units;

/**
 * A voltage as written, with its form. The caller decides what an unspecified form means
 * (nameplate voltages are rms by convention; a circuit source must say which).
 *
 * @param value V, in the form written
 * @param form PEAK, RMS or UNSPECIFIED
 */
public record Voltage(double value, Form form) {

    /** Peak value, V, taking an unspecified form as {@code assumed}. Sinusoid: peak = sqrt(2) rms. */
    public double peak(Form assumed) {
        Form f = form == Form.UNSPECIFIED ? assumed : form;
        return f == Form.RMS ? value * Constants.SQRT2 : value;
    }

    /** Rms value, V, taking an unspecified form as {@code assumed}. */
    public double rms(Form assumed) {
        Form f = form == Form.UNSPECIFIED ? assumed : form;
        return f == Form.PEAK ? value / Constants.SQRT2 : value;
    }
}
