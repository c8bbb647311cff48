package org.ferromap.cli.run;

import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.report.sections.Fmt;
import org.ferromap.report.sections.SimulationSection;

/**
 * {@code simulate}: one switching event of the equivalent circuit in the time domain. Settings:
 * {@code cycles} (most source periods, default 2000), {@code angle} (source angle at switching,
 * default the circuit's own), {@code residual-flux} (pu of the rated peak flux, default 0).
 */
final class SimulateAnalysis implements Analysis {

    @Override
    public String name() {
        return "simulate";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("cycles", "angle", "residual-flux"));
        int cycles = s.integer("cycles", SimulationSettings.defaults().maxPeriods(), 30, 1_000_000);
        double angle = s.angle("angle", ctx.study.circuit().sourceAngle());
        double flux = s.number("residual-flux", 0, -2, 2);
        SimulationSettings set = SimulationSettings.defaults().withMaxPeriods(cycles)
                .withTransientPeriods(Math.min(20, cycles / 4)).withSourceAngle(angle);
        return c -> {
            EquivalentCircuit ci = c.study.circuit();
            SimulationResult r = Simulator.simulate(ci, set.withInitialState(flux * ci.ratedPeak() / ci.omega(), 0));
            String label = "The equivalent circuit switched at source angle " + Fmt.deg(angle) + " with residual flux "
                    + Fmt.sig(flux, 3) + " pu, at most " + cycles + " source periods (" + r.periodsSimulated() + " simulated)";
            SimulationSection.write(c.notebook, c.folder, new SimulationSection.Data(c.study.title(), label, ci, angle, r));
        };
    }
}
