package org.ferromap.cli.run;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.report.sections.DampingSection;

/**
 * {@code damping}: the resistor at the terminal that removes the fold pair (the cusp condition,
 * DOMAIN.md section 7, found by bisection on the folds: {@link FoldFreeDamping}), with a margin, confirmed by simulating the switching with it added.
 * Settings: {@code margin} (factor on the missing conductance, default 1.25), {@code angles}
 * (confirmation runs, default 8), {@code cycles} (most periods per run, default 600).
 */
final class DampingAnalysis implements Analysis {

    @Override
    public String name() {
        return "damping";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        AnalysisSettings s = AnalysisSettings.of(name(), settings, List.of("margin", "angles", "cycles"));
        double margin = s.number("margin", 1.25, 1, 100);
        int angles = s.integer("angles", 8, 0, 360);
        int cycles = s.integer("cycles", 600, 30, 1_000_000);
        return c -> {
            EquivalentCircuit ci = c.study.circuit();
            double g = ci.conductance();
            double gMin = FoldFreeDamping.totalConductance(new SingleHarmonicBalance(), ci);
            double added = gMin > g ? margin * (gMin - g) : 0;
            double resistor = added > 0 ? 1 / added : Double.POSITIVE_INFINITY;
            List<SimulationResult> confirm = new ArrayList<>();
            double[] deg = new double[added > 0 ? angles : 0];
            if (added > 0 && angles > 0) {
                EquivalentCircuit damped = ci.withLoadResistance(1 / (1 / ci.loadResistance() + added));
                SimulationSettings set = SimulationSettings.defaults().withMaxPeriods(cycles);
                SimulationResult[] rs = new SimulationResult[angles];
                Parallel.run(c.threads, angles, k -> {
                    deg[k] = 360.0 * k / angles;
                    rs[k] = Simulator.simulate(damped, set.withSourceAngle(2 * Math.PI * k / angles));
                });
                confirm.addAll(List.of(rs));
            }
            DampingSection.write(c.notebook, c.folder, new DampingSection.Data(g, gMin, margin, resistor, deg, confirm));
        };
    }
}
