package org.ferromap.maps;

import java.util.List;

/**
 * Runs work units of a map: the local thread pool now, a cluster engine later. Implementations
 * evaluate each unit with {@link WorkUnit#evaluate} (so the numbers do not depend on who ran them)
 * and deliver it to the sink once finished, in any order, from any thread.
 */
public interface CellExecutor {

    /**
     * Evaluates every unit and returns when all were delivered to {@code sink}.
     *
     * @param xs    x-axis sample values, indexed by column
     * @param ys    y-axis sample values, indexed by row
     * @param units the units, in the order they should preferably start
     * @param cell  the pure cell function
     * @param sink  receives each finished unit
     * @throws org.ferromap.errors.FerromapException with key {@code INTERRUPTED} when stopped
     *         (after the units in progress were finished and delivered), or the first exception a
     *         cell threw (after the other units in progress finished)
     */
    void execute(double[] xs, double[] ys, List<WorkUnit> units, CellFunction cell, UnitSink sink);

    /** Asks the executor to stop: units in progress finish and are delivered, no new one starts. */
    void requestStop();
}
