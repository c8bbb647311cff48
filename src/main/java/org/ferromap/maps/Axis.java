package org.ferromap.maps;

import java.util.Objects;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * One swept parameter of a map: {@code steps} sample values from {@code from} to {@code to}, both
 * ends included, evenly spaced on a linear or a logarithmic scale. Each value is computed from its
 * index (never by accumulating a step), so {@code value(i)} is the same number on every run and
 * every machine, and the ends are exactly {@code from} and {@code to}.
 *
 * @param name  the parameter's name as the study calls it (e.g. {@code cable.length})
 * @param unit  display unit of {@code from} and {@code to} (e.g. {@code m}); may be empty
 * @param from  first sample, in {@code unit}; finite, and positive on a log scale
 * @param to    last sample, in {@code unit}; finite, different from {@code from}, positive on a log
 *              scale; may be smaller than {@code from} (a descending axis)
 * @param steps number of samples, at least 2
 * @param scale spacing of the samples
 */
public record Axis(String name, String unit, double from, double to, int steps, Scale scale) {

    /** How samples are spaced between the ends. */
    public enum Scale {
        /** equal differences: {@code from + (to - from) i / (steps - 1)}. */
        LINEAR,
        /** equal ratios: {@code exp(ln from + (ln to - ln from) i / (steps - 1))}; needs positive ends. */
        LOG
    }

    public Axis {
        Objects.requireNonNull(scale, "scale");
        if (name == null || name.isBlank()) {
            throw bad("an axis needs a name");
        }
        unit = unit == null ? "" : unit;
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw bad("axis " + name + ": from = " + from + " and to = " + to + " must both be finite numbers");
        }
        if (from == to) {
            throw bad("axis " + name + ": from and to are both " + from + " " + unit + "; they must differ");
        }
        if (steps < 2) {
            throw bad("axis " + name + ": steps = " + steps + "; at least 2 are needed (both ends)");
        }
        if (scale == Scale.LOG && (from <= 0 || to <= 0)) {
            throw bad("axis " + name + ": a log scale needs positive ends, got from = " + from
                    + " and to = " + to + " " + unit + "; use a linear scale or positive bounds");
        }
    }

    /** A linearly spaced axis. */
    public static Axis linear(String name, String unit, double from, double to, int steps) {
        return new Axis(name, unit, from, to, steps, Scale.LINEAR);
    }

    /** A logarithmically spaced axis (positive ends). */
    public static Axis log(String name, String unit, double from, double to, int steps) {
        return new Axis(name, unit, from, to, steps, Scale.LOG);
    }

    /** A copy with another number of samples. */
    public Axis withSteps(int newSteps) {
        return new Axis(name, unit, from, to, newSteps, scale);
    }

    /** A copy with other ends. */
    public Axis withRange(double newFrom, double newTo) {
        return new Axis(name, unit, newFrom, newTo, steps, scale);
    }

    /** The sample at index {@code i} (0 gives {@code from}, {@code steps - 1} gives {@code to}), in {@code unit}. */
    public double value(int i) {
        if (i < 0 || i >= steps) {
            throw new IndexOutOfBoundsException("axis " + name + " has samples 0.." + (steps - 1) + ", asked " + i);
        }
        if (i == 0) {
            return from;
        }
        if (i == steps - 1) {
            return to;
        }
        if (scale == Scale.LINEAR) {
            // one product and one quotient from the index: no accumulated rounding
            return from + (to - from) * i / (steps - 1);
        }
        double lf = Math.log(from);
        return Math.exp(lf + (Math.log(to) - lf) * i / (steps - 1));
    }

    /** All samples, a fresh array of length {@code steps}, in {@code unit}. */
    public double[] values() {
        double[] v = new double[steps];
        for (int i = 0; i < steps; i++) {
            v[i] = value(i);
        }
        return v;
    }

    /**
     * The lower bound (smaller value) of the cell drawn around sample {@code i}: halfway to the
     * neighbour (arithmetic midpoint on a linear axis, geometric on a log axis); the end cells
     * reach half a spacing beyond the end sample.
     */
    public double cellLow(int i) {
        return Math.min(edge(i, -1), edge(i, +1));
    }

    /** The upper bound (larger value) of the cell around sample {@code i}; see {@link #cellLow}. */
    public double cellHigh(int i) {
        return Math.max(edge(i, -1), edge(i, +1));
    }

    private double edge(int i, int side) {
        int j = i + side;
        double a = value(i);
        double b = (j >= 0 && j < steps) ? value(j) : mirror(i, side);
        return scale == Scale.LINEAR ? 0.5 * (a + b) : Math.sqrt(a * b);
    }

    /** The virtual sample one spacing beyond an end, for the end cells. */
    private double mirror(int i, int side) {
        double a = value(i);
        double inner = value(i - side);
        return scale == Scale.LINEAR ? 2 * a - inner : a * a / inner;
    }

    /** A short description, e.g. {@code cable.length 100..5000 m, 50 steps, log}. */
    public String describe() {
        return name + " " + from + ".." + to + (unit.isEmpty() ? "" : " " + unit) + ", " + steps + " steps"
                + (scale == Scale.LOG ? ", log" : "");
    }

    private static FerromapException bad(String message) {
        return new FerromapException(MessageKey.BAD_REQUEST, message);
    }
}
