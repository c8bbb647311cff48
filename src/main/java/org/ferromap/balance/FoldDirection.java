package org.ferromap.balance;

/** Which jump a fold in source voltage causes. */
public enum FoldDirection {
    /** The normal (or a lower stable) branch ends as the source rises: the state jumps up. */
    JUMP_UP("jump up"),
    /** The ferroresonant (upper stable) branch ends as the source falls: the state drops back. */
    JUMP_DOWN("jump down");

    private final String label;

    FoldDirection(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
