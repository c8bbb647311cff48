package org.ferromap.circuit;

import java.util.function.DoubleUnaryOperator;
import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Test-local single-phase loop of DOMAIN.md §1.1, written out here (SI) so the network is compared
 * with an independent reduction: a node v with Cs to a source s(t), Cg to ground, and the
 * magnetizing branch i(lambda) with conductance G from the node to a return r(t):
 * <pre>
 *   dlambda/dt = v - r(t)
 *   (Cs + Cg) dv/dt = Cs ds/dt - i(lambda) - G (v - r(t))
 * </pre>
 * s(t) = S sin(w t + alpha), r(t) = R sin(w t + beta). Integrated with Hipparchus
 * Dormand-Prince 8(5,3) into a dense output model.
 */
final class ReducedLoop implements OrdinaryDifferentialEquation {

    final double omega;
    final double cs;
    final double cg;
    final double g;
    final double sAmp;
    final double sAngle;
    final double rAmp;
    final double rAngle;
    final DoubleUnaryOperator current;

    ReducedLoop(double omega, double cs, double cg, double g, double sAmp, double sAngle, double rAmp, double rAngle,
            DoubleUnaryOperator current) {
        this.omega = omega;
        this.cs = cs;
        this.cg = cg;
        this.g = g;
        this.sAmp = sAmp;
        this.sAngle = sAngle;
        this.rAmp = rAmp;
        this.rAngle = rAngle;
        this.current = current;
    }

    @Override
    public int getDimension() {
        return 2;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        double r = rAmp * Math.sin(omega * t + rAngle);
        double ds = sAmp * omega * Math.cos(omega * t + sAngle);
        double u = y[1] - r;
        return new double[] {u, (cs * ds - current.applyAsDouble(y[0]) - g * u) / (cs + cg)};
    }

    /** Return voltage r(t), V. */
    double returnVoltage(double t) {
        return rAmp * Math.sin(omega * t + rAngle);
    }

    /** Integrates from (t0, lambda0, v0) to t1 with tolerances rtol (relative) and atol (V or Wb-turn). */
    DenseOutputModel integrate(double t0, double lambda0, double v0, double t1, double rtol, double atol) {
        DormandPrince853Integrator integ = new DormandPrince853Integrator(1e-14, (t1 - t0) / 100, atol, rtol);
        DenseOutputModel model = new DenseOutputModel();
        integ.addStepHandler(model);
        integ.integrate(this, new ODEState(t0, new double[] {lambda0, v0}), t1);
        return model;
    }
}
