/**
 * Parameter maps: a generic engine that evaluates a pure {@link org.ferromap.maps.CellFunction}
 * over the grid of two {@link org.ferromap.maps.Axis axes}.
 *
 * <p>{@link org.ferromap.maps.MapRunner#run} checks memory before allocating, cuts the grid into
 * tiles ({@link org.ferromap.maps.WorkUnit}), reuses tiles saved by an interrupted run
 * ({@link org.ferromap.maps.TileStore}), evaluates the rest on a
 * {@link org.ferromap.maps.CellExecutor} ({@link org.ferromap.maps.LocalPoolExecutor} here; a
 * cluster engine can implement the same interface), optionally refines adaptively from a coarse
 * lattice ({@link org.ferromap.maps.RefinementSettings}), and returns a
 * {@link org.ferromap.maps.MapGrid}: one row-major double array plus a computed/inferred flag per
 * cell. {@link org.ferromap.maps.Boundaries} finds where a category changes.
 *
 * <p>The engine does not depend on the physics. The study maps built on it do: a
 * {@link org.ferromap.maps.StudyPlane} (two study parameters, the circuit at any point),
 * {@link org.ferromap.maps.BalanceCell} (category and peak from the single-harmonic balance),
 * {@link org.ferromap.maps.TimeDomainCell} (an ensemble of switching events per cell,
 * {@link org.ferromap.maps.EnsembleSettings}), {@link org.ferromap.maps.FoldBoundaries} (fold
 * curves and cusps located by bisection) and {@link org.ferromap.maps.StudyMap}, which runs the
 * layers asked for ({@link org.ferromap.maps.MapLayer}, {@link org.ferromap.maps.StudyMapSettings})
 * into a {@link org.ferromap.maps.StudyMapResult}.
 *
 * <p>The users' deliverables are computed here too, on the same executors (docs/DELIVERABLES.md):
 * cable-length limit tables ({@link org.ferromap.maps.LimitTable}, {@link org.ferromap.maps.FoldLimit}),
 * core comparisons ({@link org.ferromap.maps.CoreComparison}), damping sizing and arrester duty
 * ({@link org.ferromap.maps.DampingSizing}, {@link org.ferromap.maps.ArresterDuty}) and the probability of
 * ferroresonance ({@link org.ferromap.maps.SwitchingOdds}, {@link org.ferromap.maps.BinomialInterval}),
 * with {@link org.ferromap.maps.IndexedRuns} for independent jobs and
 * {@link org.ferromap.maps.SwitchingEnsemble} for fixed sets of switching events.
 *
 * <p>May use: balance, continuation, dynamics, orbits, circuit, equipment, study, units, errors.
 */
package org.ferromap.maps;
