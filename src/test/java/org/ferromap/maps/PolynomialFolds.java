package org.ferromap.maps;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.util.CombinatoricsUtils;

/**
 * The single-harmonic folds of the loop with i = a lambda + b lambda^n in closed form
 * (DOMAIN.md §3 [der]), written out here independently of the code under test: kappa = w^2 C - a,
 * delta = w G, m = n - 1, beta = k_n b with k_n = C(n,(n-1)/2)/2^(n-1) (Commons Math's binomial
 * coefficient); folds at the roots x of (1+m) x^2 - (2+m) kappa x + kappa^2 + delta^2 = 0, the
 * larger the jump-down fold; Lambda = (x/beta)^(1/m), E = Lambda sqrt((x - kappa)^2 + delta^2)/(w Cs).
 * The pair exists while kappa &gt; 2 sqrt(n) delta / (n-1) (the cusp).
 */
final class PolynomialFolds {

    final double a;
    final double b;
    final int n;
    final double w;

    PolynomialFolds(double a, double b, int n, double w) {
        this.a = a;
        this.b = b;
        this.n = n;
        this.w = w;
    }

    double kn() {
        return CombinatoricsUtils.binomialCoefficientDouble(n, (n - 1) / 2) / Math.pow(2, n - 1);
    }

    /** C_min = (a + (2 sqrt(n)/(n-1)) w G) / w^2. */
    double cuspCapacitance(double g) {
        return (a + 2 * Math.sqrt(n) / (n - 1) * w * g) / (w * w);
    }

    /** G_min = (w^2 C - a)(n-1)/(2 sqrt(n) w). */
    double cuspConductance(double c) {
        return (w * w * c - a) * (n - 1) / (2 * Math.sqrt(n) * w);
    }

    /** Source peak at which the pair is born when C = C_min (the double root x = (n+1) kappa/(2n)). */
    double birthSource(double g, double cs) {
        double delta = w * g;
        double kappa = 2 * Math.sqrt(n) / (n - 1) * delta;
        double x = (n + 1) * kappa / (2.0 * n);
        return source(x, kappa, delta, cs);
    }

    /** Source peak of the jump-down fold (the larger root), NaN without a pair. */
    double jumpDownSource(double c, double cs, double g) {
        double kappa = w * w * c - a;
        double delta = w * g;
        int m = n - 1;
        double disc = (2.0 + m) * (2.0 + m) * kappa * kappa - 4 * (1.0 + m) * (kappa * kappa + delta * delta);
        if (!(disc > 0) || kappa <= 0) {
            return Double.NaN;
        }
        double x = ((2.0 + m) * kappa + Math.sqrt(disc)) / (2 * (1.0 + m));
        return source(x, kappa, delta, cs);
    }

    private double source(double x, double kappa, double delta, double cs) {
        double lambda = Math.pow(x / (kn() * b), 1.0 / (n - 1));
        return lambda * Math.sqrt((x - kappa) * (x - kappa) + delta * delta) / (w * cs);
    }

    /**
     * The length at which the jump-down fold reaches the source e, for a loop whose series and
     * shunt capacitances grow as s l and q l: Commons Math's Brent solver on the closed form.
     */
    double crossingLength(double e, double s, double q, double g, double from, double to) {
        return new BrentSolver(1e-14 * to, 1e-14).solve(10000,
                l -> jumpDownSource((s + q) * l, s * l, g) - e, from, to);
    }
}
