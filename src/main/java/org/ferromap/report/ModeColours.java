package org.ferromap.report;

import java.awt.Color;

/** One colour per settled mode, the same in every deliverable chart: normal green, fundamental red, and so on. */
final class ModeColours {

    private ModeColours() {
    }

    /** The colour of a mode by its label (as {@code SteadyMode.label()} writes it). */
    static Color of(String mode) {
        return switch (mode) {
            case "normal" -> Palette.SAFE.darker();
            case "fundamental" -> Palette.FERRO_ONLY;
            case "subharmonic" -> Palette.AT_RISK.darker();
            case "quasi-periodic" -> new Color(86, 180, 233);
            case "chaotic" -> new Color(120, 40, 140);
            default -> Color.GRAY;
        };
    }
}
