package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

/**
 * What every {@link CellExecutor} must do, whatever runs the cells: each unit delivered exactly
 * once with the values {@link WorkUnit#evaluate} gives, and a stop ending in INTERRUPTED after
 * the units in progress. An implementation's test only supplies {@link #create()}.
 */
abstract class CellExecutorContract {

    /** A fresh executor. */
    abstract CellExecutor create();

    private static final int NX = 30;
    private static final int NY = 20;

    private static List<WorkUnit> units() {
        List<WorkUnit> u = new ArrayList<>();
        for (int ty = 0; ty < 4; ty++) {
            for (int tx = 0; tx < 6; tx++) {
                u.add(new WorkUnit(0, tx, ty, tx * 5, ty * 5, tx * 5 + 5, ty * 5 + 5, NX, null));
            }
        }
        u.add(new WorkUnit(1, 0, 0, 0, 0, 5, 5, NX, new int[] {1, 2, NX + 3})); // a listed unit
        return u;
    }

    private static double[] axis(int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = 0.1 * i;
        }
        return v;
    }

    /** Every unit arrives once, with exactly the values of the shared evaluation loop [der]. */
    @Test
    void deliversEveryUnitOnceWithItsValues() {
        CellFunction f = new TestCells.Cubic();
        double[] xs = axis(NX);
        double[] ys = axis(NY);
        Map<WorkUnit, double[]> got = new ConcurrentHashMap<>();
        create().execute(xs, ys, units(), f, (unit, values) -> {
            double[] copy = java.util.Arrays.copyOf(values, unit.cellCount() * f.width());
            assertEquals(null, got.put(unit, copy), "delivered twice: " + unit);
        });
        assertEquals(units().size(), got.size());
        for (WorkUnit u : units()) {
            double[] expected = new double[u.cellCount() * 2];
            u.evaluate(xs, ys, f, 2, expected);
            assertArrayEquals(expected, got.get(u), 0.0, u.toString());
        }
    }

    /** No units: nothing delivered, no error [cp]. */
    @Test
    void nothingToDo() {
        create().execute(axis(NX), axis(NY), List.of(), new TestCells.Cubic(), (u, v) -> {
            throw new AssertionError("nothing to deliver");
        });
    }

    /** A stop lets no new unit start and ends in INTERRUPTED; a stopped executor stays stopped [cp]. */
    @Test
    void stopEndsInInterrupted() {
        CellExecutor ex = create();
        List<WorkUnit> delivered = new ArrayList<>();
        FerromapException e = assertThrows(FerromapException.class,
                () -> ex.execute(axis(NX), axis(NY), units(), new TestCells.Cubic(), (u, v) -> {
                    synchronized (delivered) {
                        delivered.add(u);
                    }
                    ex.requestStop();
                }));
        assertEquals(MessageKey.INTERRUPTED, e.key());
        assertTrue(delivered.size() >= 1 && delivered.size() < units().size(), delivered.size() + " delivered");
        assertEquals(MessageKey.INTERRUPTED, assertThrows(FerromapException.class,
                () -> ex.execute(axis(NX), axis(NY), units(), new TestCells.Cubic(), (u, v) -> { })).key());
    }
}
