package org.ferromap.cli;

import java.nio.file.Path;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.ArresterModel;
import org.ferromap.maps.DampingResult;
import org.ferromap.maps.DampingSettings;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.report.Json;
import org.ferromap.report.OutputFolder;
import org.ferromap.study.Study;
import org.ferromap.units.Dimension;
import org.ferromap.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** The smallest damping load that removes the risky region, confirmed in the time domain; the arrester's duty. */
@Command(name = "damping", header = "Size the smallest damping load that removes the risk; an arrester's energy duty.",
        description = {
    "The smallest resistive load (or damping resistor) that removes bistability at a cable length and voltage, "
            + "from the cusp condition, confirmed by simulating switching events with the load and raised stepwise while "
            + "any ends subharmonic, chaotic or fundamental; and the energy a metal-oxide arrester on the open phase "
            + "absorbs during the worst event, against its rating. Settings: the study's analyses.damping block, then "
            + "these options.",
    "Charts (PNG, SVG, PDF), CSV and JSON go to <out>/<study>/damping. Exit 0 with a result, 1 when a computation "
            + "fails, 2 for a bad study or request (nothing is written)."})
final class DampingCommand extends BaseCommand {

    @Mixin
    StudyOptions study;

    @Mixin
    ThreadOptions threads;

    @Mixin
    LoopPointOptions point;

    @Option(names = "--angles", paramLabel = "N", description = "Switching angles per step (default: the study's, else 8).")
    Integer angles;

    @Option(names = "--arrester", paramLabel = "Q", description = "Rated voltage of an arrester on the open phase, e.g. 30 kV.")
    String arrester;

    @Option(names = "--energy-rating", paramLabel = "Q", description = "The arrester's rated energy, e.g. 4.5 kJ/kV.")
    String energyRating;

    @Option(names = "--duration", paramLabel = "Q", description = "Duration of the event for the arrester energy, e.g. 10 s.")
    String duration;

    @Override
    int work() {
        Study s = study.read();
        DampingSettings settings = DampingSettings.from(s);
        Double length = point.length(s);
        if (length != null) {
            settings = settings.withLength(length);
        }
        Double voltage = point.voltage(s);
        if (voltage != null) {
            settings = settings.withVoltage(voltage);
        }
        if (angles != null) {
            settings = settings.withEnsemble(settings.ensemble().withAngles(angles));
        }
        if (arrester != null) {
            ArresterModel a = ArresterModel.ofRating(positive(Quantities.si(arrester, Dimension.VOLTAGE), "--arrester " + arrester));
            settings = settings.withArrester(a);
        }
        if (energyRating != null) {
            if (settings.arrester() == null) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "--energy-rating needs an arrester: --arrester RATED-VOLTAGE "
                        + "or analyses.damping.arrester in the study");
            }
            settings = settings.withArrester(settings.arrester().withEnergyRating(ArresterModel.parseEnergyRating(energyRating)));
        }
        if (duration != null) {
            settings = settings.withEventDuration(positive(Quantities.time(duration, s.frequency()), "--duration " + duration));
        }
        LocalPoolExecutor ex = threads.executor();
        DampingResult r;
        Path dir;
        try (OutputFolder f = OutputFolder.open(study.folderFor("damping"))) {
            r = DeliverableSections.damping(s, settings, ex, f.staging(), null);
            dir = f.commit();
        }
        if (study.json) {
            out().println(Json.text(r));
            return Main.OK;
        }
        var o = out();
        o.println(s.title());
        o.printf("  G_min (cusp condition): %.4g S, %s; the loop's own %.4g S%s%n", r.cuspConductance(), r.cuspMethod(),
                r.existingConductance(), r.bistableAsBuilt() ? " (bistable as built)" : " (no fold pair as built)");
        o.printf("  added: %.4g S%s%n", r.addedConductance(), Double.isNaN(r.loadPower()) ? ""
                : String.format(" = %.4g kW three-phase at rated voltage (%.3g %% of rating), %.4g ohm per phase", r.loadPower() / 1e3,
                r.loadPercent(), r.phaseResistance()));
        o.printf("  at this voltage alone: %.4g S%s%n", r.voltageConductance(), Double.isNaN(r.voltageLoadPower()) ? ""
                : String.format(" (%.4g kW)", r.voltageLoadPower() / 1e3));
        for (DampingResult.Step st : r.steps()) {
            o.printf("  %-32s G %.4g S: %d of %d ferroresonant, %d undetermined, worst %s %.3g pu%s%n", st.label(),
                    st.totalConductance(), st.ferroresonant(), st.events(), st.undetermined(), st.worstMode(), st.worstPeakPu(),
                    st.clear() ? "  CLEAR" : "");
        }
        o.println("  recommended: " + (r.recommended() == null ? "none within the steps" : r.recommended().label()));
        if (r.arrester() != null) {
            DampingResult.Arrester a = r.arrester();
            if (a.duty() == null) {
                o.println("  arrester: simulation failed: " + a.failure());
            } else {
                o.printf("  arrester: %.4g J per cycle, %.4g J over %.3g s against %.4g J rated: %s%n", a.duty().energyPerCycle(),
                        a.duty().eventEnergy(), a.duty().eventDuration(), a.duty().capability(), a.duty().note());
            }
        }
        for (String n : r.notes()) {
            o.println("  note: " + n);
        }
        o.println("  written: " + dir);
        return Main.OK;
    }

    private static double positive(double v, String what) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, what + " is not allowed; expected a value above 0");
        }
        return v;
    }
}
