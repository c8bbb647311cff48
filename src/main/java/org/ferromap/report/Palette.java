package org.ferromap.report;

import java.awt.Color;

/**
 * Colours shared by every chart: the risk categories and a perceptually uniform scale for
 * numbers (control points of the viridis map, released CC0 by its authors, van der Walt and
 * Smith, 2015, linearly interpolated).
 */
public final class Palette {

    /** Normal state only. */
    public static final Color SAFE = new Color(170, 215, 160);
    /** Normal and ferroresonant states coexist. */
    public static final Color AT_RISK = new Color(250, 200, 90);
    /** Only the ferroresonant state exists. */
    public static final Color FERRO_ONLY = new Color(205, 70, 60);

    private static final float[][] VIRIDIS = {
        {0.267f, 0.005f, 0.329f}, {0.283f, 0.141f, 0.458f}, {0.254f, 0.265f, 0.530f},
        {0.207f, 0.372f, 0.553f}, {0.164f, 0.471f, 0.558f}, {0.128f, 0.567f, 0.551f},
        {0.135f, 0.659f, 0.518f}, {0.267f, 0.749f, 0.441f}, {0.478f, 0.821f, 0.318f},
        {0.741f, 0.873f, 0.150f}, {0.993f, 0.906f, 0.144f}};

    private Palette() {
    }

    /** Colour at fraction f in [0, 1] of the scale. */
    public static Color scale(double f) {
        double p = Math.max(0, Math.min(1, f)) * (VIRIDIS.length - 1);
        int i = Math.min((int) p, VIRIDIS.length - 2);
        double t = p - i;
        float[] a = VIRIDIS[i];
        float[] b = VIRIDIS[i + 1];
        return new Color((float) (a[0] + t * (b[0] - a[0])), (float) (a[1] + t * (b[1] - a[1])),
                (float) (a[2] + t * (b[2] - a[2])));
    }
}
