package org.ferromap.maps;

import java.util.concurrent.atomic.AtomicLong;

/** Pure cell functions with known answers, standing in for the physics in engine tests. */
final class TestCells {

    private TestCells() {
    }

    /**
     * The cubic t^3 - y t - x = 0 at (x, y). Component 0: number of distinct real roots (1, 2 or 3),
     * counted from the signs of the cubic at its critical points t = -+sqrt(y/3) (three roots
     * when the local maximum is above zero and the local minimum below). Component 1: the largest
     * real root in closed form.
     * The analytic boundary of the three-root region is the discriminant 4 y^3 - 27 x^2 = 0 [der].
     */
    static final class Cubic implements CellFunction {
        @Override
        public int width() {
            return 2;
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            out[offset] = realRoots(x, y);
            out[offset + 1] = largestRoot(x, y);
        }

        @Override
        public String fingerprint() {
            return "test cubic t^3 - y t - x, v1";
        }

        static double realRoots(double x, double y) {
            if (y <= 0) {
                return 1; // monotone cubic
            }
            double c = Math.sqrt(y / 3);
            double localMax = -c * c * c + y * c - x; // at t = -c
            double localMin = c * c * c - y * c - x;  // at t = +c
            if (localMax > 0 && localMin < 0) {
                return 3;
            }
            return (localMax == 0 || localMin == 0) ? 2 : 1;
        }

        /** Cardano with one real root, the trigonometric form with three [der: standard cubic formulas]. */
        static double largestRoot(double x, double y) {
            double q = x * x / 4 - y * y * y / 27;
            if (q >= 0) {
                double s = Math.sqrt(q);
                return Math.cbrt(x / 2 + s) + Math.cbrt(x / 2 - s);
            }
            double r = Math.sqrt(y / 3);
            return 2 * r * Math.cos(Math.acos(Math.max(-1, Math.min(1, x / (2 * r * r * r)))) / 3);
        }
    }

    /** Counts evaluations of another cell function and runs an action after the n-th one. */
    static final class Counting implements CellFunction {
        final CellFunction inner;
        final AtomicLong count = new AtomicLong();
        private final long trigger;
        private final Runnable action;

        Counting(CellFunction inner) {
            this(inner, Long.MAX_VALUE, () -> { });
        }

        Counting(CellFunction inner, long trigger, Runnable action) {
            this.inner = inner;
            this.trigger = trigger;
            this.action = action;
        }

        @Override
        public int width() {
            return inner.width();
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            inner.evaluate(x, y, out, offset);
            if (count.incrementAndGet() == trigger) {
                action.run();
            }
        }

        @Override
        public String fingerprint() {
            return inner.fingerprint(); // counting does not change the values
        }
    }

    /** A smooth, cheap cell of a given width: component k = sin(x + k) * cos(y - k). */
    static class Smooth implements CellFunction {
        private final int width;

        Smooth(int width) {
            this.width = width;
        }

        @Override
        public int width() {
            return width;
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            for (int k = 0; k < width; k++) {
                out[offset + k] = Math.sin(x + k) * Math.cos(y - k);
            }
        }

        @Override
        public String fingerprint() {
            return "test smooth sin cos, width " + width;
        }
    }
}
