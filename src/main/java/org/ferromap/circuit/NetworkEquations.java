package org.ferromap.circuit;

import org.ferromap.equipment.Connection;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.hipparchus.ode.OrdinaryDifferentialEquation;

/**
 * The ODE of a {@link ThreePhaseNetwork} in per unit ({@link NetworkPerUnit}), with the state of
 * the three switch poles. Time is tau = omega t; the state is laid out as
 * {@link ThreePhaseNetwork#stateLayout()} says: three winding flux linkages, three node voltages,
 * and the neutral voltage when it is a state.
 *
 * <p><b>Closed and open poles.</b> All three node voltages are always carried. A node behind a
 * closed pole is tied to its source: its state derivative is the source's derivative, and wherever
 * the node voltage is used the source value e_k(tau) itself is taken, so integration error on the
 * tied node cannot leak into the rest of the network. A node behind an open pole obeys its
 * current balance through the capacitance matrix. With O the open nodes and K the closed ones:
 * <pre>
 *   C_OO dv_O/dtau = j_O - C_OK de_K/dtau,     dv_K/dtau = de_K/dtau
 *   dlambda_w/dtau = v(from_w) - v(to_w)
 * </pre>
 * j the winding currents injected into each node (magnetizing plus conductance). C_OO is inverted
 * once per pole configuration at construction, so a step costs a 3x3 product. Opening a pole only
 * changes which inverse is used; the state vector keeps its layout, so nothing is remapped at a
 * switching instant. The current through a closed pole into its node follows from the same
 * balance: (C dv/dtau)_k - j_k.
 *
 * <p><b>The ungrounded-wye neutral without stray capacitance.</b> The winding currents must sum to
 * zero there: sum_w [i_w(lambda_w) + G_w (v_w - v_n)] = 0. With core loss or load (sum G &gt; 0)
 * this gives v_n explicitly. A lossless unloaded bank leaves sum_w i_w(lambda_w) = 0 as a
 * constraint on the flux linkages; v_n is then chosen so that the constraint's derivative holds
 * and any drift decays at {@link #CONSTRAINT_RATE} per unit time:
 * sum_w i_w'(lambda_w) (v_w - v_n) = -CONSTRAINT_RATE * sum_w i_w(lambda_w).
 * With a stray capacitance Cn the neutral is a state instead: Cn dv_n/dtau = sum of the winding
 * currents into it.
 *
 * <p>Mutable in its pole states and scratch arrays: one instance per integration, not shared
 * between threads. Poles only open (closing needs a prestrike model not built here).
 */
public final class NetworkEquations implements OrdinaryDifferentialEquation {

    /** Rate, per unit time, at which a drift of the lossless neutral's current balance decays. */
    public static final double CONSTRAINT_RATE = 1.0;

    /**
     * Flux linkage, per unit of E/omega, beyond which the magnetizing curves continue linearly with
     * their slope there. No trajectory of the network gets near it (it takes tens of radians of
     * several per unit of one sign); only a rejected trial step of the integrator does, and there a
     * polynomial curve would overflow to infinity and NaN, which the integrator cannot reject.
     */
    static final double FLUX_LIMIT = 50.0;

    /** Node index of ground in the winding incidence. */
    private static final int GROUND = -1;
    /** Node index of the neutral in the winding incidence. */
    private static final int NEUTRAL = 3;

    private final ThreePhaseNetwork network;
    private final StateLayout layout;
    private final int dimension;
    private final SaturationCurve[] curves = new SaturationCurve[3];
    /** Flux base, Wb-turn, and 1 / current base, 1/A, to evaluate the SI curves in per unit. */
    private final double fluxBase;
    private final double inverseCurrentBase;
    /** Winding conductances, per unit. */
    private final double[] conductance = new double[3];
    private final double totalConductance;
    private final int[] from = new int[3];
    private final int[] to = new int[3];
    /** Source angle of each phase, rad. */
    private final double[] angle = new double[3];
    /** Per-unit capacitance matrix: diagonal 1 + 2r, off-diagonal -r. */
    private final double cDiag;
    private final double cOff;
    private final double cNeutral;
    private final boolean neutralState;
    private final boolean quasiStaticNeutral;
    /** Row-major 3x3 inverse of the node matrix for each closed mask (bit k set: pole k closed). */
    private final double[][] inverse = new double[8][];

    private int closedMask = 7;

    // scratch, reused every evaluation
    private final double[] de = new double[3];
    private final double[] v = new double[4];
    private final double[] iMag = new double[3];
    private final double[] inject = new double[4];
    private final double[] rhs = new double[3];
    private final double[] dv = new double[3];

    NetworkEquations(ThreePhaseNetwork network) {
        this.network = network;
        this.layout = network.stateLayout();
        this.dimension = network.dimension();
        NetworkPerUnit pu = network.perUnit();
        this.fluxBase = pu.flux();
        this.inverseCurrentBase = 1.0 / pu.current();
        double g = 0;
        for (int w = 0; w < 3; w++) {
            WindingBranch b = network.windings().get(w);
            curves[w] = b.magnetizing();
            conductance[w] = b.conductance() * pu.impedance();
            g += conductance[w];
            angle[w] = network.sourceAngle() - 2 * Math.PI * w / 3;
            switch (network.connection()) {
                case GROUNDED_WYE -> { from[w] = w; to[w] = GROUND; }
                case UNGROUNDED_WYE -> { from[w] = w; to[w] = NEUTRAL; }
                case DELTA -> { from[w] = w; to[w] = (w + 1) % 3; }
                default -> throw new IllegalStateException();
            }
        }
        this.totalConductance = g;
        double r = network.capacitanceRatio();
        this.cDiag = 1 + 2 * r;
        this.cOff = -r;
        this.neutralState = network.hasNeutralState();
        this.quasiStaticNeutral = network.connection() == Connection.UNGROUNDED_WYE && !neutralState;
        this.cNeutral = network.neutralCapacitance() / network.coreToSheathCapacitance();
        for (int mask = 0; mask < 8; mask++) {
            inverse[mask] = invertNodeMatrix(mask);
        }
    }

    /** The network these equations integrate. */
    public ThreePhaseNetwork network() {
        return network;
    }

    /** The state layout, with the per-unit bases as scales. */
    public StateLayout layout() {
        return layout;
    }

    @Override
    public int getDimension() {
        return dimension;
    }

    @Override
    public double[] computeDerivatives(double tau, double[] y) {
        double[] yDot = new double[dimension];
        evaluate(tau, y, yDot);
        return yDot;
    }

    /** Whether pole {@code phase} (0, 1, 2 for a, b, c) is closed. */
    public boolean isClosed(int phase) {
        checkPhase(phase);
        return (closedMask & (1 << phase)) != 0;
    }

    /**
     * Opens pole {@code phase}. The event handler that calls this restarts the integration from
     * {@link #withNodeOnSource}, which puts the node exactly on the source value it leaves.
     */
    public void openPole(int phase) {
        checkPhase(phase);
        closedMask &= ~(1 << phase);
    }

    /**
     * A copy of y with the voltage of node {@code phase} set to its source value at tau: the value
     * a node has at the instant its pole opens, free of the integration drift of a tied node.
     */
    public double[] withNodeOnSource(int phase, double tau, double[] y) {
        checkPhase(phase);
        double[] out = y.clone();
        out[3 + phase] = Math.sin(tau + angle[phase]);
        return out;
    }

    /** Source voltage of phase k at tau, per unit. */
    public double sourceVoltage(int phase, double tau) {
        checkPhase(phase);
        return Math.sin(tau + angle[phase]);
    }

    /**
     * Current through pole {@code phase} into its cable node at (tau, y), per unit of
     * {@link NetworkPerUnit#current()}; 0 when the pole is open.
     */
    public double switchCurrent(int phase, double tau, double[] y) {
        checkPhase(phase);
        if (!isClosed(phase)) {
            return 0.0;
        }
        evaluate(tau, y, null);
        double cdv = cDiag * dv[phase] + cOff * (dv[(phase + 1) % 3] + dv[(phase + 2) % 3]);
        return cdv - inject[phase];
    }

    /** Voltage across winding {@code w} at (tau, y), per unit: its flux linkage's derivative. */
    public double windingVoltage(int w, double tau, double[] y) {
        evaluate(tau, y, null);
        return v[from[w]] - (to[w] == GROUND ? 0.0 : v[to[w]]);
    }

    /** Neutral voltage at (tau, y), per unit; 0 for a grounded wye, NaN for a delta. */
    public double neutralVoltage(double tau, double[] y) {
        if (network.connection() == Connection.DELTA) {
            return Double.NaN;
        }
        evaluate(tau, y, null);
        return v[NEUTRAL];
    }

    /**
     * The per-unit state of the energized bank at tau, every pole treated as closed: nodes on the
     * source; flux linkages the integrals of the winding voltages with no offset; for an
     * ungrounded wye a common flux added so that the magnetizing currents sum to zero, and the
     * neutral (when a state) at the value the quasi-static balance gives.
     */
    public double[] energizedState(double tau) {
        double[] y = new double[dimension];
        for (int k = 0; k < 3; k++) {
            y[3 + k] = Math.sin(tau + angle[k]);
        }
        for (int w = 0; w < 3; w++) {
            // integral of sin(tau + a) is -cos(tau + a); the neutral of a balanced wye sits at 0
            double lam = -Math.cos(tau + angle[from[w]]);
            if (to[w] >= 0 && to[w] < 3) {
                lam += Math.cos(tau + angle[to[w]]);
            }
            y[w] = lam;
        }
        if (network.connection() == Connection.UNGROUNDED_WYE) {
            double shift = commonFluxBalancingCurrents(y);
            for (int w = 0; w < 3; w++) {
                y[w] += shift;
            }
            if (neutralState) {
                for (int k = 0; k < 3; k++) {
                    v[k] = y[3 + k];
                }
                y[6] = quasiStaticNeutral(y);
            }
        }
        return y;
    }

    /** The common flux delta with sum_w i_w(lambda_w + delta) = 0, by bisection (monotone in delta). */
    private double commonFluxBalancingCurrents(double[] y) {
        double span = 0;
        for (int w = 0; w < 3; w++) {
            span = Math.max(span, Math.abs(y[w]));
        }
        double lo = -span;
        double hi = span;
        for (int it = 0; it < 200 && hi - lo > 1e-15 * Math.max(1.0, span); it++) {
            double mid = 0.5 * (lo + hi);
            double s = 0;
            for (int w = 0; w < 3; w++) {
                s += curves[w].current(fluxBase * (y[w] + mid));
            }
            if (s > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * The whole right-hand side; fills v (node voltages), inject (winding current into each node)
     * and dv (node voltage derivatives) as side results. yDot may be null.
     */
    private void evaluate(double tau, double[] y, double[] yDot) {
        for (int k = 0; k < 3; k++) {
            double s = Math.sin(tau + angle[k]);
            double c = Math.cos(tau + angle[k]);
            de[k] = c;
            v[k] = (closedMask & (1 << k)) != 0 ? s : y[3 + k];
        }
        for (int w = 0; w < 3; w++) {
            iMag[w] = magnetizing(w, y[w]);
        }
        if (neutralState) {
            v[NEUTRAL] = y[6];
        } else if (quasiStaticNeutral) {
            v[NEUTRAL] = quasiStaticNeutral(y);
        } else {
            v[NEUTRAL] = 0.0;
        }
        inject[0] = 0;
        inject[1] = 0;
        inject[2] = 0;
        inject[3] = 0;
        for (int w = 0; w < 3; w++) {
            double u = v[from[w]] - (to[w] == GROUND ? 0.0 : v[to[w]]);
            double i = iMag[w] + conductance[w] * u;
            inject[from[w]] -= i;
            if (to[w] != GROUND) {
                inject[to[w]] += i;
            }
            if (yDot != null) {
                yDot[w] = u;
            }
        }
        for (int k = 0; k < 3; k++) {
            if ((closedMask & (1 << k)) != 0) {
                rhs[k] = de[k];
            } else {
                double x = inject[k];
                for (int j = 0; j < 3; j++) {
                    if (j != k && (closedMask & (1 << j)) != 0) {
                        x -= cOff * de[j];
                    }
                }
                rhs[k] = x;
            }
        }
        double[] m = inverse[closedMask];
        for (int k = 0; k < 3; k++) {
            dv[k] = m[3 * k] * rhs[0] + m[3 * k + 1] * rhs[1] + m[3 * k + 2] * rhs[2];
        }
        if (yDot != null) {
            yDot[3] = dv[0];
            yDot[4] = dv[1];
            yDot[5] = dv[2];
            if (neutralState) {
                yDot[6] = inject[NEUTRAL] / cNeutral;
            }
        }
    }

    /**
     * Neutral voltage from the current balance at the neutral, given v[0..2] and the flux
     * linkages in y. See the class comment for the lossless case.
     */
    private double quasiStaticNeutral(double[] y) {
        if (totalConductance > 0) {
            double num = 0;
            for (int w = 0; w < 3; w++) {
                num += magnetizing(w, y[w]) + conductance[w] * v[w];
            }
            return num / totalConductance;
        }
        double num = 0;
        double den = 0;
        double sum = 0;
        for (int w = 0; w < 3; w++) {
            double slope = magnetizingSlope(w, y[w]);
            num += slope * v[w];
            den += slope;
            sum += magnetizing(w, y[w]);
        }
        return (num + CONSTRAINT_RATE * sum) / den;
    }

    /** Magnetizing current of winding w at per-unit flux x, per unit; linear beyond {@link #FLUX_LIMIT}. */
    private double magnetizing(int w, double x) {
        if (Math.abs(x) <= FLUX_LIMIT) {
            return curves[w].current(fluxBase * x) * inverseCurrentBase;
        }
        double edge = Math.copySign(FLUX_LIMIT, x);
        return (curves[w].current(fluxBase * edge) + curves[w].currentSlope(fluxBase * edge) * fluxBase * (x - edge))
                * inverseCurrentBase;
    }

    /** d(current)/d(flux) of winding w at per-unit flux x, per unit. */
    private double magnetizingSlope(int w, double x) {
        double c = Math.max(-FLUX_LIMIT, Math.min(FLUX_LIMIT, x));
        return curves[w].currentSlope(fluxBase * c) * fluxBase * inverseCurrentBase;
    }

    /**
     * Inverse of the node matrix for one closed mask: identity rows for closed nodes, the
     * capacitance matrix restricted to open nodes elsewhere (block diagonal after permutation).
     */
    private double[] invertNodeMatrix(int mask) {
        double[][] a = new double[3][3];
        for (int k = 0; k < 3; k++) {
            boolean kClosed = (mask & (1 << k)) != 0;
            for (int j = 0; j < 3; j++) {
                boolean jClosed = (mask & (1 << j)) != 0;
                if (kClosed) {
                    a[k][j] = k == j ? 1.0 : 0.0;
                } else {
                    a[k][j] = jClosed ? 0.0 : (k == j ? cDiag : cOff);
                }
            }
        }
        double det = a[0][0] * (a[1][1] * a[2][2] - a[1][2] * a[2][1])
                - a[0][1] * (a[1][0] * a[2][2] - a[1][2] * a[2][0])
                + a[0][2] * (a[1][0] * a[2][1] - a[1][1] * a[2][0]);
        if (!(Math.abs(det) > 0)) {
            throw new FerromapException(MessageKey.SINGULAR, "the cable capacitance matrix is singular (det = " + det + ")");
        }
        double[] inv = new double[9];
        inv[0] = (a[1][1] * a[2][2] - a[1][2] * a[2][1]) / det;
        inv[1] = (a[0][2] * a[2][1] - a[0][1] * a[2][2]) / det;
        inv[2] = (a[0][1] * a[1][2] - a[0][2] * a[1][1]) / det;
        inv[3] = (a[1][2] * a[2][0] - a[1][0] * a[2][2]) / det;
        inv[4] = (a[0][0] * a[2][2] - a[0][2] * a[2][0]) / det;
        inv[5] = (a[0][2] * a[1][0] - a[0][0] * a[1][2]) / det;
        inv[6] = (a[1][0] * a[2][1] - a[1][1] * a[2][0]) / det;
        inv[7] = (a[0][1] * a[2][0] - a[0][0] * a[2][1]) / det;
        inv[8] = (a[0][0] * a[1][1] - a[0][1] * a[1][0]) / det;
        return inv;
    }

    private static void checkPhase(int phase) {
        if (phase < 0 || phase > 2) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "phase index " + phase + "; expected 0, 1 or 2 (a, b, c)");
        }
    }
}
