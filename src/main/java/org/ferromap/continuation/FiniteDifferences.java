package org.ferromap.continuation;

/** Step sizes of the difference quotients the engine uses, with the reason for each. */
final class FiniteDifferences {

    /**
     * Relative step of central first differences, eps^(1/3): balances the O(h^2) truncation error
     * against the O(eps/h) rounding error, leaving about 1e-11 relative error.
     */
    static final double CENTRAL_STEP = Math.cbrt(Math.ulp(1.0));

    /**
     * Step (scaled variables) of the central difference of the Jacobian along the null vector
     * that gives the gradient of the fold test function and the cusp coefficient. With an
     * analytic Jacobian the error is about 1e-8 (truncation) plus 1e-12 (rounding); with a
     * differenced Jacobian its 1e-11 error is amplified to about 1e-7, still enough for Newton.
     */
    static final double SECOND_STEP = 1e-4;

    private FiniteDifferences() {
    }
}
