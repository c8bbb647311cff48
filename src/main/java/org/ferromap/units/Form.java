package org.ferromap.units;

/**
 * How an alternating voltage or current is stated. Engineers write nameplate and test values as
 * rms and circuit sources as peaks; the parser keeps what was written so the caller can apply
 * its own default and convert (peak = sqrt(2) rms for a sinusoid).
 */
public enum Form {
    /** Crest value, written "peak" or "pk". */
    PEAK,
    /** Root-mean-square value, written "rms". */
    RMS,
    /** Nothing written: the caller's convention applies. */
    UNSPECIFIED
}
