package org.ferromap.balance;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;

/**
 * The single-harmonic balance of one circuit in per unit, so that studies in kV, uF and MOhm and
 * polynomial coefficients of 1e-17 all land near 1 (DOMAIN.md §3 in scaled form).
 *
 * <p>Bases: voltage V_b = rated peak, flux Lambda_b = V_b / w, current I_b = w C V_b with
 * C = Cs + Cg. Then x = Lambda / Lambda_b is also the peak magnetizing voltage in per unit, the
 * capacitor line is i = x, and the balance reads
 * <pre>  s^2 = x^2 ((n1(x) - 1)^2 + g^2),  n1 = i1(x)/x,  g = G/(w C),  s = (Cs/C)(E/V_b).</pre>
 * Phi(x) is the right-hand side; E increases with x exactly where
 * det(x) = (n1 - 1)(i1'(x) - 1) + g^2 is positive (dPhi/dx = 2 x det).
 */
final class PerUnitBranch {

    final EquivalentCircuit circuit;
    final DescribingFunction describing;
    /** Rad/s. */
    final double omega;
    /** V_b, V peak. */
    final double baseVoltage;
    /** Lambda_b, Wb-turn. */
    final double baseFlux;
    /** I_b, A peak. */
    final double baseCurrent;
    /** g = G/(w C), per unit. */
    final double g;
    /** s = (Cs/C)(E/V_b), per unit. */
    final double drive;
    /** Source voltage per unit of drive: E = drive * sourcePerDrive, V. */
    final double sourcePerDrive;
    /** n1(0+), the small-signal magnetizing admittance over the capacitor admittance. */
    final double alpha;
    /** Closed-form coefficients when the curve is a polynomial used in closed form; otherwise beta = NaN. */
    final double beta;
    final int exponent;

    PerUnitBranch(EquivalentCircuit c, DescribingFunction describing, boolean closedForm) {
        this.circuit = c;
        this.describing = describing;
        this.omega = c.omega();
        this.baseVoltage = c.ratedPeak();
        this.baseFlux = baseVoltage / omega;
        double cap = c.totalCapacitance();
        this.baseCurrent = omega * cap * baseVoltage;
        this.g = c.conductance() / (omega * cap);
        this.sourcePerDrive = baseVoltage * cap / c.seriesCapacitance();
        this.drive = c.sourcePeak() / sourcePerDrive;
        this.alpha = c.magnetizing().currentSlope(0.0) * baseFlux / baseCurrent;
        if (closedForm && c.magnetizing() instanceof PolynomialCurve p) {
            this.exponent = p.n();
            this.beta = PolynomialCurve.describingCoefficient(p.n()) * p.b() * Math.pow(baseFlux, p.n()) / baseCurrent;
        } else {
            this.exponent = 0;
            this.beta = Double.NaN;
        }
    }

    boolean closedForm() {
        return exponent > 0;
    }

    /** Fundamental magnetizing current, per unit. */
    double i1(double x) {
        if (exponent > 0) {
            return alpha * x + beta * pow(x, exponent);
        }
        return describing.value(baseFlux * x) / baseCurrent;
    }

    /** di1/dx, per unit. */
    double slope(double x) {
        if (exponent > 0) {
            return alpha + exponent * beta * pow(x, exponent - 1);
        }
        return describing.slope(baseFlux * x) * baseFlux / baseCurrent;
    }

    /** i1(x)/x: the magnetizing branch's fundamental admittance over the capacitor's. */
    double n1(double x) {
        return x > 0 ? i1(x) / x : alpha;
    }

    /** Phi(x) = x^2 ((n1 - 1)^2 + g^2) = s^2 on the branch. */
    double phi(double x) {
        if (x <= 0) {
            return 0.0;
        }
        double d = n1(x) - 1;
        return x * x * (d * d + g * g);
    }

    /** sqrt(Phi(x)) - s: nearly linear in x at small flux, so Brent converges fast. */
    double amplitudeResidual(double x) {
        if (x <= 0) {
            return -drive;
        }
        double d = n1(x) - 1;
        return x * Math.sqrt(d * d + g * g) - drive;
    }

    /** (n1 - 1)(i1' - 1) + g^2: the slow-flow determinant, same sign as dE/dLambda. */
    double det(double x) {
        return (n1(x) - 1) * (slope(x) - 1) + g * g;
    }

    /** Source voltage, V, that holds the branch at x. */
    double sourceAt(double x) {
        return Math.sqrt(phi(x)) * sourcePerDrive;
    }

    private static double pow(double x, int m) {
        double r = 1.0;
        for (int j = 0; j < m; j++) {
            r *= x;
        }
        return r;
    }
}
