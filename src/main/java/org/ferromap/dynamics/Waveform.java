package org.ferromap.dynamics;

/**
 * Uniformly sampled terminal quantities over a window of the settled state.
 *
 * @param time sample times from the switching instant, s
 * @param flux flux linkage, Wb-turn
 * @param voltage terminal voltage, V
 */
public record Waveform(double[] time, double[] flux, double[] voltage) {

    public Waveform {
        time = time.clone();
        flux = flux.clone();
        voltage = voltage.clone();
    }

    /** An empty waveform (nothing settled to show). */
    public static Waveform empty() {
        return new Waveform(new double[0], new double[0], new double[0]);
    }

    /** Number of samples. */
    public int size() {
        return time.length;
    }
}
