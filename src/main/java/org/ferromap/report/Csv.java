package org.ferromap.report;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * Minimal RFC 4180 CSV writer: a header naming each column with its unit, then rows. Numbers
 * are written with full precision in a locale-independent form; non-finite values as empty cells.
 */
public final class Csv {

    private Csv() {
    }

    /** Writes the header and rows; each row's cells are Number, Boolean, String or null. */
    public static void write(Path file, List<String> header, List<? extends List<?>> rows) {
        try (BufferedWriter w = Files.newBufferedWriter(file)) {
            w.write(line(header));
            for (List<?> r : rows) {
                if (r.size() != header.size()) {
                    throw new IllegalArgumentException("row has " + r.size() + " cells, header " + header.size());
                }
                w.write(line(r));
            }
        } catch (IOException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    private static String line(List<?> cells) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(cell(cells.get(i)));
        }
        return sb.append("\r\n").toString();
    }

    static String cell(Object o) {
        if (o == null) {
            return "";
        }
        if (o instanceof Double d) {
            return d.isNaN() || d.isInfinite() ? "" : number(d);
        }
        if (o instanceof Float f) {
            return number(f.doubleValue());
        }
        String s = o.toString();
        if (s.contains(",") || s.contains("\"") || s.contains("\n") || s.contains("\r")) {
            return '"' + s.replace("\"", "\"\"") + '"';
        }
        return s;
    }

    private static String number(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return String.format(Locale.ROOT, "%.1f", d).replace(".0", "");
        }
        return Double.toString(d).replace('E', 'e');
    }
}
