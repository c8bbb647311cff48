package org.ferromap.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.ComparisonResult;
import org.ferromap.maps.ComparisonSettings;
import org.ferromap.maps.LimitRow;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import org.ferromap.study.StudyException;
import org.ferromap.study.StudyReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Two or more core designs for one rating, side by side and ranked. */
@Command(name = "compare", header = "Compare core designs for one rating, side by side and ranked.",
        description = {
    "Studies that differ in their core data (curve, exciting current, loss): the magnetizing curves overlaid, the "
            + "margin to the jump, the fold-based cable-length limits, the damping load needed, overvoltage maps on the "
            + "same axes and colour scale (cable length 5 m to twice the installed x supply 0.8 to 1.2, or the first "
            + "study's map section with --use-map), and a ranking with its reasons.",
    "Charts (PNG, SVG, PDF), CSV and JSON go to <out>/<first study>/compare. Exit 0 with a result, 1 when a "
            + "computation fails, 2 for a bad study or request (nothing is written)."})
final class CompareCommand extends BaseCommand {

    @Parameters(arity = "2..*", paramLabel = "STUDY", description = "Two or more study files (YAML), equipment form.")
    List<Path> studies;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "notebooks-out",
            description = "Folder that receives <study>/compare (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--json", description = "Print the result as one JSON object on stdout.")
    boolean json;

    @Option(names = "--steps", paramLabel = "NX,NY", split = ",",
            description = "Map cells along each axis (default 40,17).")
    List<Integer> steps;

    @Option(names = "--use-map", description = "Use the first study's map: section for the maps' axes.")
    boolean useMap;

    @Mixin
    ThreadOptions threads;

    @Override
    int work() {
        List<Study> read = new ArrayList<>();
        List<FerromapException> problems = new ArrayList<>();
        for (Path p : studies) {
            try {
                read.add(StudyReader.read(p));
            } catch (StudyException e) {
                problems.add(e);
            }
        }
        if (!problems.isEmpty()) {
            StringBuilder sb = new StringBuilder();
            for (FerromapException e : problems) {
                sb.append(sb.length() == 0 ? "" : "\n").append(e.getMessage());
            }
            throw new FerromapException(problems.get(0).key(), sb.toString());
        }
        ComparisonSettings settings = ComparisonSettings.defaults(read.get(0));
        for (Study s : read) {
            if (!s.isEquipmentForm()) {
                throw new FerromapException(MessageKey.BAD_REQUEST, s.file() + ": a core comparison needs equipment-form studies");
            }
        }
        if (useMap) {
            settings = settings.withStudyMap(read.get(0));
        }
        if (steps != null) {
            if (steps.size() != 2 || steps.get(0) < 2 || steps.get(1) < 2 || steps.get(0) > 400 || steps.get(1) > 400) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "--steps " + steps + " is not allowed; expected NX,NY, each 2 to 400");
            }
            settings = settings.withSteps(steps.get(0), steps.get(1));
        }
        LocalPoolExecutor ex = threads.executor();
        Path target = folder();
        ComparisonResult r;
        Path dir;
        try (OutputFolder f = OutputFolder.open(target)) {
            r = DeliverableSections.compare(read, settings, ex, f.staging(), null);
            dir = f.commit();
        }
        if (json) {
            out().println(Json.text(r));
            return Main.OK;
        }
        var o = out();
        o.println("Core comparison (" + read.size() + " designs)");
        for (ComparisonResult.Ranked k : r.ranking()) {
            o.println("  " + k.rank() + ". " + k.study());
            for (String reason : k.reasons()) {
                o.println("       " + reason);
            }
        }
        o.println("  designs:");
        for (ComparisonResult.Design d : r.designs()) {
            o.printf("    %s: installed %s, worst stable %.3g pu, jump-up fold %.3g x source, cusp %s, limits %s, "
                    + "damping load %.4g kW, map at risk %.0f %%%n", d.name(), d.category(), d.worstPeakPu(), d.jumpUpMargin(),
                    LimitsCommand.metres(d.cuspLength()), d.limits().stream().map(LimitRow.MarginLimit::length)
                            .map(LimitsCommand::metres).toList(), d.dampingLoad() / 1e3, 100 * d.riskShare());
        }
        for (String n : r.notes()) {
            o.println("  note: " + n);
        }
        o.println("  written: " + dir);
        return Main.OK;
    }

    private Path folder() {
        String f = studies.get(0).getFileName().toString();
        int dot = f.lastIndexOf('.');
        Path base = out.resolve(dot > 0 ? f.substring(0, dot) : f);
        if (Files.exists(base) && !Files.isDirectory(base)) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, base + " exists and is not a folder; choose another --out");
        }
        return base.resolve("compare");
    }
}
