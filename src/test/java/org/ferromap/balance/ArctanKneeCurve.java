package org.ferromap.balance;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;
import org.ferromap.equipment.SaturationCurve;

/**
 * Test-only smooth saturation curve with an air-core asymptote, defined through its inverse:
 * lambda(i) = Lair i + (2 Ls / pi) atan(pi (Lu - Lair) i / (2 Ls)). Slope Lu at the origin, Lair
 * in deep saturation, knee near flux Ls. Current by Newton inversion; the describing function by
 * Commons Math Gauss-Legendre quadrature, 32 panels of 24 points over the quarter period (an
 * algorithm independent of the code under test; smooth integrand, converged to ~1e-14).
 * Exists only to drive the numerical, non-polynomial paths.
 */
final class ArctanKneeCurve implements SaturationCurve {

    private final double lu;
    private final double lair;
    private final double ls;
    private static final GaussIntegrator[] PANELS = new GaussIntegrator[32];

    static {
        GaussIntegratorFactory f = new GaussIntegratorFactory();
        for (int k = 0; k < PANELS.length; k++) {
            PANELS[k] = f.legendre(24, 0.5 * Math.PI * k / PANELS.length, 0.5 * Math.PI * (k + 1) / PANELS.length);
        }
    }

    ArctanKneeCurve(double unsaturatedInductance, double airCoreInductance, double kneeFlux) {
        this.lu = unsaturatedInductance;
        this.lair = airCoreInductance;
        this.ls = kneeFlux;
    }

    private double flux(double i) {
        return lair * i + 2 * ls / Math.PI * Math.atan(Math.PI * (lu - lair) * i / (2 * ls));
    }

    private double dFluxDi(double i) {
        double u = Math.PI * (lu - lair) * i / (2 * ls);
        return lair + (lu - lair) / (1 + u * u);
    }

    @Override
    public double current(double lambda) {
        double s = Math.signum(lambda);
        double target = Math.abs(lambda);
        // Start from the unsaturated line (a lower bound of i): Newton on the concave, increasing
        // lambda(i) from the left converges monotonically.
        double i = target / lu;
        for (int k = 0; k < 200; k++) {
            double di = (flux(i) - target) / dFluxDi(i);
            i -= di;
            if (Math.abs(di) <= 2e-16 * Math.abs(i)) {
                break;
            }
        }
        return s * i;
    }

    @Override
    public double currentSlope(double lambda) {
        return 1.0 / dFluxDi(Math.abs(current(lambda)));
    }

    @Override
    public double fundamentalCurrent(double amplitude) {
        if (amplitude == 0) {
            return 0;
        }
        double v = 0;
        for (GaussIntegrator g : PANELS) {
            v += g.integrate(t -> current(amplitude * Math.cos(t)) * Math.cos(t));
        }
        return 4 / Math.PI * v;
    }

    @Override
    public double fluxLinkage(double current) {
        return flux(current);
    }

    @Override
    public List<CurvePoint> definingPoints() {
        List<CurvePoint> p = new ArrayList<>();
        for (int k = 1; k <= 20; k++) {
            double x = 3 * ls * k / 20.0;
            p.add(new CurvePoint(x, current(x)));
        }
        return p;
    }

    @Override
    public double airCoreInductance() {
        return lair;
    }

    @Override
    public String describe() {
        return "test arctan knee";
    }
}
