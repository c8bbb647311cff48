package org.ferromap.maps;

import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;

/**
 * A Monte Carlo estimate of the probability of ferroresonance ({@code analyses: odds:},
 * docs/STUDY-FORMAT.md). Each run draws a switching instant uniformly over the source period and
 * a residual flux uniformly in [-r, r] pu of rated peak flux, both from its own generator seeded
 * from (seed, run index), so a run's draws do not depend on which thread ran it or on how many
 * runs there are. Immutable; change with the {@code withX} copies.
 *
 * @param runs          runs of the first batch, 1 to {@code maxRuns}; default 200
 * @param seed          the seed; default 1
 * @param confidence    confidence level of the interval, in (0, 1); default 0.95
 * @param method        interval method; default Clopper-Pearson (exact, conservative)
 * @param precision     wanted half-width of the interval, in (0, 0.5]; NaN for none (default). When
 *                      set and the first batch falls short, runs are added up to the number the
 *                      normal-approximation formula asks for (at most {@code maxRuns})
 * @param maxRuns       most runs in all; default 20000
 * @param residualFlux  r, the largest residual flux magnitude, pu of rated peak flux, in [0, 2);
 *                      default 0.8 ({@link SwitchingEnsemble#DEFAULT_RESIDUAL_FLUX})
 * @param length        cable length, m; NaN for the study's
 * @param voltage       supply line-to-line voltage V rms (equipment) or source peak V (circuit); NaN for the study's
 * @param simulation    how each run is simulated; default {@link SwitchingEnsemble#defaultSimulation()} (at most
 *                      600 periods, {@code max-periods} in studies)
 */
public record OddsSettings(int runs, long seed, double confidence, BinomialInterval.Method method, double precision,
                           int maxRuns, double residualFlux, double length, double voltage, SimulationSettings simulation) {

    public static final int DEFAULT_RUNS = 200;
    public static final long DEFAULT_SEED = 1L;
    public static final double DEFAULT_CONFIDENCE = 0.95;
    public static final int DEFAULT_MAX_RUNS = 20000;

    public OddsSettings {
        if (maxRuns < 1 || maxRuns > 10_000_000) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "max runs = " + maxRuns + " is not allowed; expected 1 to 10000000");
        }
        if (runs < 1 || runs > maxRuns) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "runs = " + runs + " is not allowed; expected 1 to max runs ("
                    + maxRuns + ")");
        }
        if (!(confidence > 0 && confidence < 1)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "confidence = " + confidence
                    + " is not allowed; expected a level between 0 and 1, e.g. 0.95");
        }
        if (method == null) {
            method = BinomialInterval.Method.CLOPPER_PEARSON;
        }
        if (!Double.isNaN(precision) && !(precision > 0 && precision <= 0.5)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "precision = " + precision
                    + " is not allowed; expected a half-width above 0 and at most 0.5 (0.05 = +-5 points of probability)");
        }
        if (!(residualFlux >= 0 && residualFlux < 2)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "residual flux = " + residualFlux
                    + " pu is not allowed; expected 0 to below 2 pu of rated peak flux");
        }
        if (!Double.isNaN(length) && !(length > 0 && Double.isFinite(length))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "length = " + length + " m; expected > 0");
        }
        if (!Double.isNaN(voltage) && !(voltage > 0 && Double.isFinite(voltage))) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "voltage = " + voltage + " V; expected > 0");
        }
        if (simulation == null) {
            simulation = SwitchingEnsemble.defaultSimulation();
        }
    }

    /** The documented defaults. */
    public static OddsSettings defaults() {
        return new OddsSettings(DEFAULT_RUNS, DEFAULT_SEED, DEFAULT_CONFIDENCE, BinomialInterval.Method.CLOPPER_PEARSON,
                Double.NaN, DEFAULT_MAX_RUNS, SwitchingEnsemble.DEFAULT_RESIDUAL_FLUX, Double.NaN, Double.NaN,
                SwitchingEnsemble.defaultSimulation());
    }

    /** The study's {@code analyses: odds:} block over the defaults; problems reported with their paths (exit 2). */
    public static OddsSettings from(Study study) {
        OddsSettings d = defaults();
        AnalysisBlock b = AnalysisBlock.of(study, "odds");
        b.allowOnly("runs", "seed", "confidence", "method", "precision", "max-runs", "residual-flux", "length", "voltage",
                "max-periods");
        int maxPeriods = b.integer("max-periods", d.simulation.maxPeriods(), 30, 1_000_000);
        int maxRuns = b.integer("max-runs", d.maxRuns, 1, 10_000_000);
        int runs = b.integer("runs", Math.min(d.runs, maxRuns), 1, maxRuns);
        long seed = d.seed;
        if (b.has("seed")) {
            Object v = b.raw("seed");
            if (v instanceof Integer i) {
                seed = i;
            } else if (v instanceof Long l) {
                seed = l;
            } else {
                b.problem("seed", v, "is not allowed; expected a whole number", MessageKey.BAD_QUANTITY);
            }
        }
        double confidence = b.number("confidence", d.confidence);
        if (!(confidence > 0 && confidence < 1)) {
            b.problem("confidence", b.raw("confidence"), "is not allowed; expected a level between 0 and 1, e.g. 0.95",
                    MessageKey.OUT_OF_RANGE);
        }
        String m = b.word("method", d.method.label(), "clopper-pearson", "wilson");
        double precision = b.number("precision", Double.NaN);
        if (b.has("precision") && !(precision > 0 && precision <= 0.5)) {
            b.problem("precision", b.raw("precision"), "is not allowed; expected a half-width above 0 and at most 0.5",
                    MessageKey.OUT_OF_RANGE);
        }
        double flux = b.number("residual-flux", d.residualFlux);
        if (!(flux >= 0 && flux < 2)) {
            b.problem("residual-flux", b.raw("residual-flux"), "is not allowed; expected 0 to below 2 pu", MessageKey.OUT_OF_RANGE);
        }
        double length = b.quantity("length", Dimension.LENGTH, Double.NaN);
        if (b.has("length") && !study.isEquipmentForm()) {
            b.problem("length", b.raw("length"), "needs an equipment-form study", MessageKey.BAD_REQUEST);
        }
        double voltage = Double.NaN;
        if (b.has("voltage")) {
            try {
                voltage = DampingSettings.voltage(String.valueOf(b.raw("voltage")), study.isEquipmentForm());
            } catch (FerromapException e) {
                b.problem("voltage", b.raw("voltage"), e.getMessage(), e.key());
            }
        }
        b.throwIfAny();
        return new OddsSettings(runs, seed, confidence, BinomialInterval.Method.of(m), precision, maxRuns, flux, length, voltage,
                d.simulation.withMaxPeriods(maxPeriods));
    }

    public OddsSettings withRuns(int n) {
        return new OddsSettings(n, seed, confidence, method, precision, Math.max(maxRuns, n), residualFlux, length, voltage, simulation);
    }

    public OddsSettings withSeed(long s) {
        return new OddsSettings(runs, s, confidence, method, precision, maxRuns, residualFlux, length, voltage, simulation);
    }

    public OddsSettings withConfidence(double c) {
        return new OddsSettings(runs, seed, c, method, precision, maxRuns, residualFlux, length, voltage, simulation);
    }

    public OddsSettings withMethod(BinomialInterval.Method m) {
        return new OddsSettings(runs, seed, confidence, m, precision, maxRuns, residualFlux, length, voltage, simulation);
    }

    public OddsSettings withPrecision(double h) {
        return new OddsSettings(runs, seed, confidence, method, h, maxRuns, residualFlux, length, voltage, simulation);
    }

    public OddsSettings withMaxRuns(int n) {
        return new OddsSettings(Math.min(runs, n), seed, confidence, method, precision, n, residualFlux, length, voltage, simulation);
    }

    public OddsSettings withResidualFlux(double r) {
        return new OddsSettings(runs, seed, confidence, method, precision, maxRuns, r, length, voltage, simulation);
    }

    public OddsSettings withLength(double m) {
        return new OddsSettings(runs, seed, confidence, method, precision, maxRuns, residualFlux, m, voltage, simulation);
    }

    public OddsSettings withVoltage(double v) {
        return new OddsSettings(runs, seed, confidence, method, precision, maxRuns, residualFlux, length, v, simulation);
    }

    public OddsSettings withSimulation(SimulationSettings s) {
        return new OddsSettings(runs, seed, confidence, method, precision, maxRuns, residualFlux, length, voltage, s);
    }
}
