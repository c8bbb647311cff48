package org.ferromap.maps;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.SweepParameter;
import org.junit.jupiter.api.Test;

/** Display units of map axes and their conversion to SI [der: SI prefixes, 1 deg = pi/180 rad]. */
class PlaneAxisTest {

    @Test
    void displayUnitsFollowTheMagnitude() {
        PlaneAxis e = PlaneAxis.ofSi(SweepParameter.SOURCE, 10e3, 40e3, 4, Axis.Scale.LINEAR);
        assertEquals("kV peak", e.unit());
        assertEquals(10.0, e.axis().from(), 0.0);
        assertEquals(40e3, e.si(e.axis().to()), 0.0);
        PlaneAxis c = PlaneAxis.ofSi(SweepParameter.SERIES_CAPACITANCE, 20e-9, 0.2e-6, 3, Axis.Scale.LOG);
        assertEquals("nF", c.unit());
        assertEquals(200.0, c.axis().to(), 0.0); // 0.2e-6 / 1e-9 carries binary noise; the display keeps 12 digits
        assertEquals("km", PlaneAxis.ofSi(SweepParameter.CABLE_LENGTH, 100, 5e3, 3, Axis.Scale.LOG).unit());
        assertEquals("m", PlaneAxis.ofSi(SweepParameter.CABLE_LENGTH, 10, 900, 3, Axis.Scale.LOG).unit());
        assertEquals("MOhm", PlaneAxis.ofSi(SweepParameter.LOAD_RESISTANCE, 10e3, 10e6, 3, Axis.Scale.LOG).unit());
        assertEquals("kV rms", PlaneAxis.ofSi(SweepParameter.SOURCE_LINE_VOLTAGE, 30e3, 38e3, 3, Axis.Scale.LINEAR).unit());
        PlaneAxis a = PlaneAxis.ofSi(SweepParameter.SOURCE_ANGLE, 0, Math.PI, 3, Axis.Scale.LINEAR);
        assertEquals("deg", a.unit());
        assertEquals(180.0, a.axis().to(), 1e-9);
        assertEquals(Math.PI, a.si(a.axis().to()), 1e-12);
    }

    @Test
    void perUnitAxesScaleByTheStudysValue() {
        PlaneAxis p = PlaneAxis.perUnit(SweepParameter.SOURCE_LINE_VOLTAGE, 0.9, 1.1, 3, Axis.Scale.LINEAR, 34.5e3);
        assertEquals("pu", p.unit());
        assertEquals(0.9 * 34.5e3, p.si(0.9), 0.0);
        assertEquals(MessageKey.BAD_REQUEST, assertThrows(FerromapException.class,
                () -> PlaneAxis.perUnit(SweepParameter.NO_LOAD_LOSS, 0.5, 2, 3, Axis.Scale.LINEAR, 0.0)).key());
    }
}
