package org.ferromap.circuit;

/** How faithfully a single-phase equivalent circuit stands for the network it came from (DOMAIN.md §1.2). */
public enum Exactness {
    /** Given directly in the study: nothing was reduced. */
    GIVEN("given directly; no reduction"),
    /** The reduction is exact, nonlinear branch included. */
    EXACT("exact reduction, nonlinear branch included"),
    /** Only the linear part reduces exactly; the energized windings carry their own excitation. */
    LINEAR_ONLY("exact for the linear network only; screening estimate, confirm with the three-phase simulation"),
    /** Magnetic coupling of a multi-legged core is not represented. */
    CORE_COUPLING_IGNORED("multi-legged core coupling not represented; the estimate may be far off");

    private final String explanation;

    Exactness(String explanation) {
        this.explanation = explanation;
    }

    /** One line saying what the user may rely on. */
    public String explanation() {
        return explanation;
    }
}
