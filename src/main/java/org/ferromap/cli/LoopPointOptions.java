package org.ferromap.cli;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.DampingSettings;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;
import org.ferromap.units.Quantities;
import picocli.CommandLine.Option;

/** The cable length and voltage at which a deliverable is evaluated (damping, odds), both optional. */
final class LoopPointOptions {

    @Option(names = "--length", paramLabel = "Q", description = "Cable length, e.g. 1.2 km (default: the study's).")
    String length;

    @Option(names = "--voltage", paramLabel = "Q", description = {"Supply line-to-line voltage, e.g. 26 kV (equipment studies),",
        "or the source with peak/rms (circuit studies). Default: the study's."})
    String voltage;

    /** The length asked for, m, or null; refused for circuit-form studies and when not positive. */
    Double length(Study s) {
        if (length == null) {
            return null;
        }
        if (!s.isEquipmentForm()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--length needs an equipment-form study; this one gives the circuit only");
        }
        double v = Quantities.si(length, Dimension.LENGTH);
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "--length " + length + " is not allowed; expected a value above 0");
        }
        return v;
    }

    /** The voltage asked for, V (line rms for equipment studies, source peak for circuits), or null. */
    Double voltage(Study s) {
        return voltage == null ? null : DampingSettings.voltage(voltage, s.isEquipmentForm());
    }
}
