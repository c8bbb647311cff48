package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.junit.jupiter.api.Test;

class AxisTest {

    /**
     * Values come from the index, so 0..1 in 11 steps gives exactly the double nearest i/10 (one
     * correctly rounded division [der]); summing a step of 0.1 would give 0.30000000000000004 at i = 3.
     */
    @Test
    void linearValuesAreComputedFromTheIndex() {
        Axis a = Axis.linear("p", "", 0, 1, 11);
        double[] v = a.values();
        for (int i = 0; i <= 10; i++) {
            assertEquals(i / 10.0, v[i], 0.0, "sample " + i);
        }
        assertEquals(0.3, a.value(3), 0.0);
    }

    /** Ends are exactly from and to, whatever the rounding in between [der: by construction]. */
    @Test
    void endsAreExact() {
        Axis a = Axis.linear("len", "m", 0.1, 0.7, 7);
        assertEquals(0.1, a.value(0), 0.0);
        assertEquals(0.7, a.value(6), 0.0);
        Axis d = Axis.linear("len", "m", 5, -3, 3); // descending
        assertEquals(5, d.value(0), 0.0);
        assertEquals(1, d.value(1), 0.0);
        assertEquals(-3, d.value(2), 0.0);
    }

    /**
     * Log samples against the closed form from * (to/from)^(i/(n-1)) [der]. Tolerance 1e-14
     * relative: exp/log and pow round differently, by a few units in the last place of ~1e-16.
     */
    @Test
    void logValuesFollowEqualRatios() {
        Axis a = Axis.log("length", "m", 100, 5000, 23);
        for (int i = 0; i < 23; i++) {
            double expected = 100 * Math.pow(5000.0 / 100, i / 22.0);
            assertEquals(expected, a.value(i), 1e-14 * expected, "sample " + i);
        }
        Axis decades = Axis.log("c", "uF", 1e-3, 1e3, 7);
        for (int i = 0; i < 7; i++) {
            double expected = Math.pow(10, i - 3); // one decade per step [der]
            assertEquals(expected, decades.value(i), 1e-14 * expected);
        }
        assertEquals(1e-3, decades.value(0), 0.0);
        assertEquals(1e3, decades.value(6), 0.0);
    }

    /** Cells reach halfway to the neighbours: arithmetic midpoints on linear, geometric on log [der]. */
    @Test
    void cellBoundsAreMidpoints() {
        Axis a = Axis.linear("p", "", 0, 4, 5); // 0 1 2 3 4
        assertEquals(1.5, a.cellLow(2), 0.0);
        assertEquals(2.5, a.cellHigh(2), 0.0);
        assertEquals(-0.5, a.cellLow(0), 0.0);
        assertEquals(4.5, a.cellHigh(4), 0.0);
        Axis l = Axis.log("p", "", 1, 100, 3); // 1 10 100
        assertEquals(Math.sqrt(10), l.cellLow(1), 1e-15 * Math.sqrt(10)); // rounding of one sqrt
        assertEquals(Math.sqrt(1000), l.cellHigh(1), 1e-14 * Math.sqrt(1000));
        assertEquals(1 / Math.sqrt(10), l.cellLow(0), 1e-14);
    }

    /** Invalid axes are refused with BAD_REQUEST and a message naming the value [cp]. */
    @Test
    void invalidAxesAreRefused() {
        assertBad(() -> Axis.linear("p", "", 0, 1, 1), "steps = 1");
        assertBad(() -> Axis.linear("p", "", 2, 2, 5), "2.0");
        assertBad(() -> Axis.linear("p", "", Double.NaN, 1, 5), "NaN");
        assertBad(() -> Axis.linear("p", "", 0, Double.POSITIVE_INFINITY, 5), "Infinity");
        assertBad(() -> Axis.log("p", "", 0, 10, 5), "positive");
        assertBad(() -> Axis.log("p", "", -1, 10, 5), "positive");
        assertBad(() -> Axis.linear(" ", "", 0, 1, 5), "name");
    }

    private static void assertBad(Runnable r, String mentions) {
        FerromapException e = assertThrows(FerromapException.class, r::run);
        assertEquals(MessageKey.BAD_REQUEST, e.key());
        assertTrue(e.getMessage().contains(mentions), e.getMessage());
    }
}
