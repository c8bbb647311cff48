package org.ferromap.maps;

import java.util.Arrays;
import java.util.List;
import org.ferromap.equipment.PiecewiseLinearCurve;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.TabulatedCurve;

/**
 * A saturation curve that remembers its recent values, for the balance layer of a map. Every cell
 * of a map shares the study's magnetizing curve and the same flux base (rated peak over omega), so
 * the balance's flux scan asks for the same fundamental currents and slopes, bit for bit, in
 * cell after cell; for curves without a closed-form describing function each of them is a
 * quadrature. A small per-thread direct-mapped table keyed by the exact argument returns the
 * value computed before, so results are bit-identical to the bare curve's and only faster.
 *
 * <p>Only curves the balance treats generically are wrapped ({@link #wrap}): a polynomial keeps its
 * closed forms and piecewise-linear and tabulated curves their breakpoint-aware quadrature.
 * Thread-safe: the tables are per thread.
 */
final class MemoizedCurve implements SaturationCurve {

    /** Entries per table (a power of two): 2^14 keys and values, 256 kB per function and thread. */
    private static final int BITS = 14;
    private static final int MASK = (1 << BITS) - 1;
    /** A NaN payload no caller passes: marks an empty slot. */
    private static final long EMPTY = 0x7ff8_dead_beef_0001L;

    private final SaturationCurve inner;
    private final ThreadLocal<Tables> tables = ThreadLocal.withInitial(Tables::new);

    private MemoizedCurve(SaturationCurve inner) {
        this.inner = inner;
    }

    /** The curve wrapped for the balance, or the curve itself when the balance has a special path for its type. */
    static SaturationCurve wrap(SaturationCurve c) {
        if (c instanceof PolynomialCurve || c instanceof PiecewiseLinearCurve || c instanceof TabulatedCurve
                || c instanceof MemoizedCurve) {
            return c;
        }
        return new MemoizedCurve(c);
    }

    /** The curve remembered. */
    SaturationCurve inner() {
        return inner;
    }

    private static final class Tables {
        final long[][] keys = new long[3][1 << BITS];
        final double[][] values = new double[3][1 << BITS];

        Tables() {
            for (long[] k : keys) {
                Arrays.fill(k, EMPTY);
            }
        }
    }

    private interface Fn {
        double apply(double x);
    }

    private double lookup(int which, double x, Fn f) {
        long bits = Double.doubleToRawLongBits(x);
        long h = bits * 0x9E3779B97F4A7C15L;
        int slot = (int) (h >>> (64 - BITS)) & MASK;
        Tables t = tables.get();
        if (t.keys[which][slot] == bits) {
            return t.values[which][slot];
        }
        double v = f.apply(x);
        t.keys[which][slot] = bits;
        t.values[which][slot] = v;
        return v;
    }

    @Override
    public double current(double fluxLinkage) {
        return lookup(0, fluxLinkage, inner::current);
    }

    @Override
    public double currentSlope(double fluxLinkage) {
        return lookup(1, fluxLinkage, inner::currentSlope);
    }

    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        return lookup(2, fluxAmplitude, inner::fundamentalCurrent);
    }

    @Override
    public double fluxLinkage(double current) {
        return inner.fluxLinkage(current);
    }

    @Override
    public List<CurvePoint> definingPoints() {
        return inner.definingPoints();
    }

    @Override
    public double airCoreInductance() {
        return inner.airCoreInductance();
    }

    @Override
    public String describe() {
        return inner.describe();
    }
}
