package org.ferromap.balance;

/** Which single-harmonic steady state a balance branch starts from at its start value. */
public enum StartState {
    /** The normal state: the stable point of lowest flux. */
    NORMAL,
    /** The upper state: the stable point of highest flux (the ferroresonant state when the circuit is bistable). */
    UPPER
}
