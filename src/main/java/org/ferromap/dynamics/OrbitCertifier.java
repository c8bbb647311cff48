package org.ferromap.dynamics;

import java.util.Optional;

/**
 * Certifies that a trajectory has settled on a periodic orbit: Newton's method on P^k(z) - z = 0
 * from the current stroboscopic sample, with the monodromy matrix from the variational equation
 * as the Jacobian. A candidate order k is tried only when the samples nearly recur after k periods,
 * so failing attempts in chaotic runs stay cheap.
 *
 * <p>The rule (documented here because the classification rests on it): the state is certified
 * periodic of period p when Newton converges to z* with |P^k(z*) - z*| below the Newton tolerance,
 * every Floquet multiplier of z* has modulus below 1, z* lies within {@link #CAPTURE_RADIUS} of the
 * current sample, and the current sample is no farther from z* than the sample k periods before
 * (the trajectory is closing in). The period p is the least j dividing the orbit such that
 * P^j(z*) returns to z*.
 */
public final class OrbitCertifier {

    /** Largest distance, per unit, from the current sample at which a found orbit is accepted. */
    public static final double CAPTURE_RADIUS = 0.25;

    /** Near-recurrence, per unit, that makes an order k worth a Newton attempt. */
    public static final double RECURRENCE_RADIUS = 0.25;

    private static final int MAX_NEWTON = 10;
    private static final int MAX_CANDIDATES = 2;
    private static final double MAX_NEWTON_STEP = 0.5;

    private final StroboscopicMap map;
    private final double newtonTolerance;
    private final double[] image = new double[2];
    private final double[] jac = new double[4];
    private final double[] point = new double[2];

    /**
     * @param map the period map
     * @param integrationTolerance the tolerance the map integrates with; Newton stops at
     *        1000 times it (the map's own error over a few periods is well below that)
     */
    public OrbitCertifier(StroboscopicMap map, double integrationTolerance) {
        this.map = map;
        this.newtonTolerance = Math.max(1e-10, 1000 * integrationTolerance);
    }

    /** Residual below which Newton has converged, per unit. */
    public double newtonTolerance() {
        return newtonTolerance;
    }

    /**
     * Tries to certify from the newest stroboscopic sample.
     *
     * @param xs scaled flux samples, index 0 the switching instant
     * @param ys scaled voltage samples
     * @param newest index of the newest sample
     * @param oldest the earliest index the search may look back to (end of the transient)
     * @param maxOrder largest k tried
     * @return the orbit, if certified
     */
    public Optional<PeriodicOrbit> certify(double[] xs, double[] ys, int newest, int oldest, int maxOrder) {
        int tried = 0;
        for (int k = 1; k <= maxOrder && newest - k >= oldest && tried < MAX_CANDIDATES; k++) {
            double d = Math.hypot(xs[newest] - xs[newest - k], ys[newest] - ys[newest - k]);
            if (d > RECURRENCE_RADIUS) {
                continue;
            }
            tried++;
            Optional<PeriodicOrbit> orbit = newton(xs[newest], ys[newest], k);
            if (orbit.isEmpty()) {
                continue;
            }
            PeriodicOrbit o = orbit.get();
            double now = Math.hypot(xs[newest] - o.x(), ys[newest] - o.y());
            double before = Math.hypot(xs[newest - k] - o.x(), ys[newest - k] - o.y());
            if (o.isStable() && now <= CAPTURE_RADIUS && now <= before + newtonTolerance) {
                return orbit;
            }
        }
        return Optional.empty();
    }

    /**
     * Newton on P^k(z) - z from (x0, y0); on convergence reduces k to the least period and
     * returns the orbit with the monodromy over that period. Empty when Newton fails.
     */
    public Optional<PeriodicOrbit> newton(double x0, double y0, int k) {
        double x = x0;
        double y = y0;
        double residual = Double.POSITIVE_INFINITY;
        boolean converged = false;
        for (int it = 0; it < MAX_NEWTON; it++) {
            point[0] = x;
            point[1] = y;
            if (map.apply(point, k, image, jac) != DormandPrince853.Status.OK) {
                return Optional.empty();
            }
            double rx = image[0] - x;
            double ry = image[1] - y;
            residual = Math.hypot(rx, ry);
            if (!Double.isFinite(residual)) {
                return Optional.empty();
            }
            if (residual <= newtonTolerance * (1 + Math.hypot(x, y))) {
                converged = true;
                break;
            }
            // Solve (M - I) delta = -r.
            double a = jac[0] - 1;
            double b = jac[1];
            double c = jac[2];
            double d = jac[3] - 1;
            double det = a * d - b * c;
            if (!(Math.abs(det) > 1e-12 * (Math.abs(a * d) + Math.abs(b * c) + 1e-300))) {
                return Optional.empty();
            }
            double dx = (-rx * d + ry * b) / det;
            double dy = (-ry * a + rx * c) / det;
            double step = Math.hypot(dx, dy);
            if (step > MAX_NEWTON_STEP) {
                dx *= MAX_NEWTON_STEP / step;
                dy *= MAX_NEWTON_STEP / step;
            }
            x += dx;
            y += dy;
        }
        if (!converged) {
            return Optional.empty();
        }
        // Least period: the first j at which the orbit returns to the fixed point.
        int period = k;
        point[0] = x;
        point[1] = y;
        double[] p = {x, y};
        for (int j = 1; j < k; j++) {
            if (map.apply(p, 1, image, null) != DormandPrince853.Status.OK) {
                return Optional.empty();
            }
            p[0] = image[0];
            p[1] = image[1];
            if (k % j == 0 && Math.hypot(p[0] - x, p[1] - y) <= 10 * newtonTolerance * (1 + Math.hypot(x, y))) {
                period = j;
                break;
            }
        }
        point[0] = x;
        point[1] = y;
        if (map.apply(point, period, image, jac) != DormandPrince853.Status.OK) {
            return Optional.empty();
        }
        double res = Math.hypot(image[0] - x, image[1] - y);
        return Optional.of(new PeriodicOrbit(x, y, period, jac, res));
    }
}
