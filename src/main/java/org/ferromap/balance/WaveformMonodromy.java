package org.ferromap.balance;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Floquet exponents of m u'' + c u' + p(tau) u = 0 by integrating the fundamental matrix over one
 * period (Hipparchus Dormand-Prince 8(5,3), tolerances 1e-12), p(tau) given as a function. Used
 * when the Hill eigenproblem fails or does not pass its Liouville check; exact up to the
 * integration tolerance, with no truncation or sorting.
 */
final class WaveformMonodromy {

    /** p(tau), per unit. */
    interface Coefficient {
        double at(double tau);
    }

    private WaveformMonodromy() { }

    static FloquetExponents exponents(double inertia, double damping, Coefficient p, double omega) {
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 4;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double q = p.at(t) / inertia;
                double c = damping / inertia;
                // Columns (y0, y1) and (y2, y3) of the fundamental matrix, each (u, u').
                return new double[] {y[1], -q * y[0] - c * y[1], y[3], -q * y[2] - c * y[3]};
            }
        };
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-9, 2 * Math.PI, 1e-12, 1e-12);
        ODEStateAndDerivative end = integrator.integrate(ode, new ODEState(0.0, new double[] {1, 0, 0, 1}), 2 * Math.PI);
        double[] m = end.getPrimaryState();
        double a = m[0];
        double b = m[2];
        double cc = m[1];
        double d = m[3];
        double tr = a + d;
        double det = a * d - b * cc;
        double disc = tr * tr / 4 - det;
        double[] mr = new double[2];
        double[] mi = new double[2];
        if (disc >= 0) {
            double r = Math.sqrt(disc);
            // Stable pair: the larger root directly, the other from the determinant.
            double big = tr / 2 + Math.copySign(r, tr);
            mr[0] = big;
            mr[1] = big != 0 ? det / big : tr / 2 - Math.copySign(r, tr);
        } else {
            mr[0] = tr / 2;
            mr[1] = tr / 2;
            mi[0] = Math.sqrt(-disc);
            mi[1] = -mi[0];
        }
        double[] re = new double[2];
        double[] im = new double[2];
        for (int i = 0; i < 2; i++) {
            double mod = Math.hypot(mr[i], mi[i]);
            re[i] = Math.log(mod) / (2 * Math.PI) * omega;
            im[i] = Math.atan2(mi[i], mr[i]) / (2 * Math.PI) * omega;
        }
        double mismatch = Math.abs(Math.log(Math.abs(det)) / (2 * Math.PI) + damping / inertia) * omega;
        double decay = damping / inertia;
        boolean stable = Math.max(re[0], re[1]) / omega < -1e-9 * Math.max(1, decay);
        return new FloquetExponents(re, im, mr, mi, stable, mismatch, 0);
    }
}
