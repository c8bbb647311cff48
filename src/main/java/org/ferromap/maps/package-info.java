/**
 * Parameter maps: axes, grids, per-cell pure functions, executors, adaptive refinement, resumable tiles.
 * May use: balance, continuation, dynamics, orbits, circuit, equipment, units, errors.
 */
package org.ferromap.maps;
