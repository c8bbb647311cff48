package org.ferromap.dynamics;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;
import org.hipparchus.ode.OrdinaryDifferentialEquation;

/**
 * The single-phase circuit of DOMAIN.md §1.1 in per-unit scaled variables, ready for an
 * integrator. With tau = omega t, x = lambda / lambda_b, y = v / V_b, V_b = the circuit's rated
 * peak and lambda_b = V_b / omega:
 *
 * <pre>
 *   x' = y
 *   y' = e cos(tau + phi) - g y - h(x)
 *   e = Cs E_pk / (C V_b),   g = G / (omega C),   h(x) = i(lambda_b x) / (omega C V_b),   C = Cs + Cg
 * </pre>
 *
 * (derived by substitution, [der]). One source period is 2 pi in tau. The Jacobian is
 * [[0, 1], [-h'(x), -g]], so its trace is the constant -g and the monodromy over one period has
 * determinant exp(-2 pi g) (Liouville).
 *
 * <p>Three right-hand sides share the model: the state alone (dimension 2), the state with one
 * tangent vector (dimension 4, for the Lyapunov exponent) and the state with the 2x2 fundamental
 * matrix (dimension 6, row-major, for monodromy matrices). All are allocation-free. A polynomial
 * curve takes a fast path that needs no call into the curve. Immutable and thread-safe.
 */
public final class PerUnitCircuit {

    /** Length of one source period in scaled time. */
    public static final double PERIOD = 2.0 * Math.PI;

    private final double omega;
    private final double voltageBase;
    private final double fluxBase;
    private final double forcing;
    private final double phase;
    private final double damping;
    private final boolean polynomial;
    private final double alpha;
    private final double beta;
    private final int exponent;
    private final SaturationCurve curve;
    private final double currentScale;

    private PerUnitCircuit(EquivalentCircuit c) {
        omega = c.omega();
        voltageBase = c.ratedPeak();
        fluxBase = voltageBase / omega;
        double cap = c.totalCapacitance();
        forcing = c.seriesCapacitance() * c.sourcePeak() / (cap * voltageBase);
        phase = c.sourceAngle();
        damping = c.conductance() / (omega * cap);
        curve = c.magnetizing();
        currentScale = 1.0 / (omega * cap * voltageBase);
        if (curve instanceof PolynomialCurve p) {
            polynomial = true;
            alpha = p.a() * fluxBase * currentScale;
            beta = p.b() * Math.pow(fluxBase, p.n()) * currentScale;
            exponent = p.n();
        } else {
            polynomial = false;
            alpha = 0;
            beta = 0;
            exponent = 0;
        }
    }

    /** The scaled model of a circuit (its own source angle). */
    public static PerUnitCircuit of(EquivalentCircuit circuit) {
        return new PerUnitCircuit(circuit);
    }

    /** Angular frequency of the source, rad/s. */
    public double omega() {
        return omega;
    }

    /** V_b: the voltage that is 1 per unit, peak V. */
    public double voltageBase() {
        return voltageBase;
    }

    /** lambda_b = V_b / omega: the flux linkage that is 1 per unit, Wb-turn. */
    public double fluxBase() {
        return fluxBase;
    }

    /** e: amplitude of the scaled forcing, per unit. */
    public double forcing() {
        return forcing;
    }

    /** phi: source angle, rad. */
    public double phase() {
        return phase;
    }

    /** g = G / (omega C): the scaled damping; the Jacobian's trace is -g. */
    public double damping() {
        return damping;
    }

    /** h(x): scaled magnetizing current at scaled flux x. */
    public double restoring(double x) {
        if (polynomial) {
            return alpha * x + beta * pow(x, exponent);
        }
        return curve.current(fluxBase * x) * currentScale;
    }

    /** h'(x): slope of the scaled magnetizing current. */
    public double restoringSlope(double x) {
        if (polynomial) {
            return alpha + exponent * beta * pow(x, exponent - 1);
        }
        return curve.currentSlope(fluxBase * x) * fluxBase * currentScale;
    }

    /** Scaled forcing at scaled time tau: e cos(tau + phi). */
    public double drive(double tau) {
        return forcing * Math.cos(tau + phase);
    }

    /** State only: z = (x, y). */
    public void derivatives(double tau, double[] z, double[] dz) {
        double x = z[0];
        double y = z[1];
        dz[0] = y;
        dz[1] = forcing * Math.cos(tau + phase) - damping * y - restoring(x);
    }

    /** State and one tangent vector: z = (x, y, dx, dy). */
    public void derivativesWithTangent(double tau, double[] z, double[] dz) {
        double x = z[0];
        double y = z[1];
        double k = restoringSlope(x);
        dz[0] = y;
        dz[1] = forcing * Math.cos(tau + phase) - damping * y - restoring(x);
        dz[2] = z[3];
        dz[3] = -k * z[2] - damping * z[3];
    }

    /** State and fundamental matrix, row-major: z = (x, y, m00, m01, m10, m11). */
    public void derivativesWithMatrix(double tau, double[] z, double[] dz) {
        double x = z[0];
        double y = z[1];
        double k = restoringSlope(x);
        dz[0] = y;
        dz[1] = forcing * Math.cos(tau + phase) - damping * y - restoring(x);
        dz[2] = z[4];
        dz[3] = z[5];
        dz[4] = -k * z[2] - damping * z[4];
        dz[5] = -k * z[3] - damping * z[5];
    }

    /** The 2-D system as a Hipparchus equation (for cross-checks and event-driven work). */
    public OrdinaryDifferentialEquation asOde() {
        return new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double[] d = new double[2];
                derivatives(t, y, d);
                return d;
            }
        };
    }

    /**
     * State and fundamental matrix (dimension 6) as one primary Hipparchus system, so that the
     * step control watches the variations too.
     */
    public OrdinaryDifferentialEquation asVariationalOde() {
        return new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 6;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                double[] d = new double[6];
                derivativesWithMatrix(t, y, d);
                return d;
            }
        };
    }

    /** x^m by squaring: exact sign for odd m, no Math.pow in the hot loop. */
    private static double pow(double x, int m) {
        double result = 1.0;
        double base = x;
        int e = m;
        while (e > 0) {
            if ((e & 1) != 0) {
                result *= base;
            }
            base *= base;
            e >>= 1;
        }
        return result;
    }
}
