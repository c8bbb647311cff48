package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.dynamics.DormandPrince853;
import org.hipparchus.analysis.solvers.BrentSolver;

/**
 * Detects and locates bifurcations between consecutive points of a branch of fixed points of a
 * return map S (P^k or the half-period map): sign changes of the test functions
 * det(S - I), det(S + I) and prod (mu_i mu_j - 1), each located by Brent's method along the chord
 * between the two points, every trial point corrected back onto the branch in the hyperplane
 * orthogonal to the chord (so folds, where the parameter turns, are passed like any other point).
 *
 * <p>Classification: a multiplier +1 where the branch turns is a fold, elsewhere a pitchfork
 * (branch point); -1 on P^k is a period doubling, -1 on the half-period map a symmetry-breaking
 * pitchfork; a complex pair of modulus one a torus. Not thread-safe (uses the shooting work area).
 */
final class BifurcationLocator {

    /** Test values below this at both ends of an interval are numerical noise (e.g. det M = 1 exactly). */
    private static final double NOISE = 1e-9;
    private static final int MAX_CORRECTOR = 20;
    private static final int MAX_EVALUATIONS = 80;
    private static final double MODULUS_TOLERANCE = 1e-5;

    /** A branch point with the multipliers of the section map there. */
    record Sample(double[] z, double p, double tangentSign, FloquetMultipliers multipliers) { }

    private final Shooting shooting;
    private final DoubleFunction<? extends PeriodicSystem> family;
    private final Section section;
    private final double pScale;
    private final double locateTolerance;
    private final int n;
    private final PeriodMap map;

    /**
     * @param shooting work area and Newton tolerance
     * @param family the system at each parameter value
     * @param section the map whose fixed points make the branch
     * @param pScale a typical size of the parameter, its units (&gt; 0)
     * @param n number of states
     * @param locateTolerance accuracy of the location, relative to pScale
     */
    BifurcationLocator(Shooting shooting, DoubleFunction<? extends PeriodicSystem> family, Section section, double pScale,
            int n, double locateTolerance) {
        this.shooting = shooting;
        this.family = family;
        this.section = section;
        this.pScale = pScale;
        this.n = n;
        this.locateTolerance = locateTolerance;
        this.map = shooting.map(n);
    }

    /** The multipliers of the section map at a converged point; null if the integration fails. */
    Sample sample(double[] z, double p, double tangentSign) {
        double[] jac = new double[n * n];
        double[] image = new double[n];
        if (!apply(p, z, image, jac)) {
            return null;
        }
        return new Sample(z.clone(), p, tangentSign, FloquetMultipliers.of(jac, n));
    }

    /** All bifurcations between consecutive samples, in branch order. */
    List<LocatedBifurcation> scan(List<Sample> samples) {
        List<LocatedBifurcation> found = new ArrayList<>();
        for (int i = 0; i + 1 < samples.size(); i++) {
            Sample a = samples.get(i);
            Sample b = samples.get(i + 1);
            if (a == null || b == null) {
                continue;
            }
            for (int test = 0; test < 3; test++) {
                double fa = test(a.multipliers(), test);
                double fb = test(b.multipliers(), test);
                if (!(fa * fb < 0) || Math.max(Math.abs(fa), Math.abs(fb)) < NOISE) {
                    continue;
                }
                LocatedBifurcation lb = locate(a, b, i, test);
                if (lb != null) {
                    found.add(lb);
                }
            }
        }
        found.sort((x, y) -> x.afterIndex() != y.afterIndex() ? Integer.compare(x.afterIndex(), y.afterIndex()) : 0);
        return found;
    }

    static double test(FloquetMultipliers mu, int which) {
        return switch (which) {
            case 0 -> mu.plusOneTest();
            case 1 -> mu.minusOneTest();
            default -> mu.torusTest();
        };
    }

    private LocatedBifurcation locate(Sample a, Sample b, int index, int test) {
        double[] wa = scaled(a);
        double[] wb = scaled(b);
        double[] chord = new double[n + 1];
        for (int j = 0; j <= n; j++) {
            chord[j] = wb[j] - wa[j];
        }
        double[] point = new double[n + 1];
        FloquetMultipliers[] last = new FloquetMultipliers[1];
        double[] sLast = {Double.NaN};
        boolean located;
        double s;
        try {
            // Accuracy in s that gives locateTolerance (relative to pScale) in the scaled point.
            double absolute = Math.max(1e-15, locateTolerance / Math.max(1e-300, SmallLinear.norm(chord, n + 1)));
            BrentSolver brent = new BrentSolver(1e-15, absolute, 0.0);
            s = brent.solve(MAX_EVALUATIONS, t -> {
                FloquetMultipliers mu = correct(wa, chord, t, point);
                if (mu == null) {
                    throw new IllegalStateException("corrector failed at s = " + t);
                }
                last[0] = mu;
                sLast[0] = t;
                return test(mu, test);
            }, 0.0, 1.0);
            if (s != sLast[0]) {
                last[0] = correct(wa, chord, s, point);
            }
            located = last[0] != null;
        } catch (RuntimeException e) {
            located = false;
            s = Double.NaN;
        }
        if (!located) {
            // Interpolate the test function linearly between the two points.
            double fa = test(a.multipliers(), test);
            double fb = test(b.multipliers(), test);
            s = fa / (fa - fb);
            for (int j = 0; j <= n; j++) {
                point[j] = wa[j] + s * chord[j];
            }
            last[0] = s < 0.5 ? a.multipliers() : b.multipliers();
        }
        double[] z = new double[n];
        System.arraycopy(point, 0, z, 0, n);
        double p = point[n] * pScale;
        FloquetMultipliers mu = last[0];
        BifurcationType type;
        double[] critical;
        if (test == 0) {
            boolean turns;
            if (Double.isFinite(a.tangentSign()) && Double.isFinite(b.tangentSign())) {
                turns = a.tangentSign() * b.tangentSign() < 0;
            } else {
                turns = p >= Math.max(a.p(), b.p()) || p <= Math.min(a.p(), b.p());
            }
            type = turns ? BifurcationType.FOLD : BifurcationType.PITCHFORK;
            critical = nearest(mu, 1.0, 0.0);
        } else if (test == 1) {
            type = section.half() ? BifurcationType.PITCHFORK : BifurcationType.PERIOD_DOUBLING;
            critical = nearest(mu, -1.0, 0.0);
        } else {
            critical = complexOnCircle(mu);
            if (critical == null) {
                return null; // a neutral saddle: real multipliers whose product passes 1
            }
            type = BifurcationType.TORUS;
        }
        return new LocatedBifurcation(type, p, section.orbitPeriod(), section, z, mu, critical, index, located);
    }

    /**
     * Corrects the predictor wa + s * chord onto the branch within the hyperplane orthogonal to
     * the chord; writes the point into {@code w} and returns the section multipliers there, or
     * null when the corrector fails.
     */
    FloquetMultipliers correct(double[] wa, double[] chord, double s, double[] w) {
        int m = n + 1;
        double[] pred = new double[m];
        for (int j = 0; j < m; j++) {
            pred[j] = wa[j] + s * chord[j];
            w[j] = pred[j];
        }
        double[] image = new double[n];
        double[] jac = new double[n * n];
        double[] plus = new double[n];
        double[] minus = new double[n];
        double[] big = new double[m * m];
        double[] rhs = new double[m];
        double tol = shooting.settings().newtonTolerance();
        double[] z = new double[n];
        double chordNorm = SmallLinear.norm(chord, m);
        for (int it = 0; it < MAX_CORRECTOR; it++) {
            System.arraycopy(w, 0, z, 0, n);
            double q = w[m - 1];
            if (!apply(q * pScale, z, image, jac)) {
                return null;
            }
            double gNorm = 0;
            for (int i = 0; i < n; i++) {
                rhs[i] = -(image[i] - z[i]);
                gNorm += rhs[i] * rhs[i];
            }
            gNorm = Math.sqrt(gNorm);
            if (!Double.isFinite(gNorm)) {
                return null;
            }
            double c = 0;
            for (int j = 0; j < m; j++) {
                c += chord[j] * (w[j] - pred[j]);
            }
            if (gNorm <= tol * (1 + SmallLinear.norm(z, n)) && Math.abs(c) <= 1e-12 * chordNorm) {
                return FloquetMultipliers.of(jac, n);
            }
            rhs[n] = -c;
            // dG/dq by central differences in the parameter.
            double h = 1e-6 * Math.max(1.0, Math.abs(q));
            if (!apply((q + h) * pScale, z, plus, null)
                    || !apply((q - h) * pScale, z, minus, null)) {
                return null;
            }
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    big[i * m + j] = jac[i * n + j] - (i == j ? 1.0 : 0.0);
                }
                big[i * m + n] = (plus[i] - minus[i]) / (2 * h);
            }
            for (int j = 0; j < m; j++) {
                big[n * m + j] = chord[j];
            }
            if (!SmallLinear.solve(big, rhs, m)) {
                return null;
            }
            for (int j = 0; j < m; j++) {
                w[j] += rhs[j];
            }
        }
        return null;
    }

    /** One map evaluation; false when it fails or the parameter is outside the system's allowed range. */
    private boolean apply(double p, double[] z, double[] out, double[] jacobian) {
        try {
            return section.apply(map, family.apply(p), z, out, jacobian) == DormandPrince853.Status.OK;
        } catch (org.ferromap.errors.FerromapException e) {
            if (e.key() == org.ferromap.errors.MessageKey.OUT_OF_RANGE) {
                return false;
            }
            throw e;
        }
    }

    private double[] scaled(Sample s) {
        double[] w = new double[n + 1];
        System.arraycopy(s.z(), 0, w, 0, n);
        w[n] = s.p() / pScale;
        return w;
    }

    private static double[] nearest(FloquetMultipliers mu, double re, double im) {
        int best = 0;
        double d = Double.POSITIVE_INFINITY;
        for (int j = 0; j < mu.size(); j++) {
            double dj = Math.hypot(mu.re()[j] - re, mu.im()[j] - im);
            if (dj < d) {
                d = dj;
                best = j;
            }
        }
        return new double[] {mu.re()[best], mu.im()[best]};
    }

    private static double[] complexOnCircle(FloquetMultipliers mu) {
        double[] re = mu.re();
        double[] im = mu.im();
        for (int j = 0; j < mu.size(); j++) {
            if (im[j] > 0 && Math.abs(mu.modulus(j) - 1.0) < MODULUS_TOLERANCE) {
                return new double[] {re[j], im[j]};
            }
        }
        return null;
    }
}
