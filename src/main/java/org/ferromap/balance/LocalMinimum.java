package org.ferromap.balance;

import java.util.function.DoubleUnaryOperator;

/**
 * Brent's derivative-free minimisation (golden section with parabolic steps) of a function on a
 * bracket. Hipparchus keeps its optimisers in a module this project does not depend on, so the
 * classic algorithm is written out here. Returns the abscissa; the value is at {@link #lastValue}.
 */
final class LocalMinimum {

    private static final double GOLDEN = 0.3819660112501051;

    private double lastValue;

    /** Value of the function at the abscissa returned by the last {@link #minimize} call. */
    double lastValue() {
        return lastValue;
    }

    /**
     * Abscissa of a local minimum of f in [a, b], to about rel |x| + abs (below ~1e-8 relative
     * only the value, not the abscissa, improves).
     */
    double minimize(DoubleUnaryOperator f, double a, double b, double rel, double abs, int maxEvaluations) {
        double x = a + GOLDEN * (b - a);
        double w = x;
        double v = x;
        double fx = f.applyAsDouble(x);
        double fw = fx;
        double fv = fx;
        double d = 0;
        double e = 0;
        for (int it = 0; it < maxEvaluations; it++) {
            double m = 0.5 * (a + b);
            double tol1 = rel * Math.abs(x) + abs;
            double tol2 = 2 * tol1;
            if (Math.abs(x - m) <= tol2 - 0.5 * (b - a)) {
                break;
            }
            boolean golden = true;
            if (Math.abs(e) > tol1) {
                double r = (x - w) * (fx - fv);
                double q = (x - v) * (fx - fw);
                double p = (x - v) * q - (x - w) * r;
                q = 2 * (q - r);
                if (q > 0) {
                    p = -p;
                } else {
                    q = -q;
                }
                double etemp = e;
                e = d;
                if (Math.abs(p) < Math.abs(0.5 * q * etemp) && p > q * (a - x) && p < q * (b - x)) {
                    d = p / q;
                    double u = x + d;
                    if (u - a < tol2 || b - u < tol2) {
                        d = x < m ? tol1 : -tol1;
                    }
                    golden = false;
                }
            }
            if (golden) {
                e = (x < m ? b : a) - x;
                d = GOLDEN * e;
            }
            double u = Math.abs(d) >= tol1 ? x + d : x + (d > 0 ? tol1 : -tol1);
            double fu = f.applyAsDouble(u);
            if (fu <= fx) {
                if (u < x) {
                    b = x;
                } else {
                    a = x;
                }
                v = w;
                fv = fw;
                w = x;
                fw = fx;
                x = u;
                fx = fu;
            } else {
                if (u < x) {
                    a = u;
                } else {
                    b = u;
                }
                if (fu <= fw || w == x) {
                    v = w;
                    fv = fw;
                    w = u;
                    fw = fu;
                } else if (fu <= fv || v == x || v == w) {
                    v = u;
                    fv = fu;
                }
            }
        }
        lastValue = fx;
        return x;
    }
}
