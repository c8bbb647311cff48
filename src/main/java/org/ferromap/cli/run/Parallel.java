package org.ferromap.cli.run;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.IntConsumer;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/** Independent simulations on a few threads, each writing its own slot (so the order of finishing does not matter). */
final class Parallel {

    private Parallel() {
    }

    static void run(int threads, int n, IntConsumer task) {
        if (threads <= 1 || n <= 1) {
            for (int i = 0; i < n; i++) {
                task.accept(i);
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.min(threads, n), r -> {
            Thread t = new Thread(r, "ferromap-run");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> fs = new ArrayList<>(n);
            for (int i = 0; i < n; i++) {
                int k = i;
                fs.add(pool.submit(() -> task.accept(k)));
            }
            for (Future<?> f : fs) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new FerromapException(MessageKey.INTERRUPTED, "simulations stopped on request");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException("a simulation failed", e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
