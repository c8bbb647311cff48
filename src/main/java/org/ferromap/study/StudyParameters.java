package org.ferromap.study;

import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.circuit.Reduction;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.SaturationCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.units.Constants;

/**
 * The study as a function of its sweep parameters: the equivalent circuit with one or two
 * parameters set to given values (SI), for branches, fold curves and map cells. Equipment-level
 * parameters (cable length, supply voltage, no-load loss) change the installation and reduce it
 * again, reusing the loop curve, which none of them changes. Immutable and thread-safe.
 */
public final class StudyParameters {

    private final Study study;
    private final SaturationCurve loopCurve;

    public StudyParameters(Study study) {
        this.study = study;
        this.loopCurve = study.isEquipmentForm() ? study.circuit().magnetizing() : null;
    }

    /** The study these parameters belong to. */
    public Study study() {
        return study;
    }

    /** The parameter by its study name, refused with the list of names when unknown or not available for this study. */
    public SweepParameter parameter(String name) {
        SweepParameter p = SweepParameter.byName(name);
        if (p == null || (p.equipmentOnly() && !study.isEquipmentForm())) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "unknown parameter '" + name + "'"
                    + (p != null ? " for a circuit-form study (it needs equipment:)" : "")
                    + "; allowed: " + String.join(", ", SweepParameter.names(study.isEquipmentForm())));
        }
        return p;
    }

    /** The study's own value of a parameter, SI (source: peak V; supply: line V rms). */
    public double valueOf(SweepParameter p) {
        EquivalentCircuit c = study.circuit();
        Installation in = study.equipment();
        return switch (p) {
            case SOURCE -> c.sourcePeak();
            case SOURCE_ANGLE -> c.sourceAngle();
            case SERIES_CAPACITANCE -> c.seriesCapacitance();
            case SHUNT_CAPACITANCE -> c.shuntCapacitance();
            case CORE_LOSS_RESISTANCE -> c.coreLossResistance();
            case LOAD_RESISTANCE -> c.loadResistance();
            case FREQUENCY -> c.omega() / (2 * Math.PI);
            case SOURCE_LINE_VOLTAGE -> requireEquipment(p).sourceLineVoltage();
            case CABLE_LENGTH -> requireEquipment(p).cableLength();
            case NO_LOAD_LOSS -> requireEquipment(p).transformer().noLoadLoss();
        };
    }

    /** The circuit with one parameter set. */
    public EquivalentCircuit circuit(SweepParameter p, double value) {
        return circuit(p, value, null, Double.NaN);
    }

    /** The circuit with two parameters set (q may be null for one). */
    public EquivalentCircuit circuit(SweepParameter p, double pValue, SweepParameter q, double qValue) {
        check(p, pValue);
        if (q != null) {
            check(q, qValue);
        }
        EquivalentCircuit c = study.circuit();
        boolean equipmentChange = p.equipmentOnly() || (q != null && q.equipmentOnly());
        if (equipmentChange) {
            Installation in = study.equipment();
            in = applyEquipment(in, p, pValue);
            if (q != null) {
                in = applyEquipment(in, q, qValue);
            }
            c = Reduction.reduce(in, loopCurve).circuit();
        }
        c = applyCircuit(c, p, pValue);
        if (q != null) {
            c = applyCircuit(c, q, qValue);
        }
        return c;
    }

    private static Installation applyEquipment(Installation in, SweepParameter p, double v) {
        return switch (p) {
            case SOURCE_LINE_VOLTAGE -> in.withSourceLineVoltage(v);
            case CABLE_LENGTH -> in.withCableLength(v);
            case NO_LOAD_LOSS -> in.withTransformer(in.transformer().withNoLoadLoss(v));
            default -> in;
        };
    }

    private static EquivalentCircuit applyCircuit(EquivalentCircuit c, SweepParameter p, double v) {
        return switch (p) {
            case SOURCE -> c.withSourcePeak(v);
            case SOURCE_ANGLE -> c.withSourceAngle(v);
            case SERIES_CAPACITANCE -> c.withSeriesCapacitance(v);
            case SHUNT_CAPACITANCE -> c.withShuntCapacitance(v);
            case CORE_LOSS_RESISTANCE -> c.withCoreLossResistance(v);
            case LOAD_RESISTANCE -> c.withLoadResistance(v);
            case FREQUENCY -> c.withOmega(Constants.omega(v));
            default -> c;
        };
    }

    private void check(SweepParameter p, double v) {
        if (p.equipmentOnly()) {
            requireEquipment(p);
        }
        boolean ok = switch (p) {
            case SOURCE_ANGLE -> Double.isFinite(v);
            case SOURCE, SHUNT_CAPACITANCE, NO_LOAD_LOSS -> v >= 0 && Double.isFinite(v);
            case CORE_LOSS_RESISTANCE, LOAD_RESISTANCE -> v > 0;
            default -> v > 0 && Double.isFinite(v);
        };
        if (!ok) {
            throw new FerromapException(MessageKey.OUT_OF_RANGE, p.studyName() + " = " + v + " (SI) is outside its physical range"
                    + (p == SweepParameter.SOURCE_ANGLE ? " (must be finite)" : " (must be positive)"));
        }
    }

    private Installation requireEquipment(SweepParameter p) {
        if (study.equipment() == null) {
            throw new FerromapException(MessageKey.BAD_REQUEST, p.studyName()
                    + " needs an equipment-form study; allowed here: " + String.join(", ", SweepParameter.names(false)));
        }
        return study.equipment();
    }
}
