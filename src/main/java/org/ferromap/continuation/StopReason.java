package org.ferromap.continuation;

/** Why a continuation run ended. Every run ends with one; none of them is an exception. */
public enum StopReason {
    /** A parameter left its window; the last point lies on the window's edge when it could be resolved. */
    WINDOW_LEFT,
    /** The limit on accepted steps was reached. */
    MAX_STEPS,
    /** Steps kept failing until the step size fell below its minimum (see the rejected steps). */
    MIN_STEP,
    /** The branch came back to its start point: a closed curve, traced once. */
    BRANCH_CLOSED,
    /** The start point could not be corrected onto the branch, or its tangent was undefined. */
    START_FAILED
}
