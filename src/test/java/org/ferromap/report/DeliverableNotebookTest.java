package org.ferromap.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.ferromap.maps.ArresterModel;
import org.ferromap.maps.ComparisonSettings;
import org.ferromap.maps.CoreComparison;
import org.ferromap.maps.DampingSettings;
import org.ferromap.maps.DampingSizing;
import org.ferromap.maps.LimitSettings;
import org.ferromap.maps.LimitTable;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.OddsSettings;
import org.ferromap.maps.SwitchingEnsemble;
import org.ferromap.maps.SwitchingOdds;
import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The four deliverable sections in one notebook, with their files, load cleanly in headless Chromium. */
class DeliverableNotebookTest {

    @TempDir
    Path tmp;

    private static Study equipment(String name, double k) {
        return StudyReader.read(String.join("\n",
                "study: notebook test " + name,
                "frequency: 60 Hz",
                "equipment:",
                "  source: {line-voltage: 24.9 kV}",
                "  transformer:",
                "    rating: 500 kVA",
                "    primary-voltage: 24.9 kV",
                "    connection: delta",
                "    core: separate",
                "    exciting-current: " + k + " %",
                "    no-load-loss: 400 W",
                "    saturation:",
                "      basis: per-unit",
                "      table:",
                "        - {flux: 0.5, current: " + 0.003 * k + "}",
                "        - {flux: 1.0, current: " + 0.01 * k + "}",
                "        - {flux: 1.2, current: " + 0.12 * k + "}",
                "        - {flux: 1.4, current: " + 2.5 * k + "}",
                "      air-core-inductance: 0.03",
                "  cable: {kind: screened, length: 1 km, core-to-sheath: 0.25 uF/km}",
                "  open-phases: 2",
                ""), name + ".yaml");
    }

    private static Study circuit() {
        return StudyReader.read(String.join("\n",
                "study: notebook test circuit",
                "frequency: 60 Hz",
                "circuit:",
                "  source: 15 kV peak",
                "  series-capacitance: 0.2 uF",
                "  shunt-capacitance: 0.05 uF",
                "  core-loss-resistance: 100 kOhm",
                "  magnetizing:",
                "    polynomial: {a: 1.5e-3, b: 1.33e-17, n: 9}",
                ""), "circuit.yaml");
    }

    @Test
    void theFourSectionsRenderInChromium() throws Exception {
        HeadlessBrowser.chromium();
        LocalPoolExecutor ex = new LocalPoolExecutor(2);
        Notebook nb = new Notebook("deliverables");
        Study a = equipment("a", 1.0);
        var limits = LimitTable.compute(a, LimitSettings.defaults(a).withRatings(250e3, 500e3).withOpenPhases(2), ex);
        LimitReport.write(limits, tmp, "limits");
        LimitReport.section(limits, nb, "limits");
        var cmp = CoreComparison.compare(List.of(a, equipment("b", 0.5)), ComparisonSettings.defaults(a).withSteps(3, 2), ex);
        ComparisonReport.write(cmp, tmp, "compare");
        ComparisonReport.section(cmp, nb, "compare");
        var damping = DampingSizing.size(circuit(), DampingSettings.defaults().withEnsemble(SwitchingEnsemble.defaults().withAngles(2))
                .withArrester(ArresterModel.ofRating(12e3).withEnergyRating(4.5)), ex);
        DampingReport.write(damping, tmp, "damping");
        DampingReport.section(damping, nb, "damping");
        var odds = SwitchingOdds.estimate(circuit(), OddsSettings.defaults().withRuns(6), ex);
        OddsReport.write(odds, tmp, "odds");
        OddsReport.section(odds, nb, "odds");
        Path html = nb.write(tmp);
        String page = Files.readString(html);
        for (String id : List.of("limits", "compare", "damping", "odds")) {
            assertTrue(page.contains("<section id=\"" + id + "\">"), id);
        }
        HeadlessBrowser.assertPageLoadsCleanly(html);
    }
}
