/**
 * Periodic orbits: shooting on the stroboscopic map, Floquet multipliers, continuation of orbits and their bifurcations.
 * May use: dynamics, continuation, circuit, equipment, errors.
 */
package org.ferromap.orbits;
