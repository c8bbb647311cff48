package org.ferromap.orbits;

import java.util.List;

/**
 * The {@code orbits} object of the JSON contract: branch points and bifurcations in SI.
 *
 * @param parameter the parameter continued (its enum name)
 * @param unit the parameter's SI unit
 * @param points orbit points in branch order (several branches follow one another)
 * @param bifurcations located bifurcations
 */
public record OrbitsReport(String parameter, String unit, List<OrbitPoint> points, List<OrbitBifurcation> bifurcations) {

    public OrbitsReport {
        points = List.copyOf(points);
        bifurcations = List.copyOf(bifurcations);
    }
}
