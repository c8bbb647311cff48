package org.ferromap.cli.run;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationResult;
import org.ferromap.dynamics.SimulationSettings;
import org.ferromap.dynamics.Simulator;
import org.ferromap.dynamics.SteadyMode;
import org.ferromap.maps.BalanceCell;
import org.ferromap.maps.EnsembleSettings;
import org.ferromap.maps.LocalPoolExecutor;
import org.ferromap.maps.MapGrid;
import org.ferromap.maps.ProgressListener;
import org.ferromap.maps.StudyMap;
import org.ferromap.maps.StudyMapResult;
import org.ferromap.maps.StudyMapSettings;
import org.ferromap.maps.StudyPlane;
import org.ferromap.maps.TileStore;
import org.ferromap.report.sections.Fmt;
import org.ferromap.report.sections.MapSection;

/**
 * {@code map}: the study's map (its {@code map:} axes, settings from {@code analyses: map:}), and
 * one simulated waveform for a representative cell of each balance category found: the cell of
 * that category nearest the middle of its region. A safe or ferroresonant-only cell is switched at
 * source angle 0 without residual flux; an at-risk cell is switched through the map's ensemble
 * until an event ends in ferroresonance, to show what the risk looks like (the first event is
 * shown when none does).
 */
final class MapAnalysis implements Analysis {

    @Override
    public String name() {
        return "map";
    }

    @Override
    public Step plan(RunContext ctx, Object settings) {
        StudyMapSettings s = MapPlanner.settings(ctx.study, MapPlanner.SettingsRequest.NONE);
        if (ctx.study.map() == null) {
            ctx.note("map: skipped; the study lists the map analysis but has no map: section with its axes");
            return null;
        }
        StudyPlane plane = MapPlanner.plane(ctx.params, MapPlanner.AxisRequest.NONE, MapPlanner.AxisRequest.NONE);
        StudyMap.checkMemory(plane, s);
        return c -> {
            TileStore store = ResumeTiles.store(c.outRoot, c.studyName);
            StudyMapResult r = StudyMap.run(plane, s, new LocalPoolExecutor(c.threads), store,
                    ProgressListener.forStream(c.progress), c.threads);
            List<MapSection.Representative> reps = representatives(c, r);
            MapSection.write(c.notebook, c.folder, r, reps);
            c.afterCommit.add(() -> ResumeTiles.forget(store, r));
        };
    }

    static List<MapSection.Representative> representatives(RunContext c, StudyMapResult r) {
        List<MapSection.Representative> out = new ArrayList<>();
        MapGrid g = r.balance();
        if (g == null) {
            return out;
        }
        EnsembleSettings e = r.settings().ensemble();
        SimulationSettings sim = SimulationSettings.defaults().withMaxPeriods(e.simulation().maxPeriods());
        String[] labels = {"A", "B", "C"};
        int label = 0;
        for (int cat = 0; cat < 3; cat++) {
            int cell = pick(g, cat);
            if (cell < 0) {
                continue;
            }
            int ix = cell % g.nx();
            int iy = cell / g.nx();
            double x = g.x().value(ix);
            double y = g.y().value(iy);
            EquivalentCircuit ci = r.plane().circuit(x, y);
            double fluxBase = ci.ratedPeak() / ci.omega();
            SimulationResult shown = null;
            String scenario;
            if (cat == BalanceCell.AT_RISK) {
                int tried = 0;
                scenario = null;
                search:
                for (int k = 0; k < e.angles(); k++) {
                    for (double f : e.signedFluxes()) {
                        SimulationResult res = Simulator.simulate(ci, sim.withSourceAngle(e.angle(k))
                                .withInitialState(f * fluxBase, 0));
                        tried++;
                        if (shown == null) {
                            shown = res;
                            scenario = describe(e.angle(k), f);
                        }
                        if (res.mode() != SteadyMode.NORMAL && res.mode() != SteadyMode.UNDETERMINED) {
                            shown = res;
                            scenario = describe(e.angle(k), f) + " (the first of " + tried + " events tried to end in "
                                    + "ferroresonance)";
                            break search;
                        }
                    }
                }
                if (shown.mode() == SteadyMode.NORMAL) {
                    scenario += " (all " + tried + " events of the ensemble settled normal; the first is shown)";
                }
            } else {
                shown = Simulator.simulate(ci, sim.withSourceAngle(0.0));
                scenario = describe(0, 0);
            }
            out.add(new MapSection.Representative(labels[label++], BalanceCell.CATEGORY_NAMES.get(cat), x, y, scenario,
                    ci.ratedPeak(), shown));
        }
        return out;
    }

    private static String describe(double angle, double flux) {
        return "switched at source angle " + Fmt.deg(angle) + " with residual flux " + Fmt.sig(flux, 3) + " pu";
    }

    /** The cell of category cat nearest the mean position of all its cells; -1 when there is none. */
    static int pick(MapGrid g, int cat) {
        double[] c = g.layer(0);
        double sx = 0;
        double sy = 0;
        int n = 0;
        for (int i = 0; i < c.length; i++) {
            if (c[i] == cat) {
                sx += i % g.nx();
                sy += i / g.nx();
                n++;
            }
        }
        if (n == 0) {
            return -1;
        }
        sx /= n;
        sy /= n;
        int best = -1;
        double bestD = Double.POSITIVE_INFINITY;
        for (int i = 0; i < c.length; i++) {
            if (c[i] == cat) {
                double d = Math.hypot(i % g.nx() - sx, i / g.nx() - sy);
                if (d < bestD) {
                    bestD = d;
                    best = i;
                }
            }
        }
        return best;
    }
}
