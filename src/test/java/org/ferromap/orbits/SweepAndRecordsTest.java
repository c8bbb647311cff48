package org.ferromap.orbits;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import org.ferromap.balance.CircuitParameter;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.Json;
import org.junit.jupiter.api.Test;

/** The brute-force sweep's determinism and checks, and the JSON shape of the contract records. */
class SweepAndRecordsTest {

    private static EquivalentCircuit cubic(double b) {
        return EquivalentCircuit.of(1.0, b, 1.0, 0.0, new PolynomialCurve(0, 1, 3)).withCoreLossResistance(10.0).withRatedPeak(1.0);
    }

    @Test
    void resultDoesNotDependOnTheThreadCount() {
        double[] values = {4.0, 4.5, 5.0, 5.5};
        List<double[]> starts = List.of(new double[] {0, 0}, new double[] {2, 0});
        SweepSettings s = SweepSettings.DEFAULTS.withTransients(50, 20).withRecordedPeriods(4);
        List<SweepRun> one = CircuitOrbits.sweep(cubic(4.0), CircuitParameter.SOURCE, values, starts, s);
        List<SweepRun> two = CircuitOrbits.sweep(cubic(4.0), CircuitParameter.SOURCE, values, starts, s.withThreads(3));
        assertEquals(4, one.size());
        for (int r = 0; r < one.size(); r++) {
            assertEquals(one.get(r).upward(), two.get(r).upward());
            for (int i = 0; i < values.length; i++) {
                for (int j = 0; j < 4; j++) {
                    // Bit for bit: each run is computed alone, whatever thread computes it.
                    assertArrayEquals(one.get(r).samples()[i][j], two.get(r).samples()[i][j], 0.0);
                }
            }
        }
        assertArrayEquals(new double[] {5.5, 5.0, 4.5, 4.0}, one.get(1).parameters(), 0.0);
        SweepReport report = CircuitOrbits.sweepReport(cubic(4.0), CircuitParameter.SOURCE, one);
        assertEquals(4 * values.length * 4, report.samples().size());
    }

    @Test
    void carriedStateStaysOnTheAttractorItFollows() {
        // Below the first period doubling (B = 4.88, CubicPeriodDoublingTest) the attractor reached
        // from rest is a period-1 orbit [der: continuation]; the carried run keeps it at the next value.
        SweepSettings s = SweepSettings.DEFAULTS.withTransients(600, 300).withRecordedPeriods(4);
        List<SweepRun> runs = CircuitOrbits.sweep(cubic(4.0), CircuitParameter.SOURCE, new double[] {3.9, 4.0},
                List.of(new double[] {0, 0}), s);
        assertEquals(1, runs.get(0).period(1, 1e-6));
    }

    @Test
    void rejectsBadRequests() {
        FerromapException e = assertThrows(FerromapException.class, () -> BruteForceSweep.sweep(b -> CircuitSystem.of(cubic(b)),
                new double[] {2, 1}, List.of(new double[] {0, 0}), SweepSettings.DEFAULTS));
        assertEquals(MessageKey.BAD_REQUEST, e.key());
        e = assertThrows(FerromapException.class, () -> BruteForceSweep.sweep(b -> CircuitSystem.of(cubic(b)),
                new double[] {1, 2}, List.of(new double[] {0, 0, 0}), SweepSettings.DEFAULTS));
        assertEquals(MessageKey.BAD_REQUEST, e.key());
        e = assertThrows(FerromapException.class, () -> SweepSettings.DEFAULTS.withThreads(0));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
        e = assertThrows(FerromapException.class, () -> ShootingSettings.DEFAULTS.withTolerance(1e-20, 1e-9));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
        e = assertThrows(FerromapException.class, () -> Section.periods(0));
        assertEquals(MessageKey.OUT_OF_RANGE, e.key());
    }

    @Test
    void shootingFailureIsAKeyedOutcome() {
        // The half-period map of a system that is not symmetric is refused as a bad request.
        MathieuSystem m = new MathieuSystem(1.0, 1.0);
        FerromapException e = assertThrows(FerromapException.class,
                () -> new Shooting(ShootingSettings.DEFAULTS).solve(m, new double[] {1, 0}, Section.halfPeriod()));
        assertEquals(MessageKey.BAD_REQUEST, e.key());
        // An undamped oscillator forced at its own frequency has M = I (every multiplier +1 [der]) and
        // no periodic orbit: shooting must fail with a keyed exception, not a raw one.
        FerromapException f = assertThrows(FerromapException.class, () -> new Shooting(ShootingSettings.DEFAULTS.withMaxIterations(1))
                .solve(new LinearSystem(new double[] {0, 1, -1, 0}, new double[] {0, 1}, 1.0), new double[] {5, 5}, Section.periods(1)));
        assertTrue(f.key() == MessageKey.NO_CONVERGENCE || f.key() == MessageKey.SINGULAR, f.key().name());
    }

    @Test
    void contractRecordsSerialiseWithTheContractFields() throws Exception {
        OrbitsReport r = new OrbitsReport("SOURCE_PEAK", "V",
                List.of(new OrbitPoint(1.5, 2, 0.3, -4.0, new double[][] {{-0.5, 0.25}, {-0.5, -0.25}}, true)),
                List.of(new OrbitBifurcation(BifurcationType.PERIOD_DOUBLING.label(), 1.6, 1)));
        JsonNode n = Json.mapper().readTree(Json.text(r));
        JsonNode p = n.get("points").get(0);
        assertEquals(1.5, p.get("parameter").asDouble());
        assertEquals(2, p.get("period").asInt());
        assertEquals(0.3, p.get("flux").asDouble());
        assertEquals(-4.0, p.get("voltage").asDouble());
        assertEquals(0.25, p.get("multipliers").get(0).get(1).asDouble());
        assertTrue(p.get("stable").asBoolean());
        JsonNode b = n.get("bifurcations").get(0);
        assertEquals("period-doubling", b.get("type").asText());
        assertEquals(1.6, b.get("parameter").asDouble());
        assertEquals(1, b.get("period").asInt());
        JsonNode s = Json.mapper().readTree(Json.text(new SweepReport("SOURCE_PEAK", "V", List.of(new SweepSample(2.0, 0.1, 0.2)))));
        assertEquals(0.1, s.get("samples").get(0).get("flux").asDouble());
        assertEquals(0.2, s.get("samples").get(0).get("voltage").asDouble());
        assertEquals(2.0, s.get("samples").get(0).get("parameter").asDouble());
    }
}
