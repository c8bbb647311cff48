package org.ferromap.maps;

/** Receives finished work units from a {@link CellExecutor}; called from any thread. */
public interface UnitSink {

    /**
     * A unit is finished: {@code values} holds its cells in unit order, {@code width} doubles each.
     * The array may be reused by the executor after this returns: copy what you keep.
     */
    void accept(WorkUnit unit, double[] values);

    /** A stop was requested; {@code inProgress} units are being finished before the executor returns. */
    default void stopping(int inProgress) {
    }
}
