package org.ferromap.orbits;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.Test;

/** Shooting and Floquet multipliers on forced linear systems, whose monodromy is exp(A T). */
class LinearOrbitTest {

    // x'' + c x' + w0^2 x = F cos(W t): c = 0.3, w0 = 1.2, F = 0.8, W = 0.9.
    private static final double C = 0.3;
    private static final double W0 = 1.2;
    private static final double F = 0.8;
    private static final double W = 0.9;
    private static final LinearSystem OSCILLATOR = new LinearSystem(new double[] {0, 1, -W0 * W0, -C},
            new double[] {0, F}, W);

    @Test
    void monodromyIsTheMatrixExponential() {
        Orbit o = new Shooting(ShootingSettings.DEFAULTS.withTolerance(1e-13, 1e-11)).solve(OSCILLATOR,
                new double[] {0, 0}, Section.periods(1));
        // exp(A T) in closed form [der]: with A's eigenvalues -c/2 +- i wd, wd = sqrt(w0^2 - c^2/4),
        // exp(A T) = exp(-c T/2) [cos(wd T) I + sin(wd T)/wd (A + c/2 I)].
        double t = 2 * Math.PI / W;
        double wd = Math.sqrt(W0 * W0 - C * C / 4);
        double e = Math.exp(-C * t / 2);
        double cs = Math.cos(wd * t);
        double sn = Math.sin(wd * t) / wd;
        double[] expected = {
            e * (cs + sn * (C / 2)), e * sn,
            e * sn * (-W0 * W0), e * (cs + sn * (-C + C / 2))};
        double[] m = o.monodromy();
        for (int i = 0; i < 4; i++) {
            // 1e-10: the brief's figure; the integration runs at 1e-13 so the bound has room.
            assertEquals(expected[i], m[i], 1e-10, "entry " + i + " of " + Arrays.toString(m));
        }
        // Liouville [der]: det M = exp(-c T); the figure the orbit reports must be at integration level.
        assertEquals(Math.exp(-C * t), o.monodromy()[0] * o.monodromy()[3] - o.monodromy()[1] * o.monodromy()[2], 1e-11);
        assertTrue(o.liouvilleDefect() < 1e-10, "Liouville defect " + o.liouvilleDefect());
        // Multipliers exp(lambda T) with lambda = -c/2 +- i wd [der], modulus exp(-c T / 2).
        assertEquals(e, o.multipliers().modulus(0), 1e-11);
        assertEquals(e * Math.cos(wd * t), o.multipliers().re()[0], 1e-11);
        assertEquals(e * Math.abs(Math.sin(wd * t)), Math.abs(o.multipliers().im()[0]), 1e-11);
        assertTrue(o.multiplierChange() < 1e-10, "multiplier change under a tighter tolerance " + o.multiplierChange());
        assertTrue(o.stable());
    }

    @Test
    void fixedPointIsTheSteadyStateResponse() {
        Orbit o = new Shooting(ShootingSettings.DEFAULTS).solve(OSCILLATOR, new double[] {1, 1}, Section.periods(1));
        // Steady state x = Re(F e^{iWt} / (w0^2 - W^2 + i c W)) [der]: at t = 0
        // x = F (w0^2 - W^2) / D, x' = F c W^2 / D, D = (w0^2 - W^2)^2 + (c W)^2.
        double d = Math.pow(W0 * W0 - W * W, 2) + Math.pow(C * W, 2);
        // 1e-8: ten times the Newton tolerance of the defaults (residual 1e-9 relative).
        assertEquals(F * (W0 * W0 - W * W) / d, o.state(0), 1e-8);
        assertEquals(F * C * W * W / d, o.state(1), 1e-8);
        assertEquals(1, o.period());
    }

    @Test
    void threeStateMultipliersAgreeWithAnIndependentEigenSolver() {
        // A 3-state system (oscillator plus a decaying mode coupled into it) exercises the general
        // (Hipparchus non-symmetric) eigen-decomposition; its multipliers are exp(eig(A) T) [der],
        // and the eigenvalues of A come from Commons Math, an independent implementation.
        double[] a = {
            0, 1, 0,
            -2.0, -0.2, 0.5,
            0, 0, -0.7};
        LinearSystem sys = new LinearSystem(a, new double[] {0, 1, 0.3}, 1.0);
        Orbit o = new Shooting(ShootingSettings.DEFAULTS.withTolerance(1e-13, 1e-11)).solve(sys, new double[3], Section.periods(1));
        EigenDecomposition ed = new EigenDecomposition(new Array2DRowRealMatrix(new double[][] {
            {0, 1, 0}, {-2.0, -0.2, 0.5}, {0, 0, -0.7}}));
        double t = 2 * Math.PI;
        double[] re = ed.getRealEigenvalues();
        double[] im = ed.getImagEigenvalues();
        double[] modExpected = new double[3];
        for (int i = 0; i < 3; i++) {
            modExpected[i] = Math.exp(re[i] * t);
        }
        Arrays.sort(modExpected);
        double[] modFound = new double[3];
        for (int i = 0; i < 3; i++) {
            modFound[i] = o.multipliers().modulus(i);
        }
        Arrays.sort(modFound);
        for (int i = 0; i < 3; i++) {
            // 1e-10 absolute on moduli below 1: integration at 1e-13.
            assertEquals(modExpected[i], modFound[i], 1e-10);
        }
        // The complex pair's argument: Im(eig) T mod 2 pi [der].
        double wd = Arrays.stream(im).map(Math::abs).max().orElseThrow();
        double arg = Math.abs(Math.atan2(o.multipliers().im()[0], o.multipliers().re()[0]));
        double expectedArg = Math.abs(Math.atan2(Math.sin(wd * t), Math.cos(wd * t)));
        assertEquals(expectedArg, arg, 1e-8);
        assertTrue(o.liouvilleDefect() < 1e-10);
        // Liouville [der]: det M = exp(trace(A) T) = exp(-0.9 * 2 pi).
        assertEquals(-0.9 * t, o.traceIntegral(), 1e-10);
    }
}
