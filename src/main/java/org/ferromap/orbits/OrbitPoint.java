package org.ferromap.orbits;

/**
 * One point of a branch of periodic orbits as the JSON contract lists it ({@code orbits.points[]}).
 *
 * @param parameter parameter value, SI unit of the parameter continued
 * @param period least period, source periods
 * @param flux flux linkage on the section t = 0 mod kT, Wb-turn
 * @param voltage terminal voltage on the section, V
 * @param multipliers Floquet multipliers over the period as [re, im] pairs
 * @param stable whether every multiplier lies inside the unit circle
 */
public record OrbitPoint(double parameter, int period, double flux, double voltage, double[][] multipliers, boolean stable) {

    public OrbitPoint {
        multipliers = copy(multipliers);
    }

    @Override
    public double[][] multipliers() {
        return copy(multipliers);
    }

    private static double[][] copy(double[][] m) {
        double[][] c = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            c[i] = m[i].clone();
        }
        return c;
    }
}
