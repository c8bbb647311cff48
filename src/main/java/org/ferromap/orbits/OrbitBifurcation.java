package org.ferromap.orbits;

/**
 * A bifurcation as the JSON contract lists it ({@code orbits.bifurcations[]}).
 *
 * @param type "fold", "period-doubling", "torus" or "pitchfork"
 * @param parameter parameter value, SI unit of the parameter continued
 * @param period period of the orbit that bifurcates, source periods
 */
public record OrbitBifurcation(String type, double parameter, int period) { }
