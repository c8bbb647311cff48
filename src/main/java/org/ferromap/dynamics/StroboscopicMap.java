package org.ferromap.dynamics;

/**
 * The period map P of the scaled circuit (state at tau = 2 pi k to the state one source period
 * later) and its Jacobian, the monodromy matrix, from the variational equation integrated as one
 * primary system with the state (so the step control watches the variations too). Not
 * thread-safe: it owns an integrator work area.
 */
public final class StroboscopicMap {

    private final PerUnitCircuit model;
    private final DormandPrince853 integrator;
    private final DormandPrince853.Rhs rhs;
    private final int maxStepsPerPeriod;
    private final double[] work = new double[6];

    /**
     * @param model the scaled circuit
     * @param tolerance relative tolerance, also absolute in per unit
     * @param maxStepsPerPeriod steps per period beyond which the map reports failure
     */
    public StroboscopicMap(PerUnitCircuit model, double tolerance, int maxStepsPerPeriod) {
        this.model = model;
        this.integrator = DormandPrince853.uniform(6, tolerance, tolerance, 1e-12, PerUnitCircuit.PERIOD);
        this.rhs = model::derivativesWithMatrix;
        this.maxStepsPerPeriod = maxStepsPerPeriod;
    }

    /** The scaled circuit. */
    public PerUnitCircuit model() {
        return model;
    }

    /**
     * Applies P^k to z.
     *
     * @param z scaled state (x, y) at a multiple of the period
     * @param k number of periods, at least 1
     * @param image receives P^k(z)
     * @param monodromy receives dP^k/dz row-major (m00, m01, m10, m11), or null if not wanted
     * @return how the integration ended
     */
    public DormandPrince853.Status apply(double[] z, int k, double[] image, double[] monodromy) {
        double[] w = work;
        w[0] = z[0];
        w[1] = z[1];
        w[2] = 1;
        w[3] = 0;
        w[4] = 0;
        w[5] = 1;
        integrator.reset();
        DormandPrince853.Status status = integrator.integrate(rhs, 0.0, w, k * PerUnitCircuit.PERIOD,
                (long) k * maxStepsPerPeriod, null);
        image[0] = w[0];
        image[1] = w[1];
        if (monodromy != null) {
            System.arraycopy(w, 2, monodromy, 0, 4);
        }
        return status;
    }

    /** Right-hand-side evaluations spent so far. */
    public long evaluations() {
        return integrator.evaluations();
    }
}
