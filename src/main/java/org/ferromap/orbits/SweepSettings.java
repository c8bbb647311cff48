package org.ferromap.orbits;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * How to draw a brute-force bifurcation diagram. Immutable; change with the {@code withX} copies.
 * Deterministic: no random numbers, and the result does not depend on the thread count.
 *
 * @param firstTransientPeriods forcing periods discarded at the first parameter value of a run
 *        (from the initial state); default 500
 * @param transientPeriods forcing periods discarded at every later value (the state is carried
 *        from the previous value, so it starts close to the attractor); default 300
 * @param recordedPeriods stroboscopic samples kept per parameter value; default 32
 * @param tolerance relative integration tolerance, also absolute in the system's units; default 1e-9
 * @param maxStepsPerPeriod integrator steps per forcing period beyond which a run is abandoned at
 *        that value (its samples there are NaN and the next value restarts from the initial
 *        state); default 100000
 * @param threads worker threads, 1 to 64; runs (initial state and direction) are independent and
 *        each writes only its own slots, so any count gives identical results; default 1
 */
public record SweepSettings(int firstTransientPeriods, int transientPeriods, int recordedPeriods, double tolerance,
        int maxStepsPerPeriod, int threads) {

    /** The documented defaults. */
    public static final SweepSettings DEFAULTS = new SweepSettings(500, 300, 32, 1e-9, 100_000, 1);

    public SweepSettings {
        check(firstTransientPeriods >= 0 && firstTransientPeriods <= 1_000_000, "first transient", firstTransientPeriods,
                "in [0, 1000000] periods");
        check(transientPeriods >= 0 && transientPeriods <= 1_000_000, "transient", transientPeriods, "in [0, 1000000] periods");
        check(recordedPeriods >= 1 && recordedPeriods <= 100_000, "recorded periods", recordedPeriods, "in [1, 100000]");
        check(tolerance >= 1e-14 && tolerance <= 1e-3, "tolerance", tolerance, "in [1e-14, 1e-3]");
        check(maxStepsPerPeriod >= 10, "steps per period", maxStepsPerPeriod, ">= 10");
        check(threads >= 1 && threads <= 64, "threads", threads, "in [1, 64]");
    }

    public SweepSettings withTransients(int first, int later) {
        return new SweepSettings(first, later, recordedPeriods, tolerance, maxStepsPerPeriod, threads);
    }

    public SweepSettings withRecordedPeriods(int v) {
        return new SweepSettings(firstTransientPeriods, transientPeriods, v, tolerance, maxStepsPerPeriod, threads);
    }

    public SweepSettings withTolerance(double v) {
        return new SweepSettings(firstTransientPeriods, transientPeriods, recordedPeriods, v, maxStepsPerPeriod, threads);
    }

    public SweepSettings withThreads(int v) {
        return new SweepSettings(firstTransientPeriods, transientPeriods, recordedPeriods, tolerance, maxStepsPerPeriod, v);
    }

    private static void check(boolean ok, String what, double v, String allowed) {
        if (!ok) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, what + " = " + v + " is not allowed; expected " + allowed);
        }
    }
}
