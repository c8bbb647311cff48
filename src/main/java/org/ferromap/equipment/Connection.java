package org.ferromap.equipment;

/** Primary winding connection of a three-phase bank (IEEE Std C57.105 terms). */
public enum Connection {
    DELTA,
    UNGROUNDED_WYE,
    GROUNDED_WYE;

    /** Whether the primary neutral is not solidly tied to ground, so open phases float together. */
    public boolean isUngrounded() {
        return this != GROUNDED_WYE;
    }
}
