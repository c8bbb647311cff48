package org.ferromap.dynamics;

/** The state a simulated circuit settles into (DOMAIN.md §6). */
public enum SteadyMode {
    /** Periodic at the source period on the inductive (normal) branch, below the peak threshold. */
    NORMAL("normal"),
    /** Periodic at the source period on the capacitive branch, or above the peak threshold. */
    FUNDAMENTAL("fundamental"),
    /** Periodic at a multiple p &gt; 1 of the source period. */
    SUBHARMONIC("subharmonic"),
    /** Bounded, not periodic, largest Lyapunov exponent about zero and 0-1 test near 0. */
    QUASI_PERIODIC("quasi-periodic"),
    /** Positive largest Lyapunov exponent and 0-1 test near 1. */
    CHAOTIC("chaotic"),
    /** No verdict: the integration failed or the indicators disagree; the result says why. */
    UNDETERMINED("undetermined");

    private final String label;

    SteadyMode(String label) {
        this.label = label;
    }

    /** The name used in reports and JSON. */
    public String label() {
        return label;
    }
}
