package org.ferromap.maps;

/**
 * What a map computes at one point of the parameter plane: a pure function of {@code (x, y)} that
 * writes a fixed number of doubles. The engine knows nothing of the physics behind it; a balance
 * cell (category, peak overvoltage) and a time-domain cell (fraction of an ensemble ending in
 * ferroresonance, worst mode) are both cell functions.
 *
 * <p>Contract: {@link #evaluate} depends on nothing but its arguments and the function's fixed
 * inputs (the same {@code (x, y)} gives bit-identical output on any thread, in any order), and it
 * may be called from several threads at once. Scratch space needed per call belongs in a
 * {@code ThreadLocal} or on the stack, never in a shared field. A point where the physics fails
 * should be written as a value (a category code, {@code NaN}) rather than thrown: an exception
 * stops the whole map.
 *
 * <p>Categories are written as small whole numbers stored in doubles (0, 1, 2, ...), compared
 * exactly by the refinement.
 */
public interface CellFunction {

    /** Number of doubles written per cell, at least 1; the same on every call. */
    int width();

    /**
     * Evaluates the cell at {@code (x, y)} (axis values in their axis units) and writes
     * {@link #width()} doubles to {@code out[offset .. offset + width - 1]}.
     */
    void evaluate(double x, double y, double[] out, int offset);

    /**
     * A stable text that identifies the function and every input it depends on (e.g. the kind of
     * cell, a content hash of the study, solver settings, the code version). Two functions with the
     * same fingerprint must give the same values: resume files are only reused under the same
     * fingerprint, so leaving an input out lets stale tiles be loaded.
     */
    String fingerprint();

    /** Names of the components, for legends and CSV headers; by default {@code c0, c1, ...}. */
    default String componentName(int k) {
        return "c" + k;
    }
}
