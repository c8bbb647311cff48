package org.ferromap.maps;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Runs work units on a fixed number of threads of this JVM. Each unit writes its own slots of the
 * result, so the map is bit-identical whatever the thread count.
 *
 * <p>Stopping: {@link #requestStop()}, an interrupt of the thread that called
 * {@link #execute}, or Ctrl-C (a shutdown hook, registered while {@code execute} runs) let the
 * units in progress finish and be delivered (and so saved by a tile store), start no new one,
 * and end {@code execute} with {@code INTERRUPTED}. On Ctrl-C the JVM waits at most
 * {@link #stopGrace()} for the units in progress. Once stopped, an executor stays stopped.
 */
public final class LocalPoolExecutor implements CellExecutor {

    /** How long Ctrl-C waits for units in progress by default: long enough for a tile of cheap cells. */
    public static final Duration DEFAULT_STOP_GRACE = Duration.ofSeconds(60);

    private final int threads;
    private final boolean stopOnShutdown;
    private final Duration stopGrace;
    private volatile boolean stopRequested;

    /** One thread per available processor, stopping on Ctrl-C. */
    public LocalPoolExecutor() {
        this(Runtime.getRuntime().availableProcessors());
    }

    /** {@code threads} worker threads (at least 1), stopping on Ctrl-C. */
    public LocalPoolExecutor(int threads) {
        this(threads, true, DEFAULT_STOP_GRACE);
    }

    /**
     * @param threads        worker threads, at least 1
     * @param stopOnShutdown whether Ctrl-C (JVM shutdown) finishes the units in progress first
     * @param stopGrace      the longest a shutdown waits for the units in progress
     */
    public LocalPoolExecutor(int threads, boolean stopOnShutdown, Duration stopGrace) {
        if (threads < 1) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "threads = " + threads + "; at least 1 is needed");
        }
        if (stopGrace == null || stopGrace.isNegative()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "stop grace " + stopGrace + " must be zero or positive");
        }
        this.threads = threads;
        this.stopOnShutdown = stopOnShutdown;
        this.stopGrace = stopGrace;
    }

    /** Number of worker threads. */
    public int threads() {
        return threads;
    }

    /** Longest wait for units in progress on Ctrl-C. */
    public Duration stopGrace() {
        return stopGrace;
    }

    /** Whether a stop was requested. */
    public boolean stopRequested() {
        return stopRequested;
    }

    @Override
    public void requestStop() {
        stopRequested = true;
    }

    @Override
    public void execute(double[] xs, double[] ys, List<WorkUnit> units, CellFunction cell, UnitSink sink) {
        int n = units.size();
        if (n == 0) {
            return;
        }
        if (stopRequested) {
            throw stopped(0, n);
        }
        int width = cell.width();
        int maxCells = 0;
        for (WorkUnit u : units) {
            maxCells = Math.max(maxCells, u.cellCount());
        }
        int bufferLength = maxCells * width;
        int workers = Math.min(threads, n);
        AtomicInteger next = new AtomicInteger();
        AtomicInteger inProgress = new AtomicInteger();
        AtomicInteger done = new AtomicInteger();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        CountDownLatch ended = new CountDownLatch(workers);

        Runnable work = () -> {
            try {
                double[] buffer = new double[bufferLength]; // one per worker, reused for every unit
                while (!stopRequested && failure.get() == null) {
                    int i = next.getAndIncrement();
                    if (i >= n) {
                        break;
                    }
                    inProgress.incrementAndGet();
                    try {
                        WorkUnit u = units.get(i);
                        u.evaluate(xs, ys, cell, width, buffer);
                        sink.accept(u, buffer);
                        done.incrementAndGet();
                    } finally {
                        inProgress.decrementAndGet();
                    }
                }
            } catch (Throwable e) {
                failure.compareAndSet(null, e);
            } finally {
                ended.countDown();
            }
        };

        Thread hook = null;
        if (stopOnShutdown) {
            hook = new Thread(() -> {
                stopRequested = true;
                sink.stopping(inProgress.get());
                try {
                    ended.await(stopGrace.toMillis(), TimeUnit.MILLISECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }, "ferromap-map-stop");
            try {
                Runtime.getRuntime().addShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                hook = null;
                stopRequested = true;
            }
        }
        for (int k = 0; k < workers; k++) {
            Thread t = new Thread(work, "ferromap-map-" + (k + 1));
            t.setDaemon(true); // never keeps a finished JVM alive; the hook waits for work in progress
            t.start();
        }
        boolean interrupted = false;
        while (true) {
            try {
                ended.await();
                break;
            } catch (InterruptedException e) {
                interrupted = true;
                if (!stopRequested) {
                    stopRequested = true;
                    sink.stopping(inProgress.get());
                }
            }
        }
        if (hook != null) {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                // the hook is running or ran: nothing to remove
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
        Throwable f = failure.get();
        if (f instanceof RuntimeException re) {
            throw re;
        }
        if (f instanceof Error err) {
            throw err;
        }
        if (f != null) {
            throw new IllegalStateException("a map cell failed", f);
        }
        if (done.get() < n) {
            throw stopped(done.get(), n);
        }
    }

    private static FerromapException stopped(int done, int total) {
        return new FerromapException(MessageKey.INTERRUPTED, "map stopped on request after " + done + " of " + total
                + " tiles of this pass; finished tiles are kept (rerun the same request to resume)");
    }
}
