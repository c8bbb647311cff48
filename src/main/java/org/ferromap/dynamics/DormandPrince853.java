package org.ferromap.dynamics;

import java.util.Arrays;

/**
 * A lean Dormand-Prince 8(5,3) integrator with dense output of order 7, written for small
 * systems integrated over many source periods: no allocation per step, no boxing, no event or
 * step-normalizer machinery. Error control, step-size control, initial-step choice, stiffness
 * test and dense output follow DOP853 as published by E. Hairer, S. P. Norsett and G. Wanner,
 * Solving Ordinary Differential Equations I, 2nd ed., Springer 1993, section II.10 and its
 * Fortran/C code. The coefficients are that method's (the same tableau as Hipparchus's
 * {@code DormandPrince853Integrator}; a test compares them entry by entry).
 *
 * <p>Instances are mutable work areas and not thread-safe: one per thread. The step size is kept
 * between calls so that integrating period after period does not restart the step control.
 * Failures are returned as an {@link Status}, never thrown, so a simulation can report them.
 */
public final class DormandPrince853 {

    /** A right-hand side y' = f(t, y) that writes into a caller-owned array and allocates nothing. */
    @FunctionalInterface
    public interface Rhs {
        /** Writes f(t, y) into {@code yDot}; must not keep or modify {@code y}. */
        void derivatives(double t, double[] y, double[] yDot);
    }

    /**
     * Called after every accepted step, before the integrator moves on; may call
     * {@link DormandPrince853#interpolate(double, double[])} for times in [tStart, tEnd].
     */
    @FunctionalInterface
    public interface StepListener {
        void stepAccepted(double tStart, double tEnd);
    }

    /** How a call to {@link #integrate} ended. */
    public enum Status {
        /** Reached the end time. */
        OK("integration reached the end time"),
        /** The step size fell below the smallest allowed step. */
        STEP_UNDERFLOW("step size collapsed below the smallest allowed step"),
        /** More steps than allowed for the interval. */
        TOO_MANY_STEPS("more steps than allowed for the interval (the problem behaves as stiff)"),
        /** The DOP853 stiffness test fired 15 times in a row. */
        STIFF("the step size is limited by stability, not accuracy: the problem is stiff"),
        /** The solution or its derivative became infinite or NaN. */
        NON_FINITE("the state became infinite or NaN");

        private final String explanation;

        Status(String explanation) {
            this.explanation = explanation;
        }

        /** One line for a report. */
        public String explanation() {
            return explanation;
        }
    }

    // DOP853 coefficients (Hairer, Norsett, Wanner): nodes C, matrix A, 8th-order weights B,
    // the 5th-order error weights ER, the 3rd-order companion BHH, and the dense-output rows D4..D7
    // with the three extra stages 14..16.
    private static final double C2 = 0.05260015195876774;
    private static final double A2_1 = 0.05260015195876774;
    private static final double C3 = 0.0789002279381516;
    private static final double A3_1 = 0.0197250569845379;
    private static final double A3_2 = 0.0591751709536137;
    private static final double C4 = 0.1183503419072274;
    private static final double A4_1 = 0.02958758547680685;
    private static final double A4_3 = 0.08876275643042056;
    private static final double C5 = 0.28164965809277265;
    private static final double A5_1 = 0.24136513415926666;
    private static final double A5_3 = -0.884549479328286;
    private static final double A5_4 = 0.9248340032617919;
    private static final double C6 = 0.3333333333333333;
    private static final double A6_1 = 0.037037037037037035;
    private static final double A6_4 = 0.1708286087294739;
    private static final double A6_5 = 0.12546768756682242;
    private static final double C7 = 0.25;
    private static final double A7_1 = 0.037109375;
    private static final double A7_4 = 0.17025221101954402;
    private static final double A7_5 = 0.060216538980455966;
    private static final double A7_6 = -0.017578125;
    private static final double C8 = 0.3076923076923077;
    private static final double A8_1 = 0.03709200011850479;
    private static final double A8_4 = 0.17038392571223998;
    private static final double A8_5 = 0.1072620304463733;
    private static final double A8_6 = -0.015319437748624402;
    private static final double A8_7 = 0.008273789163814023;
    private static final double C9 = 0.6512820512820513;
    private static final double A9_1 = 0.6241109587160757;
    private static final double A9_4 = -3.360892629446941;
    private static final double A9_5 = -0.8682193468417261;
    private static final double A9_6 = 27.59209969944671;
    private static final double A9_7 = 20.154067550477894;
    private static final double A9_8 = -43.48988418106996;
    private static final double C10 = 0.6;
    private static final double A10_1 = 0.47766253643826434;
    private static final double A10_4 = -2.4881146199716677;
    private static final double A10_5 = -0.5902908268368431;
    private static final double A10_6 = 21.230051448181193;
    private static final double A10_7 = 15.279233632882423;
    private static final double A10_8 = -33.28821096898486;
    private static final double A10_9 = -0.020331201708508627;
    private static final double C11 = 0.8571428571428571;
    private static final double A11_1 = -0.9371424300859873;
    private static final double A11_4 = 5.186372428844064;
    private static final double A11_5 = 1.09143734899673;
    private static final double A11_6 = -8.149787010746927;
    private static final double A11_7 = -18.52006565999696;
    private static final double A11_8 = 22.739487099350505;
    private static final double A11_9 = 2.4936055526796523;
    private static final double A11_10 = -3.0467644718982196;
    private static final double A12_1 = 2.273310147516538;
    private static final double A12_4 = -10.53449546673725;
    private static final double A12_5 = -2.000872058224863;
    private static final double A12_6 = -17.9589318631188;
    private static final double A12_7 = 27.94888452941996;
    private static final double A12_8 = -2.8589982771350235;
    private static final double A12_9 = -8.87285693353063;
    private static final double A12_10 = 12.360567175794303;
    private static final double A12_11 = 0.6433927460157636;
    private static final double C14 = 0.1;
    private static final double A14_1 = 0.056167502283047954;
    private static final double A14_7 = 0.25350021021662483;
    private static final double A14_8 = -0.2462390374708025;
    private static final double A14_9 = -0.12419142326381637;
    private static final double A14_10 = 0.15329179827876568;
    private static final double A14_11 = 0.00820105229563469;
    private static final double A14_12 = 0.007567897660545699;
    private static final double A14_13 = -0.008298;
    private static final double C15 = 0.2;
    private static final double A15_1 = 0.03183464816350214;
    private static final double A15_6 = 0.028300909672366776;
    private static final double A15_7 = 0.053541988307438566;
    private static final double A15_8 = -0.05492374857139099;
    private static final double A15_11 = -1.0834732869724932E-4;
    private static final double A15_12 = 3.825710908356584E-4;
    private static final double A15_13 = -3.4046500868740456E-4;
    private static final double A15_14 = 0.1413124436746325;
    private static final double C16 = 0.7777777777777778;
    private static final double A16_1 = -0.42889630158379194;
    private static final double A16_6 = -4.697621415361164;
    private static final double A16_7 = 7.683421196062599;
    private static final double A16_8 = 4.06898981839711;
    private static final double A16_9 = 0.3567271874552811;
    private static final double A16_13 = -0.0013990241651590145;
    private static final double A16_14 = 2.9475147891527724;
    private static final double A16_15 = -9.15095847217987;
    private static final double B1 = 0.054293734116568765;
    private static final double B6 = 4.450312892752409;
    private static final double B7 = 1.8915178993145003;
    private static final double B8 = -5.801203960010585;
    private static final double B9 = 0.3111643669578199;
    private static final double B10 = -0.1521609496625161;
    private static final double B11 = 0.20136540080403034;
    private static final double B12 = 0.04471061572777259;
    private static final double D4_1 = -8.428938276109013;
    private static final double D4_6 = 0.5667149535193777;
    private static final double D4_7 = -3.0689499459498917;
    private static final double D4_8 = 2.38466765651207;
    private static final double D4_9 = 2.1170345824450285;
    private static final double D4_10 = -0.871391583777973;
    private static final double D4_11 = 2.2404374302607883;
    private static final double D4_12 = 0.6315787787694688;
    private static final double D4_13 = -0.08899033645133331;
    private static final double D4_14 = 18.148505520854727;
    private static final double D4_15 = -9.194632392478356;
    private static final double D4_16 = -4.436036387594894;
    private static final double D5_1 = 10.427508642579134;
    private static final double D5_6 = 242.28349177525817;
    private static final double D5_7 = 165.20045171727028;
    private static final double D5_8 = -374.5467547226902;
    private static final double D5_9 = -22.113666853125302;
    private static final double D5_10 = 7.733432668472264;
    private static final double D5_11 = -30.674084731089398;
    private static final double D5_12 = -9.332130526430229;
    private static final double D5_13 = 15.697238121770845;
    private static final double D5_14 = -31.139403219565178;
    private static final double D5_15 = -9.35292435884448;
    private static final double D5_16 = 35.81684148639408;
    private static final double D6_1 = 19.985053242002433;
    private static final double D6_6 = -387.0373087493518;
    private static final double D6_7 = -189.17813819516758;
    private static final double D6_8 = 527.8081592054236;
    private static final double D6_9 = -11.573902539959631;
    private static final double D6_10 = 6.8812326946963;
    private static final double D6_11 = -1.0006050966910838;
    private static final double D6_12 = 0.7777137798053443;
    private static final double D6_13 = -2.778205752353508;
    private static final double D6_14 = -60.19669523126412;
    private static final double D6_15 = 84.32040550667716;
    private static final double D6_16 = 11.99229113618279;
    private static final double D7_1 = -25.69393346270375;
    private static final double D7_6 = -154.18974869023643;
    private static final double D7_7 = -231.5293791760455;
    private static final double D7_8 = 357.6391179106141;
    private static final double D7_9 = 93.4053241836243;
    private static final double D7_10 = -37.45832313645163;
    private static final double D7_11 = 104.0996495089623;
    private static final double D7_12 = 29.8402934266605;
    private static final double D7_13 = -43.53345659001114;
    private static final double D7_14 = 96.32455395918828;
    private static final double D7_15 = -39.17726167561544;
    private static final double D7_16 = -149.72683625798564;
    private static final double ER1 = 0.01312004499419488;
    private static final double ER6 = -1.2251564463762044;
    private static final double ER7 = -0.4957589496572502;
    private static final double ER8 = 1.6643771824549864;
    private static final double ER9 = -0.35032884874997366;
    private static final double ER10 = 0.3341791187130175;
    private static final double ER11 = 0.08192320648511571;
    private static final double ER12 = -0.022355307863886294;
    private static final double BHH1 = 0.244094488188976377952755905512;
    private static final double BHH2 = 0.733846688281611857341361741547;
    private static final double BHH3 = 0.0220588235294117647058823529412;

    // Stiffness test of DOP853: |h lambda| estimated from the last stages; 6.1 is the boundary
    // of the method's stability region along the negative real axis (Hairer et al., section IV.2).
    private static final double STIFF_BOUNDARY = 6.1;
    private static final int STIFF_CHECK_EVERY = 100;
    private static final double SAFETY = 0.9;
    private static final double MAX_SHRINK = 3.0;   // 1/fac1, fac1 = 0.333
    private static final double MAX_GROWTH = 1.0 / 6.0;   // 1/fac2, fac2 = 6
    private static final double EXPONENT = 1.0 / 8.0;

    private final int n;
    private final double[] absTol;
    private final double[] relTol;
    private final double minStep;
    private final double maxStep;

    private final double[] k1, k2, k3, k4, k5, k6, k7, k8, k9, k10, k11, k12, k14, k15, k16;
    private double[] k13;
    private double[] kFirst;
    private final double[] yTmp, yStage12, yNew, yPrev;
    private final double[] r1, r2, r3, r4, r5, r6, r7, r8;

    private double h;
    private double tStep, hStep;
    private boolean denseReady;
    private long evaluations;
    private long acceptedSteps;
    private long rejectedSteps;
    private double lastT = Double.NaN;
    private boolean haveDerivative;
    private Rhs lastRhs;

    /**
     * @param dimension number of state components
     * @param absTol absolute tolerance per component, in the units of the state
     * @param relTol relative tolerance per component
     * @param minStep smallest step allowed before {@link Status#STEP_UNDERFLOW}, in the time unit
     * @param maxStep largest step allowed, in the time unit
     */
    public DormandPrince853(int dimension, double[] absTol, double[] relTol, double minStep, double maxStep) {
        if (absTol.length != dimension || relTol.length != dimension) {
            throw new IllegalArgumentException("tolerance arrays must have length " + dimension);
        }
        this.n = dimension;
        this.absTol = absTol.clone();
        this.relTol = relTol.clone();
        this.minStep = minStep;
        this.maxStep = maxStep;
        k1 = new double[n]; k2 = new double[n]; k3 = new double[n]; k4 = new double[n];
        k5 = new double[n]; k6 = new double[n]; k7 = new double[n]; k8 = new double[n];
        k9 = new double[n]; k10 = new double[n]; k11 = new double[n]; k12 = new double[n];
        k13 = new double[n]; k14 = new double[n]; k15 = new double[n]; k16 = new double[n];
        kFirst = k1;
        yTmp = new double[n]; yStage12 = new double[n]; yNew = new double[n]; yPrev = new double[n];
        r1 = new double[n]; r2 = new double[n]; r3 = new double[n]; r4 = new double[n];
        r5 = new double[n]; r6 = new double[n]; r7 = new double[n]; r8 = new double[n];
    }

    /** The same tolerances for every component. */
    public static DormandPrince853 uniform(int dimension, double absTol, double relTol, double minStep, double maxStep) {
        double[] a = new double[dimension];
        double[] r = new double[dimension];
        Arrays.fill(a, absTol);
        Arrays.fill(r, relTol);
        return new DormandPrince853(dimension, a, r, minStep, maxStep);
    }

    /** Forgets the step size and the stored derivative: the next call starts afresh. */
    public void reset() {
        h = 0;
        haveDerivative = false;
        lastRhs = null;
    }

    /** Right-hand-side evaluations since construction. */
    public long evaluations() {
        return evaluations;
    }

    /** Accepted steps since construction. */
    public long acceptedSteps() {
        return acceptedSteps;
    }

    /** Rejected steps since construction. */
    public long rejectedSteps() {
        return rejectedSteps;
    }

    /** The step size the next step will try. */
    public double currentStep() {
        return h;
    }

    /**
     * Integrates from t0 to tEnd (tEnd &gt; t0), overwriting {@code y} with the state at the end
     * (or at the point of failure).
     *
     * @param f the right-hand side
     * @param t0 start time
     * @param y state at t0, replaced by the final state
     * @param tEnd end time, reached exactly
     * @param maxSteps most steps allowed in this call
     * @param listener called after each accepted step, or null
     * @return how the integration ended
     */
    public Status integrate(Rhs f, double t0, double[] y, double tEnd, long maxSteps, StepListener listener) {
        if (!(tEnd > t0)) {
            throw new IllegalArgumentException("end time " + tEnd + " must follow start time " + t0);
        }
        double t = t0;
        // Reuse the derivative of the last accepted step when this call continues where the last ended.
        if (!haveDerivative || f != lastRhs || t0 != lastT || !sameAsLastEnd(y)) {
            f.derivatives(t, y, kFirst);
            evaluations++;
            if (!finite(kFirst)) {
                return Status.NON_FINITE;
            }
        }
        lastRhs = f;
        haveDerivative = false;
        if (!(h > 0)) {
            h = initialStep(f, t, y, Math.min(maxStep, tEnd - t0));
        }
        boolean rejectedLast = false;
        int stiffCount = 0;
        int nonStiffCount = 0;
        long steps = 0;
        while (true) {
            if (steps >= maxSteps) {
                return Status.TOO_MANY_STEPS;
            }
            if (h < minStep) {
                return Status.STEP_UNDERFLOW;
            }
            boolean last = false;
            double hWanted = h;
            if (t + 1.01 * h >= tEnd) {
                h = tEnd - t;
                last = true;
            }
            steps++;
            double err = attempt(f, t, y, h);
            if (!(err <= 1.0)) {
                rejectedSteps++;
                double shrink;
                if (Double.isNaN(err) || Double.isInfinite(err)) {
                    shrink = 10.0;
                } else {
                    shrink = Math.min(MAX_SHRINK, Math.pow(err, EXPONENT) / SAFETY);
                }
                h = h / shrink;
                rejectedLast = true;
                if (h < minStep && Double.isNaN(err)) {
                    return Status.NON_FINITE;
                }
                continue;
            }
            // Accepted: the derivative at the new point (first stage of the next step).
            double tNew = last ? tEnd : t + h;
            f.derivatives(tNew, yNew, k13);
            evaluations++;
            if (!finite(k13)) {
                return Status.NON_FINITE;
            }
            acceptedSteps++;
            if (acceptedSteps % STIFF_CHECK_EVERY == 0 || stiffCount > 0) {
                double num = 0;
                double den = 0;
                for (int i = 0; i < n; i++) {
                    double a = k13[i] - k12[i];
                    double b = yNew[i] - yStage12[i];
                    num += a * a;
                    den += b * b;
                }
                if (den > 0 && h * Math.sqrt(num / den) > STIFF_BOUNDARY) {
                    nonStiffCount = 0;
                    if (++stiffCount == 15) {
                        System.arraycopy(yNew, 0, y, 0, n);
                        return Status.STIFF;
                    }
                } else if (++nonStiffCount == 6) {
                    stiffCount = 0;
                }
            }
            System.arraycopy(y, 0, yPrev, 0, n);
            System.arraycopy(yNew, 0, y, 0, n);
            tStep = t;
            hStep = h;
            denseReady = false;
            if (listener != null) {
                listener.stepAccepted(t, tNew);
            }
            // The new derivative becomes the first stage of the next step.
            double[] swap = kFirst;
            kFirst = k13;
            k13 = swap;
            t = tNew;
            double fac = Math.max(MAX_GROWTH, Math.min(MAX_SHRINK, Math.pow(Math.max(err, 1e-300), EXPONENT) / SAFETY));
            double hNew = Math.min(h / fac, maxStep);
            if (rejectedLast) {
                hNew = Math.min(hNew, h);
            }
            rejectedLast = false;
            if (last) {
                // A step clipped to reach tEnd says little about the step the problem allows:
                // start the next call from the larger of the two.
                h = Math.max(hNew, Math.min(hWanted, maxStep));
                lastT = t;
                haveDerivative = true;
                System.arraycopy(y, 0, yPrev, 0, n);
                return Status.OK;
            }
            h = hNew;
        }
    }

    private boolean sameAsLastEnd(double[] y) {
        // yPrev holds the final state of the last successful call.
        for (int i = 0; i < n; i++) {
            if (y[i] != yPrev[i]) {
                return false;
            }
        }
        return true;
    }

    /** One trial step of size hh from (t, y); fills yNew and the stages, returns the scaled error. */
    private double attempt(Rhs f, double t, double[] y, double hh) {
        final double[] s1 = kFirst;
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * A2_1 * s1[i];
        }
        f.derivatives(t + C2 * hh, yTmp, k2);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A3_1 * s1[i] + A3_2 * k2[i]);
        }
        f.derivatives(t + C3 * hh, yTmp, k3);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A4_1 * s1[i] + A4_3 * k3[i]);
        }
        f.derivatives(t + C4 * hh, yTmp, k4);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A5_1 * s1[i] + A5_3 * k3[i] + A5_4 * k4[i]);
        }
        f.derivatives(t + C5 * hh, yTmp, k5);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A6_1 * s1[i] + A6_4 * k4[i] + A6_5 * k5[i]);
        }
        f.derivatives(t + C6 * hh, yTmp, k6);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A7_1 * s1[i] + A7_4 * k4[i] + A7_5 * k5[i] + A7_6 * k6[i]);
        }
        f.derivatives(t + C7 * hh, yTmp, k7);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A8_1 * s1[i] + A8_4 * k4[i] + A8_5 * k5[i] + A8_6 * k6[i] + A8_7 * k7[i]);
        }
        f.derivatives(t + C8 * hh, yTmp, k8);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A9_1 * s1[i] + A9_4 * k4[i] + A9_5 * k5[i] + A9_6 * k6[i] + A9_7 * k7[i]
                    + A9_8 * k8[i]);
        }
        f.derivatives(t + C9 * hh, yTmp, k9);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A10_1 * s1[i] + A10_4 * k4[i] + A10_5 * k5[i] + A10_6 * k6[i] + A10_7 * k7[i]
                    + A10_8 * k8[i] + A10_9 * k9[i]);
        }
        f.derivatives(t + C10 * hh, yTmp, k10);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * (A11_1 * s1[i] + A11_4 * k4[i] + A11_5 * k5[i] + A11_6 * k6[i] + A11_7 * k7[i]
                    + A11_8 * k8[i] + A11_9 * k9[i] + A11_10 * k10[i]);
        }
        f.derivatives(t + C11 * hh, yTmp, k11);
        for (int i = 0; i < n; i++) {
            yStage12[i] = y[i] + hh * (A12_1 * s1[i] + A12_4 * k4[i] + A12_5 * k5[i] + A12_6 * k6[i] + A12_7 * k7[i]
                    + A12_8 * k8[i] + A12_9 * k9[i] + A12_10 * k10[i] + A12_11 * k11[i]);
        }
        f.derivatives(t + hh, yStage12, k12);
        evaluations += 11;
        double err5 = 0;
        double err3 = 0;
        for (int i = 0; i < n; i++) {
            double incr = B1 * s1[i] + B6 * k6[i] + B7 * k7[i] + B8 * k8[i] + B9 * k9[i] + B10 * k10[i]
                    + B11 * k11[i] + B12 * k12[i];
            double yi = y[i] + hh * incr;
            yNew[i] = yi;
            double sk = absTol[i] + relTol[i] * Math.max(Math.abs(y[i]), Math.abs(yi));
            double e3 = incr - BHH1 * s1[i] - BHH2 * k9[i] - BHH3 * k12[i];
            double e5 = ER1 * s1[i] + ER6 * k6[i] + ER7 * k7[i] + ER8 * k8[i] + ER9 * k9[i] + ER10 * k10[i]
                    + ER11 * k11[i] + ER12 * k12[i];
            e3 /= sk;
            e5 /= sk;
            err3 += e3 * e3;
            err5 += e5 * e5;
        }
        double deno = err5 + 0.01 * err3;
        if (deno <= 0.0) {
            deno = 1.0;
        }
        return Math.abs(hh) * err5 * Math.sqrt(1.0 / (n * deno));
    }

    /** Hairer's starting step for an order-8 method. */
    private double initialStep(Rhs f, double t, double[] y, double hMax) {
        double dnf = 0;
        double dny = 0;
        for (int i = 0; i < n; i++) {
            double sk = absTol[i] + relTol[i] * Math.abs(y[i]);
            dnf += (kFirst[i] / sk) * (kFirst[i] / sk);
            dny += (y[i] / sk) * (y[i] / sk);
        }
        double hh = (dnf <= 1e-10 || dny <= 1e-10) ? 1e-6 : Math.sqrt(dny / dnf) * 0.01;
        hh = Math.min(hh, hMax);
        for (int i = 0; i < n; i++) {
            yTmp[i] = y[i] + hh * kFirst[i];
        }
        f.derivatives(t + hh, yTmp, k2);
        evaluations++;
        double der2 = 0;
        for (int i = 0; i < n; i++) {
            double sk = absTol[i] + relTol[i] * Math.abs(y[i]);
            double d = (k2[i] - kFirst[i]) / sk;
            der2 += d * d;
        }
        der2 = Math.sqrt(der2) / hh;
        double der12 = Math.max(Math.abs(der2), Math.sqrt(dnf));
        double h1 = der12 <= 1e-15 ? Math.max(1e-6, hh * 1e-3) : Math.pow(0.01 / der12, 1.0 / 8.0);
        double result = Math.min(Math.min(100 * hh, h1), hMax);
        return Double.isFinite(result) && result > 0 ? result : Math.max(minStep, 1e-6 * hMax);
    }

    /**
     * The dense-output state at time t inside the step just accepted (call only from a
     * {@link StepListener}). Order 7; costs three extra evaluations the first time per step.
     *
     * @param t time in [tStart, tEnd] of the current step
     * @param out receives the state
     */
    public void interpolate(double t, double[] out) {
        if (!denseReady) {
            prepareDense();
        }
        double s = (t - tStep) / hStep;
        double s1 = 1.0 - s;
        for (int i = 0; i < n; i++) {
            double conpar = r5[i] + s * (r6[i] + s1 * (r7[i] + s * r8[i]));
            out[i] = r1[i] + s * (r2[i] + s1 * (r3[i] + s * (r4[i] + s1 * conpar)));
        }
    }

    /** One component of the dense-output state at t; see {@link #interpolate(double, double[])}. */
    public double interpolate(double t, int component) {
        if (!denseReady) {
            prepareDense();
        }
        int i = component;
        double s = (t - tStep) / hStep;
        double s1 = 1.0 - s;
        double conpar = r5[i] + s * (r6[i] + s1 * (r7[i] + s * r8[i]));
        return r1[i] + s * (r2[i] + s1 * (r3[i] + s * (r4[i] + s1 * conpar)));
    }

    private void prepareDense() {
        // During the listener call: yPrev = start state, kFirst = stage 1, k13 = derivative at the end.
        final double hh = hStep;
        final double t = tStep;
        final double[] s1 = kFirst;
        final Rhs f = lastRhs;
        for (int i = 0; i < n; i++) {
            double ydiff = yNew[i] - yPrev[i];
            double bspl = hh * s1[i] - ydiff;
            r1[i] = yPrev[i];
            r2[i] = ydiff;
            r3[i] = bspl;
            r4[i] = ydiff - hh * k13[i] - bspl;
        }
        for (int i = 0; i < n; i++) {
            yTmp[i] = yPrev[i] + hh * (A14_1 * s1[i] + A14_7 * k7[i] + A14_8 * k8[i] + A14_9 * k9[i]
                    + A14_10 * k10[i] + A14_11 * k11[i] + A14_12 * k12[i] + A14_13 * k13[i]);
        }
        f.derivatives(t + C14 * hh, yTmp, k14);
        for (int i = 0; i < n; i++) {
            yTmp[i] = yPrev[i] + hh * (A15_1 * s1[i] + A15_6 * k6[i] + A15_7 * k7[i] + A15_8 * k8[i]
                    + A15_11 * k11[i] + A15_12 * k12[i] + A15_13 * k13[i] + A15_14 * k14[i]);
        }
        f.derivatives(t + C15 * hh, yTmp, k15);
        for (int i = 0; i < n; i++) {
            yTmp[i] = yPrev[i] + hh * (A16_1 * s1[i] + A16_6 * k6[i] + A16_7 * k7[i] + A16_8 * k8[i]
                    + A16_9 * k9[i] + A16_13 * k13[i] + A16_14 * k14[i] + A16_15 * k15[i]);
        }
        f.derivatives(t + C16 * hh, yTmp, k16);
        evaluations += 3;
        for (int i = 0; i < n; i++) {
            r5[i] = hh * (D4_1 * s1[i] + D4_6 * k6[i] + D4_7 * k7[i] + D4_8 * k8[i] + D4_9 * k9[i]
                    + D4_10 * k10[i] + D4_11 * k11[i] + D4_12 * k12[i] + D4_13 * k13[i] + D4_14 * k14[i]
                    + D4_15 * k15[i] + D4_16 * k16[i]);
            r6[i] = hh * (D5_1 * s1[i] + D5_6 * k6[i] + D5_7 * k7[i] + D5_8 * k8[i] + D5_9 * k9[i]
                    + D5_10 * k10[i] + D5_11 * k11[i] + D5_12 * k12[i] + D5_13 * k13[i] + D5_14 * k14[i]
                    + D5_15 * k15[i] + D5_16 * k16[i]);
            r7[i] = hh * (D6_1 * s1[i] + D6_6 * k6[i] + D6_7 * k7[i] + D6_8 * k8[i] + D6_9 * k9[i]
                    + D6_10 * k10[i] + D6_11 * k11[i] + D6_12 * k12[i] + D6_13 * k13[i] + D6_14 * k14[i]
                    + D6_15 * k15[i] + D6_16 * k16[i]);
            r8[i] = hh * (D7_1 * s1[i] + D7_6 * k6[i] + D7_7 * k7[i] + D7_8 * k8[i] + D7_9 * k9[i]
                    + D7_10 * k10[i] + D7_11 * k11[i] + D7_12 * k12[i] + D7_13 * k13[i] + D7_14 * k14[i]
                    + D7_15 * k15[i] + D7_16 * k16[i]);
        }
        denseReady = true;
    }

    private static boolean finite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }

    /** The Runge-Kutta matrix rows, nodes and weights, for comparison with other published copies (stages 1..12). */
    static double[] nodes() {
        return new double[] {0, C2, C3, C4, C5, C6, C7, C8, C9, C10, C11, 1.0};
    }

    /** 8th-order weights of stages 1..12. */
    static double[] weights() {
        return new double[] {B1, 0, 0, 0, 0, B6, B7, B8, B9, B10, B11, B12};
    }

    /** Rows 2..12 of the Runge-Kutta matrix, each of length (stage - 1). */
    static double[][] matrix() {
        return new double[][] {
            {A2_1},
            {A3_1, A3_2},
            {A4_1, 0, A4_3},
            {A5_1, 0, A5_3, A5_4},
            {A6_1, 0, 0, A6_4, A6_5},
            {A7_1, 0, 0, A7_4, A7_5, A7_6},
            {A8_1, 0, 0, A8_4, A8_5, A8_6, A8_7},
            {A9_1, 0, 0, A9_4, A9_5, A9_6, A9_7, A9_8},
            {A10_1, 0, 0, A10_4, A10_5, A10_6, A10_7, A10_8, A10_9},
            {A11_1, 0, 0, A11_4, A11_5, A11_6, A11_7, A11_8, A11_9, A11_10},
            {A12_1, 0, 0, A12_4, A12_5, A12_6, A12_7, A12_8, A12_9, A12_10, A12_11},
        };
    }
}
