package org.ferromap.study;

/**
 * One axis of a parameter map.
 *
 * @param parameter what is swept
 * @param from first value: SI in the parameter's unit (V peak for source, V rms for
 *        source-line-voltage), or per unit of the study's own value when {@code perUnit}
 * @param to last value, same unit as {@code from}
 * @param steps number of grid values including both ends, &gt;= 2
 * @param scale spacing of the values
 * @param perUnit whether from/to are per unit of the study's own value of the parameter
 */
public record MapAxis(SweepParameter parameter, double from, double to, int steps, Scale scale, boolean perUnit) {

    /** Spacing of axis values. */
    public enum Scale {
        LINEAR, LOG
    }

    /** The grid values, from..to inclusive, evenly spaced in the axis scale. */
    public double[] values() {
        double[] v = new double[steps];
        for (int k = 0; k < steps; k++) {
            double s = (double) k / (steps - 1);
            v[k] = scale == Scale.LOG ? from * Math.pow(to / from, s) : from + (to - from) * s;
        }
        v[steps - 1] = to;
        return v;
    }
}
