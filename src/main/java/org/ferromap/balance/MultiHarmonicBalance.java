package org.ferromap.balance;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Multi-harmonic balance of one equivalent circuit (DOMAIN.md §3, alternating frequency-time
 * method): residuals for continuation, Newton solutions at the circuit's own parameters seeded
 * from the single-harmonic points, folds in source voltage, and Hill stability.
 *
 * <p>Folds are found by a small pseudo-arclength trace in (harmonics, source voltage)
 * ({@code SourceBranchTracer}); fixing the fundamental amplitude instead fails where a harmonic
 * resonates internally and the branch turns back in that amplitude (seen for n = 9).
 *
 * <p>Immutable; each call makes its own work arrays, so instances may be shared between threads.
 */
public final class MultiHarmonicBalance {

    private final EquivalentCircuit circuit;
    private final HarmonicSettings settings;
    private final HarmonicBasis basis;

    public MultiHarmonicBalance(EquivalentCircuit circuit, HarmonicSettings settings) {
        this.circuit = circuit;
        this.settings = settings;
        int n = settings.samples();
        if (n == 0) {
            n = automaticSamples(circuit, settings.harmonics());
        }
        this.basis = new HarmonicBasis(settings.harmonics(), settings.oddOnly(), n);
    }

    /** (n+1)H + 1 for a degree-n polynomial (alias-free); max(64, 32(H+1)) otherwise. */
    static int automaticSamples(EquivalentCircuit c, int h) {
        if (c.magnetizing() instanceof PolynomialCurve p) {
            return (p.n() + 1) * h + 1;
        }
        return Math.max(64, 32 * (h + 1));
    }

    public HarmonicBasis basis() {
        return basis;
    }

    public EquivalentCircuit circuit() {
        return circuit;
    }

    public HarmonicSettings settings() {
        return settings;
    }

    /** The residual F(x, p) with p the given quantity, bases from this circuit. */
    public MultiHarmonicResidual residual(CircuitParameter parameter) {
        return new MultiHarmonicResidual(circuit, parameter, basis);
    }

    /** Per-unit unknown vector of a single-harmonic point: lambda = Lambda cos(w t + phi + voltagePhase - pi). */
    public double[] seed(OperatingPoint point) {
        double[] x = new double[basis.dimension()];
        double amp = point.flux() / (circuit.ratedPeak() / circuit.omega());
        double theta = circuit.sourceAngle() + point.voltagePhase() - Math.PI;
        x[basis.cosIndex(1)] = amp * Math.cos(theta);
        x[basis.sinIndex(1)] = -amp * Math.sin(theta);
        return x;
    }

    /**
     * Newton solution at the circuit's own parameters from a per-unit guess. For non-polynomial
     * curves the samples are doubled until the residual on twice as many samples is within the
     * tolerance. Throws NO_CONVERGENCE when Newton fails.
     */
    public PeriodicSolution solve(double[] guess) {
        MultiHarmonicResidual r = residual(CircuitParameter.SOURCE);
        double p = circuit.sourcePeak();
        NewtonResult res = newton(r, p, guess);
        if (!(circuit.magnetizing() instanceof PolynomialCurve) && settings.samples() == 0) {
            for (int doubling = 0; doubling < 8; doubling++) {
                MultiHarmonicResidual fine = new MultiHarmonicResidual(circuit, CircuitParameter.SOURCE,
                        r.basis().withSamples(2 * r.basis().samples()));
                double[] f = new double[fine.dimension()];
                fine.residual(res.x(), p, f);
                if (DenseNewton.maxAbs(f) <= settings.tolerance() * fine.scale(res.x(), p)) {
                    break;
                }
                r = fine;
                res = newton(r, p, res.x());
            }
        }
        return describe(res.x(), res.residualNorm(), r.basis().samples());
    }

    /** Multi-harmonic steady states seeded from every single-harmonic point (those that converge), with their stability. */
    public List<SteadyState> operatingPoints(SingleHarmonicBalance single) {
        List<SteadyState> out = new ArrayList<>();
        for (OperatingPoint op : single.operatingPoints(circuit)) {
            if (op.flux() == 0) {
                continue;
            }
            try {
                PeriodicSolution s = solve(seed(op));
                out.add(new SteadyState(s, stability(s.perUnit()), op));
            } catch (FerromapException e) {
                if (e.key() != MessageKey.NO_CONVERGENCE) {
                    throw e;
                }
            }
        }
        return out;
    }

    /** A multi-harmonic steady state with its Hill stability and the single-harmonic point it grew from. */
    public record SteadyState(PeriodicSolution solution, FloquetExponents stability, OperatingPoint seed) { }

    /** SI description of a per-unit solution vector. */
    public PeriodicSolution describe(double[] x, double residualNorm, int samples) {
        double lb = circuit.ratedPeak() / circuit.omega();
        double[] c = new double[x.length];
        for (int k = 0; k < x.length; k++) {
            c[k] = x[k] * lb;
        }
        double a1 = Math.hypot(x[basis.cosIndex(1)], x[basis.sinIndex(1)]) * lb;
        return new PeriodicSolution(circuit.omega(), basis.harmonics(), basis.oddOnly(), c, lb,
                basis.peak(x, 0) * lb, basis.peak(x, 1) * lb * circuit.omega(), a1, a1 * circuit.omega(), residualNorm, samples);
    }

    /**
     * Floquet exponents of a per-unit solution by Hill's method, truncated at
     * {@link HarmonicSettings#hillHarmonics()} (default max(10, min(H + 4, 20))). When the
     * eigenproblem fails or its Liouville check is off by more than 1e-6 per unit, the exponents
     * come instead from the fundamental matrix integrated over one period along the waveform
     * (then {@link FloquetExponents#truncation()} is 0).
     */
    public FloquetExponents stability(double[] x) {
        int k = settings.hillHarmonics() > 0 ? settings.hillHarmonics() : Math.max(10, Math.min(basis.harmonics() + 4, 20));
        int n;
        if (circuit.magnetizing() instanceof PolynomialCurve p) {
            n = Math.max(4 * k + 1, (p.n() - 1) * basis.harmonics() + 2 * k + 1);
        } else {
            n = Math.max(4 * k + 1, 2 * basis.samples());
        }
        HarmonicBasis hb = basis.withSamples(n);
        double[] y = new double[n];
        hb.synthesize(x, y);
        double lb = circuit.ratedPeak() / circuit.omega();
        double ib = circuit.omega() * circuit.totalCapacitance() * circuit.ratedPeak();
        for (int j = 0; j < n; j++) {
            y[j] = circuit.magnetizing().currentSlope(lb * y[j]) * lb / ib;
        }
        double damping = circuit.conductance() / (circuit.omega() * circuit.totalCapacitance());
        try {
            FloquetExponents fe = HillStability.exponents(1.0, damping, y, k, circuit.omega());
            if (fe.liouvilleMismatch() / circuit.omega() <= 1e-6) {
                return fe;
            }
        } catch (FerromapException e) {
            if (e.key() != MessageKey.NO_CONVERGENCE) {
                throw e;
            }
        }
        final double[] xx = x.clone();
        return WaveformMonodromy.exponents(1.0, damping,
                tau -> circuit.magnetizing().currentSlope(lb * basis.evaluate(xx, tau, 0)) * lb / ib, circuit.omega());
    }

    /**
     * Folds of the multi-harmonic branch in source voltage, traced by pseudo-arclength in
     * (harmonics, E) from the normal state at 30 % of the single-harmonic jump-up voltage until
     * the flux passes twice the single-harmonic jump-down flux (or E three times the jump-up
     * voltage). Empty when the single-harmonic branch has no fold pair. Fold flux and voltage
     * are the peaks of the multi-harmonic waveform.
     */
    public List<Fold> folds(SingleHarmonicBalance single) {
        List<Fold> sh = single.folds(circuit);
        if (sh.isEmpty()) {
            return List.of();
        }
        double rated = circuit.ratedPeak();
        double lb = rated / circuit.omega();
        double eStart = 0.3 * sh.get(0).sourcePeak();
        EquivalentCircuit start = circuit.withSourcePeak(eStart);
        OperatingPoint normal = single.operatingPoints(start).get(0);
        MultiHarmonicBalance at = new MultiHarmonicBalance(start, settings);
        double[] x0 = at.solve(at.seed(normal)).perUnit();
        double xMax = 2.0 * sh.get(sh.size() - 1).flux() / lb;
        double qMax = 3.0 * sh.get(0).sourcePeak() / rated;
        SourceBranchTracer tracer = new SourceBranchTracer(residual(CircuitParameter.SOURCE), rated, settings);
        List<Fold> out = new ArrayList<>();
        for (SourceBranchTracer.FoldPoint fp : tracer.folds(x0, eStart / rated, qMax, xMax, 5000)) {
            double[] u = fp.u();
            double[] x = java.util.Arrays.copyOf(u, basis.dimension());
            double e = u[basis.dimension()] * rated;
            PeriodicSolution s = describe(x, 0.0, basis.samples());
            out.add(new Fold(e, e / rated, s.peakFlux(), s.peakVoltage(), fp.jumpUp() ? FoldDirection.JUMP_UP : FoldDirection.JUMP_DOWN));
        }
        return out;
    }

    private NewtonResult newton(MultiHarmonicResidual r, double p, double[] guess) {
        int d = r.dimension();
        NewtonResult res = DenseNewton.solve(new DenseNewton.SquareSystem() {
            @Override
            public int dimension() {
                return d;
            }

            @Override
            public void residual(double[] x, double[] f) {
                r.residual(x, p, f);
            }

            @Override
            public void jacobian(double[] x, double[][] j) {
                r.jacobian(x, p, j, null);
            }

            @Override
            public double scale(double[] x) {
                return r.scale(x, p);
            }
        }, guess, settings.tolerance(), settings.maxIterations());
        if (!res.converged()) {
            throw new FerromapException(MessageKey.NO_CONVERGENCE, "multi-harmonic Newton stopped after " + res.iterations()
                    + " steps with residual " + res.residualNorm() + " (tolerance " + settings.tolerance() + ")");
        }
        return res;
    }
}
