package org.ferromap.circuit;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.BracketedUnivariateSolver;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.AdaptableInterval;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * Detects the zeros of one pole's current (the current through the closed pole into its cable
 * node) and opens the pole at the first zero at or after its command, as a breaker interrupts.
 * Zeros before the command are located and let pass, which keeps g continuous; once the pole is
 * open g holds the sign it had just after the interrupting zero, so no further event fires.
 */
public final class PoleCurrentZero implements ODEEventDetector {

    private final NetworkEquations equations;
    private final int phase;
    private final BracketedUnivariateSolver<UnivariateFunction> solver;
    private final double maxCheck;
    private final Opener opener;
    private double signAfterOpening = 1.0;

    /**
     * @param equations the equations whose pole opens
     * @param phase 0, 1, 2 for a, b, c
     * @param commandTau per-unit time of the command, tau = omega t
     * @param threshold convergence threshold of the event time, per-unit time
     * @param maxCheck largest interval between two checks of the current's sign, per-unit time:
     *        must be shorter than the closest pair of zeros to be told apart
     */
    public PoleCurrentZero(NetworkEquations equations, int phase, double commandTau, double threshold, double maxCheck) {
        this.equations = equations;
        this.phase = phase;
        this.solver = new BracketingNthOrderBrentSolver(0.0, threshold, 0.0, 5);
        this.maxCheck = maxCheck;
        // a zero located within the event threshold before the command counts as at the command
        this.opener = new Opener(equations, phase, commandTau - threshold);
    }

    @Override
    public double g(ODEStateAndDerivative s) {
        if (!equations.isClosed(phase)) {
            return signAfterOpening;
        }
        return equations.switchCurrent(phase, s.getTime(), s.getPrimaryState());
    }

    @Override
    public AdaptableInterval getMaxCheckInterval() {
        return (s, forward) -> equations.isClosed(phase) ? maxCheck : Double.POSITIVE_INFINITY;
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

    /** Opens the pole at the interrupting zero and remembers which way the current crossed. */
    private final class Opener extends PoleOpener {
        Opener(NetworkEquations equations, int phase, double notBefore) {
            super(equations, phase, notBefore);
        }

        @Override
        protected void opened(boolean increasing) {
            signAfterOpening = increasing ? 1.0 : -1.0;
        }
    }
}
