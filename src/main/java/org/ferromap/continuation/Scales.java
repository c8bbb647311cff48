package org.ferromap.continuation;

import java.util.Arrays;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/** Choice of the engine's variable scales and the checks on start values. */
final class Scales {

    private Scales() {
    }

    /** Given per-state scales, or the start point's largest |x_j| for all (1 if it is zero). */
    static double[] states(double[] given, double[] x0) {
        if (given != null) {
            if (given.length != x0.length) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "xScale has " + given.length
                        + " entries but the problem has " + x0.length + " states");
            }
            return given.clone();
        }
        double largest = 0;
        for (double v : x0) {
            largest = Math.max(largest, Math.abs(v));
        }
        double[] s = new double[x0.length];
        Arrays.fill(s, largest > 0 ? largest : 1.0);
        return s;
    }

    /** Given parameter scale, else the window width when finite, else |value|, else 1. */
    static double parameter(double given, double min, double max, double value) {
        if (!Double.isNaN(given)) {
            return given;
        }
        double width = max - min;
        if (Double.isFinite(width) && width > 0) {
            return width;
        }
        return value != 0 ? Math.abs(value) : 1.0;
    }

    static void checkStart(String name, double[] x0, int n) {
        if (x0 == null || x0.length != n) {
            throw new FerromapException(MessageKey.BAD_REQUEST, name + " must have " + n + " entries (the problem's dimension), got "
                    + (x0 == null ? "none" : String.valueOf(x0.length)));
        }
        for (int j = 0; j < n; j++) {
            if (!Double.isFinite(x0[j])) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, name + "[" + j + "] = " + x0[j] + " must be finite");
            }
        }
    }

    static void checkParameter(String name, double value, double min, double max) {
        if (!Double.isFinite(value) || value < min || value > max) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, name + " = " + value + " must be finite and lie in its window ["
                    + min + ", " + max + "]");
        }
    }

    /** A short description of a scaled point in the problem's units, for stop messages. */
    static String describe(ScaledProblem problem, double[] z) {
        StringBuilder sb = new StringBuilder();
        sb.append("p = ").append(problem.p(z));
        if (problem.parameters == 2) {
            sb.append(", q = ").append(problem.q(z));
        }
        int shown = Math.min(problem.n, 3);
        sb.append(", x = [");
        for (int j = 0; j < shown; j++) {
            if (j > 0) {
                sb.append(", ");
            }
            sb.append(z[j] * problem.xScale[j]);
        }
        if (problem.n > shown) {
            sb.append(", ...");
        }
        return sb.append(']').toString();
    }
}
