package org.ferromap.orbits;

/**
 * One stroboscopic sample of a brute-force sweep as the JSON contract lists it ({@code sweep.samples[]}).
 *
 * @param parameter parameter value, SI unit of the parameter swept
 * @param flux flux linkage at t = 0 mod T, Wb-turn
 * @param voltage terminal voltage at t = 0 mod T, V
 */
public record SweepSample(double parameter, double flux, double voltage) { }
