package org.ferromap.report.sections;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;

/** Sizing a damping resistor at the terminal from the cusp condition, confirmed by simulation (DOMAIN.md section 7). */
public final class DampingSection {

    private DampingSection() {
    }

    /**
     * @param conductance        the circuit's shunt conductance now, S
     * @param dampingConductance the total conductance that removes the fold pair, S
     * @param margin             factor applied to the added conductance for the confirmation runs
     * @param resistor           the resistor to add (with the margin), ohm; infinite when none is needed
     * @param anglesDeg          switching angles of the confirmation runs, deg
     * @param confirm            the confirmation runs with the resistor added
     */
    public record Data(double conductance, double dampingConductance, double margin, double resistor, double[] anglesDeg,
            List<SimulationResult> confirm) { }

    public static void write(Notebook nb, Path notebook, Data d) {
        nb.section("damping", "Damping resistor");
        if (!(d.dampingConductance() > d.conductance())) {
            nb.text("The circuit's own shunt conductance (" + Fmt.si(d.conductance(), "S") + ") already exceeds the "
                    + Fmt.si(d.dampingConductance(), "S") + " that removes the fold pair: no resistor is needed by the balance.");
        } else {
            nb.text("The fold pair disappears once the total shunt conductance reaches " + Fmt.si(d.dampingConductance(), "S")
                    + " (cusp condition); the circuit has " + Fmt.si(d.conductance(), "S") + ". A resistor of "
                    + Fmt.si(d.resistor(), "Ohm") + " at the terminal adds " + Fmt.sig(d.margin(), 3)
                    + " times the missing conductance.");
        }
        if (!d.confirm().isEmpty()) {
            List<List<String>> rows = new ArrayList<>();
            int normal = 0;
            for (int i = 0; i < d.confirm().size(); i++) {
                SimulationResult r = d.confirm().get(i);
                normal += r.mode() == org.ferromap.dynamics.SteadyMode.NORMAL ? 1 : 0;
                rows.add(List.of(Fmt.sig(d.anglesDeg()[i], 4) + " deg", r.mode().label(), Fmt.pu(r.peakPerUnit())));
            }
            nb.text("Confirmation with the resistor added: " + normal + " of " + d.confirm().size()
                    + " switching angles settle in the normal state.");
            nb.table(List.of("switching angle", "settled mode", "peak"), rows);
        }
        List<RunJson> runs = new ArrayList<>();
        for (int i = 0; i < d.confirm().size(); i++) {
            runs.add(new RunJson(d.anglesDeg()[i], d.confirm().get(i).mode().label(), d.confirm().get(i).peakPerUnit()));
        }
        Json.write(new DampingJson(d.conductance(), d.dampingConductance(), d.margin(), d.resistor(), runs),
                Figures.folder(notebook, "damping").resolve("damping.json"));
        nb.text("Data: damping/damping.json.");
        nb.end();
    }

    private record RunJson(double angleDeg, String mode, double peakPu) { }

    private record DampingJson(double conductance, double dampingConductance, double margin, double resistor,
            List<RunJson> confirmation) { }
}
