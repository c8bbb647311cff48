package org.ferromap.balance;

import java.util.Arrays;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.ContinuationProblem;
import org.ferromap.continuation.TwoParameterProblem;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.errors.FerromapException;

/**
 * The harmonic balance of the equivalent circuit as a continuation problem in one or two
 * parameters of any kind (DOMAIN.md §1.1, §3), in per unit with bases fixed at a reference
 * circuit: tau = w_r t, y = lambda / Lambda_b, Lambda_b = V_b / w_r, currents over
 * I_b = w_r C_r V_b. With rho = w / w_r the circuit at (p, q) reads
 * <pre>
 *   gC y'' + gG y' + i(y) = sigma cos(tau + phi),
 *   gC = (C/C_r) rho^2,  gG = G rho / (w_r C_r),  sigma = (Cs/C_r) rho (E/V_b)
 * </pre>
 * so only the four loop coefficients (gC, gG, sigma cos phi, -sigma sin phi) depend on the
 * parameters; the magnetizing curve does not. With H = 1 the unknowns are (a1, b1) and the
 * nonlinear term is the describing function (exact for every curve, closed form for
 * polynomials); with H &gt; 1 they are the odd harmonics and the term is projected by the
 * alternating frequency-time method, exactly as in {@link MultiHarmonicResidual}.
 *
 * <p>dF/dx is analytic; dF/dp and dF/dq are exact for the circuit-level axes and a five-point
 * difference in a step of 1e-3 of the value for {@link BalanceAxis.Rate#DIFFERENCED} ones.
 * Values outside an axis's physical range give a NaN residual, which the engine treats as a
 * failed step. Not thread-safe (work arrays and caches): one instance per run.
 */
final class LoopResidual implements TwoParameterProblem {

    /** Relative step of the differenced rates: the coefficients are smooth (mostly linear) in the values. */
    private static final double DIFFERENCE_STEP = 1e-3;

    private final CircuitPlane plane;
    private final BalanceAxis pAxis;
    private final BalanceAxis qAxis;
    private final double pWidth;
    private final double qWidth;
    private final int harmonics;
    private final HarmonicBasis basis;
    private final DescribingFunction describing;
    private final SaturationCurve curve;

    /** V_b, V peak. */
    final double baseVoltage;
    /** w_r, rad/s. */
    final double baseOmega;
    /** C_r, F. */
    final double baseCapacitance;
    /** Lambda_b = V_b / w_r, Wb-turn. */
    final double baseFlux;
    /** I_b = w_r C_r V_b, A. */
    final double baseCurrent;
    /** Small-signal magnetizing slope, per unit. */
    private final double alpha;

    private final double[] y;
    private final double[] work;
    private final double[] dc;
    private final double[] ds;

    private double lastP = Double.NaN;
    private double lastQ = Double.NaN;
    private boolean lastOk;
    private EquivalentCircuit lastCircuit;
    private double signP = 1;
    private double signQ = 1;
    private final double[] coef = new double[4];
    private final double[] rateP = new double[4];
    private final double[] rateQ = new double[4];
    private final double[] fa = new double[4];
    private final double[] fb = new double[4];
    private final double[] fc = new double[4];
    private final double[] fd = new double[4];

    /**
     * @param plane the circuit as a function of (p, q)
     * @param reference circuit whose bases are used (normally the start circuit)
     * @param pAxis first parameter
     * @param pWidth typical size of p (window width), SI, for differenced rates at p = 0
     * @param qAxis second parameter, or null when q is ignored
     * @param qWidth typical size of q, SI
     * @param harmonics H &gt;= 1
     * @param samples AFT samples per period for H &gt; 1 (ignored for H = 1)
     */
    LoopResidual(CircuitPlane plane, EquivalentCircuit reference, BalanceAxis pAxis, double pWidth,
                 BalanceAxis qAxis, double qWidth, int harmonics, int samples) {
        this.plane = plane;
        this.pAxis = pAxis;
        this.qAxis = qAxis;
        this.pWidth = pWidth;
        this.qWidth = qWidth;
        this.harmonics = harmonics;
        this.curve = reference.magnetizing();
        this.describing = DescribingFunction.of(curve);
        this.basis = harmonics > 1 ? new HarmonicBasis(harmonics, true, samples) : null;
        this.baseVoltage = reference.ratedPeak();
        this.baseOmega = reference.omega();
        this.baseCapacitance = reference.totalCapacitance();
        this.baseFlux = baseVoltage / baseOmega;
        this.baseCurrent = baseOmega * baseCapacitance * baseVoltage;
        this.alpha = curve.currentSlope(0.0) * baseFlux / baseCurrent;
        int n = basis == null ? 1 : basis.samples();
        this.y = new double[n];
        this.work = new double[n];
        this.dc = new double[2 * harmonics + 1];
        this.ds = new double[2 * harmonics + 1];
    }

    int harmonics() {
        return harmonics;
    }

    /** The basis for H &gt; 1, null for H = 1. */
    HarmonicBasis basis() {
        return basis;
    }

    @Override
    public int dimension() {
        return basis == null ? 2 : basis.dimension();
    }

    /** Fundamental flux amplitude of x, per unit of {@link #baseFlux}. */
    double fundamental(double[] x) {
        return basis == null ? Math.hypot(x[0], x[1]) : Math.hypot(x[basis.cosIndex(1)], x[basis.sinIndex(1)]);
    }

    /** Largest |dy/dtau| over the period, per unit (equals the fundamental for H = 1). */
    double peakRate(double[] x) {
        return basis == null ? fundamental(x) : basis.peak(x, 1);
    }

    /** Largest |y| over the period, per unit. */
    double peakFlux(double[] x) {
        return basis == null ? fundamental(x) : basis.peak(x, 0);
    }

    /** The start vector for a single-harmonic point of the circuit c (same bases as this residual). */
    double[] seed(OperatingPoint point, EquivalentCircuit c) {
        double[] x = new double[dimension()];
        double amp = point.flux() / baseFlux;
        double theta = c.sourceAngle() + point.voltagePhase() - Math.PI;
        int ci = basis == null ? 0 : basis.cosIndex(1);
        x[ci] = amp * Math.cos(theta);
        x[ci + 1] = -amp * Math.sin(theta);
        return x;
    }

    /** The circuit at (p, q), or null when the values are not physical. */
    EquivalentCircuit circuit(double p, double q) {
        return coefficients(p, q) ? lastCircuit : null;
    }

    @Override
    public void residual(double[] x, double p, double q, double[] out) {
        if (!coefficients(p, q)) {
            Arrays.fill(out, 0, dimension(), Double.NaN);
            return;
        }
        if (basis == null) {
            double a = x[0];
            double b = x[1];
            double r = Math.hypot(a, b);
            double n = r > 0 ? describing.value(baseFlux * r) / (baseCurrent * r) : alpha;
            out[0] = (n - coef[0]) * a + coef[1] * b - coef[2];
            out[1] = (n - coef[0]) * b - coef[1] * a - coef[3];
            return;
        }
        basis.synthesize(x, y);
        int ns = basis.samples();
        double inv = 1.0 / baseCurrent;
        for (int j = 0; j < ns; j++) {
            work[j] = curve.current(baseFlux * y[j]) * inv;
        }
        Arrays.fill(out, 0, basis.dimension(), 0.0);
        basis.analyze(work, 1.0, out);
        addLinear(x, coef, out, true);
    }

    @Override
    public void jacobian(double[] x, double p, double q, double[][] dFdx, double[] dFdp, double[] dFdq) {
        int d = dimension();
        if (!coefficients(p, q)) {
            fillNaN(dFdx, dFdp, dFdq, d);
            return;
        }
        if (dFdx != null) {
            stateJacobian(x, dFdx);
        }
        if (dFdp != null && !parameterRate(x, true, dFdp)) {
            fillNaN(dFdx, dFdp, dFdq, d);
            return;
        }
        if (dFdq != null) {
            if (qAxis == null) {
                Arrays.fill(dFdq, 0, d, 0.0);
            } else if (!parameterRate(x, false, dFdq)) {
                fillNaN(dFdx, dFdp, dFdq, d);
            }
        }
    }

    /** This problem with q held fixed; its Jacobian computes dF/dp only. */
    ContinuationProblem atQ(double q) {
        LoopResidual self = this;
        return new ContinuationProblem() {
            @Override
            public int dimension() {
                return self.dimension();
            }

            @Override
            public void residual(double[] x, double p, double[] out) {
                self.residual(x, p, q, out);
            }

            @Override
            public void jacobian(double[] x, double p, double[][] dFdx, double[] dFdp) {
                self.jacobian(x, p, q, dFdx, dFdp, null);
            }
        };
    }

    private static void fillNaN(double[][] dFdx, double[] dFdp, double[] dFdq, int d) {
        if (dFdx != null) {
            for (int i = 0; i < d; i++) {
                Arrays.fill(dFdx[i], 0, d, Double.NaN);
            }
        }
        if (dFdp != null) {
            Arrays.fill(dFdp, 0, d, Double.NaN);
        }
        if (dFdq != null) {
            Arrays.fill(dFdq, 0, d, Double.NaN);
        }
    }

    private void stateJacobian(double[] x, double[][] j) {
        if (basis == null) {
            double a = x[0];
            double b = x[1];
            double r = Math.hypot(a, b);
            double n;
            double k;
            if (r > 0) {
                n = describing.value(baseFlux * r) / (baseCurrent * r);
                double s = describing.slope(baseFlux * r) * baseFlux / baseCurrent;
                k = (s - n) / (r * r);
            } else {
                n = alpha;
                k = 0;
            }
            j[0][0] = n + k * a * a - coef[0];
            j[0][1] = k * a * b + coef[1];
            j[1][0] = k * a * b - coef[1];
            j[1][1] = n + k * b * b - coef[0];
            return;
        }
        basis.synthesize(x, y);
        int ns = basis.samples();
        double scale = baseFlux / baseCurrent;
        for (int i = 0; i < ns; i++) {
            work[i] = curve.currentSlope(baseFlux * y[i]) * scale;
        }
        basis.moments(work, dc, ds);
        int d = basis.dimension();
        for (int r = 0; r < d; r++) {
            Arrays.fill(j[r], 0, d, 0.0);
        }
        basis.addMultiplication(dc, ds, 1.0, j, 0, 0);
        for (int r = 0; r < d; r++) {
            int k = basis.harmonicOf(r);
            if (k == 0) {
                continue;
            }
            j[r][r] += -coef[0] * k * k;
            if (basis.isSine(r)) {
                j[r][r - 1] += -coef[1] * k;
            } else {
                j[r][r + 1] += coef[1] * k;
            }
        }
    }

    /** dF/dp (first) or dF/dq into out; false when the rate cannot be formed. */
    private boolean parameterRate(double[] x, boolean first, double[] out) {
        double[] rate = first ? rateP : rateQ;
        if (!rate(first, rate)) {
            return false;
        }
        if (basis == null) {
            out[0] = -rate[0] * x[0] + rate[1] * x[1] - rate[2];
            out[1] = -rate[0] * x[1] - rate[1] * x[0] - rate[3];
            return true;
        }
        Arrays.fill(out, 0, basis.dimension(), 0.0);
        addLinear(x, rate, out, true);
        return true;
    }

    /** Adds the linear part (inertia, damping, forcing) for a coefficient set. */
    private void addLinear(double[] x, double[] cf, double[] out, boolean forcing) {
        int d = basis.dimension();
        for (int r = 0; r < d; r++) {
            int k = basis.harmonicOf(r);
            if (k == 0) {
                continue;
            }
            double v;
            if (basis.isSine(r)) {
                v = -cf[0] * k * k * x[r] - cf[1] * k * x[r - 1];
                if (k == 1 && forcing) {
                    v -= cf[3];
                }
            } else {
                v = -cf[0] * k * k * x[r] + cf[1] * k * x[r + 1];
                if (k == 1 && forcing) {
                    v -= cf[2];
                }
            }
            out[r] += v;
        }
    }

    /** Sets coef (and the circuit) for (p, q); false when the values are not physical. */
    private boolean coefficients(double p, double q) {
        if (Double.compare(p, lastP) == 0 && Double.compare(q, lastQ) == 0) {
            return lastOk;
        }
        lastP = p;
        lastQ = q;
        lastOk = false;
        lastCircuit = null;
        signP = 1;
        signQ = 1;
        double pe = p;
        double qe = q;
        if (pAxis.rate() == BalanceAxis.Rate.SOURCE && p < 0) {
            pe = -p;
            signP = -1;
        }
        if (qAxis != null && qAxis.rate() == BalanceAxis.Rate.SOURCE && q < 0) {
            qe = -q;
            signQ = -1;
        }
        if (!pAxis.allows(pe) || (qAxis != null && !qAxis.allows(qe))) {
            return false;
        }
        EquivalentCircuit c = at(pe, qe);
        if (c == null) {
            return false;
        }
        fill(c, signP * signQ, coef);
        lastCircuit = c;
        lastOk = true;
        return true;
    }

    private EquivalentCircuit at(double p, double q) {
        try {
            return plane.at(p, q);
        } catch (FerromapException e) {
            return null;
        }
    }

    /** The four per-unit loop coefficients of circuit c, forcing multiplied by sign. */
    private void fill(EquivalentCircuit c, double sign, double[] out) {
        double rho = c.omega() / baseOmega;
        out[0] = c.totalCapacitance() / baseCapacitance * rho * rho;
        out[1] = c.conductance() / (baseOmega * baseCapacitance) * rho;
        double sigma = sign * c.seriesCapacitance() / baseCapacitance * rho * c.sourcePeak() / baseVoltage;
        out[2] = sigma * Math.cos(c.sourceAngle());
        out[3] = -sigma * Math.sin(c.sourceAngle());
    }

    /** Rates of the loop coefficients in p (first) or q at the last (p, q); false when not computable. */
    private boolean rate(boolean first, double[] out) {
        BalanceAxis axis = first ? pAxis : qAxis;
        EquivalentCircuit c = lastCircuit;
        double sign = signP * signQ;
        Arrays.fill(out, 0.0);
        double rho = c.omega() / baseOmega;
        double cos = Math.cos(c.sourceAngle());
        double sin = Math.sin(c.sourceAngle());
        double dSigma = 0;
        switch (axis.rate()) {
            case SOURCE -> dSigma = (first ? signQ : signP) * c.seriesCapacitance() / baseCapacitance * rho / baseVoltage;
            case SERIES_CAPACITANCE -> {
                out[0] = rho * rho / baseCapacitance;
                dSigma = sign * rho * c.sourcePeak() / (baseVoltage * baseCapacitance);
            }
            case SHUNT_CAPACITANCE -> out[0] = rho * rho / baseCapacitance;
            case CORE_LOSS_RESISTANCE -> {
                double r = c.coreLossResistance();
                out[1] = Double.isInfinite(r) ? 0.0 : -rho / (r * r * baseOmega * baseCapacitance);
            }
            case LOAD_RESISTANCE -> {
                double r = c.loadResistance();
                out[1] = Double.isInfinite(r) ? 0.0 : -rho / (r * r * baseOmega * baseCapacitance);
            }
            case FREQUENCY -> {
                double dRho = 2 * Math.PI / baseOmega;
                out[0] = 2 * c.totalCapacitance() / baseCapacitance * rho * dRho;
                out[1] = c.conductance() / (baseOmega * baseCapacitance) * dRho;
                dSigma = sign * c.seriesCapacitance() / baseCapacitance * c.sourcePeak() / baseVoltage * dRho;
            }
            case DIFFERENCED -> {
                return difference(first, out);
            }
            default -> throw new IllegalStateException("unknown rate " + axis.rate());
        }
        out[2] = dSigma * cos;
        out[3] = -dSigma * sin;
        return true;
    }

    /** Five-point central difference of the coefficients (three-point forward next to 0). */
    private boolean difference(boolean first, double[] out) {
        BalanceAxis axis = first ? pAxis : qAxis;
        double v = first ? lastP : lastQ;
        double other = first ? Math.abs(lastQ) : Math.abs(lastP);
        double width = first ? pWidth : qWidth;
        double h = DIFFERENCE_STEP * (v != 0 ? Math.abs(v) : width);
        double sign = signP * signQ;
        if (axis.allows(v - 2 * h)) {
            if (!shifted(first, v - 2 * h, other, sign, fa) || !shifted(first, v - h, other, sign, fb)
                    || !shifted(first, v + h, other, sign, fc) || !shifted(first, v + 2 * h, other, sign, fd)) {
                return false;
            }
            for (int k = 0; k < 4; k++) {
                out[k] = (fa[k] - 8 * fb[k] + 8 * fc[k] - fd[k]) / (12 * h);
            }
            return true;
        }
        if (!shifted(first, v + h, other, sign, fc) || !shifted(first, v + 2 * h, other, sign, fd)) {
            return false;
        }
        for (int k = 0; k < 4; k++) {
            out[k] = (-3 * coef[k] + 4 * fc[k] - fd[k]) / (2 * h);
        }
        return true;
    }

    private boolean shifted(boolean first, double v, double other, double sign, double[] out) {
        if (!(first ? pAxis : qAxis).allows(v)) {
            return false;
        }
        EquivalentCircuit c = first ? at(v, other) : at(other, v);
        if (c == null) {
            return false;
        }
        fill(c, sign, out);
        return true;
    }
}
