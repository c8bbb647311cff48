package org.ferromap.orbits;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.DoubleFunction;
import org.ferromap.dynamics.DormandPrince853;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The brute-force bifurcation diagram: for each initial state, a run up through the parameter
 * values and a run down, each carrying its state from one value to the next, discarding a
 * transient and keeping stroboscopic samples (t = 0 mod T). Carrying the state follows an
 * attractor through its range of existence, so up and down runs show hysteresis; several initial
 * states find coexisting attractors. Runs are independent, so they run in parallel when asked and
 * the result is the same for any thread count.
 */
public final class BruteForceSweep {

    private BruteForceSweep() {
    }

    /**
     * Sweeps.
     *
     * @param family the system at each parameter value
     * @param parameters the values, strictly increasing, units of the parameter
     * @param initialStates states to start from, system units (at least one)
     * @param settings transients, samples, tolerance, threads
     * @return runs in the order: for each initial state, the upward run then the downward run
     */
    public static List<SweepRun> sweep(DoubleFunction<? extends PeriodicSystem> family, double[] parameters,
            List<double[]> initialStates, SweepSettings settings) {
        if (parameters == null || parameters.length == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the sweep needs at least one parameter value");
        }
        for (int i = 0; i < parameters.length; i++) {
            if (!Double.isFinite(parameters[i]) || (i > 0 && !(parameters[i] > parameters[i - 1]))) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "parameter values must be finite and strictly increasing; value "
                        + i + " is " + parameters[i]);
            }
        }
        if (initialStates == null || initialStates.isEmpty()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "the sweep needs at least one initial state");
        }
        int n = family.apply(parameters[0]).dimension();
        for (double[] s : initialStates) {
            if (s.length != n) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "initial state " + Arrays.toString(s) + " has "
                        + s.length + " components; the system has " + n);
            }
        }
        int runs = 2 * initialStates.size();
        SweepRun[] out = new SweepRun[runs];
        if (settings.threads() == 1) {
            for (int r = 0; r < runs; r++) {
                out[r] = run(family, parameters, initialStates.get(r / 2), r / 2, r % 2 == 0, settings, n);
            }
        } else {
            ExecutorService pool = Executors.newFixedThreadPool(Math.min(settings.threads(), runs));
            try {
                List<Future<SweepRun>> futures = new ArrayList<>();
                for (int r = 0; r < runs; r++) {
                    final int rr = r;
                    futures.add(pool.submit(() -> run(family, parameters, initialStates.get(rr / 2), rr / 2, rr % 2 == 0,
                            settings, n)));
                }
                for (int r = 0; r < runs; r++) {
                    out[r] = futures.get(r).get();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new FerromapException(MessageKey.INTEGRATION_FAILED, "the sweep was interrupted", e);
            } catch (ExecutionException e) {
                Throwable c = e.getCause();
                if (c instanceof RuntimeException re) {
                    throw re;
                }
                throw new FerromapException(MessageKey.INTEGRATION_FAILED, "a sweep run failed: " + c, c);
            } finally {
                pool.shutdownNow();
            }
        }
        return List.of(out);
    }

    private static SweepRun run(DoubleFunction<? extends PeriodicSystem> family, double[] parameters, double[] initial,
            int index, boolean upward, SweepSettings s, int n) {
        int count = parameters.length;
        double[] visited = new double[count];
        double[][][] samples = new double[count][s.recordedPeriods()][n];
        PeriodMap map = new PeriodMap(n, s.tolerance(), s.maxStepsPerPeriod());
        double[] z = initial.clone();
        boolean fresh = true;
        for (int i = 0; i < count; i++) {
            double p = parameters[upward ? i : count - 1 - i];
            visited[i] = p;
            PeriodicSystem sys = family.apply(p);
            map.restart();
            boolean ok = map.advance(sys, z, fresh ? s.firstTransientPeriods() : s.transientPeriods())
                    == DormandPrince853.Status.OK;
            for (int j = 0; j < s.recordedPeriods() && ok; j++) {
                ok = map.advance(sys, z, 1) == DormandPrince853.Status.OK;
                System.arraycopy(z, 0, samples[i][j], 0, n);
            }
            if (ok) {
                fresh = false;
            } else {
                for (double[] row : samples[i]) {
                    Arrays.fill(row, Double.NaN);
                }
                z = initial.clone();
                fresh = true;
            }
        }
        return new SweepRun(index, upward, visited, samples);
    }
}
