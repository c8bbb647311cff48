package org.ferromap.maps;

import java.util.List;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.PointKind;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;

/**
 * The balance layer of a study map (DOMAIN.md §3): at each point of the plane, which steady
 * states the single-harmonic balance has, and how high the worst stable one drives the terminal.
 *
 * <p>Two components per cell:
 * <ol start="0">
 * <li>{@code states}: {@link #SAFE} (0, the normal state only), {@link #AT_RISK} (1, normal and
 * ferroresonant states coexist: the outcome depends on the switching), {@link #FERRO_ONLY} (2,
 * only a ferroresonant state), NaN when the balance failed or found no stable state.</li>
 * <li>{@code peakVoltagePu}: the largest fundamental peak of the terminal voltage over the stable
 * states, per unit of the circuit's rated peak ({@link EquivalentCircuit#ratedPeak()}); NaN when
 * there is no stable state.</li>
 * </ol>
 * "Normal" and "ferroresonant" are the kinds {@link SingleHarmonicBalance} gives: with a fold
 * pair, the lower and upper stable branches; without one, the single branch is ferroresonant
 * once saturation has turned the loop capacitive.
 *
 * <p>Pure and thread-safe: the plane and the balance are immutable.
 */
public final class BalanceCell implements CellFunction {

    /** Category code: normal state only. */
    public static final int SAFE = 0;
    /** Category code: normal and ferroresonant states coexist. */
    public static final int AT_RISK = 1;
    /** Category code: only a ferroresonant state. */
    public static final int FERRO_ONLY = 2;

    /** Names of the categories by code, as JSON and CSV write them. */
    public static final List<String> CATEGORY_NAMES = List.of("safe", "at-risk", "ferroresonant-only");

    /** Bump when what a cell computes changes, so stale resume tiles are not reused. */
    private static final String VERSION = "balance-cell v1";

    private final StudyPlane plane;
    private final SingleHarmonicBalance balance;

    public BalanceCell(StudyPlane plane, SingleHarmonicBalance balance) {
        this.plane = plane;
        this.balance = balance;
    }

    /** The plane this cell function covers. */
    public StudyPlane plane() {
        return plane;
    }

    /** The balance used. */
    public SingleHarmonicBalance balance() {
        return balance;
    }

    @Override
    public int width() {
        return 2;
    }

    @Override
    public void evaluate(double x, double y, double[] out, int offset) {
        out[offset] = Double.NaN;
        out[offset + 1] = Double.NaN;
        List<OperatingPoint> points;
        try {
            points = balance.operatingPoints(plane.balanceCircuit(x, y));
        } catch (FerromapException e) {
            return; // a point where the balance fails is drawn as "no data", never stops the map
        }
        boolean normal = false;
        boolean ferro = false;
        double peak = Double.NaN;
        for (OperatingPoint p : points) {
            if (!p.stable()) {
                continue;
            }
            normal |= p.kind() == PointKind.NORMAL;
            ferro |= p.kind() == PointKind.FERRORESONANT;
            if (!(p.voltagePerUnit() <= peak)) {
                peak = p.voltagePerUnit();
            }
        }
        out[offset] = category(normal, ferro);
        out[offset + 1] = peak;
    }

    /** The category code of a cell with or without a stable normal and ferroresonant state; NaN with neither. */
    public static double category(boolean normal, boolean ferro) {
        if (normal && ferro) {
            return AT_RISK;
        }
        if (normal) {
            return SAFE;
        }
        return ferro ? FERRO_ONLY : Double.NaN;
    }

    /** Whether a category code has a stable normal state. */
    public static boolean hasNormal(double category) {
        return category == SAFE || category == AT_RISK;
    }

    /** Whether a category code has a stable ferroresonant state. */
    public static boolean hasFerro(double category) {
        return category == AT_RISK || category == FERRO_ONLY;
    }

    /** The category's name, or null for NaN (no data). */
    public static String categoryName(double category) {
        return Double.isNaN(category) ? null : CATEGORY_NAMES.get((int) category);
    }

    @Override
    public String fingerprint() {
        return VERSION + "; " + plane.fingerprint() + "; " + balance.settings();
    }

    @Override
    public String componentName(int k) {
        return k == 0 ? "states" : "peakVoltagePu";
    }
}
