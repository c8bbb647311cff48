package org.ferromap.balance;

/**
 * What a steady state is, by the branch of the balance it lies on (DOMAIN.md §3, §6).
 * With a fold pair, the branch below the jump-up fold is normal, the part between the folds is
 * unstable and the branch above the jump-down fold is ferroresonant. With no fold pair the branch
 * is single: normal while the loop is inductive, ferroresonant once saturation has turned it
 * capacitive (only possible when the small-signal loop is inductive).
 */
public enum PointKind {
    NORMAL("normal"),
    UNSTABLE("unstable"),
    FERRORESONANT("ferroresonant");

    private final String label;

    PointKind(String label) {
        this.label = label;
    }

    /** Lower-case label for reports and JSON. */
    public String label() {
        return label;
    }
}
