/**
 * Equivalent circuits: the single-phase LC loop, its reduction from equipment (with its exactness), the three-phase lumped network; each an ODE provider.
 * May use: equipment, units, errors.
 */
package org.ferromap.circuit;
