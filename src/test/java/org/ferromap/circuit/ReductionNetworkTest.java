package org.ferromap.circuit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.ferromap.equipment.Cable;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.CoreType;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.equipment.Transformer;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Cross-checks every row of the reduction table (DOMAIN.md §1.2 [der]) against a direct linear
 * phasor solution of the three-phase network: the nodal admittance matrix of the open terminals
 * (and the floating neutral) with Ccs, Ccc, the linear magnetizing inductance Lm and the core-loss
 * resistance of every winding, solved with Commons Math's LU on the real 2n x 2n form (an
 * algorithm and a library independent of the code under test, which uses closed forms).
 *
 * <p>For r = 0 and r = 0.3, a short and a long cable, and each connection and case, the loop
 * voltage W and loop current I taken from the network must equal the single loop's prediction
 * W = j w Cs E / (j w (Cs + Cg) + 1/(j w k Lm) + 1/R_eq), with E the circuit's source phasor, and
 * k = 1.5 (ungrounded primaries) or 1 (grounded wye) written here from the table, not read from
 * the code. Tolerance 1e-9 relative to |W|: the systems have at most three unknowns and
 * condition numbers below 1e4, so LU round-off stays near 1e-12.
 */
class ReductionNetworkTest {

    private static final double F = 60.0;
    private static final double W = 2 * Math.PI * F;
    private static final double VLINE = 34.5e3;
    private static final double PHI = 0.3; // supply phase-a angle, rad: non-zero to catch angle slips
    private static final double CCS_PER_M = 0.2554e-9;

    static Stream<Arguments> cases() {
        List<Arguments> out = new ArrayList<>();
        for (Connection c : Connection.values()) {
            for (int open = 1; open <= 2; open++) {
                for (double r : new double[] {0.0, 0.3}) {
                    for (double length : new double[] {50.0, 3000.0}) {
                        out.add(Arguments.of(c, open, r, length));
                    }
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0}, {1} open, r = {2}, {3} m")
    @MethodSource("cases")
    void loopMatchesTheThreePhaseNetwork(Connection conn, int open, double r, double length) {
        Transformer t = new Transformer(500e3, VLINE, F, conn, CoreType.SEPARATE_PHASE_CORES, 0.008, 450,
                new PolynomialCurve(1e-3, 1e-16, 9));
        Cable cable = r == 0 ? Cable.screened(CCS_PER_M) : Cable.belted(CCS_PER_M, r * CCS_PER_M);
        Installation in = new Installation(VLINE, PHI, F, t, cable, length, new OpenPhaseCase(open));
        // A linear stand-in keeps this test on the table's numbers only (no curve is evaluated).
        EquivalentCircuit eq = Reduction.reduce(in, new PolynomialCurve(1e-3, 1e-16, 9)).circuit();

        double lm = t.magnetizingInductance();
        double rPhase = VLINE * VLINE / 450; // R = 3 V_phase^2 / P per phase, wye-equivalent
        double ccs = CCS_PER_M * length;
        double ccc = r * ccs;
        double k = conn == Connection.GROUNDED_WYE ? 1.0 : 1.5;

        Complex[] loop = network(conn, open, ccs, ccc, lm, rPhase);
        Complex wNet = loop[0];
        Complex iNet = loop[1];

        Complex e = Complex.valueOf(Math.cos(eq.sourceAngle()), Math.sin(eq.sourceAngle())).multiply(eq.sourcePeak());
        Complex jw = new Complex(0, W);
        Complex yLoop = jw.multiply(k * lm).reciprocal().add(1.0 / eq.coreLossResistance());
        Complex wRed = jw.multiply(eq.seriesCapacitance()).multiply(e)
                .divide(jw.multiply(eq.totalCapacitance()).add(yLoop));
        Complex iRed = wRed.multiply(yLoop);

        double tol = 1e-9 * Math.max(wNet.abs(), 1e-3);
        assertEquals(wNet.getReal(), wRed.getReal(), tol, "Re W");
        assertEquals(wNet.getImaginary(), wRed.getImaginary(), tol, "Im W");
        double tolI = 1e-9 * Math.max(iNet.abs(), 1e-12);
        assertEquals(iNet.getReal(), iRed.getReal(), tolI, "Re I");
        assertEquals(iNet.getImaginary(), iRed.getImaginary(), tolI, "Im I");
        // The loss combines like the inductance: R_eq = k R (exact for the linear network).
        assertEquals(k * rPhase, eq.coreLossResistance(), 1e-9 * k * rPhase);
    }

    // Nodes: 0 ground, 1 a, 2 b, 3 c, 4 neutral.
    private static final int G = 0;
    private static final int A = 1;
    private static final int B = 2;
    private static final int C = 3;
    private static final int N = 4;

    /** Solves the network; returns {W, I} as the reduction defines them (see Reduction's table). */
    private static Complex[] network(Connection conn, int open, double ccs, double ccc, double lm, double rPhase) {
        Complex[][] y = new Complex[5][5];
        for (Complex[] row : y) {
            java.util.Arrays.fill(row, Complex.ZERO);
        }
        Complex jw = new Complex(0, W);
        Complex yCs = jw.multiply(ccs);
        Complex yCc = jw.multiply(ccc);
        Complex yWye = jw.multiply(lm).reciprocal().add(1.0 / rPhase);
        Complex yDelta = jw.multiply(3 * lm).reciprocal().add(1.0 / (3 * rPhase)); // L_D = 3 Lm, R_D = 3 R
        for (int p : new int[] {A, B, C}) {
            stamp(y, p, G, yCs);
        }
        stamp(y, A, B, yCc);
        stamp(y, B, C, yCc);
        stamp(y, C, A, yCc);
        switch (conn) {
            case GROUNDED_WYE -> {
                for (int p : new int[] {A, B, C}) {
                    stamp(y, p, G, yWye);
                }
            }
            case UNGROUNDED_WYE -> {
                for (int p : new int[] {A, B, C}) {
                    stamp(y, p, N, yWye);
                }
            }
            case DELTA -> {
                stamp(y, A, B, yDelta);
                stamp(y, B, C, yDelta);
                stamp(y, C, A, yDelta);
            }
        }
        double epk = VLINE * Math.sqrt(2) / Math.sqrt(3);
        Complex[] v = new Complex[5];
        v[G] = Complex.ZERO;
        v[A] = phasor(epk, PHI);
        v[B] = phasor(epk, PHI - 2 * Math.PI / 3);
        v[C] = phasor(epk, PHI + 2 * Math.PI / 3);
        Complex eb = v[B];
        Complex ec = v[C];

        List<Integer> unknown = new ArrayList<>();
        unknown.add(A);
        if (open == 2) {
            unknown.add(B);
        }
        if (conn == Connection.UNGROUNDED_WYE) {
            unknown.add(N);
        } else {
            v[N] = Complex.ZERO; // unused node: no branches
        }
        int n = unknown.size();
        double[][] m = new double[2 * n][2 * n];
        double[] rhs = new double[2 * n];
        for (int i = 0; i < n; i++) {
            int ni = unknown.get(i);
            Complex b = Complex.ZERO;
            for (int node = 0; node < 5; node++) {
                if (!unknown.contains(node) && v[node] != null) {
                    b = b.subtract(y[ni][node].multiply(v[node]));
                }
            }
            rhs[i] = b.getReal();
            rhs[n + i] = b.getImaginary();
            for (int j = 0; j < n; j++) {
                Complex a = y[ni][unknown.get(j)];
                m[i][j] = a.getReal();
                m[i][n + j] = -a.getImaginary();
                m[n + i][j] = a.getImaginary();
                m[n + i][n + j] = a.getReal();
            }
        }
        RealVector x = new LUDecomposition(new Array2DRowRealMatrix(m)).getSolver().solve(new ArrayRealVector(rhs));
        for (int i = 0; i < n; i++) {
            v[unknown.get(i)] = new Complex(x.getEntry(i), x.getEntry(n + i));
        }

        Complex wLoop;
        Complex iLoop;
        if (conn == Connection.GROUNDED_WYE) {
            wLoop = v[A];
            iLoop = v[A].multiply(yWye);
        } else if (open == 1) {
            wLoop = v[A].subtract(eb.add(ec).multiply(0.5));
            iLoop = conn == Connection.UNGROUNDED_WYE
                    ? v[A].subtract(v[N]).multiply(yWye)
                    : v[A].subtract(v[B]).multiply(yDelta).add(v[A].subtract(v[C]).multiply(yDelta));
        } else {
            wLoop = v[A].subtract(ec);
            iLoop = conn == Connection.UNGROUNDED_WYE
                    ? v[A].subtract(v[N]).multiply(yWye).add(v[B].subtract(v[N]).multiply(yWye))
                    : v[A].subtract(v[C]).multiply(yDelta).add(v[B].subtract(v[C]).multiply(yDelta));
        }
        return new Complex[] {wLoop, iLoop};
    }

    private static Complex phasor(double mag, double angle) {
        return new Complex(mag * Math.cos(angle), mag * Math.sin(angle));
    }

    private static void stamp(Complex[][] y, int i, int j, Complex adm) {
        y[i][i] = y[i][i].add(adm);
        y[j][j] = y[j][j].add(adm);
        y[i][j] = y[i][j].subtract(adm);
        y[j][i] = y[j][i].subtract(adm);
    }
}
