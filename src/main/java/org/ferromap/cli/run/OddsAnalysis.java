package org.ferromap.cli.run;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.report.sections.OddsSection;

/**
 * {@code odds}: the share of switching angles that end in ferroresonance. Settings: {@code angles}
 * (default 36), {@code residual-flux} (pu, default 0), {@code cycles} (most periods per run,
 * default 600).
 */
final class OddsAnalysis implements Analysis {

    @Override
    public String name() {
        return "odds";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("angles", "residual-flux", "cycles"));
        int n = s.integer("angles", 36, 1, 3600);
        double flux = s.number("residual-flux", 0, -2, 2);
        int cycles = s.integer("cycles", 600, 30, 1_000_000);
        return c -> {
            EquivalentCircuit ci = c.study.circuit();
            SimulationSettings set = SimulationSettings.defaults().withMaxPeriods(cycles)
                    .withInitialState(flux * ci.ratedPeak() / ci.omega(), 0);
            double[] deg = new double[n];
            SimulationResult[] results = new SimulationResult[n];
            Parallel.run(c.threads, n, k -> {
                deg[k] = 360.0 * k / n;
                results[k] = Simulator.simulate(ci, set.withSourceAngle(2 * Math.PI * k / n));
            });
            OddsSection.write(c.notebook, c.folder, new OddsSection.Data(deg, new ArrayList<>(List.of(results)), flux,
                    ci.ratedPeak()));
        };
    }
}
