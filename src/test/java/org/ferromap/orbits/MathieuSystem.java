package org.ferromap.orbits;

/**
 * Mathieu's equation x'' + (a - 2 q cos 2t) x = 0 as a first-order system (x, x'), period pi:
 * a linear periodic ODE with trace zero, so det M = 1 (Liouville).
 */
record MathieuSystem(double a, double q) implements PeriodicSystem {

    @Override
    public int dimension() {
        return 2;
    }

    @Override
    public double period() {
        return Math.PI;
    }

    @Override
    public void derivatives(double t, double[] z, double[] dz) {
        dz[0] = z[1];
        dz[1] = -(a - 2 * q * Math.cos(2 * t)) * z[0];
    }

    @Override
    public void jacobian(double t, double[] z, double[] jac) {
        jac[0] = 0;
        jac[1] = 1;
        jac[2] = -(a - 2 * q * Math.cos(2 * t));
        jac[3] = 0;
    }
}
