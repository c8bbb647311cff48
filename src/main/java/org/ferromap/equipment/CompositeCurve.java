package org.ferromap.equipment;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Series combination of two magnetizing branches carrying related currents: lambda_eq(i) = lambda_1(i) + lambda_2(i * ratio). The floating-wye composite of DOMAIN.md §1.2 is floatingWye(c) = lambda(i) + lambda(i/2).
 *
 * <p>In general lambda_eq(i) = sum_k lambda_k(r_k i) for any number of branches with current
 * ratios r_k &gt; 0. The flux is explicit in the current; current(lambda) inverts the sum by a
 * safeguarded Newton iteration on a bracket read off the parts: with K parts, every part must
 * carry at least lambda / K and at most lambda, so min_k i_k(lambda/K)/r_k &lt;= i &lt;= min_k i_k(lambda)/r_k.
 */
public final class CompositeCurve implements SaturationCurve, KinkedCurve {

    private final SaturationCurve[] parts;
    private final double[] ratios;
    private final String label;
    private final double[] kinks;
    private final MonotoneInversion.Increasing forward;

    private CompositeCurve(SaturationCurve[] parts, double[] ratios, String label) {
        this.parts = parts;
        this.ratios = ratios;
        this.label = label;
        this.forward = new MonotoneInversion.Increasing() {
            @Override
            public double value(double i) {
                return fluxLinkage(i);
            }

            @Override
            public double derivative(double i) {
                return inductanceAtCurrent(i);
            }
        };
        this.kinks = mapKinks();
    }

    /** @return lambda_eq(i) = lambda(i) + lambda(i/2) */
    public static CompositeCurve floatingWye(SaturationCurve phase) {
        if (phase == null) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "the phase curve is missing");
        }
        return new CompositeCurve(new SaturationCurve[] {phase, phase}, new double[] {1.0, 0.5},
                "floating wye lambda(i) + lambda(i/2) of " + phase.describe());
    }

    /**
     * lambda_eq(i) = sum_k lambda_k(r_k i).
     *
     * @param parts the branch curves, at least one
     * @param currentRatios r_k, dimensionless, finite and &gt; 0, one per part
     */
    public static CompositeCurve sum(List<? extends SaturationCurve> parts, double... currentRatios) {
        if (parts == null || parts.isEmpty() || currentRatios == null) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "a composite curve needs at least one part and its ratio");
        }
        if (parts.size() != currentRatios.length) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, parts.size() + " parts but "
                    + currentRatios.length + " current ratios; give one ratio per part");
        }
        SaturationCurve[] p = new SaturationCurve[parts.size()];
        double[] r = new double[p.length];
        StringBuilder label = new StringBuilder("sum of");
        for (int k = 0; k < p.length; k++) {
            p[k] = parts.get(k);
            if (p[k] == null) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, "part " + k + " is missing");
            }
            r[k] = CurveChecks.positive(currentRatios[k], "current ratio " + k, "(dimensionless)");
            label.append(k == 0 ? " " : " + ").append(String.format("lambda%d(%.4g i)", k + 1, r[k]));
        }
        if (p.length == 1) {
            label.append(" of ").append(p[0].describe());
        }
        return new CompositeCurve(p, r, label.toString());
    }

    @Override
    public double current(double fluxLinkage) {
        double a = Math.abs(fluxLinkage);
        if (a == 0 || Double.isNaN(a)) {
            return fluxLinkage;
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        for (int k = 0; k < parts.length; k++) {
            lo = Math.min(lo, parts[k].current(a / parts.length) / ratios[k]);
            hi = Math.min(hi, parts[k].current(a) / ratios[k]);
        }
        return Math.copySign(MonotoneInversion.solve(forward, a, lo, hi, lo), fluxLinkage);
    }

    /** 1 / (sum_k r_k L_k), L_k the differential inductance of part k at its own flux. */
    @Override
    public double currentSlope(double fluxLinkage) {
        return 1.0 / inductanceAtCurrent(current(fluxLinkage));
    }

    @Override
    public double fundamentalCurrent(double fluxAmplitude) {
        return CurveQuadrature.fundamental(this, fluxAmplitude, kinks);
    }

    @Override
    public double fluxLinkage(double current) {
        double s = 0;
        for (int k = 0; k < parts.length; k++) {
            s += parts[k].fluxLinkage(ratios[k] * current);
        }
        return s;
    }

    /** The parts' defining points, each moved to the composite flux at the same branch current. */
    @Override
    public List<CurvePoint> definingPoints() {
        List<CurvePoint> pts = new ArrayList<>();
        for (int k = 0; k < parts.length; k++) {
            for (CurvePoint p : parts[k].definingPoints()) {
                double i = p.current() / ratios[k];
                pts.add(new CurvePoint(fluxLinkage(i), i));
            }
        }
        pts.sort(Comparator.comparingDouble(CurvePoint::flux));
        List<CurvePoint> unique = new ArrayList<>(pts.size());
        for (CurvePoint p : pts) {
            if (unique.isEmpty() || p.flux() > unique.get(unique.size() - 1).flux()) {
                unique.add(p);
            }
        }
        return List.copyOf(unique);
    }

    /** sum_k r_k L_air,k, H: each part sees r_k times the current. */
    @Override
    public double airCoreInductance() {
        double s = 0;
        for (int k = 0; k < parts.length; k++) {
            s += ratios[k] * parts[k].airCoreInductance();
        }
        return s;
    }

    @Override
    public String describe() {
        return label;
    }

    @Override
    public double[] kinkFluxes() {
        return kinks.clone();
    }

    /** dlambda_eq/di at current i, H. */
    private double inductanceAtCurrent(double i) {
        double s = 0;
        for (int k = 0; k < parts.length; k++) {
            s += ratios[k] * parts[k].differentialInductance(parts[k].fluxLinkage(ratios[k] * i));
        }
        return s;
    }

    /** Each part's kinks, at the composite flux where that part reaches its kink. */
    private double[] mapKinks() {
        double[] all = new double[0];
        for (int k = 0; k < parts.length; k++) {
            if (parts[k] instanceof KinkedCurve kc) {
                double[] own = kc.kinkFluxes();
                int at = all.length;
                all = Arrays.copyOf(all, at + own.length);
                for (int j = 0; j < own.length; j++) {
                    all[at + j] = fluxLinkage(parts[k].current(own[j]) / ratios[k]);
                }
            }
        }
        Arrays.sort(all);
        int n = 0;
        for (double v : all) {
            if (v > 0 && (n == 0 || v > all[n - 1])) {
                all[n++] = v;
            }
        }
        return Arrays.copyOf(all, n);
    }
}
