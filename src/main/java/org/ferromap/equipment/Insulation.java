package org.ferromap.equipment;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Cable insulation materials with the relative permittivity used for the coaxial capacitance
 * (DOMAIN.md §5, values [mem: IEC 60287-1-1], recalled, not re-read).
 */
public enum Insulation {
    XLPE("xlpe", 2.5),
    FILLED_XLPE("filled-xlpe", 3.0),
    EPR("epr", 3.0),
    PVC("pvc", 8.0),
    PE("pe", 2.3),
    IMPREGNATED_PAPER("paper", 4.0),
    OIL_FILLED_PAPER("oil-filled-paper", 3.6),
    BUTYL_RUBBER("butyl-rubber", 4.0);

    /** Where the permittivities come from. */
    public static final String SOURCE = "[mem: IEC 60287-1-1] relative permittivities, recalled";

    private final String studyName;
    private final double permittivity;

    Insulation(String studyName, double permittivity) {
        this.studyName = studyName;
        this.permittivity = permittivity;
    }

    /** The name a study file uses, e.g. "xlpe", "oil-filled-paper". */
    public String studyName() {
        return studyName;
    }

    /** Relative permittivity eps_r, dimensionless. */
    public double permittivity() {
        return permittivity;
    }

    /** All study names, for messages. */
    public static String names() {
        return Arrays.stream(values()).map(Insulation::studyName).collect(Collectors.joining(", "));
    }

    /** Looks a material up by its study name (case-insensitive). */
    public static Insulation fromName(String name) {
        String n = name == null ? "" : name.trim().toLowerCase(Locale.ROOT);
        for (Insulation i : values()) {
            if (i.studyName.equals(n)) {
                return i;
            }
        }
        throw new FerromapException(MessageKey.OUT_OF_RANGE,
                "insulation '" + name + "' is not known; expected one of " + names());
    }
}
