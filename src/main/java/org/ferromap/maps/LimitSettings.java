package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.equipment.Cable;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.LinearCriterion;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;

/**
 * What a cable-length limit table covers ({@code analyses: limits:} in a study, docs/STUDY-FORMAT.md):
 * the grid of transformer ratings x primary connections x cable types x voltage classes x
 * open-phase cases, the source margins, the linear criterion shown beside the fold-based limit,
 * typical-data overrides and the optional time-domain confirmation. Every default comes from the
 * study's own installation or a named source. Immutable; change with the {@code withX} copies.
 *
 * @param ratings      three-phase ratings, VA; default the study's rating x {0.25, 0.5, 1, 2}
 * @param connections  primary connections; default the study's
 * @param cables       cable types; default the study's cable
 * @param voltages     voltage classes (rated primary line-to-line voltage, the supply at 1 pu), V rms;
 *                     default the study's primary voltage
 * @param openPhases   open-phase cases, each 1 or 2; default both
 * @param margins      supply voltages at which limits are given, per unit of the voltage class;
 *                     default 1.0, 1.05, 1.1
 * @param linear       the linear criterion in the column beside the fold-based limit; default
 *                     K = 40 (Hopkinson 1965 [mem])
 * @param overrides    typical data replaced per rating (exciting current, no-load loss)
 * @param maxLength    longest cable searched, m; default 100 km
 * @param confirm      the time-domain check just below each rated-voltage limit; null for none (default)
 */
public record LimitSettings(
        double[] ratings,
        List<Connection> connections,
        List<NamedCable> cables,
        double[] voltages,
        int[] openPhases,
        double[] margins,
        LinearCriterion linear,
        List<TypicalOverride> overrides,
        double maxLength,
        Confirmation confirm) {

    /** Multipliers of the study's rating in the default grid. */
    public static final double[] DEFAULT_RATING_FACTORS = {0.25, 0.5, 1.0, 2.0};
    /** Default supply margins, pu. */
    public static final double[] DEFAULT_MARGINS = {1.0, 1.05, 1.1};
    /** Default longest cable searched: 100 km covers distribution practice. */
    public static final double DEFAULT_MAX_LENGTH = 100e3;

    /**
     * A cable type of the table.
     *
     * @param name  the label in the table
     * @param cable capacitances per length
     * @param only  voltage classes (V rms) this cable applies to; empty for every class
     */
    public record NamedCable(String name, Cable cable, double[] only) {
        public NamedCable {
            only = only == null ? new double[0] : only.clone();
        }

        /** Whether this cable is used at a voltage class. */
        public boolean appliesTo(double voltage) {
            if (only.length == 0) {
                return true;
            }
            for (double v : only) {
                if (Math.abs(v - voltage) <= 1e-9 * voltage) {
                    return true;
                }
            }
            return false;
        }
    }

    /**
     * Typical data replaced for one rating.
     *
     * @param rating          the rating, VA
     * @param excitingCurrent fraction of rated current, NaN to keep the default
     * @param noLoadLoss      W, NaN to keep the default
     */
    public record TypicalOverride(double rating, double excitingCurrent, double noLoadLoss) { }

    /**
     * The time-domain check of a limit: switching events simulated at {@code fraction} times the
     * rated-voltage limit, where the balance says no ferroresonant state exists.
     *
     * @param fraction length simulated over the limit, in (0, 1); default 0.95
     * @param ensemble the switching events; default 4 angles, no residual flux (the check is a
     *                 spot check, the odds command samples properly)
     */
    public record Confirmation(double fraction, SwitchingEnsemble ensemble) {
        public Confirmation {
            if (!(fraction > 0 && fraction < 1)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, "confirmation length fraction = " + fraction
                        + " is not allowed; expected a value between 0 and 1 (0.95 simulates 5 % below the limit)");
            }
        }

        /** 0.95 of the limit, 4 angles, no residual flux. */
        public static Confirmation defaults() {
            return new Confirmation(0.95, new SwitchingEnsemble(4, new double[] {0}, SwitchingEnsemble.defaultSimulation()));
        }
    }

    public LimitSettings {
        ratings = ratings.clone();
        voltages = voltages.clone();
        openPhases = openPhases.clone();
        margins = margins.clone();
        connections = List.copyOf(connections);
        cables = List.copyOf(cables);
        overrides = List.copyOf(overrides);
        positive("rating", ratings, "VA");
        positive("voltage class", voltages, "V");
        positive("margin", margins, "pu");
        for (int p : openPhases) {
            if (p != 1 && p != 2) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, "open phases = " + p + " is not allowed; expected 1 or 2");
            }
        }
        if (ratings.length == 0 || connections.isEmpty() || cables.isEmpty() || voltages.length == 0 || openPhases.length == 0
                || margins.length == 0) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "a limit table needs at least one rating, connection, cable, "
                    + "voltage class, open-phase case and margin");
        }
        if (!(maxLength > 0) || Double.isInfinite(maxLength)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, "max length = " + maxLength + " m; expected a finite value > 0");
        }
        if (linear == null) {
            linear = LinearCriterion.hopkinson();
        }
    }

    /** The default grid of an equipment study (see the record's parameters). */
    public static LimitSettings defaults(Study study) {
        Installation in = requireEquipment(study);
        double s = in.transformer().rating();
        double[] ratings = new double[DEFAULT_RATING_FACTORS.length];
        for (int i = 0; i < ratings.length; i++) {
            ratings[i] = s * DEFAULT_RATING_FACTORS[i];
        }
        return new LimitSettings(ratings, List.of(in.transformer().connection()),
                List.of(new NamedCable("study cable", in.cable(), null)), new double[] {in.transformer().primaryVoltage()},
                new int[] {1, 2}, DEFAULT_MARGINS, LinearCriterion.hopkinson(), List.of(), DEFAULT_MAX_LENGTH, null);
    }

    /**
     * The settings of a study's {@code analyses: limits:} block over the defaults; every problem in
     * the block is reported together, with its path (exit 2).
     */
    public static LimitSettings from(Study study) {
        LimitSettings d = defaults(study);
        AnalysisBlock b = AnalysisBlock.of(study, "limits");
        b.allowOnly("ratings", "connections", "cables", "voltages", "open-phases", "margins", "linear-k", "transformers",
                "max-length", "confirm");
        double[] ratings = b.quantities("ratings", Dimension.APPARENT_POWER, d.ratings);
        for (double r : ratings) {
            if (!(r > 0)) {
                b.problem("ratings", r + " VA", "is not allowed; expected ratings above 0 VA (e.g. 500 kVA)", MessageKey.OUT_OF_RANGE);
            }
        }
        List<Connection> conns = new ArrayList<>();
        for (String w : b.words("connections", List.of(), "delta", "ungrounded-wye", "grounded-wye")) {
            conns.add(switch (w) {
                case "delta" -> Connection.DELTA;
                case "ungrounded-wye" -> Connection.UNGROUNDED_WYE;
                default -> Connection.GROUNDED_WYE;
            });
        }
        if (conns.isEmpty()) {
            conns = d.connections;
        }
        double[] voltages = b.rmsVoltages("voltages", d.voltages);
        List<NamedCable> cables = new ArrayList<>();
        for (AnalysisBlock c : b.blocks("cables")) {
            c.allowOnly("name", "core-to-sheath", "core-to-core", "voltages");
            String name = c.texts("name", List.of("cable " + (cables.size() + 1))).get(0);
            double ccs = c.quantity("core-to-sheath", Dimension.CAPACITANCE_PER_LENGTH, Double.NaN);
            double ccc = c.quantity("core-to-core", Dimension.CAPACITANCE_PER_LENGTH, 0.0);
            if (!c.has("core-to-sheath")) {
                c.problem("core-to-sheath", null, "is missing; give the core-to-sheath capacitance, e.g. 0.24 uF/km",
                        MessageKey.MISSING_KEY);
            }
            double[] only = c.rmsVoltages("voltages", new double[0]);
            try {
                if (!Double.isNaN(ccs)) {
                    Cable cable = ccc > 0 ? Cable.belted(ccs, ccc) : Cable.screened(ccs);
                    cables.add(new NamedCable(name, cable, only));
                }
            } catch (FerromapException e) {
                c.problem("", null, e.getMessage(), e.key());
            }
        }
        if (cables.isEmpty()) {
            cables = d.cables;
        }
        double[] openDefault = {1, 2};
        double[] open = b.numbers("open-phases", openDefault);
        int[] openPhases = new int[open.length];
        for (int i = 0; i < open.length; i++) {
            if (open[i] != 1 && open[i] != 2) {
                b.problem("open-phases", open[i], "is not allowed; expected 1 or 2 (or a list of them)", MessageKey.OUT_OF_RANGE);
            }
            openPhases[i] = (int) open[i];
        }
        double[] margins = b.numbers("margins", d.margins);
        for (double m : margins) {
            if (!(m > 0 && m < 3)) {
                b.problem("margins", m, "is not allowed; expected supply voltages in per unit between 0 and 3 (e.g. 1.05)",
                        MessageKey.OUT_OF_RANGE);
            }
        }
        LinearCriterion linear = d.linear;
        if (b.has("linear-k")) {
            Object k = b.raw("linear-k");
            if ("hopkinson".equals(k)) {
                linear = LinearCriterion.hopkinson();
            } else if ("linear-resonance".equals(k)) {
                linear = LinearCriterion.linearResonance();
            } else {
                double kv = b.number("linear-k", Double.NaN);
                if (kv > 0 && Double.isFinite(kv)) {
                    linear = LinearCriterion.hopkinson().withThreshold(kv);
                } else if (!b.failed()) {
                    b.problem("linear-k", k, "is not allowed; expected hopkinson (K = 40), linear-resonance or a number > 0",
                            MessageKey.OUT_OF_RANGE);
                }
            }
        }
        List<TypicalOverride> overrides = new ArrayList<>();
        for (AnalysisBlock t : b.blocks("transformers")) {
            t.allowOnly("rating", "exciting-current", "no-load-loss");
            double r = t.quantity("rating", Dimension.APPARENT_POWER, Double.NaN);
            if (!t.has("rating")) {
                t.problem("rating", null, "is missing; say which rating the figures are for, e.g. 500 kVA", MessageKey.MISSING_KEY);
            }
            double i0 = t.number("exciting-current", Double.NaN);
            if (t.has("exciting-current") && !(i0 > 0 && i0 < 0.2)) {
                t.problem("exciting-current", t.raw("exciting-current"), "is not allowed; expected a percentage below 20 % (e.g. 0.8 %)",
                        MessageKey.OUT_OF_RANGE);
            }
            double p0 = t.quantity("no-load-loss", Dimension.ACTIVE_POWER, Double.NaN);
            if (t.has("no-load-loss") && !(p0 >= 0)) {
                t.problem("no-load-loss", t.raw("no-load-loss"), "must be 0 W or more", MessageKey.OUT_OF_RANGE);
            }
            overrides.add(new TypicalOverride(r, i0, p0));
        }
        double maxLength = b.quantity("max-length", Dimension.LENGTH, d.maxLength);
        if (!(maxLength > 0)) {
            b.problem("max-length", b.raw("max-length"), "is not allowed; expected a length above 0 m (e.g. 100 km)",
                    MessageKey.OUT_OF_RANGE);
        }
        Confirmation confirm = null;
        if (b.has("confirm")) {
            Object v = b.raw("confirm");
            if (Boolean.TRUE.equals(v)) {
                confirm = Confirmation.defaults();
            } else if (!Boolean.FALSE.equals(v)) {
                AnalysisBlock c = b.block("confirm");
                c.allowOnly("fraction", "angles", "residual-flux", "max-periods");
                int maxPeriods = c.integer("max-periods", SwitchingEnsemble.DEFAULT_MAX_PERIODS, 30, 1_000_000);
                Confirmation dc = Confirmation.defaults();
                double fraction = c.number("fraction", dc.fraction());
                int angles = c.integer("angles", dc.ensemble().angles(), 1, 720);
                double[] flux = c.numbers("residual-flux", dc.ensemble().residualFluxes());
                if (!(fraction > 0 && fraction < 1)) {
                    c.problem("fraction", fraction, "is not allowed; expected a value between 0 and 1", MessageKey.OUT_OF_RANGE);
                }
                for (double r : flux) {
                    if (!(r >= 0 && r < 2)) {
                        c.problem("residual-flux", r, "is not allowed; expected magnitudes from 0 to below 2 pu", MessageKey.OUT_OF_RANGE);
                    }
                }
                if (!c.failed()) {
                    confirm = new Confirmation(fraction, new SwitchingEnsemble(angles, flux,
                            SwitchingEnsemble.defaultSimulation().withMaxPeriods(maxPeriods)));
                }
            }
        }
        b.throwIfAny();
        return new LimitSettings(ratings, conns, cables, voltages, openPhases, margins, linear, overrides, maxLength, confirm);
    }

    static Installation requireEquipment(Study study) {
        if (!study.isEquipmentForm()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, study.file() + ": a cable-length limit table needs an "
                    + "equipment-form study (equipment: transformer, cable, open phases); this study gives the circuit only");
        }
        return study.equipment();
    }

    public LimitSettings withConfirm(Confirmation c) {
        return new LimitSettings(ratings, connections, cables, voltages, openPhases, margins, linear, overrides, maxLength, c);
    }

    public LimitSettings withRatings(double... r) {
        return new LimitSettings(r, connections, cables, voltages, openPhases, margins, linear, overrides, maxLength, confirm);
    }

    public LimitSettings withOpenPhases(int... p) {
        return new LimitSettings(ratings, connections, cables, voltages, p, margins, linear, overrides, maxLength, confirm);
    }

    public LimitSettings withMargins(double... m) {
        return new LimitSettings(ratings, connections, cables, voltages, openPhases, m, linear, overrides, maxLength, confirm);
    }

    public LimitSettings withLinear(LinearCriterion l) {
        return new LimitSettings(ratings, connections, cables, voltages, openPhases, margins, l, overrides, maxLength, confirm);
    }

    public LimitSettings withOverrides(List<TypicalOverride> o) {
        return new LimitSettings(ratings, connections, cables, voltages, openPhases, margins, linear, o, maxLength, confirm);
    }

    public LimitSettings withConnections(List<Connection> c) {
        return new LimitSettings(ratings, c, cables, voltages, openPhases, margins, linear, overrides, maxLength, confirm);
    }

    public LimitSettings withCables(List<NamedCable> c) {
        return new LimitSettings(ratings, connections, c, voltages, openPhases, margins, linear, overrides, maxLength, confirm);
    }

    public LimitSettings withVoltages(double... v) {
        return new LimitSettings(ratings, connections, cables, v, openPhases, margins, linear, overrides, maxLength, confirm);
    }

    @Override
    public double[] ratings() {
        return ratings.clone();
    }

    @Override
    public double[] voltages() {
        return voltages.clone();
    }

    @Override
    public int[] openPhases() {
        return openPhases.clone();
    }

    @Override
    public double[] margins() {
        return margins.clone();
    }

    private static void positive(String what, double[] v, String unit) {
        for (double x : v) {
            if (!(x > 0) || Double.isInfinite(x)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE, what + " = " + x + " " + unit + " is not allowed; expected > 0");
            }
        }
    }
}
