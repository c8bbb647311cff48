/**
 * Harmonic balance of the equivalent circuit: single-harmonic (the graphical method) operating points and folds, closed forms, multi-harmonic residuals by the alternating frequency-time method.
 * May use: circuit, equipment, continuation, errors.
 */
package org.ferromap.balance;
