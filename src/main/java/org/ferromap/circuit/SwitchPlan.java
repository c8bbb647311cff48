package org.ferromap.circuit;

import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * When each pole of the three-pole switch opens. Times are in seconds from the start of the
 * simulation (t = 0, when phase a of the source is at its angle phi). A pole opens either at its
 * commanded instant, or at the first zero of its current after the command, as a breaker or a
 * fused cutout interrupts (common practice of the trade, no single source). Poles never reclose.
 *
 * @param poles the commands for phases a, b, c (exactly three)
 */
public record SwitchPlan(List<PoleCommand> poles) {

    /** How a commanded pole opens. */
    public enum Opening {
        /** At the commanded instant, whatever the current (an ideal disconnector). */
        AT_COMMAND,
        /** At the first zero of the pole current at or after the command. */
        AT_NEXT_CURRENT_ZERO
    }

    /**
     * The command of one pole.
     *
     * @param commandTime s from the start; {@code Double.POSITIVE_INFINITY} for a pole that stays closed
     * @param opening how the pole opens once commanded
     */
    public record PoleCommand(double commandTime, Opening opening) {
        public PoleCommand {
            if (Double.isNaN(commandTime) || commandTime == Double.NEGATIVE_INFINITY) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "pole command time = " + commandTime + " s; expected a time >= 0 s or +infinity (stays closed)");
            }
            if (commandTime < 0) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "pole command time = " + commandTime + " s; expected >= 0 s");
            }
            if (opening == null) {
                opening = Opening.AT_COMMAND;
            }
        }

        /** A pole that stays closed. */
        public static PoleCommand stayClosed() {
            return new PoleCommand(Double.POSITIVE_INFINITY, Opening.AT_COMMAND);
        }

        /** Whether the pole is ever commanded to open. */
        public boolean opens() {
            return commandTime != Double.POSITIVE_INFINITY;
        }
    }

    public SwitchPlan {
        if (poles == null || poles.size() != 3) {
            throw new FerromapException(MessageKey.BAD_REQUEST,
                    "a switch plan needs 3 pole commands; got " + (poles == null ? "none" : poles.size()));
        }
        for (PoleCommand p : poles) {
            if (p == null) {
                throw new FerromapException(MessageKey.MISSING_KEY, "a pole command of the switch plan is missing");
            }
        }
        poles = List.copyOf(poles);
    }

    /** Every pole stays closed. */
    public static SwitchPlan allClosed() {
        return new SwitchPlan(List.of(PoleCommand.stayClosed(), PoleCommand.stayClosed(), PoleCommand.stayClosed()));
    }

    /** The given phases (0, 1, 2 for a, b, c) open at instant t, s; the others stay closed. */
    public static SwitchPlan openAt(double t, int... phases) {
        return allClosed().with(new PoleCommand(t, Opening.AT_COMMAND), phases);
    }

    /** The given phases are commanded at t, s, and each opens at its next current zero. */
    public static SwitchPlan openAtCurrentZero(double t, int... phases) {
        return allClosed().with(new PoleCommand(t, Opening.AT_NEXT_CURRENT_ZERO), phases);
    }

    /** The command of pole {@code phase}. */
    public PoleCommand pole(int phase) {
        checkPhase(phase);
        return poles.get(phase);
    }

    /** A copy with these phases given command c. */
    public SwitchPlan with(PoleCommand c, int... phases) {
        List<PoleCommand> p = new ArrayList<>(poles);
        for (int k : phases) {
            checkPhase(k);
            p.set(k, c);
        }
        return new SwitchPlan(p);
    }

    private static void checkPhase(int phase) {
        if (phase < 0 || phase > 2) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "phase index " + phase + "; expected 0, 1 or 2 (a, b, c)");
        }
    }
}
