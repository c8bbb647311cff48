package org.ferromap.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldDirection;
import org.ferromap.balance.HarmonicSettings;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.continuation.ContinuationSettings;
import org.ferromap.errors.FerromapException;
import org.ferromap.orbits.CircuitOrbits;
import org.ferromap.orbits.CircuitSystem;
import org.ferromap.orbits.FoldComparison;
import org.ferromap.orbits.LocatedBifurcation;
import org.ferromap.orbits.OrbitBifurcation;
import org.ferromap.orbits.OrbitBranch;
import org.ferromap.orbits.OrbitContinuationSettings;
import org.ferromap.orbits.OrbitExtent;
import org.ferromap.orbits.OrbitPoint;
import org.ferromap.orbits.OrbitsReport;
import org.ferromap.report.Csv;
import org.ferromap.report.OrbitCharts;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.SweepParameter;

/**
 * The periodic orbits of one request (explored, continued, with their bifurcations and, for the
 * source voltage, the fold comparison), turned into what the verbs print, write and draw. Built
 * once by {@link #explore}; the orbits and sweep verbs share it.
 */
final class ContinuedOrbits {

    /** Integration tolerance when following each orbit for its section states and peaks (the shooting's own, 1e-11). */
    private static final double EXTENT_TOLERANCE = OrbitContinuationSettings.DEFAULTS.shooting().tolerance();

    /**
     * One orbit, as the contract lists it ({@code points[]}), with the branch it belongs to.
     *
     * @param parameter parameter value, SI (source: V peak)
     * @param period least period, source periods
     * @param flux flux linkage on the section t = 0 mod kT, Wb-turn
     * @param voltage terminal voltage on the section, V
     * @param multipliers Floquet multipliers over the period, [re, im] pairs
     * @param stable every multiplier inside the unit circle
     * @param branch index into {@code branches}
     * @param peakVoltage largest |v(t)| over the orbit's period, V (null when the orbit could not be followed)
     * @param peakFlux largest |lambda(t)| over the orbit's period, Wb-turn (null likewise)
     */
    record PointJson(double parameter, int period, double flux, double voltage, List<List<Double>> multipliers, boolean stable,
                     int branch, double peakVoltage, double peakFlux) { }

    /**
     * A located bifurcation ({@code bifurcations[]}).
     *
     * @param type "fold", "period-doubling", "torus" or "pitchfork"
     * @param parameter parameter value, SI
     * @param period period of the orbit that bifurcates, source periods
     * @param flux flux linkage of that orbit on the section, Wb-turn
     * @param voltage its terminal voltage on the section, V
     * @param located false when the location did not converge (values interpolated between branch points)
     * @param branch index into {@code branches}
     * @param peakVoltage largest |v(t)| over the period of the orbit that bifurcates, V
     */
    record BifurcationJson(String type, double parameter, int period, double flux, double voltage, boolean located, int branch,
                           double peakVoltage) { }

    /**
     * A continued branch.
     *
     * @param branch its index
     * @param period the orbits' period, source periods
     * @param map the return map continued: "P^k" or "half-period map" (symmetric period-1 orbits)
     * @param points number of points
     * @param from smallest parameter reached, SI (null when empty)
     * @param to largest parameter reached, SI (null when empty)
     * @param stop why the continuation stopped (engine code)
     * @param detail where and why, in words
     */
    record BranchJson(int branch, int period, String map, int points, Double from, Double to, String stop, String detail) { }

    /**
     * One fold of the source voltage located three ways (V peak); differences relative to the exact fold.
     *
     * @param jump "up" or "down": the single-harmonic fold it starts from
     * @param note why the exact fold is missing (null when found)
     */
    record FoldJson(String jump, double singleHarmonic, double multiHarmonic, double exact, double singleHarmonicDifference,
                    double multiHarmonicDifference, String note) { }

    private final VaryOptions.Range range;
    private final double start;
    private final List<OrbitBranch> branches;
    private final List<PointJson> points = new ArrayList<>();
    private final List<BifurcationJson> bifurcations = new ArrayList<>();
    private final List<BranchJson> branchList = new ArrayList<>();
    private final List<OrbitCharts.Curve> sectionCurves = new ArrayList<>();
    private final List<OrbitCharts.Mark> sectionMarks = new ArrayList<>();
    private final List<OrbitCharts.Curve> peakCurves = new ArrayList<>();
    private final List<OrbitCharts.Mark> peakMarks = new ArrayList<>();
    private final List<FoldJson> folds;
    private final String foldNote;

    private ContinuedOrbits(VaryOptions.Range range, double start, List<OrbitBranch> branches, boolean compareFolds) {
        this.range = range;
        this.start = start;
        this.branches = branches;
        EquivalentCircuit base = range.circuit(start);
        CircuitSystem sys = CircuitSystem.of(base);
        OrbitsReport report = CircuitOrbits.report(base, range.name(), range.unitLabel(), branches);
        for (int b = 0; b < branches.size(); b++) {
            OrbitBranch br = branches.get(b);
            int k = br.section().half() ? 1 : br.period();
            double lo = Double.NaN;
            double hi = Double.NaN;
            List<Double> cp = new ArrayList<>();
            List<Boolean> cs = new ArrayList<>();
            List<Double> cPeak = new ArrayList<>();
            List<double[]> cSection = new ArrayList<>();
            List<double[]> cMirror = new ArrayList<>();
            for (int i = 0; i < br.size(); i++) {
                OrbitPoint p = report.points().get(points.size());
                OrbitExtent e = extent(p.parameter(), p.flux(), p.voltage(), k);
                points.add(new PointJson(p.parameter(), p.period(), p.flux(), p.voltage(), pairs(p.multipliers()), p.stable(), b,
                        e == null ? Double.NaN : e.peakVoltage(), e == null ? Double.NaN : e.peakFlux()));
                lo = Double.isNaN(lo) ? p.parameter() : Math.min(lo, p.parameter());
                hi = Double.isNaN(hi) ? p.parameter() : Math.max(hi, p.parameter());
                if (e != null) {
                    cp.add(p.parameter());
                    cs.add(p.stable());
                    cPeak.add(e.peakVoltage());
                    cSection.add(e.voltage());
                    cMirror.add(e.mirrorVoltage());
                }
            }
            branchList.add(new BranchJson(b, br.period(), br.section().toString(), br.size(), br.size() == 0 ? null : lo,
                    br.size() == 0 ? null : hi, br.stopReason(), br.stopDetail()));
            if (!cp.isEmpty()) {
                double[] px = cp.stream().mapToDouble(Double::doubleValue).toArray();
                boolean[] st = new boolean[cs.size()];
                for (int i = 0; i < st.length; i++) {
                    st[i] = cs.get(i);
                }
                peakCurves.add(new OrbitCharts.Curve(b, br.period(), px, cPeak.stream().mapToDouble(Double::doubleValue).toArray(), st));
                // An asymmetric orbit's mirror image is an orbit with the same stability: drawn with it, so
                // the section chart shows what a sweep from any initial state can meet.
                boolean mirrored = !br.section().half();
                for (int j = 0; j < k; j++) {
                    for (List<double[]> src : mirrored ? List.of(cSection, cMirror) : List.of(cSection)) {
                        double[] v = new double[px.length];
                        for (int i = 0; i < v.length; i++) {
                            v[i] = src.get(i)[j];
                        }
                        sectionCurves.add(new OrbitCharts.Curve(b, br.period(), px, v, st));
                    }
                }
            }
            for (LocatedBifurcation at : br.bifurcations()) {
                OrbitBifurcation r = at.toRecord();
                double flux = sys.flux(at.state()[0]);
                double voltage = sys.voltage(at.state()[1]);
                OrbitExtent e = extent(r.parameter(), flux, voltage, at.section().half() ? 1 : at.period());
                double peak = e == null ? Double.NaN : e.peakVoltage();
                bifurcations.add(new BifurcationJson(r.type(), r.parameter(), r.period(), flux, voltage, at.located(), b, peak));
                sectionMarks.add(new OrbitCharts.Mark(b, r.type(), r.parameter(), voltage));
                if (e != null) {
                    peakMarks.add(new OrbitCharts.Mark(b, r.type(), r.parameter(), peak));
                    if (!at.section().half()) {
                        sectionMarks.add(new OrbitCharts.Mark(b, r.type(), r.parameter(), e.mirrorVoltage()[0]));
                    }
                }
            }
        }
        if (!compareFolds) {
            folds = null;
            foldNote = null;
        } else if (range.parameter() == SweepParameter.SOURCE) {
            List<FoldJson> fj = new ArrayList<>();
            String note;
            List<Fold> sh = new SingleHarmonicBalance().folds(base);
            List<FoldComparison> cmp;
            // The balances describe period-1 states: their folds are compared with those of the period-1 branches only.
            List<OrbitBranch> periodOne = branches.stream().filter(b -> b.period() == 1).toList();
            String exact = "exact: the nearest fold of the period-1 branches continued (" + g(range.from(), 6) + " to "
                    + g(range.to(), 6) + " V peak)";
            try {
                cmp = CircuitOrbits.compareFolds(base, periodOne, HarmonicSettings.DEFAULTS);
                note = exact + "; multi-harmonic: " + HarmonicSettings.DEFAULTS.harmonics() + " odd harmonics";
            } catch (FerromapException e) {
                cmp = CircuitOrbits.compareFolds(base, periodOne, null);
                note = exact + "; the multi-harmonic balance failed: " + e.getMessage();
            }
            for (int i = 0; i < cmp.size(); i++) {
                FoldComparison c = cmp.get(i);
                String jump = i < sh.size() ? (sh.get(i).direction() == FoldDirection.JUMP_UP ? "up" : "down") : "";
                String why = null;
                if (!range.contains(c.singleHarmonic())) {
                    why = "outside the range continued";
                } else if (Double.isNaN(c.exact())) {
                    why = "no fold on the period-1 branches continued";
                } else {
                    // One exact fold answers one balance fold: the nearest exact fold may belong to another balance fold.
                    for (FoldComparison other : cmp) {
                        if (Math.abs(c.exact() - other.singleHarmonic()) < Math.abs(c.exact() - c.singleHarmonic())) {
                            why = "no fold on the period-1 branches continued near it";
                        }
                    }
                }
                fj.add(why == null ? new FoldJson(jump, c.singleHarmonic(), c.multiHarmonic(), c.exact(), c.singleHarmonicDifference(),
                        c.multiHarmonicDifference(), null)
                        : new FoldJson(jump, c.singleHarmonic(), c.multiHarmonic(), Double.NaN, Double.NaN, Double.NaN, why));
            }
            if (cmp.isEmpty()) {
                note = "the single-harmonic balance has no fold (no bistability): nothing to compare";
            }
            folds = fj;
            foldNote = note;
        } else {
            folds = null;
            foldNote = "the fold comparison is made for --vary source only";
        }
    }

    /**
     * Explores and continues the orbits over the range.
     *
     * @param range the checked range
     * @param start where the initial states settle, SI, inside the range
     * @param initial {flux Wb-turn, voltage V} pairs
     * @param minPeriod least period of the orbits started from
     * @param maxPeriod largest period followed
     * @param maxPoints most points per branch (continuation steps)
     * @param compareFolds whether to compare the folds with the harmonic balances (source only)
     */
    static ContinuedOrbits explore(VaryOptions.Range range, double start, List<double[]> initial, int minPeriod, int maxPeriod,
            int maxPoints, boolean compareFolds) {
        OrbitContinuationSettings d = OrbitContinuationSettings.DEFAULTS;
        ContinuationSettings c = d.continuation();
        // Corrector tolerance 1e-8 (scaled) instead of the engine's 1e-9: with a tabulated curve
        // (C1 interpolation) the shooting residual is noisy at about 1e-9 and the corrector then fails
        // to start or crawls; 1e-8 of the state's size is still far below what a chart or the JSON shows.
        c = c.withMaxSteps(maxPoints).withNewton(1e-8, c.maxNewtonIterations(), c.targetNewtonIterations());
        OrbitContinuationSettings settings = d.withContinuation(c).withWindow(range.from(), range.to());
        List<OrbitBranch> branches = CircuitOrbits.explore(range.circuits(), start, initial, minPeriod, maxPeriod, settings);
        return new ContinuedOrbits(range, start, branches, compareFolds);
    }

    /** The orbit over its period (section states and peaks), or null when it cannot be integrated (left out of the charts). */
    private OrbitExtent extent(double parameter, double flux, double voltage, int k) {
        try {
            return CircuitOrbits.extent(range.circuit(parameter), flux, voltage, k, EXTENT_TOLERANCE);
        } catch (FerromapException e) {
            return null;
        }
    }

    private static List<List<Double>> pairs(double[][] m) {
        List<List<Double>> out = new ArrayList<>();
        for (double[] pair : m) {
            out.add(List.of(pair[0], pair[1]));
        }
        return out;
    }

    List<PointJson> points() {
        return points;
    }

    List<BifurcationJson> bifurcations() {
        return bifurcations;
    }

    List<BranchJson> branches() {
        return branchList;
    }

    /** The fold comparison, or null when the parameter is not the source voltage. */
    List<FoldJson> folds() {
        return folds;
    }

    String foldNote() {
        return foldNote;
    }

    /** Curves of the voltage on the section t = 0 mod T (k per period-k branch), for the stroboscopic view. */
    List<OrbitCharts.Curve> sectionCurves() {
        return sectionCurves;
    }

    List<OrbitCharts.Mark> sectionMarks() {
        return sectionMarks;
    }

    /** Curves of the peak terminal voltage over each orbit. */
    List<OrbitCharts.Curve> peakCurves() {
        return peakCurves;
    }

    List<OrbitCharts.Mark> peakMarks() {
        return peakMarks;
    }

    double start() {
        return start;
    }

    /** Writes orbit-points.csv, bifurcations.csv and (source only) fold-comparison.csv. */
    void writeCsv(OutputFolder f) {
        String u = " (" + range.unitLabel() + ")";
        List<List<?>> rows = new ArrayList<>();
        for (PointJson p : points) {
            List<Object> r = new ArrayList<>(List.of(p.branch(), p.period(), p.parameter(), p.flux(), p.voltage()));
            for (int j = 0; j < 2; j++) {
                boolean has = j < p.multipliers().size();
                r.add(has ? p.multipliers().get(j).get(0) : null);
                r.add(has ? p.multipliers().get(j).get(1) : null);
            }
            r.add(p.stable());
            r.add(p.peakVoltage());
            rows.add(r);
        }
        Csv.write(f.file("orbit-points.csv"), List.of("branch", "period (source periods)", range.name() + u,
                "flux at t = 0 mod kT (Wb-turn)", "voltage at t = 0 mod kT (V)", "multiplier 1 re", "multiplier 1 im",
                "multiplier 2 re", "multiplier 2 im", "stable", "peak voltage over the orbit (V)"), rows);
        List<List<?>> brows = new ArrayList<>();
        for (BifurcationJson b : bifurcations) {
            brows.add(List.of(b.type(), b.parameter(), b.period(), b.flux(), b.voltage(), b.located(), b.branch(), b.peakVoltage()));
        }
        Csv.write(f.file("bifurcations.csv"), List.of("type", range.name() + u, "period (source periods)",
                "flux at t = 0 mod kT (Wb-turn)", "voltage at t = 0 mod kT (V)", "located", "branch", "peak voltage over the orbit (V)"), brows);
        if (folds != null) {
            List<List<?>> frows = new ArrayList<>();
            for (FoldJson fj : folds) {
                frows.add(java.util.Arrays.asList(fj.jump(), fj.singleHarmonic(), fj.multiHarmonic(), fj.exact(),
                        fj.singleHarmonicDifference(), fj.multiHarmonicDifference(), fj.note()));
            }
            Csv.write(f.file("fold-comparison.csv"), List.of("jump", "single-harmonic (V peak)", "multi-harmonic (V peak)",
                    "exact (V peak)", "single-harmonic difference (relative)", "multi-harmonic difference (relative)", "note"), frows);
        }
    }

    /** The human summary: branches, distinct bifurcations, the fold comparison. */
    void print(PrintWriter o) {
        String u = range.unitLabel();
        o.println("  branches:");
        if (branchList.isEmpty()) {
            o.println("    none: no orbit of the periods asked for passes through the settled states");
        }
        for (BranchJson b : branchList) {
            if (b.points() == 0) {
                o.printf("    %2d  period %d on %-16s not continued: %s%n", b.branch(), b.period(), b.map(), b.detail());
            } else {
                o.printf("    %2d  period %d on %-16s %4d points, %s to %s %s  (%s)%n", b.branch(), b.period(), b.map(),
                        b.points(), g(b.from(), 6), g(b.to(), 6), u, b.stop().toLowerCase().replace('_', ' '));
            }
        }
        o.println("  bifurcations (each once; mirror-image orbits share them):");
        List<BifurcationJson> distinct = distinct();
        if (distinct.isEmpty()) {
            o.println("    none in the range");
        }
        int longer = 0;
        java.util.TreeSet<Integer> periods = new java.util.TreeSet<>();
        for (BifurcationJson b : distinct) {
            if (distinct.size() > 20 && b.period() > 2) {
                longer++; // a cascade's many high-period events go to the files only
                periods.add(b.period());
                continue;
            }
            o.printf("    %-16s at %s %s, period %d, peak %s V%s%n", b.type(), g(b.parameter(), 7), u, b.period(),
                    g(b.peakVoltage(), 4), b.located() ? "" : " (not located)");
        }
        if (longer > 0) {
            o.printf("    and %d more on orbits of period %s (listed in bifurcations.csv)%n", longer, periods);
        }
        if (folds != null && !folds.isEmpty()) {
            o.println("  folds in source voltage, three ways (V peak):");
            o.printf("    %-5s %15s %15s %15s %12s %12s%n", "jump", "single-harm.", "multi-harm.", "exact", "single diff", "multi diff");
            for (FoldJson f : folds) {
                o.printf("    %-5s %15s %15s %15s %12s %12s%s%n", f.jump(), num(f.singleHarmonic()), num(f.multiHarmonic()),
                        num(f.exact()), pct(f.singleHarmonicDifference()), pct(f.multiHarmonicDifference()),
                        f.note() == null ? "" : "  (" + f.note() + ")");
            }
        }
        if (foldNote != null) {
            o.println("    " + foldNote);
        }
    }

    /**
     * Bifurcations for people: the same type and period at the same parameter (to 1e-6 of the
     * range) listed once, and the pitchfork a doubled branch shows where it meets its parent
     * (period 2k at a period doubling of period k: the same event seen in P^2k) left out.
     */
    List<BifurcationJson> distinct() {
        double tol = 1e-6 * Math.max(range.to() - range.from(), Math.abs(range.to()));
        List<BifurcationJson> out = new ArrayList<>();
        for (BifurcationJson b : bifurcations) {
            boolean dup = out.stream().anyMatch(x -> x.type().equals(b.type()) && x.period() == b.period()
                    && Math.abs(x.parameter() - b.parameter()) <= tol);
            boolean twin = b.type().equals("pitchfork") && bifurcations.stream().anyMatch(x -> x.type().equals("period-doubling")
                    && 2 * x.period() == b.period() && Math.abs(x.parameter() - b.parameter()) <= tol);
            if (!dup && !twin) {
                out.add(b);
            }
        }
        out.sort((a, b) -> Double.compare(a.parameter(), b.parameter()));
        return out;
    }

    private static String num(double v) {
        return Double.isFinite(v) ? g(v, 6) : "-";
    }

    /** A number to {@code digits} significant digits without trailing zeros ("4.7", "2.5e-07"). */
    static String g(double v, int digits) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        String s = String.format(java.util.Locale.ROOT, "%." + digits + "g", v);
        int e = s.indexOf('e');
        String mant = e < 0 ? s : s.substring(0, e);
        if (mant.contains(".")) {
            mant = mant.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return e < 0 ? mant : mant + s.substring(e);
    }

    private static String pct(double v) {
        return Double.isFinite(v) ? String.format("%+.2f %%", 100 * v) : "-";
    }
}
