package org.ferromap.maps;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import java.util.StringJoiner;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/** What a study map draws (the command line's {@code --layers}). */
public enum MapLayer {
    /** The balance category per cell: safe, at-risk, ferroresonant-only ({@link BalanceCell}). */
    BALANCE("balance"),
    /** The peak voltage of the worst stable balance state per cell ({@link BalanceCell}, component 1). */
    PEAK("peak"),
    /** The time-domain ensemble per cell ({@link TimeDomainCell}). */
    TIME("time"),
    /** The fold curves and cusps where the balance category changes ({@link FoldBoundaries}). */
    FOLDS("folds");

    private final String label;

    MapLayer(String label) {
        this.label = label;
    }

    /** The name on the command line and in study files. */
    public String label() {
        return label;
    }

    /** Whether the layer needs the balance grid (every layer but the time-domain one). */
    public boolean needsBalance() {
        return this != TIME;
    }

    /**
     * Layers from their names, e.g. {@code balance,peak,folds}; {@code BAD_REQUEST} naming the
     * allowed ones for anything else.
     */
    public static Set<MapLayer> parse(Iterable<String> names) {
        Set<MapLayer> out = EnumSet.noneOf(MapLayer.class);
        for (String raw : names) {
            String n = raw.trim().toLowerCase(Locale.ROOT);
            if (n.isEmpty()) {
                continue;
            }
            MapLayer found = null;
            for (MapLayer l : values()) {
                if (l.label.equals(n)) {
                    found = l;
                }
            }
            if (found == null) {
                throw new FerromapException(MessageKey.BAD_REQUEST, "unknown map layer '" + raw.trim() + "'; allowed: "
                        + names(EnumSet.allOf(MapLayer.class)));
            }
            out.add(found);
        }
        if (out.isEmpty()) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "no map layer asked for; allowed: "
                    + names(EnumSet.allOf(MapLayer.class)));
        }
        return out;
    }

    /** Comma-separated names. */
    public static String names(Set<MapLayer> layers) {
        StringJoiner j = new StringJoiner(",");
        for (MapLayer l : layers) {
            j.add(l.label);
        }
        return j.toString();
    }
}
