package org.ferromap.units;

/**
 * A parsed quantity.
 *
 * @param value the value in the SI unit of its dimension ({@link Dimension#siUnit()}); angles in
 *        rad, percentages as fractions, cycles as a count of source cycles
 * @param dimension what kind of quantity it is
 * @param form peak or rms where written (voltages and currents only), otherwise UNSPECIFIED
 * @param text the text as the user wrote it, for messages
 */
public record Quantity(double value, Dimension dimension, Form form, String text) {
}
