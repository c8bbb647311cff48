package org.ferromap.errors;

/**
 * The catalogue of failures ferromap reports. Tests assert on these keys; wording may change.
 * Keys marked "input" are the user's to fix (the command line exits 2); the rest are solver
 * outcomes that a command reports as a result, not as a crash.
 */
public enum MessageKey {
    /** input: a quantity string that does not parse, or has a unit of the wrong dimension. */
    BAD_QUANTITY(true),
    /** input: a value outside its allowed range (negative capacitance, even exponent, ...). */
    OUT_OF_RANGE(true),
    /** input: a saturation curve that is not monotone or has a non-positive slope. */
    NOT_MONOTONE(true),
    /** input: a required key is missing from the study. */
    MISSING_KEY(true),
    /** input: a key the study format does not know. */
    UNKNOWN_KEY(true),
    /** input: the study file cannot be read or is not YAML. */
    UNREADABLE_FILE(true),
    /** input: a request (parameter name, range, grid) that cannot be honoured. */
    BAD_REQUEST(true),
    /** input: a request that would not fit in memory. */
    TOO_LARGE(true),
    /** input: an output folder that cannot be written. */
    CANNOT_WRITE(true),
    /** solver: Newton or a corrector did not converge. */
    NO_CONVERGENCE(false),
    /** solver: a time integration failed (step size underflow, stiffness). */
    INTEGRATION_FAILED(false),
    /** solver: a singular linear system where a regular one was needed. */
    SINGULAR(false),
    /** run: stopped on request (Ctrl-C, thread interrupt) after saving the work finished so far. */
    INTERRUPTED(false);

    private final boolean input;

    MessageKey(boolean input) {
        this.input = input;
    }

    /** Whether the failure is the user's input to fix (exit code 2) rather than a solver outcome. */
    public boolean isInputError() {
        return input;
    }
}
