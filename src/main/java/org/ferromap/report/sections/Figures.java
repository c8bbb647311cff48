package org.ferromap.report.sections;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.ChartFiles;
import org.ferromap.report.Csv;
import org.ferromap.report.Json;
import org.ferromap.report.Notebook;
import org.knowm.xchart.XYChart;

/**
 * Writing a section's files: each section gets its own folder under the notebook's, and every
 * chart is saved with a CSV and a JSON of the data it draws, then shown in the notebook.
 */
public final class Figures {

    private Figures() {
    }

    /** The section's folder {@code <notebook>/<name>}, created. */
    public static Path folder(Path notebook, String name) {
        Path d = notebook.resolve(name);
        try {
            Files.createDirectories(d);
        } catch (java.io.IOException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot create " + d + ": " + e.getMessage(), e);
        }
        return d;
    }

    /**
     * Saves an XY chart as PNG/SVG/PDF with {@code name.csv} (header and rows) and
     * {@code name.json} (the given value) beside it, and shows it in the notebook.
     *
     * @param nb       the notebook
     * @param notebook the notebook folder
     * @param section  the section's folder name
     * @param name     file base name
     * @param chart    the chart
     * @param caption  figure caption
     * @param header   CSV header
     * @param rows     CSV rows
     * @param json     what name.json holds
     */
    public static void xy(Notebook nb, Path notebook, String section, String name, XYChart chart, String caption,
            List<String> header, List<? extends List<?>> rows, Object json) {
        Path dir = folder(notebook, section);
        ChartFiles.save(chart, dir, name);
        Csv.write(dir.resolve(name + ".csv"), header, rows);
        Json.write(json, dir.resolve(name + ".json"));
        nb.figure(section + "/" + name, caption, List.of(section + "/" + name + ".csv", section + "/" + name + ".json"));
    }

    /** Columns of equal-length arrays as CSV rows. */
    public static List<List<?>> columns(double[]... cols) {
        int n = cols.length == 0 ? 0 : cols[0].length;
        List<List<?>> rows = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            List<Object> r = new ArrayList<>(cols.length);
            for (double[] c : cols) {
                r.add(c[i]);
            }
            rows.add(r);
        }
        return rows;
    }
}
