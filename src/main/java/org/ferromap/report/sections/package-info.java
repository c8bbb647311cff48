/**
 * The notebook's sections, one class per analysis: each takes results already computed (plain
 * records of the solver packages) and writes its text, tables, charts (PNG, SVG, PDF) and the
 * CSV and JSON beside every chart into the notebook folder. A new analysis adds a class here and
 * the step that computes its results in {@code cli.run}. Never calls solvers.
 * May use: what {@code report} may use.
 */
package org.ferromap.report.sections;
