package org.ferromap.balance;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * A truncated real Fourier basis over one period (tau = w t in [0, 2 pi)) and its sample grid,
 * for the alternating frequency-time method.
 *
 * <p>Layout of a coefficient vector: with the constant term, [c0, a1, b1, a2, b2, ..., aH, bH];
 * odd harmonics only (half-wave symmetric solutions), [a1, b1, a3, b3, ...]. A signal is
 * y(tau) = c0 + sum a_k cos(k tau) + b_k sin(k tau). Samples sit at tau_j = 2 pi j / N.
 * Trigonometric values come from one table of N entries indexed by (k j) mod N.
 *
 * <p>Immutable and thread-safe; the work arrays are the caller's.
 */
public final class HarmonicBasis {

    private final int harmonics;
    private final boolean oddOnly;
    private final int samples;
    private final int dimension;
    private final int[] harmonicOf;
    private final boolean[] sine;
    private final double[] cosTable;
    private final double[] sinTable;

    /**
     * @param harmonics highest harmonic H, &gt;= 1
     * @param oddOnly keep odd harmonics only, no constant term
     * @param samples time samples per period N, &gt;= 2H + 1 (more to keep a nonlinearity's
     *        higher harmonics from folding back: (n+1)H + 1 for a degree-n polynomial)
     */
    public HarmonicBasis(int harmonics, boolean oddOnly, int samples) {
        if (harmonics < 1 || harmonics > 10_000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "harmonics = " + harmonics + " is not allowed; expected 1 to 10000");
        }
        if (samples < 2 * harmonics + 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "samples = " + samples + " is not allowed for " + harmonics + " harmonics; expected >= " + (2 * harmonics + 1));
        }
        this.harmonics = harmonics;
        this.oddOnly = oddOnly;
        this.samples = samples;
        int d = 0;
        int[] h = new int[2 * harmonics + 1];
        boolean[] s = new boolean[2 * harmonics + 1];
        if (!oddOnly) {
            h[d] = 0;
            s[d++] = false;
        }
        for (int k = 1; k <= harmonics; k++) {
            if (oddOnly && (k & 1) == 0) {
                continue;
            }
            h[d] = k;
            s[d++] = false;
            h[d] = k;
            s[d++] = true;
        }
        this.dimension = d;
        this.harmonicOf = java.util.Arrays.copyOf(h, d);
        this.sine = java.util.Arrays.copyOf(s, d);
        this.cosTable = new double[samples];
        this.sinTable = new double[samples];
        for (int j = 0; j < samples; j++) {
            double t = 2 * Math.PI * j / samples;
            cosTable[j] = Math.cos(t);
            sinTable[j] = Math.sin(t);
        }
    }

    /** The same harmonics with another number of samples. */
    public HarmonicBasis withSamples(int n) {
        return new HarmonicBasis(harmonics, oddOnly, n);
    }

    public int harmonics() {
        return harmonics;
    }

    public boolean oddOnly() {
        return oddOnly;
    }

    public int samples() {
        return samples;
    }

    /** Number of real coefficients. */
    public int dimension() {
        return dimension;
    }

    /** Harmonic number of coefficient {@code index} (0 for the constant). */
    public int harmonicOf(int index) {
        return harmonicOf[index];
    }

    /** Whether coefficient {@code index} multiplies a sine. */
    public boolean isSine(int index) {
        return sine[index];
    }

    /** Index of the constant term, or -1 when odd-only. */
    public int constantIndex() {
        return oddOnly ? -1 : 0;
    }

    /** Index of the cosine coefficient of harmonic k, or -1 if not in the basis. */
    public int cosIndex(int k) {
        if (k < 1 || k > harmonics) {
            return k == 0 ? constantIndex() : -1;
        }
        if (oddOnly) {
            return (k & 1) == 1 ? k - 1 : -1;
        }
        return 2 * k - 1;
    }

    /** Index of the sine coefficient of harmonic k, or -1 if not in the basis. */
    public int sinIndex(int k) {
        int c = cosIndex(k);
        return c < 0 || k == 0 ? -1 : c + 1;
    }

    /** y_j at the N samples from coefficients x. */
    public void synthesize(double[] x, double[] y) {
        java.util.Arrays.fill(y, 0, samples, 0.0);
        for (int r = 0; r < dimension; r++) {
            double c = x[r];
            if (c == 0) {
                continue;
            }
            int k = harmonicOf[r];
            if (k == 0) {
                for (int j = 0; j < samples; j++) {
                    y[j] += c;
                }
                continue;
            }
            double[] tab = sine[r] ? sinTable : cosTable;
            int idx = 0;
            for (int j = 0; j < samples; j++) {
                y[j] += c * tab[idx];
                idx += k;
                if (idx >= samples) {
                    idx -= samples;
                }
            }
        }
    }

    /**
     * Coefficients of the samples on this basis, added to out after multiplying by {@code scale}:
     * constant (1/N) sum f_j, cosine (2/N) sum f_j cos(k tau_j), sine likewise.
     */
    public void analyze(double[] f, double scale, double[] out) {
        for (int r = 0; r < dimension; r++) {
            int k = harmonicOf[r];
            double acc = 0;
            if (k == 0) {
                for (int j = 0; j < samples; j++) {
                    acc += f[j];
                }
                out[r] += scale * acc / samples;
                continue;
            }
            double[] tab = sine[r] ? sinTable : cosTable;
            int idx = 0;
            for (int j = 0; j < samples; j++) {
                acc += f[j] * tab[idx];
                idx += k;
                if (idx >= samples) {
                    idx -= samples;
                }
            }
            out[r] += scale * 2 * acc / samples;
        }
    }

    /**
     * Discrete moments of a sampled function up to harmonic 2H: dc[m] = (1/N) sum p_j cos(m tau_j),
     * ds[m] likewise with sine, m = 0..2H. Arrays of length at least 2H + 1.
     */
    public void moments(double[] p, double[] dc, double[] ds) {
        int top = 2 * harmonics;
        for (int m = 0; m <= top; m++) {
            double c = 0;
            double s = 0;
            int idx = 0;
            int step = m % samples;
            for (int j = 0; j < samples; j++) {
                c += p[j] * cosTable[idx];
                s += p[j] * sinTable[idx];
                idx += step;
                if (idx >= samples) {
                    idx -= samples;
                }
            }
            dc[m] = c / samples;
            ds[m] = s / samples;
        }
    }

    /**
     * Adds {@code scale} times the matrix of "multiply by p(tau), then project on this basis" to
     * {@code m} at row/column offsets r0/c0, from the moments of p ({@link #moments}). This is the
     * exact derivative of {@code analyze(f(synthesize(x)))} when p = f'(y).
     */
    public void addMultiplication(double[] dc, double[] ds, double scale, double[][] m, int r0, int c0) {
        for (int r = 0; r < dimension; r++) {
            int k = harmonicOf[r];
            boolean rs = sine[r];
            double[] row = m[r0 + r];
            for (int c = 0; c < dimension; c++) {
                int l = harmonicOf[c];
                boolean cs = sine[c];
                double v;
                if (k == 0) {
                    v = l == 0 ? dc[0] : (cs ? ds[l] : dc[l]);
                } else if (l == 0) {
                    v = 2 * (rs ? ds[k] : dc[k]);
                } else {
                    int diff = Math.abs(k - l);
                    int sum = k + l;
                    if (!rs && !cs) {
                        v = dc[diff] + dc[sum];
                    } else if (!rs) {
                        v = ds[sum] + Integer.signum(l - k) * ds[diff];
                    } else if (!cs) {
                        v = ds[sum] + Integer.signum(k - l) * ds[diff];
                    } else {
                        v = dc[diff] - dc[sum];
                    }
                }
                row[c0 + c] += scale * v;
            }
        }
    }

    /** The d-th derivative in tau (d = 0..3) of the series with coefficients x at tau. */
    public double evaluate(double[] x, double tau, int derivative) {
        double y = 0;
        for (int r = 0; r < dimension; r++) {
            int k = harmonicOf[r];
            if (k == 0) {
                if (derivative == 0) {
                    y += x[r];
                }
                continue;
            }
            double ph = k * tau + (sine[r] ? -0.5 * Math.PI : 0.0) + 0.5 * Math.PI * derivative;
            y += x[r] * Math.pow(k, derivative) * Math.cos(ph);
        }
        return y;
    }

    /** Largest |d-th derivative| over the period: dense sampling, then a local refinement. */
    public double peak(double[] x, int derivative) {
        int m = Math.max(256, 32 * harmonics);
        double best = -1;
        int bj = 0;
        for (int j = 0; j < m; j++) {
            double v = Math.abs(evaluate(x, 2 * Math.PI * j / m, derivative));
            if (v > best) {
                best = v;
                bj = j;
            }
        }
        double h = 2 * Math.PI / m;
        double t0 = 2 * Math.PI * bj / m;
        LocalMinimum lm = new LocalMinimum();
        lm.minimize(t -> -Math.abs(evaluate(x, t, derivative)), t0 - h, t0 + h, 1e-12, 1e-12, 200);
        return Math.max(best, -lm.lastValue());
    }
}
