package org.ferromap.balance;

/**
 * A fold of the steady-state branch in source voltage: a turning point where two steady states
 * meet and vanish (DOMAIN.md §3).
 *
 * @param sourcePeak peak source voltage at the fold, V
 * @param sourcePerUnit {@code sourcePeak} over the circuit's rated peak, per unit
 * @param flux peak flux linkage at the fold, Wb-turn
 * @param voltage peak voltage across the magnetizing branch at the fold, V
 * @param direction the jump the fold causes
 */
public record Fold(double sourcePeak, double sourcePerUnit, double flux, double voltage, FoldDirection direction) {
}
