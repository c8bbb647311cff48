package org.ferromap.study;

import org.ferromap.equipment.CoreDesignCurve;
import org.ferromap.equipment.PiecewiseLinearCurve;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.RmsTestConversion;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.SmoothKneeCurve;
import org.ferromap.equipment.TabulatedCurve;

/**
 * A magnetizing curve as validated from a study, in absolute SI units (per-unit data already
 * converted), not yet built. Building is separate so that a study can be checked completely
 * without evaluating any curve.
 */
public sealed interface CurveSpec {

    /** The curve object; constructors check monotonicity again. */
    SaturationCurve build();

    /** The study's name for the form: polynomial, piecewise, table, smooth-knee, rms-test, steel. */
    String form();

    /**
     * i = a lambda + b lambda^n.
     *
     * @param a 1/H
     * @param b A/(Wb-turn)^n
     * @param n odd, &gt;= 3
     */
    record Polynomial(double a, double b, int n) implements CurveSpec {
        @Override public SaturationCurve build() {
            return new PolynomialCurve(a, b, n);
        }

        @Override public String form() {
            return "polynomial";
        }
    }

    /**
     * Breakpoints (piecewise linear) or interpolation points (tabulated, monotone cubic).
     *
     * @param tabulated true for "table", false for "piecewise"
     * @param flux Wb-turn, positive, strictly increasing
     * @param current peak A, positive, strictly increasing
     * @param airCoreInductance H, NaN when not given
     */
    record Points(boolean tabulated, double[] flux, double[] current, double airCoreInductance) implements CurveSpec {
        public Points {
            flux = flux.clone();
            current = current.clone();
        }

        @Override public double[] flux() {
            return flux.clone();
        }

        @Override public double[] current() {
            return current.clone();
        }

        @Override public SaturationCurve build() {
            return tabulated ? new TabulatedCurve(flux, current, airCoreInductance)
                    : new PiecewiseLinearCurve(flux, current, airCoreInductance);
        }

        @Override public String form() {
            return tabulated ? "table" : "piecewise";
        }
    }

    /**
     * lambda(i) = L_air i + Lambda_s tanh((L_u - L_air) i / Lambda_s).
     *
     * @param unsaturatedInductance L_u, H
     * @param airCoreInductance L_air, H
     * @param saturationFlux Lambda_s, Wb-turn
     */
    record SmoothKnee(double unsaturatedInductance, double airCoreInductance, double saturationFlux) implements CurveSpec {
        @Override public SaturationCurve build() {
            return new SmoothKneeCurve(unsaturatedInductance, airCoreInductance, saturationFlux);
        }

        @Override public String form() {
            return "smooth-knee";
        }
    }

    /**
     * Rms open-circuit test points, converted point by point to a peak curve.
     *
     * @param omega test angular frequency, rad/s
     * @param voltageRms V rms, strictly increasing
     * @param currentRms A rms, strictly increasing
     * @param lossWatts W per point, or null when no losses were given
     * @param airCoreInductance H, NaN when not given
     */
    record RmsTest(double omega, double[] voltageRms, double[] currentRms, double[] lossWatts,
                   double airCoreInductance) implements CurveSpec {
        public RmsTest {
            voltageRms = voltageRms.clone();
            currentRms = currentRms.clone();
            lossWatts = lossWatts == null ? null : lossWatts.clone();
        }

        @Override public double[] voltageRms() {
            return voltageRms.clone();
        }

        @Override public double[] currentRms() {
            return currentRms.clone();
        }

        @Override public double[] lossWatts() {
            return lossWatts == null ? null : lossWatts.clone();
        }

        @Override public SaturationCurve build() {
            return RmsTestConversion.convert(omega, voltageRms, currentRms, lossWatts, airCoreInductance);
        }

        @Override public String form() {
            return "rms-test";
        }
    }

    /**
     * Steel B-H points with the core geometry: lambda = N A B, i = H l / N.
     *
     * @param induction B, T, strictly increasing
     * @param field H, A/m, strictly increasing
     * @param area m^2
     * @param pathLength m
     * @param turns primary turns
     * @param airCoreInductance H, NaN = mu0 N^2 A / l
     */
    record Steel(double[] induction, double[] field, double area, double pathLength, int turns,
                 double airCoreInductance) implements CurveSpec {
        public Steel {
            induction = induction.clone();
            field = field.clone();
        }

        @Override public double[] induction() {
            return induction.clone();
        }

        @Override public double[] field() {
            return field.clone();
        }

        @Override public SaturationCurve build() {
            return CoreDesignCurve.fromSteel(induction, field, area, pathLength, turns, airCoreInductance);
        }

        @Override public String form() {
            return "steel";
        }
    }
}
