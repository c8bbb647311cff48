package org.ferromap.balance;

import java.util.Arrays;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.complex.Complex;
import org.hipparchus.exception.MathRuntimeException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionNonSymmetric;
import org.hipparchus.linear.FieldVector;

/**
 * Hill's method for the Floquet exponents of m u'' + c u' + p(tau) u = 0 with p 2 pi-periodic,
 * the variational equation of the circuit about a periodic steady state (m = C/C_ref,
 * c = G/(w C_ref), p = i'(lambda(tau)) in per unit).
 *
 * <p>With z = (u, u') = e^{sigma tau} w(tau), w periodic and expanded on harmonics 0..K, sigma
 * is an eigenvalue of the real Hill matrix [[-D, I], [-P/m, -(c/m) I - D]], D the derivative on
 * the basis and P multiplication by p. Each exponent appears with copies shifted by i k; the
 * two physical representatives are taken as the eigenvalues whose eigenvectors sit lowest in
 * harmonic number (energy-weighted mean harmonic), the second one not a shifted copy of the
 * first. Liouville (sum of exponents = -c/m) is reported as a check of the truncation.
 */
public final class HillStability {

    private HillStability() { }

    /**
     * @param inertia m &gt; 0
     * @param damping c &gt;= 0
     * @param slopeSamples p(tau_j) at tau_j = 2 pi j / N; N &gt;= 4K + 1 and fine enough that p's
     *        harmonics above N - 2K are negligible
     * @param truncation K &gt;= 1
     * @param omega rad/s, to express exponents per second (1 for per-tau values)
     */
    public static FloquetExponents exponents(double inertia, double damping, double[] slopeSamples, int truncation, double omega) {
        int n = slopeSamples.length;
        if (truncation < 1 || n < 4 * truncation + 1) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE,
                    "Hill truncation K = " + truncation + " with " + n + " samples is not allowed; expected K >= 1 and N >= 4K + 1");
        }
        // Hipparchus's QR iteration occasionally stalls on Hill matrices (evenly spaced copies of
        // the exponents); an equivalent matrix (velocity rescaled) or a neighbouring truncation
        // takes another path. The variants are tried in turn.
        int[] dk = {0, 0, 0, -1, 1, -1, 1, -2};
        double[] scale = {1, 2, 0.5, 1, 1, 2, 0.5, 1};
        MathRuntimeException last = null;
        for (int v = 0; v < dk.length; v++) {
            int k = truncation + dk[v];
            if (k < 1 || n < 4 * k + 1) {
                continue;
            }
            try {
                return attempt(inertia, damping, slopeSamples, k, omega, scale[v]);
            } catch (MathRuntimeException e) {
                last = e;
            }
        }
        throw new FerromapException(MessageKey.NO_CONVERGENCE,
                "Hill matrix eigen-decomposition failed for every variant: " + (last == null ? "" : last.getMessage()), last);
    }

    private static FloquetExponents attempt(double inertia, double damping, double[] slopeSamples, int truncation, double omega,
                                            double velocityScale) {
        int n = slopeSamples.length;
        HarmonicBasis basis = new HarmonicBasis(truncation, false, n);
        int d = basis.dimension();
        double[] dc = new double[2 * truncation + 1];
        double[] ds = new double[2 * truncation + 1];
        basis.moments(slopeSamples, dc, ds);
        double[][] h = new double[2 * d][2 * d];
        basis.addMultiplication(dc, ds, -1.0 / (inertia * velocityScale), h, d, 0);
        for (int r = 0; r < d; r++) {
            h[r][d + r] = velocityScale;
            h[d + r][d + r] = -damping / inertia;
            int k = basis.harmonicOf(r);
            if (k == 0) {
                continue;
            }
            // (u')_cos k = k b_k, (u')_sin k = -k a_k; the Hill matrix carries -D.
            if (basis.isSine(r)) {
                h[r][r - 1] += k;
                h[d + r][d + r - 1] += k;
            } else {
                h[r][r + 1] -= k;
                h[d + r][d + r + 1] -= k;
            }
        }
        EigenDecompositionNonSymmetric eig = new EigenDecompositionNonSymmetric(new Array2DRowRealMatrix(h, false));
        Complex[] ev = eig.getEigenvalues();
        int m = ev.length;
        double[] centroid = new double[m];
        Integer[] order = new Integer[m];
        for (int i = 0; i < m; i++) {
            FieldVector<Complex> v = eig.getEigenvector(i);
            double wsum = 0;
            double ksum = 0;
            for (int r = 0; r < 2 * d; r++) {
                Complex c = v.getEntry(r);
                double w = c.getReal() * c.getReal() + c.getImaginary() * c.getImaginary();
                wsum += w;
                ksum += w * basis.harmonicOf(r % d);
            }
            centroid[i] = wsum > 0 ? ksum / wsum : Double.POSITIVE_INFINITY;
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(centroid[a], centroid[b]));
        // The best-resolved eigenvalue is one physical exponent. The other follows from it for a
        // real 2-D system: the multipliers are a conjugate pair or both real, and their product is
        // exp(-2 pi c/m) (Liouville). Taking it from the spectrum instead is fragile near a
        // double multiplier, where eigenvalues carry round-off of order sqrt(eps).
        Complex s1 = ev[order[0]];
        double decay = damping / inertia;
        double im1 = s1.getImaginary() - Math.rint(s1.getImaginary());
        double halfOff = Math.abs(2 * im1 - Math.rint(2 * im1)) / 2;
        boolean realMultipliers = halfOff <= 1e-6;
        if (realMultipliers) {
            im1 = 0.5 * Math.rint(2 * im1);
        }
        double re1 = s1.getReal();
        double re2 = -decay - re1;
        double im2 = realMultipliers ? im1 : -im1;
        // How well the spectrum contains the second exponent: a truncation check.
        double mismatch = Double.POSITIVE_INFINITY;
        for (int i = 0; i < m; i++) {
            double di = ev[i].getImaginary() - im2;
            mismatch = Math.min(mismatch, Math.abs(ev[i].getReal() - re2) + Math.abs(di - Math.rint(di)));
        }
        double[] reAll = {re1, re2};
        double[] imAll = {im1, im2};
        double[] re = new double[2];
        double[] im = new double[2];
        double[] mr = new double[2];
        double[] mi = new double[2];
        for (int i = 0; i < 2; i++) {
            re[i] = reAll[i] * omega;
            im[i] = imAll[i] * omega;
            double mod = Math.exp(2 * Math.PI * reAll[i]);
            double ang = 2 * Math.PI * imAll[i];
            mr[i] = mod * Math.cos(ang);
            mi[i] = realMultipliers ? 0.0 : mod * Math.sin(ang);
        }
        mismatch *= omega;
        boolean stable = Math.max(re1, re2) < -1e-9 * Math.max(1, decay);
        return new FloquetExponents(re, im, mr, mi, stable, mismatch, truncation);
    }
}
