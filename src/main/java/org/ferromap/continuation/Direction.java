package org.ferromap.continuation;

/** Which way a run leaves its start point: the sign of the continuation parameter's first change. */
public enum Direction {
    /** The parameter (p for branches, q for fold curves) increases at the start. */
    INCREASING,
    /** The parameter decreases at the start. */
    DECREASING;

    int sign() {
        return this == INCREASING ? 1 : -1;
    }
}
