package org.ferromap.orbits;

/** The bifurcations of periodic orbits that the orbit continuation reports, with their contract labels. */
public enum BifurcationType {
    /** A real multiplier passes +1 where the branch turns back in the parameter (saddle-node). */
    FOLD("fold"),
    /** A real multiplier passes -1: an orbit of twice the period is born (flip). */
    PERIOD_DOUBLING("period-doubling"),
    /** A complex pair of multipliers crosses the unit circle (Neimark-Sacker): an invariant torus. */
    TORUS("torus"),
    /**
     * A symmetry-breaking pitchfork: on the half-period map a multiplier passes -1 (a multiplier +1
     * of the full period map where the branch does not turn); a pair of asymmetric orbits is born.
     * Also used for any other simple branch point with a multiplier +1.
     */
    PITCHFORK("pitchfork");

    private final String label;

    BifurcationType(String label) {
        this.label = label;
    }

    /** The label of the JSON contract ("fold", "period-doubling", "torus", "pitchfork"). */
    public String label() {
        return label;
    }
}
