package org.ferromap.cli.run;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.CuspCondition;
import org.ferromap.balance.FoldMargin;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.sections.CompareSection;
import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;

/**
 * {@code compare}: this study beside others ({@code with}: a study file or a list, relative to
 * this study's folder): stable states, worst peak, jump-up fold, cusp condition.
 */
final class CompareAnalysis implements Analysis {

    @Override
    public String name() {
        return "compare";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("with"));
        List<String> files = s.texts("with");
        if (files.isEmpty()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.compare needs 'with': the study file(s) to compare with");
        }
        List<Study> others = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (String f : files) {
            Path p = ctx.studyFolder().resolve(f);
            if (!Files.isRegularFile(p)) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "analyses.compare.with: " + p + " is not a file");
            }
            others.add(StudyReader.read(p));
            names.add(f);
        }
        return c -> {
            List<CompareSection.Row> rows = new ArrayList<>();
            rows.add(row(c.study.file() == null ? c.studyName : c.study.file().getFileName().toString(), c.study));
            for (int i = 0; i < others.size(); i++) {
                rows.add(row(names.get(i), others.get(i)));
            }
            CompareSection.write(c.notebook, c.folder, rows);
        };
    }

    static CompareSection.Row row(String file, Study s) {
        EquivalentCircuit c = s.circuit();
        SingleHarmonicBalance b = new SingleHarmonicBalance();
        List<String> kinds = new ArrayList<>();
        double worst = Double.NaN;
        for (OperatingPoint p : b.operatingPoints(c)) {
            if (p.stable()) {
                kinds.add(p.kind().label());
                worst = Double.isNaN(worst) ? p.voltagePerUnit() : Math.max(worst, p.voltagePerUnit());
            }
        }
        FoldMargin m = b.margin(c);
        CuspCondition cu = b.cuspCondition(c);
        return new CompareSection.Row(file, s.title(), s.exactness().explanation(), c.sourcePeak() / c.ratedPeak(),
                String.join(" + ", kinds), worst, m.hasFold() ? m.jumpUpSourcePeak() / c.ratedPeak() : Double.NaN, m.ratio(),
                cu.capacitanceRatio(), 1 / FoldFreeDamping.totalConductance(b, c));
    }
}
