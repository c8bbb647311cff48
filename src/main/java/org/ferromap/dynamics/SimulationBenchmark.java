package org.ferromap.dynamics;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The time-domain speed benchmark: integrate a circuit from rest for N source periods with 100
 * output samples a period (the work a user-facing simulation does to find the peak), R times in
 * one warm process, and report the median wall time. The same work as the peer program
 * {@code gsl_circuit.c} (GSL's rk8pd with 100 driver outputs a period), so the figures compare.
 * A benchmark reports figures; it asserts nothing.
 */
public final class SimulationBenchmark {

    /** Output samples per source period, as in the peer program. */
    public static final int SAMPLES_PER_PERIOD = 100;

    private SimulationBenchmark() {
    }

    /**
     * Figures of one benchmark run.
     *
     * @param medianSeconds median wall time of one integration, s
     * @param medianCpuSeconds median CPU time of the benchmark thread for one integration, s (less
     *        disturbed than wall time on a shared machine; NaN where the JVM cannot measure it)
     * @param rhsEvaluations right-hand-side evaluations of one integration
     * @param finalFlux flux linkage at the end, Wb-turn
     * @param finalVoltage terminal voltage at the end, V
     * @param peakVoltageLast10 largest |v| among the output samples of the last 10 periods, V
     * @param status how the integration ended
     */
    public record Result(double medianSeconds, double medianCpuSeconds, long rhsEvaluations, double finalFlux, double finalVoltage,
                         double peakVoltageLast10, DormandPrince853.Status status) { }

    /**
     * Runs the benchmark.
     *
     * @param circuit the circuit, started from lambda = 0, v = 0 at its own source angle
     * @param periods source periods to integrate, at least 10
     * @param repeat integrations to time, at least 1
     * @param rtol relative tolerance; the absolute tolerance is the same number in per unit of
     *        the rated peak voltage and flux (the peer's scaled tolerances come to about the same)
     * @return the figures
     */
    public static Result run(EquivalentCircuit circuit, int periods, int repeat, double rtol) {
        if (periods < 10) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "periods = " + periods + " must be >= 10");
        }
        if (repeat < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "repeat = " + repeat + " must be >= 1");
        }
        if (!(rtol > 0 && rtol < 1)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "rtol = " + rtol + " must lie in (0, 1)");
        }
        PerUnitCircuit model = PerUnitCircuit.of(circuit);
        double[] seconds = new double[repeat];
        double[] cpuSeconds = new double[repeat];
        Result last = null;
        for (int r = 0; r < repeat; r++) {
            long cpu = cpuNanos();
            long start = System.nanoTime();
            last = once(model, periods, rtol);
            seconds[r] = (System.nanoTime() - start) * 1e-9;
            cpuSeconds[r] = (cpuNanos() - cpu) * 1e-9;
        }
        return new Result(median(seconds), median(cpuSeconds), last.rhsEvaluations(), last.finalFlux(), last.finalVoltage(),
                last.peakVoltageLast10(), last.status());
    }

    private static Result once(PerUnitCircuit model, int periods, double rtol) {
        DormandPrince853 integrator = DormandPrince853.uniform(2, rtol, rtol, 1e-12, PerUnitCircuit.PERIOD);
        DormandPrince853.Rhs rhs = model::derivatives;
        double dt = PerUnitCircuit.PERIOD / SAMPLES_PER_PERIOD;
        long total = (long) periods * SAMPLES_PER_PERIOD;
        long firstWatched = (long) (periods - 10) * SAMPLES_PER_PERIOD + 1;
        double[] peak = {0};
        long[] next = {1};
        DormandPrince853.StepListener sampler = (t0, t1) -> {
            // Output samples on the fixed grid tau_j = j dt that fall in this step.
            while (next[0] <= total) {
                double tj = next[0] * dt;
                if (tj > t1) {
                    break;
                }
                double v = integrator.interpolate(tj, 1);
                if (next[0] >= firstWatched) {
                    peak[0] = Math.max(peak[0], Math.abs(v));
                }
                next[0]++;
            }
        };
        double[] z = {0.0, 0.0};
        DormandPrince853.Status status = integrator.integrate(rhs, 0.0, z, periods * PerUnitCircuit.PERIOD,
                Long.MAX_VALUE, sampler);
        return new Result(0, 0, integrator.evaluations(), z[0] * model.fluxBase(), z[1] * model.voltageBase(),
                peak[0] * model.voltageBase(), status);
    }

    private static double median(double[] v) {
        double[] c = v.clone();
        Arrays.sort(c);
        int n = c.length;
        return n % 2 == 1 ? c[n / 2] : 0.5 * (c[n / 2 - 1] + c[n / 2]);
    }

    private static long cpuNanos() {
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        return mx.isCurrentThreadCpuTimeSupported() ? mx.getCurrentThreadCpuTime() : 0L;
    }

    /**
     * The same work done by Hipparchus's {@code DormandPrince853Integrator} (per-component
     * tolerances, a step handler reading the 100 samples a period from its interpolator), for
     * comparison with the lean integrator.
     */
    public static Result runHipparchus(EquivalentCircuit circuit, int periods, int repeat, double rtol) {
        PerUnitCircuit model = PerUnitCircuit.of(circuit);
        double[] seconds = new double[repeat];
        double[] cpuSeconds = new double[repeat];
        Result last = null;
        for (int r = 0; r < repeat; r++) {
            long cpu = cpuNanos();
            long start = System.nanoTime();
            last = onceHipparchus(model, periods, rtol);
            seconds[r] = (System.nanoTime() - start) * 1e-9;
            cpuSeconds[r] = (cpuNanos() - cpu) * 1e-9;
        }
        return new Result(median(seconds), median(cpuSeconds), last.rhsEvaluations(), last.finalFlux(), last.finalVoltage(),
                last.peakVoltageLast10(), last.status());
    }

    private static Result onceHipparchus(PerUnitCircuit model, int periods, double rtol) {
        double[] tol = {rtol, rtol};
        org.hipparchus.ode.nonstiff.DormandPrince853Integrator integ =
                new org.hipparchus.ode.nonstiff.DormandPrince853Integrator(1e-12, PerUnitCircuit.PERIOD, tol, tol);
        long[] evals = {0};
        org.hipparchus.ode.OrdinaryDifferentialEquation ode = new org.hipparchus.ode.OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                evals[0]++;
                double[] d = new double[2];
                model.derivatives(t, y, d);
                return d;
            }
        };
        double dt = PerUnitCircuit.PERIOD / SAMPLES_PER_PERIOD;
        long total = (long) periods * SAMPLES_PER_PERIOD;
        long firstWatched = (long) (periods - 10) * SAMPLES_PER_PERIOD + 1;
        double[] peak = {0};
        long[] next = {1};
        integ.addStepHandler(interpolator -> {
            double t1 = interpolator.getCurrentState().getTime();
            while (next[0] <= total && next[0] * dt <= t1) {
                double v = interpolator.getInterpolatedState(next[0] * dt).getPrimaryState()[1];
                if (next[0] >= firstWatched) {
                    peak[0] = Math.max(peak[0], Math.abs(v));
                }
                next[0]++;
            }
        });
        org.hipparchus.ode.ODEStateAndDerivative end = integ.integrate(ode,
                new org.hipparchus.ode.ODEState(0.0, new double[] {0, 0}), periods * PerUnitCircuit.PERIOD);
        double[] z = end.getPrimaryState();
        return new Result(0, 0, evals[0], z[0] * model.fluxBase(), z[1] * model.voltageBase(),
                peak[0] * model.voltageBase(), DormandPrince853.Status.OK);
    }

    /**
     * Command-line entry for measurements: {@code E_pk periods repeat rtol} on the peer's default
     * circuit (a = 1.5e-3, b = 1.33e-17, n = 9, R = 1.19 MOhm, Cs = 0.2 uF, Cg = 0.05 uF, 60 Hz).
     */
    public static void main(String[] args) {
        double e = args.length > 0 ? Double.parseDouble(args[0]) : 28170;
        int periods = args.length > 1 ? Integer.parseInt(args[1]) : 1000;
        int repeat = args.length > 2 ? Integer.parseInt(args[2]) : 11;
        double rtol = args.length > 3 ? Double.parseDouble(args[3]) : 1e-8;
        boolean hipparchus = args.length > 4 && args[4].equals("hipparchus");
        Result r = hipparchus ? runHipparchus(peerCircuit(e), periods, repeat, rtol) : run(peerCircuit(e), periods, repeat, rtol);
        System.out.printf("median_s %.6f cpu_s %.6f rhs_evals %d lam %.12e v %.12e vpeak_last10 %.9e status %s%n",
                r.medianSeconds(), r.medianCpuSeconds(), r.rhsEvaluations(), r.finalFlux(), r.finalVoltage(), r.peakVoltageLast10(),
                r.status());
    }

    /** The peer program's default circuit at source peak e, V (1 pu = e). */
    public static EquivalentCircuit peerCircuit(double e) {
        return EquivalentCircuit.of(2 * Math.PI * 60.0, e, 0.2e-6, 0.05e-6,
                        new org.ferromap.equipment.PolynomialCurve(1.5e-3, 1.33e-17, 9))
                .withCoreLossResistance(1.19e6);
    }
}
