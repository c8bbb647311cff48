package org.ferromap.orbits;

/**
 * One run of a brute-force sweep: from one initial state, through the parameter values in one
 * direction, carrying the state from value to value.
 *
 * @param initialState index of the initial state the run started from
 * @param upward whether the run went through the values in increasing order
 * @param parameters the parameter values in the order visited, units of the parameter
 * @param samples stroboscopic samples: [value index in visiting order][sample][state component],
 *        system units; NaN where the integration failed at that value
 */
public record SweepRun(int initialState, boolean upward, double[] parameters, double[][][] samples) {

    /**
     * The least period of the samples at value index i: the smallest p &lt;= half the samples such
     * that every sample equals the one p later within {@code tolerance} (Euclidean, system units);
     * 0 when none (not periodic at that resolution, or failed).
     */
    public int period(int i, double tolerance) {
        double[][] s = samples[i];
        int count = s.length;
        for (int p = 1; p <= count / 2; p++) {
            boolean ok = true;
            for (int j = 0; j + p < count && ok; j++) {
                double d = 0;
                for (int c = 0; c < s[j].length; c++) {
                    double e = s[j][c] - s[j + p][c];
                    d += e * e;
                }
                ok = Math.sqrt(d) <= tolerance;
            }
            if (ok) {
                return p;
            }
        }
        return 0;
    }
}
