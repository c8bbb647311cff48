package org.ferromap.balance;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.SaturationCurve;

/**
 * Harmonic-balance residual of the equivalent circuit (DOMAIN.md §1.1, §3) by the alternating
 * frequency-time method, F(x, p) = 0 with x the Fourier coefficients of the per-unit flux and p
 * one {@link CircuitParameter}. In per unit (tau = w t, y = lambda / Lambda_b, Lambda_b = V_b/w,
 * currents over I_b = w C_ref V_b, all bases from the reference circuit and fixed):
 * <pre>
 *   gC y'' + gG y' + i(y) = sigma cos(tau + phi),
 *   gC = C/C_ref,  gG = G/(w C_ref),  sigma = (Cs/C_ref)(E/V_b),  i(y) = i(Lambda_b y)/I_b
 * </pre>
 * F is the projection of the left side minus the right on the {@link HarmonicBasis}; the
 * nonlinear current is evaluated at the N time samples and projected back, and dF/dx is the
 * same projection of i'(y) (exact for the discrete residual, whatever N).
 *
 * <p>The plain API ({@link #dimension}, {@link #residual}, {@link #jacobian}) is what the
 * continuation engine consumes. Not thread-safe (it keeps work arrays and the circuit for the
 * last p): give each thread its own {@link #copy()}.
 */
public final class MultiHarmonicResidual {

    private final EquivalentCircuit reference;
    private final CircuitParameter parameter;
    private final HarmonicBasis basis;
    private final SaturationCurve curve;
    private final double baseFlux;
    private final double baseCurrent;
    private final double omega;
    private final double refCapacitance;
    private final double baseVoltage;

    private final double[] y;
    private final double[] work;
    private final double[] dc;
    private final double[] ds;

    private double lastP = Double.NaN;
    /** gC, gG, forcing cos and sine components, per unit, at lastP. */
    private final double[] coef = new double[4];
    private final double[] rate = new double[4];

    /**
     * @param reference the circuit at which bases are taken and to which the parameter is applied
     * @param parameter the quantity p varies
     * @param basis harmonics and samples
     */
    public MultiHarmonicResidual(EquivalentCircuit reference, CircuitParameter parameter, HarmonicBasis basis) {
        this.reference = reference;
        this.parameter = parameter;
        this.basis = basis;
        this.curve = reference.magnetizing();
        this.omega = reference.omega();
        this.baseVoltage = reference.ratedPeak();
        this.baseFlux = baseVoltage / omega;
        this.refCapacitance = reference.totalCapacitance();
        this.baseCurrent = omega * refCapacitance * baseVoltage;
        int n = basis.samples();
        this.y = new double[n];
        this.work = new double[n];
        this.dc = new double[2 * basis.harmonics() + 1];
        this.ds = new double[2 * basis.harmonics() + 1];
    }

    /** An independent instance for another thread. */
    public MultiHarmonicResidual copy() {
        return new MultiHarmonicResidual(reference, parameter, basis);
    }

    public int dimension() {
        return basis.dimension();
    }

    public HarmonicBasis basis() {
        return basis;
    }

    public CircuitParameter parameter() {
        return parameter;
    }

    public EquivalentCircuit reference() {
        return reference;
    }

    /** The parameter's value in the reference circuit, in its unit. */
    public double referenceValue() {
        return parameter.valueOf(reference);
    }

    /** Lambda_b, Wb-turn: x times this is the flux coefficient. */
    public double baseFlux() {
        return baseFlux;
    }

    /** I_b = w C_ref V_b, A: residual coefficients times this are currents. */
    public double baseCurrent() {
        return baseCurrent;
    }

    /** The circuit at parameter value p. */
    public EquivalentCircuit circuitAt(double p) {
        return parameter.apply(reference, p);
    }

    /**
     * Magnitude of the terms of the residual at x (largest per-unit nonlinear current sample or
     * capacitor term, at least 1), the scale against which a residual is small.
     */
    public double scale(double[] x, double p) {
        coefficients(p);
        basis.synthesize(x, y);
        double m = 1.0;
        for (int j = 0; j < basis.samples(); j++) {
            m = Math.max(m, Math.abs(curve.current(baseFlux * y[j]) / baseCurrent));
        }
        for (int r = 0; r < basis.dimension(); r++) {
            int k = basis.harmonicOf(r);
            m = Math.max(m, Math.abs(coef[0] * k * k * x[r]));
        }
        return m;
    }

    /** F(x, p) into out (length {@link #dimension()}). For the source, negative p is allowed (a phase flip). */
    public void residual(double[] x, double p, double[] out) {
        coefficients(p);
        basis.synthesize(x, y);
        int n = basis.samples();
        double inv = 1.0 / baseCurrent;
        for (int j = 0; j < n; j++) {
            work[j] = curve.current(baseFlux * y[j]) * inv;
        }
        java.util.Arrays.fill(out, 0, basis.dimension(), 0.0);
        basis.analyze(work, 1.0, out);
        addLinear(x, coef, out, 1.0);
    }

    /** dF/dx into dFdx (dimension x dimension) and dF/dp into dFdp (per unit of the parameter's unit); either may be null. */
    public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
        coefficients(p);
        if (dFdx != null) {
            basis.synthesize(x, y);
            int n = basis.samples();
            double scale = baseFlux / baseCurrent;
            for (int j = 0; j < n; j++) {
                work[j] = curve.currentSlope(baseFlux * y[j]) * scale;
            }
            basis.moments(work, dc, ds);
            int d = basis.dimension();
            for (int r = 0; r < d; r++) {
                java.util.Arrays.fill(dFdx[r], 0, d, 0.0);
            }
            basis.addMultiplication(dc, ds, 1.0, dFdx, 0, 0);
            for (int r = 0; r < d; r++) {
                int k = basis.harmonicOf(r);
                if (k == 0) {
                    continue;
                }
                if (basis.isSine(r)) {
                    dFdx[r][r] += -coef[0] * k * k;
                    dFdx[r][r - 1] += -coef[1] * k;
                } else {
                    dFdx[r][r] += -coef[0] * k * k;
                    dFdx[r][r + 1] += coef[1] * k;
                }
            }
        }
        if (dFdp != null) {
            rates(p);
            java.util.Arrays.fill(dFdp, 0, basis.dimension(), 0.0);
            addLinear(x, rate, dFdp, 1.0);
        }
    }

    /** Adds the linear part (inertia, damping, forcing) with the given coefficient set to out. */
    private void addLinear(double[] x, double[] cf, double[] out, double scale) {
        int d = basis.dimension();
        for (int r = 0; r < d; r++) {
            int k = basis.harmonicOf(r);
            if (k == 0) {
                continue;
            }
            double v;
            if (basis.isSine(r)) {
                v = -cf[0] * k * k * x[r] - cf[1] * k * x[r - 1];
                if (k == 1) {
                    v -= cf[3];
                }
            } else {
                v = -cf[0] * k * k * x[r] + cf[1] * k * x[r + 1];
                if (k == 1) {
                    v -= cf[2];
                }
            }
            out[r] += scale * v;
        }
    }

    private void coefficients(double p) {
        if (p == lastP) {
            return;
        }
        if (parameter == CircuitParameter.SOURCE) {
            // Direct, so that iterates may pass through negative source values (a phase flip),
            // which the circuit record refuses.
            fill(reference, coef);
            double sigma = reference.seriesCapacitance() / refCapacitance * p / baseVoltage;
            coef[2] = sigma * Math.cos(reference.sourceAngle());
            coef[3] = -sigma * Math.sin(reference.sourceAngle());
        } else {
            fill(parameter.apply(reference, p), coef);
        }
        lastP = p;
    }

    private void fill(EquivalentCircuit c, double[] cf) {
        double sigma = c.seriesCapacitance() / refCapacitance * c.sourcePeak() / baseVoltage;
        double phi = c.sourceAngle();
        cf[0] = c.totalCapacitance() / refCapacitance;
        cf[1] = c.conductance() / (omega * refCapacitance);
        cf[2] = sigma * Math.cos(phi);
        cf[3] = -sigma * Math.sin(phi);
    }

    /** d(coefficients)/dp: exact for the standard parameters, a 5-point difference otherwise. */
    private void rates(double p) {
        EquivalentCircuit c = parameter == CircuitParameter.SOURCE ? reference : parameter.apply(reference, p);
        double cs = c.seriesCapacitance();
        double e = c.sourcePeak();
        double cosPhi = Math.cos(c.sourceAngle());
        double sinPhi = Math.sin(c.sourceAngle());
        java.util.Arrays.fill(rate, 0.0);
        if (parameter instanceof CircuitParameter.Standard s) {
            switch (s) {
                case SOURCE -> {
                    double ds = cs / refCapacitance / baseVoltage;
                    rate[2] = ds * cosPhi;
                    rate[3] = -ds * sinPhi;
                }
                case SERIES_CAPACITANCE -> {
                    rate[0] = 1.0 / refCapacitance;
                    double ds = e / baseVoltage / refCapacitance;
                    rate[2] = ds * cosPhi;
                    rate[3] = -ds * sinPhi;
                }
                case SHUNT_CAPACITANCE -> rate[0] = 1.0 / refCapacitance;
                case CORE_LOSS_RESISTANCE -> {
                    double r = c.coreLossResistance();
                    rate[1] = Double.isInfinite(r) ? 0.0 : -1.0 / (r * r) / (omega * refCapacitance);
                }
                case LOAD_RESISTANCE -> {
                    double r = c.loadResistance();
                    rate[1] = Double.isInfinite(r) ? 0.0 : -1.0 / (r * r) / (omega * refCapacitance);
                }
                default -> throw new IllegalStateException("unknown standard parameter " + s);
            }
            return;
        }
        double h = 1e-3 * Math.max(Math.abs(p), Double.MIN_NORMAL);
        double[] a = new double[4];
        double[] b = new double[4];
        double[] cc = new double[4];
        double[] dd = new double[4];
        fill(parameter.apply(reference, p - 2 * h), a);
        fill(parameter.apply(reference, p - h), b);
        fill(parameter.apply(reference, p + h), cc);
        fill(parameter.apply(reference, p + 2 * h), dd);
        for (int k = 0; k < 4; k++) {
            rate[k] = (a[k] - 8 * b[k] + 8 * cc[k] - dd[k]) / (12 * h);
        }
    }
}
