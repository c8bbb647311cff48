package org.ferromap.balance;

import java.util.function.DoubleUnaryOperator;

/**
 * Adaptive Gauss-Kronrod (7-point Gauss, 15-point Kronrod) quadrature on a finite interval.
 * Recursive bisection where the two rules disagree; no allocation per call beyond the stack.
 * Used for the slope of the describing function of curves without a closed form.
 */
final class GaussKronrod {

    /** Kronrod abscissae on [-1, 1], the positive half; odd indices are the Gauss points (published constants of the 7-15 pair). */
    private static final double[] XGK = {
        0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
        0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
        0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
        0.207784955007898467600689403773245, 0.0};
    /** Kronrod weights matching {@link #XGK}. */
    private static final double[] WGK = {
        0.022935322010529224963732008058970, 0.063092092629978553290700663189204,
        0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
        0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
        0.204432940075298892414161999234649, 0.209482141084727828012999174891714};
    /** Gauss weights for XGK[1], XGK[3], XGK[5], XGK[7]. */
    private static final double[] WG = {
        0.129484966168869693270611432679082, 0.279705391489276667901467771423780,
        0.381830050505118944950369775488975, 0.417959183673469387755102040816327};

    /** Deep enough to isolate a kink to 2^-40 of the interval; beyond that the rule's estimate is taken. */
    private static final int MAX_DEPTH = 40;

    private GaussKronrod() { }

    /**
     * Integral of f over [a, b] to about {@code relativeTolerance} of the integral's magnitude
     * (measured by a first 15-point pass), with an absolute floor {@code absoluteTolerance}.
     */
    static double integrate(DoubleUnaryOperator f, double a, double b, double relativeTolerance, double absoluteTolerance) {
        if (a == b) {
            return 0.0;
        }
        double[] ke = new double[2];
        rule(f, a, b, ke);
        double tol = Math.max(relativeTolerance * Math.abs(ke[0]), absoluteTolerance);
        if (Math.abs(ke[0] - ke[1]) <= tol) {
            return ke[0];
        }
        return adapt(f, a, b, tol / (b - a), 0, ke);
    }

    private static double adapt(DoubleUnaryOperator f, double a, double b, double tolPerLength, int depth, double[] ke) {
        double m = 0.5 * (a + b);
        rule(f, a, m, ke);
        double left = ke[0];
        double leftErr = Math.abs(ke[0] - ke[1]);
        rule(f, m, b, ke);
        double right = ke[0];
        double rightErr = Math.abs(ke[0] - ke[1]);
        double half = 0.5 * (b - a);
        if (depth < MAX_DEPTH && leftErr > tolPerLength * half) {
            left = adapt(f, a, m, tolPerLength, depth + 1, ke);
        }
        if (depth < MAX_DEPTH && rightErr > tolPerLength * half) {
            right = adapt(f, m, b, tolPerLength, depth + 1, ke);
        }
        return left + right;
    }

    /** Writes the Kronrod estimate to out[0] and the Gauss estimate to out[1]. */
    static void rule(DoubleUnaryOperator f, double a, double b, double[] out) {
        double c = 0.5 * (a + b);
        double h = 0.5 * (b - a);
        double fc = f.applyAsDouble(c);
        double k = fc * WGK[7];
        double g = fc * WG[3];
        for (int j = 0; j < 7; j++) {
            double dx = h * XGK[j];
            double s = f.applyAsDouble(c - dx) + f.applyAsDouble(c + dx);
            k += WGK[j] * s;
            if ((j & 1) == 1) {
                g += WG[j >> 1] * s;
            }
        }
        out[0] = k * h;
        out[1] = g * h;
    }
}
