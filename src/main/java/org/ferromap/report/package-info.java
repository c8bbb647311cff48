/**
 * Output: charts (XChart, PNG/SVG/PDF), CSV and JSON writers, the HTML notebook, atomic output folders. Draws results; never calls solvers.
 * May use: result types of the solver packages, units, errors.
 */
package org.ferromap.report;
