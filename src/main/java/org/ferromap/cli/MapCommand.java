package org.ferromap.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.ferromap.cli.run.MapPlanner;
import org.ferromap.cli.run.ResumeTiles;
import org.ferromap.maps.BalanceCell;
import org.ferromap.maps.FoldBoundaries;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.MapLayer;
import org.ferromap.maps.ProgressListener;
import org.ferromap.maps.StudyMap;
import org.ferromap.maps.StudyMapResult;
import org.ferromap.maps.StudyMapSettings;
import org.ferromap.maps.StudyPlane;
import org.ferromap.maps.TileStore;
import org.ferromap.report.Json;
import org.ferromap.report.MapReport;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** A map of the study over two parameters: balance categories, peak, time-domain ensembles, fold curves. */
@Command(name = "map", description = {
    "Map the study over two parameters: which steady states exist (safe, at-risk, ferroresonant-only),",
    "the peak of the worst one, the share of switching events ending in ferroresonance, and the fold",
    "curves and cusps drawn over them. Axes default to the study's map: section; options override them.",
    "Writes charts (PNG 300 dpi, SVG, PDF), CSV and JSON under <out>/<study>/map. Progress goes to stderr;",
    "Ctrl-C keeps the finished tiles (under <out>/.tiles/<study>) and a rerun resumes from them.",
    "Exit 0 done, 1 a computation failed or was stopped, 2 a bad request (nothing written)."})
final class MapCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Option(names = "--x", paramLabel = "PARAM", description = "Parameter on the x axis (e.g. source, cable-length).")
    String x;
    @Option(names = "--x-from", paramLabel = "Q", description = "First x value with its unit (e.g. '100 m'), or a plain number: per unit of the study's value.")
    String xFrom;
    @Option(names = "--x-to", paramLabel = "Q", description = "Last x value.")
    String xTo;
    @Option(names = "--x-steps", paramLabel = "N", description = "Number of x values, both ends included (default: the study's, or " + MapPlanner.DEFAULT_STEPS + ").")
    Integer xSteps;
    @Option(names = "--x-scale", paramLabel = "SCALE", description = "linear or log.")
    String xScale;
    @Option(names = "--y", paramLabel = "PARAM", description = "Parameter on the y axis.")
    String y;
    @Option(names = "--y-from", paramLabel = "Q", description = "First y value.")
    String yFrom;
    @Option(names = "--y-to", paramLabel = "Q", description = "Last y value.")
    String yTo;
    @Option(names = "--y-steps", paramLabel = "N", description = "Number of y values.")
    Integer ySteps;
    @Option(names = "--y-scale", paramLabel = "SCALE", description = "linear or log.")
    String yScale;
    @Option(names = "--layers", paramLabel = "LIST", split = ",",
            description = "Any of balance,peak,time,folds (default: the study's analyses: map: layers, else balance,peak,folds).")
    List<String> layers;
    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: one per processor).")
    Integer threads;
    @Option(names = "--refine", paramLabel = "on|off",
            description = "Adaptive refinement from a coarse lattice (default on); off computes every cell.")
    String refine;
    @Option(names = "--angles", paramLabel = "N", description = "Switching angles per cell for the time layer (default 8).")
    Integer angles;
    @Option(names = "--residual-flux", paramLabel = "LIST", split = ",",
            description = "Residual flux magnitudes, pu of the rated peak flux, each r > 0 used as +r and -r (default 0,0.8).")
    List<String> residualFlux;
    @Option(names = "--max-periods", paramLabel = "N", description = "Longest simulation of one event, source periods (default 600).")
    Integer maxPeriods;

    @Override
    int work() {
        Study s = study.read();
        StudyParameters sp = new StudyParameters(s);
        StudyPlane plane = MapPlanner.plane(sp, new MapPlanner.AxisRequest(x, xFrom, xTo, xSteps, xScale),
                new MapPlanner.AxisRequest(y, yFrom, yTo, ySteps, yScale));
        StudyMapSettings settings = MapPlanner.settings(s, new MapPlanner.SettingsRequest(layers, angles, residualFlux,
                maxPeriods, MapPlanner.onOff("--refine", refine)));
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        LocalPoolExecutor executor = new LocalPoolExecutor(n); // BAD_REQUEST for n < 1
        StudyMap.checkMemory(plane, settings);
        Path target = study.folderFor("map");
        TileStore tiles = ResumeTiles.store(study.out, study.name());
        StudyMapResult r;
        Path dir;
        try (OutputFolder f = OutputFolder.open(target)) {
            r = StudyMap.run(plane, settings, executor, tiles, ProgressListener.forStream(err()), n);
            MapReport.write(r, f.staging(), List.of());
            dir = f.commit();
        }
        ResumeTiles.forget(tiles, r);
        if (study.json) {
            out().println(Json.text(MapReport.json(r)));
        } else {
            summary(s, r, dir);
        }
        return Main.OK;
    }

    private void summary(Study s, StudyMapResult r, Path dir) {
        out().println(s.title());
        out().println("  x: " + r.plane().x().axis().describe());
        out().println("  y: " + r.plane().y().axis().describe());
        out().println("  layers: " + MapLayer.names(r.layers()));
        if (r.balance() != null) {
            long[] n = new long[4];
            for (double c : r.balance().layer(0)) {
                n[Double.isNaN(c) ? 3 : (int) c]++;
            }
            out().printf(Locale.ROOT, "  balance: %d safe, %d at-risk, %d ferroresonant-only%s cells%n", n[BalanceCell.SAFE],
                    n[BalanceCell.AT_RISK], n[BalanceCell.FERRO_ONLY], n[3] > 0 ? ", " + n[3] + " without a result" : "");
        }
        if (r.time() != null) {
            double sum = 0;
            int cells = 0;
            for (double v : r.time().layer(0)) {
                if (!Double.isNaN(v)) {
                    sum += v;
                    cells++;
                }
            }
            out().printf(Locale.ROOT, "  time domain: %s; mean share ending in ferroresonance %.3f%n",
                    r.settings().ensemble().describe(), cells == 0 ? Double.NaN : sum / cells);
        }
        if (r.folds() != null) {
            out().printf(Locale.ROOT, "  fold curves: %d jump-up, %d jump-down, %d cusp(s)%n",
                    r.folds().of(FoldBoundaries.Kind.JUMP_UP).size(), r.folds().of(FoldBoundaries.Kind.JUMP_DOWN).size(),
                    r.folds().cusps().size());
        }
        out().println("  written: " + dir);
    }
}
