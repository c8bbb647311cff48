package org.ferromap.circuit;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * Detects the commanded instant of one pole (g = tau - tau_command, per-unit time) and opens the
 * pole there through a {@link PoleOpener}: an ideal disconnector that interrupts whatever current
 * flows.
 */
public final class PoleCommandInstant implements ODEEventDetector {

    private final double commandTau;
    private final BracketedUnivariateSolver<UnivariateFunction> solver;
    private final PoleOpener opener;

    /**
     * @param equations the equations whose pole opens
     * @param phase 0, 1, 2 for a, b, c
     * @param commandTau per-unit time of the command, tau = omega t
     * @param threshold convergence threshold of the event time, per-unit time
     */
    public PoleCommandInstant(NetworkEquations equations, int phase, double commandTau, double threshold) {
        this.commandTau = commandTau;
        this.solver = new BracketingNthOrderBrentSolver(0.0, threshold, 0.0, 5);
        // g only crosses zero at the command, so the handler needs no time gate of its own (the
        // located root may sit a threshold's width either side of the command)
        this.opener = new PoleOpener(equations, phase, Double.NEGATIVE_INFINITY);
    }

    @Override
    public double g(ODEStateAndDerivative s) {
        return s.getTime() - commandTau;
    }

    @Override
    public AdaptableInterval getMaxCheckInterval() {
        // g is linear in time: one check per step finds it
        return AdaptableInterval.of(Double.POSITIVE_INFINITY);
    }

    @Override
    public int getMaxIterationCount() {
        return 100;
    }

    @Override
    public BracketedUnivariateSolver<UnivariateFunction> getSolver() {
        return solver;
    }

    @Override
    public ODEEventHandler getHandler() {
        return opener;
    }

    /** The handler, which knows when the pole opened. */
    public PoleOpener opener() {
        return opener;
    }
}
