package org.ferromap.continuation;

/** Why a continuation step was refused (the step is then halved and tried again). */
public enum RejectionReason {
    /** The corrector did not converge within its iteration limit, diverged or met a singular system. */
    NO_CONVERGENCE,
    /** The tangent turned more than the angle guard allows: the step may have jumped branches. */
    ANGLE_TOO_LARGE,
    /** A parameter changed more than its cap in one step. */
    PARAMETER_STEP_TOO_LARGE,
    /** The tangent at the corrected point could not be computed (singular bordered Jacobian). */
    SINGULAR_TANGENT
}
