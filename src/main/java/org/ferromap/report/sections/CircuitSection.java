package org.ferromap.report.sections;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.ReducedCircuit;
import org.ferromap.report.Notebook;
import org.ferromap.study.Study;

/** The single-phase equivalent circuit the analyses use, and how far it can be trusted. */
public final class CircuitSection {

    private CircuitSection() {
    }

    public static void write(Notebook nb, Study s) {
        EquivalentCircuit c = s.circuit();
        nb.section("circuit", "Equivalent circuit");
        nb.text("A source e(t) = E sin(wt + phi) feeds the series capacitance Cs into the transformer terminal, where "
                + "the shunt capacitance Cg, the core-loss resistance, any load and the magnetizing branch sit in parallel "
                + "(DOMAIN.md section 1.1). 1 per unit at the terminal is the rated peak below.");
        List<List<String>> rows = new ArrayList<>();
        rows.add(List.of("frequency", Fmt.sig(c.omega() / (2 * Math.PI), 5) + " Hz"));
        rows.add(List.of("source E (peak)", Fmt.si(c.sourcePeak(), "V") + " = " + Fmt.pu(c.sourcePeak() / c.ratedPeak())));
        rows.add(List.of("source angle phi", Fmt.deg(c.sourceAngle())));
        rows.add(List.of("series capacitance Cs", Fmt.si(c.seriesCapacitance(), "F")));
        rows.add(List.of("shunt capacitance Cg", Fmt.si(c.shuntCapacitance(), "F")));
        rows.add(List.of("core-loss resistance", Double.isInfinite(c.coreLossResistance()) ? "none (lossless)"
                : Fmt.si(c.coreLossResistance(), "Ohm")));
        rows.add(List.of("load resistance", Double.isInfinite(c.loadResistance()) ? "none (unloaded)"
                : Fmt.si(c.loadResistance(), "Ohm")));
        rows.add(List.of("magnetizing branch", c.magnetizing().describe()));
        rows.add(List.of("rated peak (1 pu)", Fmt.si(c.ratedPeak(), "V")));
        rows.add(List.of("exactness", c.exactness().name().toLowerCase().replace('_', ' ')));
        nb.table(List.of("quantity", "value"), rows);
        nb.text("Exactness: " + s.exactness().explanation() + ".");
        ReducedCircuit r = s.reduction();
        if (r != null) {
            nb.text("Reduction: " + r.explanation());
            nb.text("Loop curve: " + r.curveModel() + ". Loop voltage at rated excitation is " + Fmt.sig(r.loopVoltageRatio(), 4)
                    + " times the rated phase-to-neutral voltage; loop capacitance " + Fmt.si(r.loop().capacitance(), "F")
                    + ", source share " + Fmt.sig(r.loop().sourceFraction(), 4) + " of the phase voltage.");
        }
        nb.end();
    }
}
