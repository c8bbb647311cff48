/**
 * The notebook run behind {@code ferromap run}: one {@link org.ferromap.cli.run.Analysis} per name
 * of a study's {@code analyses:} section, each checking its settings first and then computing its
 * results and handing them to its section class in {@code report.sections}; and the map request
 * planning shared with {@code ferromap map} ({@link org.ferromap.cli.run.MapPlanner}).
 * May use: everything.
 */
package org.ferromap.cli.run;
