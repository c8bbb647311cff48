/**
 * Time-domain simulation: per-unit ODEs, switching events, stroboscopic sampling, steady-state certification, mode classification (spectrum, 0-1 test, Lyapunov exponent).
 * May use: circuit, equipment, errors.
 */
package org.ferromap.dynamics;
