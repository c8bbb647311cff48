/**
 * Quantities as engineers write them ("34.5 kV", "0.28 uF/km") parsed to SI, per-unit bases, physical constants with their sources.
 * May use: errors.
 */
package org.ferromap.units;
