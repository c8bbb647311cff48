package org.ferromap.maps;

import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;

/**
 * Study texts for the deliverable tests, written here (not the demo studies, whose numbers never
 * serve as expectations). Values are round figures at realistic SI scale.
 */
final class DeliverableStudies {

    private DeliverableStudies() {
    }

    /** Polynomial curve a, SI (A per Wb-turn). */
    static final double A = 1.5e-3;
    /** Polynomial curve b, SI. */
    static final double B = 1.33e-17;
    /** Polynomial exponent. */
    static final int N = 9;

    /**
     * A circuit-form study: 0.2 uF in series, 0.05 uF shunt, a ninth-power curve, the given source
     * and core-loss resistance; analyses as given (YAML text, may be empty).
     */
    static String circuit(String source, String coreLoss, String analyses) {
        return String.join("\n",
                "study: deliverable test circuit",
                "frequency: 60 Hz",
                "circuit:",
                "  source: " + source,
                "  series-capacitance: 0.2 uF",
                "  shunt-capacitance: 0.05 uF",
                "  core-loss-resistance: " + coreLoss,
                "  magnetizing:",
                "    polynomial: {a: " + A + ", b: " + B + ", n: " + N + "}",
                analyses,
                "");
    }

    static Study circuitStudy(String source, String coreLoss, String analyses) {
        return StudyReader.read(circuit(source, coreLoss, analyses), "deliverable-circuit.yaml");
    }

    /**
     * An equipment-form study: a bank on a given primary connection, 2 km of screened cable of
     * 0.25 uF/km, one or two phases open, a per-unit table curve with a knee near 1.1 pu.
     */
    static String equipment(String connection, int open, String excitingCurrent, String noLoadLoss, String analyses) {
        return equipment(connection, open, excitingCurrent, noLoadLoss, 1.0, analyses);
    }

    /** The same with the per-unit curve's currents multiplied by {@code k} (another core design). */
    static String equipment(String connection, int open, String excitingCurrent, String noLoadLoss, double k, String analyses) {
        return String.join("\n",
                "study: deliverable test installation",
                "frequency: 60 Hz",
                "equipment:",
                "  source:",
                "    line-voltage: 24.9 kV",
                "  transformer:",
                "    rating: 500 kVA",
                "    primary-voltage: 24.9 kV",
                "    connection: " + connection,
                "    core: separate",
                "    exciting-current: " + excitingCurrent,
                "    no-load-loss: " + noLoadLoss,
                "    saturation:",
                "      basis: per-unit",
                "      table:",
                "        - {flux: 0.5, current: " + 0.003 * k + "}",
                "        - {flux: 1.0, current: " + 0.01 * k + "}",
                "        - {flux: 1.1, current: " + 0.03 * k + "}",
                "        - {flux: 1.2, current: " + 0.12 * k + "}",
                "        - {flux: 1.3, current: " + 0.6 * k + "}",
                "        - {flux: 1.4, current: " + 2.5 * k + "}",
                "      air-core-inductance: 0.03",
                "  cable:",
                "    kind: screened",
                "    length: 2 km",
                "    core-to-sheath: 0.25 uF/km",
                "  open-phases: " + open,
                analyses,
                "");
    }

    static Study equipmentStudy(String connection, int open, String excitingCurrent, String noLoadLoss, String analyses) {
        return StudyReader.read(equipment(connection, open, excitingCurrent, noLoadLoss, analyses), "deliverable-equipment.yaml");
    }

    static Study equipmentStudy(String connection, int open, String excitingCurrent, String noLoadLoss, double k, String analyses) {
        return StudyReader.read(equipment(connection, open, excitingCurrent, noLoadLoss, k, analyses), "deliverable-equipment.yaml");
    }

    /**
     * An equipment-form study whose winding curve is a polynomial in absolute units (grounded wye
     * on belted cable, so the loop's curve is the winding's own and the closed forms apply).
     */
    static String polynomialEquipment(double a, double b, int n, String analyses) {
        return polynomialEquipment("grounded-wye", a, b, n, analyses);
    }

    /** The same on another primary connection (delta and ungrounded wye reduce the curve: no closed form). */
    static String polynomialEquipment(String connection, double a, double b, int n, String analyses) {
        return String.join("\n",
                "study: deliverable polynomial installation",
                "frequency: 60 Hz",
                "equipment:",
                "  source:",
                "    line-voltage: 12.47 kV",
                "  transformer:",
                "    rating: 300 kVA",
                "    primary-voltage: 12.47 kV",
                "    connection: " + connection,
                "    core: separate",
                "    exciting-current: 1 %",
                "    no-load-loss: 400 W",
                "    saturation:",
                "      polynomial: {a: " + a + ", b: " + b + ", n: " + n + "}",
                "  cable:",
                "    kind: belted",
                "    length: 1 km",
                "    core-to-sheath: 0.3 uF/km",
                "    core-to-core: 0.1 uF/km",
                "  open-phases: 1",
                analyses,
                "");
    }
}
