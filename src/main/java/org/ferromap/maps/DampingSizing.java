package org.ferromap.maps;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.balance.CuspCondition;
import org.ferromap.balance.Fold;
import org.ferromap.balance.FoldDirection;
import org.ferromap.balance.OperatingPoint;
import org.ferromap.balance.PointKind;
import org.ferromap.balance.SingleHarmonicBalance;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.equipment.Installation;
import org.ferromap.equipment.PolynomialCurve;
import org.ferromap.errors.FerromapException;
import org.ferromap.study.Study;
import org.ferromap.study.StudyParameters;
import org.ferromap.study.SweepParameter;

/**
 * Sizes the smallest resistive load (or damping resistor) that removes the risky region at a
 * given cable length and voltage (DOMAIN.md §7), then confirms it in the time domain.
 *
 * <ol>
 *   <li>The cusp condition gives G_min, the total shunt conductance at and above which the loop has
 *   no fold pair at any voltage: G_min = (w^2 C - a)(n-1)/(2 sqrt(n) w) for i = a lambda + b
 *   lambda^n [der, DOMAIN.md §7], numerically otherwise ({@link SingleHarmonicBalance#cuspCondition}).
 *   A numerical value is checked against the fold scan 0.1 % either side and, where the two
 *   disagree (kinked curves), replaced by bisection on whether the fold scan has a pair.</li>
 *   <li>The switching ensemble is simulated at G_min. If any event ends in a subharmonic, chaotic,
 *   quasi-periodic or fundamental ferroresonant state (or undetermined), the conductance is raised
 *   by the step factor and the ensemble run again, up to the step limit; every step is reported.</li>
 *   <li>The added conductance is expressed as a balanced three-phase resistive load at rated voltage:
 *   the loop sees a load like the core loss, R_loop = k V^2 / P with k = L_eq / Lm (1.5 for
 *   ungrounded primaries, 1 for grounded wye; circuit.Reduction [der]).</li>
 * </ol>
 */
public final class DampingSizing {

    private DampingSizing() {
    }

    /** Sizes the load for a study. */
    public static DampingResult size(Study study, DampingSettings settings, CellExecutor executor) {
        EquivalentCircuit c = circuit(study, settings);
        Installation in = study.isEquipmentForm() ? installation(study, settings) : null;
        SingleHarmonicBalance balance = new SingleHarmonicBalance();
        double[] cusp = cuspConductance(balance, c);
        String method = cusp[1] == 0 ? "closed form (n-1)(w^2 C - a)/(2 sqrt(n) w) [der, DOMAIN.md §7]"
                : cusp[1] == 1 ? "numerical cusp condition (extremum of the fold locus), checked against the fold scan"
                : "bisection on the fold scan (the numerical cusp condition disagreed with it)";
        double g0 = c.conductance();
        double gMin = cusp[0];
        boolean bistable = pair(balance, c);
        double added = Math.max(0, gMin - g0);
        double k = in == null ? Double.NaN : in.loop().inductanceFactor();
        double vRated = in == null ? Double.NaN : in.transformer().primaryVoltage();
        double power = in == null ? Double.NaN : k * vRated * vRated * added;
        double percent = in == null ? Double.NaN : 100 * power / in.transformer().rating();
        double phaseR = in == null || added == 0 ? Double.NaN : 1.0 / (k * added);
        double loopR = added == 0 ? Double.POSITIVE_INFINITY : 1.0 / added;
        double gVoltage = voltageConductance(balance, c, gMin);
        double addedAtVoltage = Math.max(0, gVoltage - g0);
        double powerAtVoltage = in == null ? Double.NaN : k * vRated * vRated * addedAtVoltage;

        List<DampingResult.Step> steps = new ArrayList<>();
        SwitchingEnsemble.Outcome asBuilt = null;
        if (settings.undamped()) {
            asBuilt = settings.ensemble().run(c, executor);
            steps.add(step("as built", g0, 0, 0, asBuilt));
        }
        DampingResult.Step recommended = null;
        double gStart = Math.max(gMin, g0);
        if (asBuilt != null && gStart == g0 && asBuilt.allNormal()) {
            recommended = steps.get(0);
        } else {
            double g = gStart;
            for (int s = 0; s < settings.maxSteps(); s++) {
                EquivalentCircuit damped = withConductance(c, g);
                SwitchingEnsemble.Outcome o = g == g0 && asBuilt != null ? asBuilt : settings.ensemble().run(damped, executor);
                String label = s == 0 ? (gMin > g0 ? "G_min from the cusp condition" : "as built (no fold pair)")
                        : String.format("G_min x %.4g", Math.pow(settings.stepFactor(), s));
                double gAdd = g - g0;
                DampingResult.Step st = step(label, g, gAdd, in == null ? Double.NaN : k * vRated * vRated * gAdd, o);
                steps.add(st);
                if (st.clear()) {
                    recommended = st;
                    break;
                }
                g *= settings.stepFactor();
            }
        }

        DampingResult.Arrester arrester = null;
        if (settings.arrester() != null) {
            SwitchingEnsemble.Outcome o = asBuilt != null ? asBuilt : settings.ensemble().run(c, executor);
            SwitchingEnsemble.Event worst = o.worst();
            double offset = in == null ? 0.0 : ArresterDuty.terminalOffset(in.transformer().connection(), in.openPhases());
            EquivalentCircuit atEvent = c.withSourceAngle(worst.angle());
            ArresterDuty.Result duty = null;
            String failure = null;
            try {
                duty = ArresterDuty.simulate(atEvent, offset, worst.residualFlux() * c.ratedPeak() / c.omega(),
                        settings.arrester(), settings.eventDuration(), ArresterDuty.DEFAULT_TRANSIENT_PERIODS,
                        ArresterDuty.DEFAULT_MEASURED_PERIODS);
            } catch (FerromapException e) {
                if (e.key().isInputError()) {
                    throw e;
                }
                failure = e.getMessage();
            }
            ArresterModel a = settings.arrester();
            List<String> sources = new ArrayList<>();
            sources.add(ArresterModel.ALPHA_SOURCE + (a.alpha() == ArresterModel.DEFAULT_ALPHA ? "" : " (default; the study sets " + a.alpha() + ")"));
            sources.add("reference current: " + (a.referenceCurrent() == ArresterModel.DEFAULT_REFERENCE_CURRENT
                    ? ArresterModel.REFERENCE_CURRENT_SOURCE : "the study"));
            sources.add("reference voltage: " + (a.referenceVoltage() == Math.sqrt(2) * a.ratedVoltage()
                    ? ArresterModel.REFERENCE_VOLTAGE_SOURCE : "the study"));
            sources.add("energy rating: " + (Double.isNaN(a.energyRating()) ? "not given" : "the study"));
            sources.add(String.format("event duration %.4g s: %s", settings.eventDuration(),
                    settings.eventDuration() == DampingSettings.DEFAULT_EVENT_DURATION
                            ? "illustrative default, no source; set analyses.damping.event-duration" : "the study"));
            sources.add("arrester voltage: the open terminal to ground, V_a = W - c e(t) with c = " + offset
                    + " [der from the reduction's table]");
            arrester = new DampingResult.Arrester(a.ratedVoltage(), a.referenceVoltage(), a.referenceCurrent(), a.alpha(),
                    a.energyRating(), sources, worst.angle(), worst.residualFlux(), worst.peakPerUnit(), duty, failure);
        }

        List<String> notes = new ArrayList<>();
        notes.add("G_min removes bistability at every source voltage (the cusp condition), so it is the load that leaves no "
                + "fundamental ferroresonant state whatever the voltage; subharmonic and chaotic states are checked by the "
                + "simulated switching events.");
        if (in != null) {
            notes.add(String.format("A load of P at rated voltage adds P/(k V^2) to the loop's conductance, like the core loss "
                    + "(k = %.3g here, L_eq/Lm). On the secondary it acts through the leakage impedance, neglected here.", k));
        }
        notes.add("Equivalent circuit: " + study.exactness().explanation());
        if (asBuilt != null && asBuilt.allNormal() && bistable) {
            notes.add("As built, every switching event tried settled normal, yet the loop is bistable: a ferroresonant state "
                    + "exists and other instants, residual fluxes or voltage swings can reach it. The cusp value removes it.");
        }
        if (recommended == null) {
            notes.add("Ferroresonant or undetermined outcomes remain after " + settings.maxSteps()
                    + " steps: raise max-steps or the step factor, or consider another mitigation (gang-operated switching, "
                    + "switching at the transformer terminals).");
        }
        return new DampingResult(study.title(), in == null ? Double.NaN : in.cableLength(),
                in == null ? c.sourcePeak() : in.sourceLineVoltage(), c.sourcePeak(), g0, gMin, method, bistable, added, power,
                percent, phaseR, loopR, gVoltage, addedAtVoltage, powerAtVoltage, steps, recommended, arrester,
                settings.ensemble().describe(), notes);
    }

    /** The loop at the settings' length and voltage. */
    static EquivalentCircuit circuit(Study study, DampingSettings s) {
        return circuit(study, s.length(), s.voltage());
    }

    /**
     * A study's loop at a cable length (m, NaN for the study's) and a voltage (supply line-to-line
     * V rms for equipment studies, source peak V for circuit studies; NaN for the study's).
     */
    public static EquivalentCircuit circuit(Study study, double length, double voltage) {
        if (!study.isEquipmentForm()) {
            if (!Double.isNaN(length)) {
                throw new FerromapException(org.ferromap.errors.MessageKey.BAD_REQUEST,
                        "a cable length needs an equipment-form study; this study gives the circuit only");
            }
            return Double.isNaN(voltage) ? study.circuit() : study.circuit().withSourcePeak(voltage);
        }
        StudyParameters p = new StudyParameters(study);
        double l = Double.isNaN(length) ? study.equipment().cableLength() : length;
        double v = Double.isNaN(voltage) ? study.equipment().sourceLineVoltage() : voltage;
        return p.circuit(SweepParameter.CABLE_LENGTH, l, SweepParameter.SOURCE_LINE_VOLTAGE, v);
    }

    private static Installation installation(Study study, DampingSettings s) {
        Installation in = study.equipment();
        if (!Double.isNaN(s.length())) {
            in = in.withCableLength(s.length());
        }
        if (!Double.isNaN(s.voltage())) {
            in = in.withSourceLineVoltage(s.voltage());
        }
        return in;
    }

    /** The circuit with its total shunt conductance raised to g (at least its own): the extra as a load. */
    public static EquivalentCircuit withConductance(EquivalentCircuit c, double g) {
        if (g <= c.conductance()) {
            return c;
        }
        double load = g - 1.0 / c.coreLossResistance();
        return c.withLoadResistance(1.0 / load);
    }

    /**
     * G_min of a circuit, S, and how it was found: {value, 0 closed form | 1 numerical | 2 bisection}.
     */
    public static double[] cuspConductance(SingleHarmonicBalance balance, EquivalentCircuit c) {
        CuspCondition cc = balance.cuspCondition(c);
        double g = cc.dampingConductance();
        if (balance.settings().closedForms() && c.magnetizing() instanceof PolynomialCurve) {
            return new double[] {g, 0};
        }
        boolean above = g > 0 && pair(balance, atConductance(c, g * (1 + CHECK)));
        boolean below = g > 0 && pair(balance, atConductance(c, g * (1 - CHECK)));
        if (g > 0 && !above && below) {
            return new double[] {g, 1};
        }
        if (g == 0 && !pair(balance, atConductance(c, 0))) {
            return new double[] {0, 1};
        }
        // bracket [a, b]: a pair at a, none at b
        double a;
        double b;
        if (above) {
            a = g;
            b = g * 2;
            while (pair(balance, atConductance(c, b))) {
                a = b;
                b *= 2;
            }
        } else {
            b = g > 0 ? g : c.omega() * c.totalCapacitance();
            a = b / 2;
            while (!pair(balance, atConductance(c, a))) {
                b = a;
                a /= 2;
                if (a < 1e-30) {
                    return new double[] {0, 2};
                }
            }
        }
        while (b - a > BISECTION * b) {
            double m = 0.5 * (a + b);
            if (pair(balance, atConductance(c, m))) {
                a = m;
            } else {
                b = m;
            }
        }
        return new double[] {b, 2};
    }

    /** Relative distance at which the fold scan must agree with a numerical cusp conductance. */
    static final double CHECK = 1e-3;
    /** Relative accuracy of a bisected conductance. */
    static final double BISECTION = 1e-7;

    /**
     * The smallest total conductance at which no stable ferroresonant state exists at the
     * circuit's own source voltage, S: bisection (relative 1e-7) between the circuit's own
     * conductance and G_min on whether the balance has a stable ferroresonant point. At most G_min;
     * the circuit's own when it has no such state as built.
     */
    public static double voltageConductance(SingleHarmonicBalance balance, EquivalentCircuit c, double gMin) {
        double a = c.conductance();
        if (!ferroresonantPoint(balance, atConductance(c, a)) || !(gMin > a)) {
            return a;
        }
        double b = gMin;
        if (ferroresonantPoint(balance, atConductance(c, b))) {
            // the single branch can be ferroresonant past the cusp (a capacitive loop): G_min is not enough alone
            return Double.NaN;
        }
        while (b - a > BISECTION * b) {
            double m = 0.5 * (a + b);
            if (ferroresonantPoint(balance, atConductance(c, m))) {
                a = m;
            } else {
                b = m;
            }
        }
        return b;
    }

    private static boolean ferroresonantPoint(SingleHarmonicBalance balance, EquivalentCircuit c) {
        for (OperatingPoint p : balance.operatingPoints(c)) {
            if (p.stable() && p.kind() == PointKind.FERRORESONANT) {
                return true;
            }
        }
        return false;
    }

    /** The circuit with total conductance exactly g (as core loss; only the total enters the balance). */
    private static EquivalentCircuit atConductance(EquivalentCircuit c, double g) {
        return c.withCoreLossResistance(g > 0 ? 1.0 / g : Double.POSITIVE_INFINITY).withLoadResistance(Double.POSITIVE_INFINITY);
    }

    /** Whether the balance has a fold pair (a jump-down fold after a jump-up one). */
    static boolean pair(SingleHarmonicBalance balance, EquivalentCircuit c) {
        boolean up = false;
        for (Fold f : balance.folds(c)) {
            if (f.direction() == FoldDirection.JUMP_UP) {
                up = true;
            } else if (up) {
                return true;
            }
        }
        return false;
    }

    private static DampingResult.Step step(String label, double g, double added, double power, SwitchingEnsemble.Outcome o) {
        SwitchingEnsemble.Event w = o.worst();
        return new DampingResult.Step(label, g, added, power, o.events().size(), o.counts(), o.ferroresonant(), o.undetermined(),
                w == null ? null : w.mode().label(), w == null ? Double.NaN : w.peakPerUnit(), o.allNormal());
    }
}
