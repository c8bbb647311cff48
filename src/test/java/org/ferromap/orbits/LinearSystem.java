package org.ferromap.orbits;

/**
 * z' = A z + b cos(omega t): a forced linear system with constant A (row-major), period 2 pi / omega.
 * Its monodromy over one period is exp(A T) exactly.
 */
record LinearSystem(double[] a, double[] b, double omega) implements PeriodicSystem {

    @Override
    public int dimension() {
        return b.length;
    }

    @Override
    public double period() {
        return 2 * Math.PI / omega;
    }

    @Override
    public void derivatives(double t, double[] z, double[] dz) {
        int n = b.length;
        double c = Math.cos(omega * t);
        for (int i = 0; i < n; i++) {
            double s = b[i] * c;
            for (int j = 0; j < n; j++) {
                s += a[i * n + j] * z[j];
            }
            dz[i] = s;
        }
    }

    @Override
    public void jacobian(double t, double[] z, double[] jac) {
        System.arraycopy(a, 0, jac, 0, a.length);
    }
}
