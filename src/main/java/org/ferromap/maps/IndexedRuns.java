package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReferenceArray;
import java.util.function.IntFunction;

/**
 * Evaluates independent jobs 0 .. n-1 (table rows, switching events, Monte Carlo runs) on a
 * {@link CellExecutor}, the engine the maps use, and returns their results in index order. Each
 * job depends only on its index, and its result goes to the slot of its index, so the answer is
 * the same whatever the executor and its thread count; a stop request (Ctrl-C) ends with
 * {@code INTERRUPTED} like a map does.
 */
public final class IndexedRuns {

    private IndexedRuns() {
    }

    /**
     * Runs {@code job} for every index and returns the results in index order.
     *
     * @param n        number of jobs, &gt;= 0
     * @param job      the job, a pure function of its index, callable from several threads at once
     * @param executor who runs the jobs
     * @param chunk    jobs per work unit (1 for slow jobs such as simulations)
     */
    public static <T> List<T> map(int n, IntFunction<T> job, CellExecutor executor, int chunk) {
        if (n == 0) {
            return List.of();
        }
        AtomicReferenceArray<T> results = new AtomicReferenceArray<>(n);
        double[] xs = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = i;
        }
        double[] ys = {0.0};
        int c = Math.max(1, chunk);
        List<WorkUnit> units = new ArrayList<>();
        for (int i0 = 0, t = 0; i0 < n; i0 += c, t++) {
            units.add(new WorkUnit(0, t, 0, i0, 0, Math.min(n, i0 + c), 1, n, null));
        }
        CellFunction cell = new CellFunction() {
            @Override
            public int width() {
                return 1;
            }

            @Override
            public void evaluate(double x, double y, double[] out, int offset) {
                int i = (int) x;
                results.set(i, job.apply(i));
                out[offset] = i;
            }

            @Override
            public String fingerprint() {
                return "indexed jobs " + n;
            }
        };
        executor.execute(xs, ys, units, cell, new UnitSink() {
            @Override
            public void accept(WorkUnit u, double[] values) {
                // results are kept by index in the job itself
            }

            @Override
            public void stopping(int inProgress) {
                // nothing to save: a stopped run is reported as interrupted
            }
        });
        List<T> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(results.get(i));
        }
        return out;
    }
}
