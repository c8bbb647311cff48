package org.ferromap.circuit;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.events.Action;
import org.hipparchus.ode.events.ODEEventDetector;
import org.hipparchus.ode.events.ODEEventHandler;

/**
 * Event handler that opens one pole of the switch in {@link NetworkEquations}: it ignores events
 * before the pole's command and events on a pole already open; otherwise it opens the pole,
 * records the instant, and restarts the integration with the node exactly on the source value
 * it leaves. Used by {@link PoleCommandInstant} and {@link PoleCurrentZero}.
 */
public class PoleOpener implements ODEEventHandler {

    private final NetworkEquations equations;
    private final int phase;
    private final double notBefore;
    private double openedAt = Double.NaN;

    /**
     * @param equations the equations whose pole state this handler changes
     * @param phase 0, 1, 2 for a, b, c
     * @param notBefore per-unit time tau of the command; earlier events are let pass
     */
    public PoleOpener(NetworkEquations equations, int phase, double notBefore) {
        this.equations = equations;
        this.phase = phase;
        this.notBefore = notBefore;
    }

    @Override
    public Action eventOccurred(ODEStateAndDerivative s, ODEEventDetector detector, boolean increasing) {
        if (s.getTime() < notBefore || !equations.isClosed(phase)) {
            return Action.CONTINUE;
        }
        equations.openPole(phase);
        openedAt = s.getTime();
        opened(increasing);
        return Action.RESET_STATE;
    }

    @Override
    public ODEState resetState(ODEEventDetector detector, ODEStateAndDerivative s) {
        return new ODEState(s.getTime(), equations.withNodeOnSource(phase, s.getTime(), s.getPrimaryState()));
    }

    /** Hook for a detector that must know which way its function crossed zero when the pole opened. */
    protected void opened(boolean increasing) {
        // nothing by default
    }

    /** Phase this handler opens. */
    public int phase() {
        return phase;
    }

    /** Per-unit time tau at which the pole opened; NaN while it is closed. */
    public double openedAt() {
        return openedAt;
    }
}
