package org.ferromap.balance;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Settings of the multi-harmonic balance.
 *
 * @param harmonics highest harmonic H; default 9
 * @param oddOnly odd harmonics only (half-wave symmetric steady states of an odd curve); default
 *        true. False adds the constant and even harmonics, for generality
 * @param samples time samples per period N; 0 (default) chooses (n+1)H + 1 for a degree-n
 *        polynomial (alias-free, DOMAIN.md §3 [der]) and max(64, 32(H+1)) for other curves,
 *        which the solver doubles until the residual on twice the samples is within tolerance
 * @param tolerance Newton tolerance on the largest per-unit residual coefficient; default 1e-10
 * @param maxIterations Newton iteration limit; default 50
 * @param hillHarmonics truncation K of the Hill matrix for stability; 0 (default) means max(10, min(H + 4, 20))
 */
public record HarmonicSettings(int harmonics, boolean oddOnly, int samples, double tolerance, int maxIterations, int hillHarmonics) {

    public static final HarmonicSettings DEFAULTS = new HarmonicSettings(9, true, 0, 1e-10, 50, 0);

    public HarmonicSettings {
        if (harmonics < 1 || harmonics > 1000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "harmonics = " + harmonics + " is not allowed; expected 1 to 1000");
        }
        if (samples != 0 && samples < 2 * harmonics + 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "samples = " + samples + " is not allowed; expected 0 (automatic) or >= 2H + 1 = " + (2 * harmonics + 1));
        }
        if (!(tolerance > 0 && tolerance < 1e-2)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "tolerance = " + tolerance + " is not allowed; expected 0 < t < 1e-2");
        }
        if (maxIterations < 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "max iterations = " + maxIterations + " is not allowed; expected >= 1");
        }
        if (hillHarmonics < 0) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "Hill harmonics = " + hillHarmonics + " is not allowed; expected >= 0");
        }
    }

    public HarmonicSettings withHarmonics(int h) {
        return new HarmonicSettings(h, oddOnly, samples, tolerance, maxIterations, hillHarmonics);
    }

    public HarmonicSettings withOddOnly(boolean odd) {
        return new HarmonicSettings(harmonics, odd, samples, tolerance, maxIterations, hillHarmonics);
    }

    public HarmonicSettings withSamples(int n) {
        return new HarmonicSettings(harmonics, oddOnly, n, tolerance, maxIterations, hillHarmonics);
    }

    public HarmonicSettings withTolerance(double t) {
        return new HarmonicSettings(harmonics, oddOnly, samples, t, maxIterations, hillHarmonics);
    }

    public HarmonicSettings withMaxIterations(int n) {
        return new HarmonicSettings(harmonics, oddOnly, samples, tolerance, n, hillHarmonics);
    }

    public HarmonicSettings withHillHarmonics(int k) {
        return new HarmonicSettings(harmonics, oddOnly, samples, tolerance, maxIterations, k);
    }
}
