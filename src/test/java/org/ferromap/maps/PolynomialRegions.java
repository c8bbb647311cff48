package org.ferromap.maps;

/**
 * The regions of the single-harmonic balance of i = a lambda + b lambda^n in closed form
 * (DOMAIN.md §3 [der]), written here independently of the balance package: kappa = w^2 C - a,
 * delta = w G, m = n - 1, beta = k_n b, x = beta Lambda^m; folds at the roots of
 * (1+m) x^2 - (2+m) kappa x + kappa^2 + delta^2 = 0 (smaller: jump-up, larger: jump-down),
 * E = Lambda sqrt((x - kappa)^2 + delta^2) / (w Cs); a fold pair exists only if
 * kappa &gt; (2 sqrt(n)/(n-1)) delta (the cusp). Without a fold pair the single branch turns
 * capacitive where I1 = w^2 C Lambda, i.e. x = kappa, at E = Lambda(kappa) delta / (w Cs) [der:
 * the same balance equation with I1/Lambda = w^2 C].
 */
final class PolynomialRegions {

    final double w;
    final double a;
    final double b;
    final int n;
    final double cg;
    final double g;

    PolynomialRegions(double w, double a, double b, int n, double cg, double g) {
        this.w = w;
        this.a = a;
        this.b = b;
        this.n = n;
        this.cg = cg;
        this.g = g;
    }

    /** k_n = C(n, (n-1)/2) / 2^(n-1) (DOMAIN.md §3). */
    double kn() {
        double c = 1;
        int k = (n - 1) / 2;
        for (int i = 1; i <= k; i++) {
            c = c * (n - k + i) / i;
        }
        return c / Math.pow(2, n - 1);
    }

    double cusp() {
        return 2 * Math.sqrt(n) / (n - 1);
    }

    /** Source peaks {jump-up, jump-down} of the fold pair at series capacitance cs, or null without one. */
    double[] folds(double cs) {
        double kappa = w * w * (cs + cg) - a;
        double delta = w * g;
        if (!(kappa > cusp() * delta)) {
            return null;
        }
        int m = n - 1;
        double qa = 1 + m;
        double qb = -(2 + m) * kappa;
        double qc = kappa * kappa + delta * delta;
        double disc = Math.sqrt(qb * qb - 4 * qa * qc);
        double xUp = (-qb - disc) / (2 * qa);
        double xDown = (-qb + disc) / (2 * qa);
        return new double[] {source(xUp, kappa, delta, cs), source(xDown, kappa, delta, cs)};
    }

    /** Source peak where the single branch turns capacitive, or NaN when it never does (kappa &lt;= 0). */
    double turn(double cs) {
        double kappa = w * w * (cs + cg) - a;
        return kappa > 0 ? source(kappa, kappa, w * g, cs) : Double.NaN;
    }

    private double source(double x, double kappa, double delta, double cs) {
        double lambda = Math.pow(x / (kn() * b), 1.0 / (n - 1));
        return lambda * Math.sqrt((x - kappa) * (x - kappa) + delta * delta) / (w * cs);
    }

    /** Whether a stable normal state exists at source peak e and series capacitance cs. */
    boolean normal(double e, double cs) {
        double[] f = folds(cs);
        if (f != null) {
            return e < f[0];
        }
        double t = turn(cs);
        return Double.isNaN(t) || e < t;
    }

    /** Whether a stable ferroresonant state exists. */
    boolean ferro(double e, double cs) {
        double[] f = folds(cs);
        if (f != null) {
            return e > f[1];
        }
        double t = turn(cs);
        return !Double.isNaN(t) && e > t;
    }

    /** Category code as {@link BalanceCell} writes it. */
    int category(double e, double cs) {
        boolean nn = normal(e, cs);
        boolean ff = ferro(e, cs);
        return nn && ff ? BalanceCell.AT_RISK : nn ? BalanceCell.SAFE : BalanceCell.FERRO_ONLY;
    }

    /** Series capacitance at the cusp: C_min - Cg, C_min = (a + (2 sqrt(n)/(n-1)) w G) / w^2. */
    double cuspSeriesCapacitance() {
        return (a + cusp() * w * g) / (w * w) - cg;
    }

    /** Source peak at the cusp: x = kappa (n+1)/(2n) with kappa = (2 sqrt(n)/(n-1)) delta. */
    double cuspSource() {
        double delta = w * g;
        double kappa = cusp() * delta;
        double x = kappa * (n + 1) / (2.0 * n);
        return source(x, kappa, delta, cuspSeriesCapacitance());
    }
}
