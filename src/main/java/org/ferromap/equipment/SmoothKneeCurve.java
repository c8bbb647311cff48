package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Smooth knee with an air-core asymptote: lambda(i) = L_air i + Lambda_s tanh((L_u - L_air) i / Lambda_s)
 * (DOMAIN.md §2, common practice). Slope L_u at the origin, L_air in deep saturation, the knee
 * near Lambda_s.
 *
 * <p>The flux is explicit in the current; the current is found by a safeguarded Newton inversion
 * in the scaled variables y = lambda / Lambda_s, z = (L_u - L_air) i / Lambda_s, where
 * y(z) = rho z + tanh z with rho = L_air / (L_u - L_air). y(z) is increasing and concave for z &gt; 0,
 * so Newton started from a lower bound climbs monotonically to the root: no bracket bookkeeping
 * is needed, and one expm1 per step gives both tanh z and its derivative.
 */
public final class SmoothKneeCurve implements SaturationCurve, KinkedCurve {

    private final double lu;
    private final double lair;
    private final double lambdaS;
    /** L_air / (L_u - L_air), dimensionless. */
    private final double rho;
    /** Newton steps allowed; from the bounds used, a handful suffice. */
    private static final int MAX_NEWTON = 200;

    /** Current per unit of z, A: Lambda_s / (L_u - L_air). */
    private final double currentUnit;
    /** Knee marks for quadrature, Wb-turn: see {@link #kinkFluxes()}. */
    private final double[] knee;

    /**
     * @param unsaturatedInductance L_u, H, slope at the origin
     * @param airCoreInductance L_air, H, 0 &lt; L_air &lt; L_u
     * @param saturationFlux Lambda_s, Wb-turn, &gt; 0
     */
    public SmoothKneeCurve(double unsaturatedInductance, double airCoreInductance, double saturationFlux) {
        lu = CurveChecks.positive(unsaturatedInductance, "unsaturated inductance", "H");
        lair = CurveChecks.positive(airCoreInductance, "air-core inductance", "H");
        lambdaS = CurveChecks.positive(saturationFlux, "saturation flux", "Wb-turn");
        if (!(lair < lu)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "air-core inductance " + lair
                    + " H must be below the unsaturated inductance " + lu + " H");
        }
        rho = lair / (lu - lair);
        currentUnit = lambdaS / (lu - lair);
        knee = kneeMarks();
    }

    /** L_u, H. */
    public double unsaturatedInductance() {
        return lu;
    }

    /** Lambda_s, Wb-turn. */
    public double saturationFlux() {
        return lambdaS;
    }

    @Override
    public double current(double fluxLinkage) {
        return Math.copySign(currentUnit * scaledCurrent(Math.abs(fluxLinkage) / lambdaS), fluxLinkage);
    }

    /** From the implicit derivative: di/dlambda = 1 / (L_air + (L_u - L_air) sech^2 z). */
    @Override
    public double currentSlope(double fluxLinkage) {
        double z = scaledCurrent(Math.abs(fluxLinkage) / lambdaS);
        return 1.0 / (lair + (lu - lair) * sech2(z));
    }

    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        return CurveQuadrature.fundamental(this, fluxAmplitude, kinkFluxes());
    }

    @Override
    public double fluxLinkage(double current) {
        return lair * current + lambdaS * Math.tanh((lu - lair) * current / lambdaS);
    }

    /** 40 points evenly spaced in flux up to 2 Lambda_s: the knee and the start of the air-core line. */
    @Override
    public List<CurvePoint> definingPoints() {
        List<CurvePoint> pts = new ArrayList<>(40);
        for (int k = 1; k <= 40; k++) {
            double f = 2 * lambdaS * k / 40.0;
            pts.add(new CurvePoint(f, current(f)));
        }
        return List.copyOf(pts);
    }

    @Override
    public double airCoreInductance() {
        return lair;
    }

    @Override
    public String describe() {
        return String.format("smooth knee, L_u %.4g H, L_air %.4g H, Lambda_s %.4g Wb-turn", lu, lair, lambdaS);
    }

    /**
     * The knee: the fluxes where sech^2 z = rho 10^j, j = -4, -3, ..., that is where the slope
     * di/dlambda has climbed by successive factors of about ten from 1/L_u towards 1/L_air. The
     * change is packed into a flux band a few rho Lambda_s wide; marking it lets the quadrature
     * split there, since a rule whose nodes all miss such a band would report a smooth answer.
     */
    @Override
    public double[] kinkFluxes() {
        return knee.clone();
    }

    private double[] kneeMarks() {
        double[] marks = new double[0];
        for (int j = -4; rho * Math.pow(10, j) < 0.5; j++) {
            double q = rho * Math.pow(10, j);
            double w = 1 / Math.sqrt(q);
            double z = Math.log(w + Math.sqrt((w - 1) * (w + 1)));
            marks = java.util.Arrays.copyOf(marks, marks.length + 1);
            marks[marks.length - 1] = lambdaS * (rho * z + Math.tanh(z));
        }
        return marks;
    }

    /** z with rho z + tanh z = y, y &gt;= 0. */
    private double scaledCurrent(double y) {
        if (y == 0 || Double.isNaN(y)) {
            return y;
        }
        // Upper bounds: tanh z >= 0, and tanh z = y - rho z <= y.
        double hi = y / rho;
        if (y < 1) {
            hi = Math.min(hi, atanh(y));
        }
        // Lower bounds: tanh z <= z, tanh z <= 1, and tanh z = y - rho z >= y - rho hi.
        double lo = Math.max(y / (1 + rho), (y - 1) / rho);
        double t = y - rho * hi;
        if (t > 0 && t < 1) {
            lo = Math.max(lo, atanh(t));
        }
        double z = Math.min(lo, hi);
        for (int it = 0; it < MAX_NEWTON; it++) {
            double em = Math.expm1(-2 * z);
            double q = 2 + em;
            // tanh z = -em / (2 + em) without cancellation at small z; sech^2 z = 4 (1 + em) / (2 + em)^2.
            double residual = rho * z - em / q - y;
            double step = residual / (rho + 4 * (1 + em) / (q * q));
            z -= step;
            // Done when the step is a few ulps of z, or the residual is down to the rounding of y:
            // on the flat air-core stretch (slope rho) that rounding alone moves z by ulp(y) / rho.
            if (Math.abs(step) <= 4 * Math.ulp(z) || Math.abs(residual) <= 4 * Math.ulp(y)) {
                break;
            }
        }
        return z;
    }

    /** sech^2 z, accurate also where tanh z rounds to 1. */
    private static double sech2(double z) {
        double e = Math.exp(-2 * Math.abs(z));
        double d = 1 + e;
        return 4 * e / (d * d);
    }

    private static double atanh(double v) {
        return 0.5 * Math.log1p(2 * v / (1 - v));
    }
}
