package org.ferromap.dynamics;

import org.ferromap.equipment.LinearCurve;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Exactness;
import org.junit.jupiter.api.Test;

/**
 * The circuit with a linear inductor is a linear second-order ODE with sinusoidal forcing,
 * C lambda'' + G lambda' + lambda / L = Cs E w cos(w t + phi), solved in closed form here in SI
 * [der], independently of the per-unit scaling the simulator uses.
 */
class LinearResponseTest {

    // A kV-scale circuit so the per-unit scaling is exercised: 11 kV-class source, 60 Hz.
    private static final double W = 2 * Math.PI * 60;
    private static final double E = 9000.0;
    private static final double CS = 0.2e-6;
    private static final double CG = 0.05e-6;
    private static final double L = 200.0;       // H: resonance of L with C near 22.5 Hz, below the source
    private static final double R = 2.0e5;       // ohm
    private static final double PHI = 0.7;

    /** Closed-form (lambda, v) at time t from lambda0, v0 at t = 0 [der]. */
    private static double[] exact(double t, double lambda0, double v0) {
        double c = CS + CG;
        double twoSigma = 1 / (R * c);          // 2 * decay rate
        double w0sq = 1 / (L * c);
        double f = CS * E * W / c;              // forcing amplitude of lambda'' equation
        // Particular solution Re(X exp(i(w t + phi))), X = f / (w0^2 - w^2 + i w twoSigma).
        double dr = w0sq - W * W;
        double di = W * twoSigma;
        double den = dr * dr + di * di;
        double xr = f * dr / den;
        double xi = -f * di / den;
        double th = W * t + PHI;
        double lp = xr * Math.cos(th) - xi * Math.sin(th);
        double vp = -W * (xr * Math.sin(th) + xi * Math.cos(th));
        double lp0 = xr * Math.cos(PHI) - xi * Math.sin(PHI);
        double vp0 = -W * (xr * Math.sin(PHI) + xi * Math.cos(PHI));
        double sigma = twoSigma / 2;
        double wd = Math.sqrt(w0sq - sigma * sigma);
        double a = lambda0 - lp0;
        double b = (v0 - vp0 + sigma * a) / wd;
        double decay = Math.exp(-sigma * t);
        double lh = decay * (a * Math.cos(wd * t) + b * Math.sin(wd * t));
        double vh = decay * (-sigma * (a * Math.cos(wd * t) + b * Math.sin(wd * t))
                + wd * (-a * Math.sin(wd * t) + b * Math.cos(wd * t)));
        return new double[] {lp + lh, vp + vh};
    }

    @Test
    void stroboscopicSamplesFollowTheClosedForm() {
        EquivalentCircuit circuit = new EquivalentCircuit(W, E, PHI, CS, CG, R, Double.POSITIVE_INFINITY,
                new LinearCurve(L), Exactness.GIVEN, E);
        double lambda0 = 5.0;     // residual flux, Wb-turn
        double v0 = -2000.0;      // trapped charge, V
        SimulationResult r = Simulator.simulate(circuit, SimulationSettings.defaults()
                .withInitialState(lambda0, v0).withCertify(false).withMaxPeriods(60).withTransientPeriods(10)
                .withTolerance(1e-11));
        double[] flux = r.strobeFlux();
        double[] volt = r.strobeVoltage();
        double lambdaBase = E / W;
        assertEquals(61, flux.length);
        for (int k = 0; k < flux.length; k++) {
            double[] ex = exact(k * 2 * Math.PI / W, lambda0, v0);
            // 1e-8 of the per-unit bases: tolerance 1e-11 per step over ~60 periods of a few
            // hundred steps leaves global errors well below this; a scaling slip would be O(1).
            assertEquals(ex[0], flux[k], 1e-8 * lambdaBase, "flux at period " + k);
            assertEquals(ex[1], volt[k], 1e-8 * E, "voltage at period " + k);
        }
    }

    @Test
    void settledLinearStateIsNormalWithTheSteadyStateAmplitude() {
        EquivalentCircuit circuit = new EquivalentCircuit(W, E, PHI, CS, CG, R, Double.POSITIVE_INFINITY,
                new LinearCurve(L), Exactness.GIVEN, E);
        SimulationResult r = Simulator.simulate(circuit, SimulationSettings.defaults());
        // Steady amplitude of v: w |X| [der, from the particular solution above].
        double c = CS + CG;
        double f = CS * E * W / c;
        double dr = 1 / (L * c) - W * W;
        double di = W / (R * c);
        double amplitude = W * f / Math.hypot(dr, di);
        // Resonance below the source frequency (capacitive node): in phase with the source, about 0.93 pu.
        assertEquals(SteadyMode.NORMAL, r.mode());
        // Phase of v against e from the particular solution [der]: v leads lambda by pi/2, so the
        // fundamental is a cosine of phase phi + pi/2 + arg X, against phi - pi/2 for e = E sin.
        double expectedPhase = Simulator.wrap(Math.PI + Math.atan2(-di, dr));
        assertEquals(expectedPhase, r.fundamentalPhase(), 1e-6);
        assertEquals(1, r.period());
        assertEquals(true, r.certified());
        // 1e-6 relative: the orbit is sampled 128 times a period and the peak refined by a parabola,
        // whose error for a pure sine is (pi/128)^4/... about 1e-7.
        assertEquals(amplitude, r.peakVoltage(), 1e-6 * amplitude);
        // Liouville for a linear system: both multipliers have modulus exp(-pi g), g = G/(wC) [der].
        assertEquals(Math.exp(-Math.PI / (R * c * W)), r.largestMultiplierModulus(), 1e-7);
    }
}
