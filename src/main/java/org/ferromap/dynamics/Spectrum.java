package org.ferromap.dynamics;

/**
 * One-sided amplitude spectrum of a sampled signal.
 *
 * @param frequency line frequencies, Hz, from 0 up to below the Nyquist frequency
 * @param amplitude peak amplitude of each line, in the unit of the signal (V for voltages)
 * @param phase phase of each line, rad, as a cosine referred to the first sample
 */
public record Spectrum(double[] frequency, double[] amplitude, double[] phase) {

    public Spectrum {
        frequency = frequency.clone();
        amplitude = amplitude.clone();
        phase = phase.clone();
    }

    /** An empty spectrum. */
    public static Spectrum empty() {
        return new Spectrum(new double[0], new double[0], new double[0]);
    }

    /**
     * Spectrum of exactly one period (or a whole number of periods) of a periodic signal: no
     * window, so each line is exact up to aliasing.
     *
     * @param samples signal samples, a power of two in number, spanning the window [0, duration)
     * @param duration length of the window, s
     * @param scale factor applied to amplitudes (V per unit, say)
     */
    public static Spectrum ofPeriodic(double[] samples, double duration, double scale) {
        return transform(samples, duration, scale, false);
    }

    /**
     * Spectrum of a non-periodic record with a Hann window (amplitudes corrected for the window's
     * coherent gain, so a line's amplitude reads right; leakage spreads it over neighbouring bins).
     */
    public static Spectrum ofRecord(double[] samples, double duration, double scale) {
        return transform(samples, duration, scale, true);
    }

    /**
     * Spectrum of a whole number of periods of a periodic signal, any number of samples (at least
     * 2): a direct discrete Fourier transform with an exact twiddle table, no window. For records
     * whose length cannot be a power of two (p periods of a subharmonic at a fixed rate); O(n^2).
     *
     * @param samples signal samples spanning [0, duration)
     * @param duration length of the window, s
     * @param scale factor applied to amplitudes
     */
    public static Spectrum ofWholePeriods(double[] samples, double duration, double scale) {
        int n = samples.length;
        if (n < 2) {
            throw new IllegalArgumentException("sample count " + n + " must be >= 2");
        }
        double[] cos = new double[n];
        double[] sin = new double[n];
        for (int j = 0; j < n; j++) {
            cos[j] = Math.cos(2 * Math.PI * j / n);
            sin[j] = Math.sin(2 * Math.PI * j / n);
        }
        int lines = n / 2;
        double[] f = new double[lines];
        double[] a = new double[lines];
        double[] p = new double[lines];
        for (int k = 0; k < lines; k++) {
            double re = 0;
            double im = 0;
            int idx = 0;
            for (int j = 0; j < n; j++) {
                // exp(-2 pi i j k / n), index j k mod n kept without overflow
                re += samples[j] * cos[idx];
                im -= samples[j] * sin[idx];
                idx += k;
                if (idx >= n) {
                    idx -= n;
                }
            }
            f[k] = k / duration;
            double mag = Math.hypot(re, im) / n;
            a[k] = (k == 0 ? mag : 2 * mag) * scale;
            p[k] = Math.atan2(im, re);
        }
        return new Spectrum(f, a, p);
    }

    private static Spectrum transform(double[] samples, double duration, double scale, boolean hann) {
        int n = samples.length;
        if (n < 2 || Integer.bitCount(n) != 1) {
            throw new IllegalArgumentException("sample count " + n + " must be a power of two >= 2");
        }
        double[] data = new double[n];
        double gain = 0;
        for (int j = 0; j < n; j++) {
            double w = hann ? 0.5 * (1 - Math.cos(2 * Math.PI * j / n)) : 1.0;
            data[j] = samples[j] * w;
            gain += w;
        }
        double[][] c = RealFourier.forward(data);
        int lines = n / 2;
        double[] f = new double[lines];
        double[] a = new double[lines];
        double[] p = new double[lines];
        for (int k = 0; k < lines; k++) {
            f[k] = k / duration;
            double mag = Math.hypot(c[0][k], c[1][k]) / gain;
            a[k] = (k == 0 ? mag : 2 * mag) * scale;
            p[k] = Math.atan2(c[1][k], c[0][k]);
        }
        return new Spectrum(f, a, p);
    }

    /** Number of lines. */
    public int size() {
        return frequency.length;
    }

    /** Index of the strongest line above DC, or -1 if there is none. */
    public int strongestLine() {
        int best = -1;
        for (int k = 1; k < amplitude.length; k++) {
            if (best < 0 || amplitude[k] > amplitude[best]) {
                best = k;
            }
        }
        return best;
    }
}
