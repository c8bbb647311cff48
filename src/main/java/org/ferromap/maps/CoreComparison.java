package org.ferromap.maps;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.ferromap.balance.FoldMargin;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldDirection;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.PointKind;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.equipment.Transformer;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;
import org.ferromap.units.PerUnitBase;

/**
 * Compares two or more core designs for one rating (studies that differ in their core data):
 * the magnetizing curves in per unit, the margin to the jump and the folds at the installed
 * length, the fold-based cable-length limits ({@link FoldLimit}), the damping load needed
 * ({@link DampingSizing#cuspConductance}), overvoltage maps of the worst stable state on the same
 * axes with one colour scale, and a ranking with its reasons.
 *
 * <h2>Ranking</h2>
 * Lexicographic, best first (see {@link #CRITERIA}): fewer stable states at the installed length
 * and voltage (safe, then at-risk, then ferroresonant-only), a longer fold-based limit at rated
 * voltage, a smaller share of the map plane with a ferroresonant state, a smaller damping load.
 * The first criterion that separates two designs decides between them, and the reasons name it.
 */
public final class CoreComparison {

    /** The ranking criteria in order. */
    public static final List<String> CRITERIA = List.of(
            "steady states at the installed length and voltage: safe (normal only) before at-risk (normal and "
                    + "ferroresonant) before ferroresonant-only",
            "fold-based cable-length limit at rated voltage: longer is better",
            "share of the map plane where a ferroresonant state exists: smaller is better",
            "damping load needed to remove bistability at the installed length: smaller is better");

    /** Category names by code (as the map cells write them). */
    public static final List<String> CATEGORY_NAMES = List.of("safe", "at-risk", "ferroresonant-only");

    /** Flux step of the curve samples, pu of rated peak flux. */
    static final double CURVE_STEP = 0.01;

    private CoreComparison() {
    }

    /** Compares the studies (at least two, equipment form) on the settings' axes. */
    public static ComparisonResult compare(List<Study> studies, ComparisonSettings settings, CellExecutor executor) {
        if (studies.size() < 2) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "a core comparison needs at least two studies; got " + studies.size());
        }
        for (Study s : studies) {
            LimitSettings.requireEquipment(s);
        }
        List<String> notes = new ArrayList<>();
        Transformer t0 = studies.get(0).equipment().transformer();
        for (Study s : studies.subList(1, studies.size())) {
            Transformer t = s.equipment().transformer();
            if (Math.abs(t.rating() - t0.rating()) > 1e-9 * t0.rating() || t.connection() != t0.connection()
                    || Math.abs(t.primaryVoltage() - t0.primaryVoltage()) > 1e-9 * t0.primaryVoltage()) {
                notes.add("'" + s.title() + "' differs from '" + studies.get(0).title() + "' in more than the core "
                        + "(rating, voltage or connection): the comparison mixes those effects in");
            }
        }
        Axis ax = settings.x().axis();
        Axis ay = settings.y().axis();
        SingleHarmonicBalance balance = new SingleHarmonicBalance();
        List<ComparisonResult.Design> designs = new ArrayList<>();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Study s : studies) {
            MapGrid grid = MapRunner.run(MapRequest.of(ax, ay), new PeakCell(new StudyParameters(s), settings.x().parameter(),
                    settings.y().parameter(), balance), executor, null, null, null);
            designs.add(design(s, grid, settings, balance));
            for (double v : grid.layer(1)) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (!(hi >= lo)) {
            lo = 0;
            hi = 1;
        }
        List<Integer> order = new ArrayList<>();
        for (int i = 0; i < designs.size(); i++) {
            order.add(i);
        }
        Comparator<ComparisonResult.Design> cmp = comparator();
        order.sort((i, j) -> cmp.compare(designs.get(i), designs.get(j)));
        List<ComparisonResult.Ranked> ranking = new ArrayList<>();
        List<ComparisonResult.Design> ranked = new ArrayList<>(designs);
        for (int r = 0; r < order.size(); r++) {
            int i = order.get(r);
            ranked.set(i, designs.get(i).withRank(r + 1));
            ranking.add(new ComparisonResult.Ranked(r + 1, designs.get(i).study(), reasons(designs, order, r)));
        }
        notes.add("Every figure from the single-harmonic balance; subharmonic and chaotic states need the time domain "
                + "(odds, damping). Maps: the worst stable state's fundamental peak at each point, per unit of the loop's "
                + "rated peak, one colour scale for all designs.");
        return new ComparisonResult(ranked, ranking, ax, ay, lo, hi, CRITERIA, notes);
    }

    private static ComparisonResult.Design design(Study s, MapGrid grid, ComparisonSettings settings,
                                                  SingleHarmonicBalance balance) {
        Installation in = s.equipment();
        Transformer t = in.transformer();
        PerUnitBase b = t.windingBase();
        SaturationCurve curve = t.phaseCurve();
        double top = 1.6;
        for (SaturationCurve.CurvePoint p : curve.definingPoints()) {
            top = Math.max(top, 1.05 * p.flux() / b.flux());
        }
        int samples = (int) Math.ceil(top / CURVE_STEP);
        double[] fx = new double[samples];
        double[] ix = new double[samples];
        for (int k = 0; k < samples; k++) {
            fx[k] = CURVE_STEP * (k + 1);
            ix[k] = curve.current(fx[k] * b.flux()) / b.current();
        }
        EquivalentCircuit c = s.circuit();
        double[] cell = new double[2];
        PeakCell.classify(balance.operatingPoints(c), cell, 0);
        FoldMargin margin = balance.margin(c);
        double down = Double.NaN;
        for (Fold f : balance.folds(c)) {
            if (f.direction() == FoldDirection.JUMP_DOWN) {
                down = Double.isNaN(down) ? f.sourcePeak() : Math.min(down, f.sourcePeak());
            }
        }
        StudyParameters p = new StudyParameters(s);
        double[] margins = settings.margins();
        double[] sources = new double[margins.length];
        double ratedPeak = in.withSourceLineVoltage(t.primaryVoltage()).sourcePhasePeak();
        for (int k = 0; k < margins.length; k++) {
            sources[k] = margins[k] * ratedPeak;
        }
        List<LimitRow.MarginLimit> limits = new ArrayList<>();
        double cuspLength;
        if (in.loop().driven()) {
            FoldLimit.Result fr = new FoldLimit(balance, LimitSettings.DEFAULT_MAX_LENGTH).find(
                    l -> p.circuit(SweepParameter.CABLE_LENGTH, l, SweepParameter.SOURCE_LINE_VOLTAGE, t.primaryVoltage()),
                    in.cableLength(), sources);
            double[] ls = fr.limits();
            for (int k = 0; k < margins.length; k++) {
                limits.add(new LimitRow.MarginLimit(margins[k], sources[k], ls[k]));
            }
            cuspLength = fr.cuspLength();
        } else {
            for (int k = 0; k < margins.length; k++) {
                limits.add(new LimitRow.MarginLimit(margins[k], sources[k], Double.POSITIVE_INFINITY));
            }
            cuspLength = Double.POSITIVE_INFINITY;
        }
        double gMin = DampingSizing.cuspConductance(balance, c)[0];
        double added = Math.max(0, gMin - c.conductance());
        double load = in.loop().inductanceFactor() * t.primaryVoltage() * t.primaryVoltage() * added;
        double[] cat = grid.layer(0);
        int risky = 0;
        int known = 0;
        for (double v : cat) {
            if (!Double.isNaN(v)) {
                known++;
                risky += v >= 1 ? 1 : 0;
            }
        }
        String name = s.file() == null ? s.title() : stem(s.file().getFileName().toString());
        return new ComparisonResult.Design(s.title(), name, t.rating(), t.excitingCurrent(), t.noLoadLoss(), curve.describe(),
                fx, ix, in.cableLength(), in.sourceLineVoltage(), categoryName(cell[0]), cell[1], margin.jumpUpSourcePeak(),
                margin.ratio(), down, cuspLength, limits, gMin, load, known == 0 ? Double.NaN : (double) risky / known,
                boxed(cat), boxed(grid.layer(1)), s.exactness().explanation(), 0);
    }

    private static List<Double> boxed(double[] v) {
        List<Double> out = new ArrayList<>(v.length);
        for (double d : v) {
            out.add(d);
        }
        return out;
    }

    private static String stem(String f) {
        int dot = f.lastIndexOf('.');
        return dot > 0 ? f.substring(0, dot) : f;
    }

    /** The category's name, or "none" for NaN. */
    public static String categoryName(double code) {
        return Double.isNaN(code) ? "none" : CATEGORY_NAMES.get((int) code);
    }

    private static double categoryCode(String name) {
        int i = CATEGORY_NAMES.indexOf(name);
        return i < 0 ? 3 : i;
    }

    /** Best first, by {@link #CRITERIA}. */
    static Comparator<ComparisonResult.Design> comparator() {
        return Comparator.<ComparisonResult.Design>comparingDouble(d -> categoryCode(d.category()))
                .thenComparingDouble(d -> -nanLow(d.ratedLimit()))
                .thenComparingDouble(d -> nanHigh(d.riskShare()))
                .thenComparingDouble(d -> nanHigh(d.dampingLoad()));
    }

    private static double nanLow(double v) {
        return Double.isNaN(v) ? Double.NEGATIVE_INFINITY : v;
    }

    private static double nanHigh(double v) {
        return Double.isNaN(v) ? Double.POSITIVE_INFINITY : v;
    }

    /** Reasons for the design at place r of the order: its figures and what separates it from its neighbours. */
    private static List<String> reasons(List<ComparisonResult.Design> designs, List<Integer> order, int r) {
        ComparisonResult.Design d = designs.get(order.get(r));
        List<String> out = new ArrayList<>();
        if (r + 1 < order.size()) {
            out.add("ahead of '" + designs.get(order.get(r + 1)).study() + "': "
                    + separation(d, designs.get(order.get(r + 1))));
        }
        if (r > 0) {
            out.add("behind '" + designs.get(order.get(r - 1)).study() + "': "
                    + separation(designs.get(order.get(r - 1)), d));
        }
        out.add(String.format(Locale.ROOT, "installed case (%.4g m, %.4g kV): %s, worst stable state %.3g pu", d.length(),
                d.lineVoltage() / 1e3, d.category(), d.worstPeakPu()));
        out.add(String.format(Locale.ROOT, "fold-based limit at rated voltage %s; the fold pair appears from %s", metres(d.ratedLimit()),
                metres(d.cuspLength())));
        out.add(String.format(Locale.ROOT, "ferroresonant states in %.0f %% of the map plane", 100 * d.riskShare()));
        out.add(String.format(Locale.ROOT, "damping load to remove bistability at the installed length: %.4g kW (%.3g %% of rating)",
                d.dampingLoad() / 1e3, 100 * d.dampingLoad() / d.rating()));
        return out;
    }

    /** What puts a before b, in words: the first criterion that separates them. */
    private static String separation(ComparisonResult.Design a, ComparisonResult.Design b) {
        if (categoryCode(a.category()) != categoryCode(b.category())) {
            return "at the installed length it is " + a.category() + ", the other " + b.category();
        }
        if (nanLow(a.ratedLimit()) != nanLow(b.ratedLimit())) {
            return "longer cable-length limit at rated voltage (" + metres(a.ratedLimit()) + " against " + metres(b.ratedLimit()) + ")";
        }
        if (nanHigh(a.riskShare()) != nanHigh(b.riskShare())) {
            return String.format(Locale.ROOT, "smaller share of the map plane at risk (%.0f %% against %.0f %%)", 100 * a.riskShare(),
                    100 * b.riskShare());
        }
        if (nanHigh(a.dampingLoad()) != nanHigh(b.dampingLoad())) {
            return String.format(Locale.ROOT, "smaller damping load (%.4g kW against %.4g kW)", a.dampingLoad() / 1e3,
                    b.dampingLoad() / 1e3);
        }
        return "no criterion separates them (a tie, kept in the order given)";
    }

    private static String metres(double m) {
        if (Double.isInfinite(m)) {
            return "none up to " + (int) (LimitSettings.DEFAULT_MAX_LENGTH / 1e3) + " km";
        }
        return Double.isNaN(m) ? "not found" : String.format(Locale.ROOT, "%.4g m", m);
    }

    /**
     * The balance cell of the comparison maps: {category, worst stable peak pu} at (x, y), the two
     * axes being study parameters in SI. Category 0 safe (normal state only), 1 at-risk (normal and
     * ferroresonant stable states), 2 ferroresonant-only, NaN when the balance failed. Pure.
     */
    static final class PeakCell implements CellFunction {
        private final StudyParameters parameters;
        private final SweepParameter px;
        private final SweepParameter py;
        private final SingleHarmonicBalance balance;

        PeakCell(StudyParameters parameters, SweepParameter px, SweepParameter py, SingleHarmonicBalance balance) {
            this.parameters = parameters;
            this.px = px;
            this.py = py;
            this.balance = balance;
        }

        @Override
        public int width() {
            return 2;
        }

        @Override
        public void evaluate(double x, double y, double[] out, int offset) {
            out[offset] = Double.NaN;
            out[offset + 1] = Double.NaN;
            try {
                classify(balance.operatingPoints(parameters.circuit(px, x, py, y)), out, offset);
            } catch (FerromapException e) {
                // a point where the balance fails is drawn as no data
            }
        }

        static void classify(List<OperatingPoint> points, double[] out, int offset) {
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
            out[offset] = normal && ferro ? 1 : normal ? 0 : ferro ? 2 : Double.NaN;
            out[offset + 1] = peak;
        }

        @Override
        public String fingerprint() {
            return "comparison peak cell v1 " + parameters.study().title() + " " + px + " " + py + " " + balance.settings();
        }

        @Override
        public String componentName(int k) {
            return k == 0 ? "states" : "peakVoltagePu";
        }
    }
}
