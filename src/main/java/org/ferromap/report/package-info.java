/**
 * Output: charts (XChart, PNG/SVG/PDF), CSV and JSON writers, the HTML notebook, atomic output folders. Draws results; never calls solvers.
 * Study maps are written by {@link org.ferromap.report.MapReport}; the notebook's sections, one
 * class per analysis, are in {@code report.sections}.
 * May use: result types of the solver packages, units, errors.
 */
package org.ferromap.report;
