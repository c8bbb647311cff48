package org.ferromap.equipment;

/** Magnetic construction of a three-phase bank's core. */
public enum CoreType {
    /** Three single-phase units or separate magnetic circuits: no coupling between phases. */
    SEPARATE_PHASE_CORES,
    /** Three-legged core: the open phase is back-fed through the shared yokes. */
    THREE_LEGGED,
    /** Five-legged (shell-like) core: outer legs give a zero-sequence flux path. */
    FIVE_LEGGED
}
