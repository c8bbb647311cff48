package org.ferromap.orbits;

import java.util.List;

/**
 * The {@code sweep} object of the JSON contract: stroboscopic samples against the parameter, SI.
 *
 * @param parameter the parameter swept (its enum name)
 * @param unit the parameter's SI unit
 * @param samples samples of every run, runs in order (per initial state: up, then down)
 */
public record SweepReport(String parameter, String unit, List<SweepSample> samples) {

    public SweepReport {
        samples = List.copyOf(samples);
    }
}
