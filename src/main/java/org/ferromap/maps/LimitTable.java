package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Reduction;
import org.ferromap.equipment.Connection;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.LinearCriterion;
import org.ferromap.equipment.OpenPhaseCase;
import org.ferromap.equipment.OpenPhaseLoop;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.ScaledCurve;
import org.ferromap.equipment.Transformer;
import org.ferromap.equipment.TypicalTransformerData;
import org.ferromap.errors.FerromapException;
import org.ferromap.study.Study;
import org.ferromap.units.PerUnitBase;

/**
 * Cable-length limit tables: for every combination of rating, primary connection, cable type,
 * voltage class and open-phase case in {@link LimitSettings}, the longest cable with no jump
 * risk at rated voltage and at the stated margins ({@link FoldLimit}), the linear criterion
 * beside it, and optionally a time-domain spot check just below the rated-voltage limit.
 *
 * <h2>How a row's transformer is made</h2>
 * The study's winding curve is taken in per unit of its own winding rating and given to every
 * row's nameplate (rating, voltage class, connection): the assumption that a family of designs
 * shares its per-unit magnetizing curve. The exciting current is the study's unless the table
 * overrides it for a rating; the per-unit current of the whole curve is scaled in proportion to
 * it (so the per-unit air-core inductance scales inversely, a simplification). The no-load loss is
 * the typical figure of {@link TypicalTransformerData#noLoadLoss(double)} for the rating (EU
 * 548/2014 Tier 2 [mem] and its stated interpolation) unless overridden. Frequency and core
 * construction are the study's. Each row names where its figures came from.
 *
 * <p>Rows are independent and computed in parallel on the map engine's executor; the table is
 * the same for any thread count.
 */
public final class LimitTable {

    private LimitTable() {
    }

    /** What "limit" means in the table, for reports. */
    public static final String LIMIT_DEFINITION = "the longest cable with no ferroresonant steady state at the supply "
            + "voltage: the length at which the jump-down fold of the single-harmonic balance reaches the source "
            + "(DOMAIN.md §3-4). Beyond it a switching transient can settle on the ferroresonant branch.";

    /**
     * Computes the table.
     *
     * @param study    an equipment-form study (its transformer's curve, frequency, core)
     * @param settings the grid and options
     * @param executor runs the rows and the switching events
     */
    public static LimitTableResult compute(Study study, LimitSettings settings, CellExecutor executor) {
        Installation in = LimitSettings.requireEquipment(study);
        List<RowSpec> specs = new ArrayList<>();
        for (double v : settings.voltages()) {
            for (Connection conn : settings.connections()) {
                for (LimitSettings.NamedCable cable : settings.cables()) {
                    if (!cable.appliesTo(v)) {
                        continue;
                    }
                    for (int open : settings.openPhases()) {
                        for (double s : settings.ratings()) {
                            specs.add(new RowSpec(s, v, conn, cable, open));
                        }
                    }
                }
            }
        }
        SingleHarmonicBalance balance = new SingleHarmonicBalance();
        FoldLimit foldLimit = new FoldLimit(balance, settings.maxLength());
        List<Built> built = IndexedRuns.map(specs.size(), i -> build(in, specs.get(i), settings, foldLimit), executor, 1);
        List<LimitRow> rows = new ArrayList<>(built.size());
        for (Built b : built) {
            LimitRow.Check check = null;
            if (settings.confirm() != null && b.row.driven()) {
                check = confirm(b, settings, executor);
            }
            rows.add(b.row.withCheck(check));
        }
        List<String> sources = new ArrayList<>();
        sources.add("saturation curve: the study's winding curve (" + in.transformer().phaseCurve().describe()
                + ") in per unit of its winding rating, given to every row's nameplate; per-unit current scaled with the "
                + "exciting current");
        sources.add(String.format("exciting current: the study's transformer, %.3g %% of rated current, unless a row says "
                + "otherwise", 100 * in.transformer().excitingCurrent()));
        sources.add("no-load loss: " + TypicalTransformerData.TIER2_NO_LOAD_LOSS.get(0).source()
                + " (100, 400, 1000 kVA); between them log-log interpolation [der]; outside 100 to 1000 kVA, 0.1 % of the "
                + "rating [mem/cp]; unless a row says otherwise");
        sources.add("frequency " + in.frequency() + " Hz and core construction " + in.transformer().core()
                + ": the study's");
        sources.add("linear criterion: " + settings.linear().rule().source());
        List<String> notes = new ArrayList<>();
        notes.add("Limits from the single-harmonic balance; time-domain fold points differ by a few percent, more for sharp "
                + "knees (DOMAIN.md §3). Rows marked linear-only or core-coupling-ignored are screening values.");
        if (settings.confirm() != null) {
            notes.add("Time-domain check: " + settings.confirm().ensemble().describe() + " at "
                    + settings.confirm().fraction() + " x the rated-voltage limit.");
        }
        return new LimitTableResult(study.title(), LIMIT_DEFINITION, settings.linear().rule().source(), rows, sources, notes);
    }

    /** One row of the grid before evaluation. */
    record RowSpec(double rating, double voltage, Connection connection, LimitSettings.NamedCable cable, int openPhases) { }

    /** A row evaluated, with what the time-domain check needs. */
    record Built(LimitRow row, Installation installation, SaturationCurve loopCurve) { }

    /** The transformer of a row: the study's per-unit curve on the row's nameplate. */
    static Transformer transformer(Transformer base, double rating, double voltage, Connection conn, double excitingCurrent,
                                   double noLoadLoss) {
        PerUnitBase b0 = base.windingBase();
        PerUnitBase b1 = Transformer.windingBase(rating, voltage, conn, base.ratedFrequency());
        double k = excitingCurrent / base.excitingCurrent();
        SaturationCurve curve = new ScaledCurve(base.phaseCurve(), b1.flux() / b0.flux(), k * b1.current() / b0.current());
        return new Transformer(rating, voltage, base.ratedFrequency(), conn, base.core(), excitingCurrent, noLoadLoss, curve);
    }

    private static Built build(Installation study, RowSpec r, LimitSettings settings, FoldLimit foldLimit) {
        Transformer base = study.transformer();
        double i0 = base.excitingCurrent();
        String i0Source = "the study's transformer";
        TypicalTransformerData.Sourced loss = TypicalTransformerData.noLoadLoss(r.rating());
        double p0 = loss.value();
        String p0Source = loss.source();
        for (LimitSettings.TypicalOverride o : settings.overrides()) {
            if (Math.abs(o.rating() - r.rating()) <= 1e-9 * r.rating()) {
                if (!Double.isNaN(o.excitingCurrent())) {
                    i0 = o.excitingCurrent();
                    i0Source = "the study (analyses.limits.transformers)";
                }
                if (!Double.isNaN(o.noLoadLoss())) {
                    p0 = o.noLoadLoss();
                    p0Source = "the study (analyses.limits.transformers)";
                }
            }
        }
        Transformer t = transformer(base, r.rating(), r.voltage(), r.connection(), i0, p0);
        OpenPhaseCase open = new OpenPhaseCase(r.openPhases());
        Installation in = new Installation(r.voltage(), 0.0, study.frequency(), t, r.cable().cable(), 1000.0, open);
        SaturationCurve loopCurve = Reduction.loopCurve(t, open);
        String exactness = Reduction.exactness(r.connection(), t.core(), open).name().toLowerCase().replace('_', '-');
        LinearCriterion.Result lin = settings.linear().evaluate(in);
        LinearCriterion.Result res = LinearCriterion.linearResonance().evaluate(in);
        double[] margins = settings.margins();
        List<LimitRow.MarginLimit> limits = new ArrayList<>();
        OpenPhaseLoop loop = in.loop();
        if (!loop.driven()) {
            for (double m : margins) {
                limits.add(new LimitRow.MarginLimit(m, m * in.sourcePhasePeak(), Double.POSITIVE_INFINITY));
            }
            LimitRow row = new LimitRow(r.rating(), r.voltage(), label(r.connection()), r.cable().name(), r.openPhases(), i0,
                    i0Source, p0, p0Source, exactness, false, Double.POSITIVE_INFINITY, limits, lin.criticalLength(),
                    lin.threshold(), res.criticalLength(), null,
                    "not driven: a grounded-wye primary on screened cable sees no drive on the open phase (DOMAIN.md §1.2)");
            return new Built(row, in, loopCurve);
        }
        double[] sources = new double[margins.length];
        for (int k = 0; k < margins.length; k++) {
            sources[k] = margins[k] * in.sourcePhasePeak();
        }
        DoubleFunction<EquivalentCircuit> at = l -> Reduction.reduce(in.withCableLength(l), loopCurve).circuit();
        double ref = Double.isFinite(res.criticalLength()) && res.criticalLength() > 0 ? res.criticalLength() : 1000.0;
        FoldLimit.Result fr;
        String note;
        double cusp;
        try {
            fr = foldLimit.find(at, ref, sources);
            double[] ls = fr.limits();
            for (int k = 0; k < margins.length; k++) {
                limits.add(new LimitRow.MarginLimit(margins[k], sources[k], ls[k]));
            }
            cusp = fr.cuspLength();
            note = fr.note();
        } catch (FerromapException e) {
            for (int k = 0; k < margins.length; k++) {
                limits.add(new LimitRow.MarginLimit(margins[k], sources[k], Double.NaN));
            }
            cusp = Double.NaN;
            note = "the balance failed for this row: " + e.getMessage();
        }
        LimitRow row = new LimitRow(r.rating(), r.voltage(), label(r.connection()), r.cable().name(), r.openPhases(), i0,
                i0Source, p0, p0Source, exactness, true, cusp, limits, lin.criticalLength(), lin.threshold(),
                res.criticalLength(), null, note);
        return new Built(row, in, loopCurve);
    }

    /** The spot check at fraction x the limit at the margin nearest 1 pu. */
    private static LimitRow.Check confirm(Built b, LimitSettings settings, CellExecutor executor) {
        LimitSettings.Confirmation c = settings.confirm();
        LimitRow.MarginLimit rated = b.row.ratedLimit();
        if (!Double.isFinite(rated.length())) {
            return null;
        }
        double length = c.fraction() * rated.length();
        Installation in = b.installation.withCableLength(length).withSourceLineVoltage(rated.margin() * b.installation.sourceLineVoltage());
        EquivalentCircuit circuit = Reduction.reduce(in, b.loopCurve).circuit();
        SwitchingEnsemble.Outcome o = c.ensemble().run(circuit, executor);
        List<org.ferromap.balance.OperatingPoint> stable = Branches.stable(new SingleHarmonicBalance(), circuit);
        double threshold = c.ensemble().simulation().peakThreshold();
        int off = 0;
        double worstPeak = Double.NaN;
        String worstMode = null;
        for (SwitchingEnsemble.Event e : o.events()) {
            boolean on = e.period() == 1 && e.peakPerUnit() <= threshold && !Double.isNaN(e.phase())
                    && stable.size() == 1 && Branches.distance(e.phase(), stable.get(0).voltagePhase()) <= Branches.PHASE_MATCH;
            if (!on) {
                off++;
            }
            if (worstMode == null || !(e.peakPerUnit() <= worstPeak)) {
                worstPeak = e.peakPerUnit();
                worstMode = e.mode().label();
            }
        }
        String predicted = stable.size() == 1 ? stable.get(0).kind().label() : stable.size() + " stable states";
        boolean ok = off == 0;
        String note = ok ? String.format("every event settled on the single steady state the balance predicts there (%s branch, "
                + "%.3g pu): no jump, no subharmonic or chaotic state", predicted, stable.get(0).voltagePerUnit())
                : off + " of " + o.events().size() + " events settled elsewhere than the balance's single steady state ("
                + predicted + ") below the fold-based limit: a subharmonic, chaotic or jumped state the single-harmonic "
                + "balance does not see, or the few-percent error of the balance near the fold";
        return new LimitRow.Check(length, rated.margin(), o.events().size(), off, o.undetermined(), predicted, worstMode,
                worstPeak, ok, note);
    }

    /** Connection as written in studies. */
    public static String label(Connection c) {
        return switch (c) {
            case DELTA -> "delta";
            case UNGROUNDED_WYE -> "ungrounded-wye";
            case GROUNDED_WYE -> "grounded-wye";
        };
    }
}
