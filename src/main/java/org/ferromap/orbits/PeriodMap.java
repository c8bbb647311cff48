package org.ferromap.orbits;

import org.ferromap.dynamics.DormandPrince853;

/**
 * The stroboscopic map of a {@link PeriodicSystem} on the section t = 0 mod T: P^k (k forcing
 * periods) and the half-period map Q(z) = -P_{T/2}(z) of symmetric systems, each with its
 * Jacobian (the monodromy matrix) from the variational equation Phi' = J Phi, and with the
 * integral of trace J along the way for Liouville's check det Phi = exp(integral of trace J).
 *
 * <p>State, fundamental matrix and trace integral are integrated as ONE primary system by the
 * dynamics package's {@link DormandPrince853}, so the step control watches the variations too.
 * Not thread-safe: a work area, one per thread.
 */
public final class PeriodMap {

    private final int n;
    private final double tolerance;
    private final int maxStepsPerPeriod;
    private final double[] w;
    private final double[] jac;
    private final double[] state;
    private final DormandPrince853.Rhs variational;
    private final DormandPrince853.Rhs plain;
    private DormandPrince853 withMatrix;
    private DormandPrince853 stateOnly;
    private double builtFor = Double.NaN;
    private PeriodicSystem system;
    private double traceIntegral;

    /**
     * @param dimension number of states n of the systems this map will integrate
     * @param tolerance relative tolerance of the integration, also absolute in the system's units
     * @param maxStepsPerPeriod integrator steps per forcing period beyond which the map fails
     */
    public PeriodMap(int dimension, double tolerance, int maxStepsPerPeriod) {
        this.n = dimension;
        this.tolerance = tolerance;
        this.maxStepsPerPeriod = maxStepsPerPeriod;
        this.w = new double[n + n * n + 1];
        this.jac = new double[n * n];
        this.state = new double[n];
        this.variational = this::variationalDerivatives;
        this.plain = (t, z, dz) -> system.derivatives(t, z, dz);
    }

    /** Number of states. */
    public int dimension() {
        return n;
    }

    /** Integration tolerance. */
    public double tolerance() {
        return tolerance;
    }

    /** The integral of trace J over the last map applied (with variations), in the system's units. */
    public double traceIntegral() {
        return traceIntegral;
    }

    /**
     * Applies P^k: the state k forcing periods later.
     *
     * @param sys the system, of this map's dimension
     * @param z state on the section, length n (not modified)
     * @param k forcing periods, &gt;= 1
     * @param image receives P^k(z), length n (may be z itself)
     * @param monodromy receives dP^k/dz row-major (n * n), or null if not wanted (then no
     *        variations are integrated)
     * @return how the integration ended
     */
    public DormandPrince853.Status apply(PeriodicSystem sys, double[] z, int k, double[] image, double[] monodromy) {
        return map(sys, z, k * sys.period(), k, 1.0, image, monodromy);
    }

    /**
     * Applies the half-period map Q(z) = -P_{T/2}(z) of a half-period symmetric system, whose fixed
     * points are the symmetric orbits (Q^2 = P).
     *
     * @param sys the system; must be half-period symmetric
     * @param z state on the section (not modified)
     * @param image receives Q(z)
     * @param monodromy receives dQ/dz = -Phi(T/2) row-major, or null
     * @return how the integration ended
     */
    public DormandPrince853.Status applyHalf(PeriodicSystem sys, double[] z, double[] image, double[] monodromy) {
        return map(sys, z, 0.5 * sys.period(), 1, -1.0, image, monodromy);
    }

    private DormandPrince853.Status map(PeriodicSystem sys, double[] z, double span, int periods, double sign,
            double[] image, double[] monodromy) {
        prepare(sys);
        DormandPrince853.Status status;
        if (monodromy == null) {
            System.arraycopy(z, 0, state, 0, n);
            stateOnly.reset();
            status = stateOnly.integrate(plain, 0.0, state, span, (long) periods * maxStepsPerPeriod, null);
            for (int i = 0; i < n; i++) {
                image[i] = sign * state[i];
            }
            return status;
        }
        System.arraycopy(z, 0, w, 0, n);
        java.util.Arrays.fill(w, n, w.length, 0.0);
        for (int i = 0; i < n; i++) {
            w[n + i * n + i] = 1.0;
        }
        withMatrix.reset();
        status = withMatrix.integrate(variational, 0.0, w, span, (long) periods * maxStepsPerPeriod, null);
        for (int i = 0; i < n; i++) {
            image[i] = sign * w[i];
        }
        for (int i = 0; i < n * n; i++) {
            monodromy[i] = sign * w[n + i];
        }
        traceIntegral = w[n + n * n];
        return status;
    }

    /**
     * Advances the state alone by k forcing periods (no variations), for transients and sweeps.
     *
     * @param sys the system
     * @param z state on the section, replaced by P^k(z)
     * @param k forcing periods, &gt;= 1
     * @return how the integration ended
     */
    public DormandPrince853.Status advance(PeriodicSystem sys, double[] z, int k) {
        prepare(sys);
        // Period by period, keeping the step size: long runs are many single periods.
        double period = sys.period();
        for (int j = 0; j < k; j++) {
            DormandPrince853.Status s = stateOnly.integrate(plain, j * period, z, (j + 1) * period, maxStepsPerPeriod, null);
            if (s != DormandPrince853.Status.OK) {
                return s;
            }
        }
        return DormandPrince853.Status.OK;
    }

    /** Forgets the step size of the state-only integrator: the next {@link #advance} starts afresh. */
    public void restart() {
        if (stateOnly != null) {
            stateOnly.reset();
        }
    }

    private void prepare(PeriodicSystem sys) {
        if (sys.dimension() != n) {
            throw new IllegalArgumentException("system dimension " + sys.dimension() + " differs from the map's " + n);
        }
        double period = sys.period();
        if (period != builtFor) {
            double minStep = 1e-13 * period;
            withMatrix = DormandPrince853.uniform(w.length, tolerance, tolerance, minStep, period);
            stateOnly = DormandPrince853.uniform(n, tolerance, tolerance, minStep, period);
            builtFor = period;
        }
        if (sys != system) {
            system = sys;
            stateOnly.reset();
        }
    }

    private void variationalDerivatives(double t, double[] y, double[] dy) {
        PeriodicSystem s = system;
        s.derivatives(t, y, dy);
        s.jacobian(t, y, jac);
        double trace = 0;
        for (int i = 0; i < n; i++) {
            trace += jac[i * n + i];
            for (int j = 0; j < n; j++) {
                double sum = 0;
                for (int m = 0; m < n; m++) {
                    sum += jac[i * n + m] * y[n + m * n + j];
                }
                dy[n + i * n + j] = sum;
            }
        }
        dy[n + n * n] = trace;
    }
}
