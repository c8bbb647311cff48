package org.ferromap.circuit;

import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * What each component of an ODE state vector is: its name, its SI unit, and the SI value of one
 * unit of the integrated variable (the per-unit base when the equations are scaled, 1 when they
 * are integrated in SI). Shared by every circuit that is an ODE provider, so samplers, charts and
 * JSON output can label a state without knowing the circuit.
 *
 * @param components one entry per state component, in state-vector order
 */
public record StateLayout(List<Component> components) {

    /**
     * One state component.
     *
     * @param name short identifier such as {@code "lambda_a"} or {@code "v_b"}, unique in a layout
     * @param unit SI unit of the physical quantity, such as {@code "V"} or {@code "Wb-turn"}
     * @param scale SI value (in {@code unit}) of 1 in the integrated state; &gt; 0
     */
    public record Component(String name, String unit, double scale) {
        public Component {
            if (name == null || name.isBlank() || unit == null) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "a state component needs a name and a unit");
            }
            if (!(scale > 0) || Double.isInfinite(scale)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "scale of state component " + name + " = " + scale + "; expected a finite value > 0");
            }
        }
    }

    public StateLayout {
        components = List.copyOf(components);
        for (int i = 0; i < components.size(); i++) {
            for (int j = 0; j < i; j++) {
                if (components.get(i).name().equals(components.get(j).name())) {
                    throw new FerromapException(MessageKey.BAD_REQUEST,
                            "state component name " + components.get(i).name() + " appears twice");
                }
            }
        }
    }

    /** Number of state components. */
    public int dimension() {
        return components.size();
    }

    /** Name of component {@code i}. */
    public String name(int i) {
        return components.get(i).name();
    }

    /** SI unit of component {@code i}. */
    public String unit(int i) {
        return components.get(i).unit();
    }

    /** SI value of one unit of the integrated component {@code i}. */
    public double scale(int i) {
        return components.get(i).scale();
    }

    /** Index of the component with this name, or -1 when there is none. */
    public int indexOf(String name) {
        for (int i = 0; i < components.size(); i++) {
            if (components.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /** The SI state for an integrated (scaled) state: each component times its scale. */
    public double[] toSi(double[] scaled) {
        checkLength(scaled);
        double[] si = new double[scaled.length];
        for (int i = 0; i < si.length; i++) {
            si[i] = scaled[i] * components.get(i).scale();
        }
        return si;
    }

    /** The integrated (scaled) state for an SI state: each component over its scale. */
    public double[] toScaled(double[] si) {
        checkLength(si);
        double[] y = new double[si.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = si[i] / components.get(i).scale();
        }
        return y;
    }

    private void checkLength(double[] v) {
        if (v.length != components.size()) {
            throw new FerromapException(MessageKey.BAD_REQUEST,
                    "state has " + v.length + " components; this layout has " + components.size());
        }
    }
}
