package org.ferromap.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;

/**
 * The study notebook: one self-contained HTML page (no external scripts or fonts) with sections
 * of text, tables and figures, each figure linked to its PNG, SVG, PDF, CSV and JSON beside it.
 * A small inline script checks on load that every image decoded and records script errors in
 * the page, so a headless browser can verify the notebook.
 */
public final class Notebook {

    /** The cautions every notebook carries (README "Cautions"). */
    public static final List<String> CAUTIONS = List.of(
            "Ferroresonance produces overvoltages of several per unit, destroys surge arresters and can rupture "
                    + "transformer tanks. Switching and field work on open-phase circuits are hazardous; follow your "
                    + "utility's switching and safety rules.",
            "These results are engineering estimates from simplified models (lumped cable, single-valued "
                    + "magnetizing curve without hysteresis, idealised switching). They inform, and do not replace, "
                    + "a study by a licensed professional engineer under the codes and standards that apply where "
                    + "the equipment is installed.",
            "Where the reduction to the single-phase circuit is exact only for the linear network, figures "
                    + "derived from it are screening values; the notebook says so where it applies.");

    private final String title;
    private final List<String> body = new ArrayList<>();

    public Notebook(String title) {
        this.title = title;
    }

    /** Starts a section with a heading and an anchor. */
    public Notebook section(String id, String heading) {
        body.add("<section id=\"" + esc(id) + "\"><h2>" + esc(heading) + "</h2>");
        return this;
    }

    /** Ends the current section. */
    public Notebook end() {
        body.add("</section>");
        return this;
    }

    /** A sub-heading inside the current section (escaped). */
    public Notebook heading(String s) {
        body.add("<h3>" + esc(s) + "</h3>");
        return this;
    }

    /** A paragraph of plain text (escaped). */
    public Notebook text(String s) {
        body.add("<p>" + esc(s) + "</p>");
        return this;
    }

    /** A caution box. */
    public Notebook caution(String s) {
        body.add("<p class=\"caution\">" + esc(s) + "</p>");
        return this;
    }

    /** A bulleted list of plain-text items. */
    public Notebook list(List<String> items) {
        StringBuilder sb = new StringBuilder("<ul>");
        for (String i : items) {
            sb.append("<li>").append(esc(i)).append("</li>");
        }
        body.add(sb.append("</ul>").toString());
        return this;
    }

    /** A table of plain-text cells with a header row. */
    public Notebook table(List<String> header, List<List<String>> rows) {
        StringBuilder sb = new StringBuilder("<table><thead><tr>");
        for (String h : header) {
            sb.append("<th>").append(esc(h)).append("</th>");
        }
        sb.append("</tr></thead><tbody>");
        for (List<String> r : rows) {
            sb.append("<tr>");
            for (String c : r) {
                sb.append("<td>").append(esc(c)).append("</td>");
            }
            sb.append("</tr>");
        }
        body.add(sb.append("</tbody></table>").toString());
        return this;
    }

    /** Preformatted text (the study file as read). */
    public Notebook code(String s) {
        body.add("<pre>" + esc(s) + "</pre>");
        return this;
    }

    /**
     * A figure: the PNG shown, with links to its other forms and data files (relative names in
     * the notebook folder; only files given are linked).
     */
    public Notebook figure(String baseName, String caption, List<String> dataFiles) {
        StringBuilder sb = new StringBuilder("<figure><img src=\"").append(esc(baseName)).append(".png\" alt=\"")
                .append(esc(caption)).append("\" loading=\"eager\"><figcaption>").append(esc(caption))
                .append("<br><span class=\"files\">")
                .append(link(baseName + ".svg", "SVG")).append(' ')
                .append(link(baseName + ".pdf", "PDF")).append(' ')
                .append(link(baseName + ".png", "PNG 300 dpi"));
        for (String f : dataFiles) {
            sb.append(' ').append(link(f, f.substring(f.lastIndexOf('.') + 1).toUpperCase() + ": " + f));
        }
        body.add(sb.append("</span></figcaption></figure>").toString());
        return this;
    }

    /** Raw trusted HTML produced by this package (never user text). */
    Notebook html(String s) {
        body.add(s);
        return this;
    }

    /** Writes index.html into the folder. */
    public Path write(Path folder) {
        Path f = folder.resolve("index.html");
        try {
            Files.writeString(f, render());
            return f;
        } catch (IOException e) {
            throw new FerromapException(MessageKey.CANNOT_WRITE, "cannot write " + f + ": " + e.getMessage(), e);
        }
    }

    String render() {
        StringBuilder sb = new StringBuilder();
        sb.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">")
                .append("<title>").append(esc(title)).append(" - ferromap notebook</title>")
                .append("<style>").append(CSS).append("</style>")
                .append("<script>").append(CHECK_SCRIPT).append("</script></head><body>\n")
                .append("<header><h1>").append(esc(title)).append("</h1><p class=\"meta\">ferromap notebook, written ")
                .append(esc(ZonedDateTime.now().format(DateTimeFormatter.RFC_1123_DATE_TIME))).append("</p></header>\n")
                .append("<section id=\"cautions\"><h2>Cautions</h2>");
        for (String c : CAUTIONS) {
            sb.append("<p class=\"caution\">").append(esc(c)).append("</p>");
        }
        sb.append("</section>\n");
        for (String b : body) {
            sb.append(b).append('\n');
        }
        sb.append("<div id=\"page-check\" data-state=\"pending\"></div></body></html>\n");
        return sb.toString();
    }

    private static String link(String href, String label) {
        return "<a href=\"" + esc(href) + "\">" + esc(label) + "</a>";
    }

    /** HTML-escapes text. */
    public static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }

    private static final String CSS = "body{font-family:system-ui,-apple-system,'Segoe UI',sans-serif;max-width:1100px;"
            + "margin:0 auto;padding:0 1.2em 3em;color:#1d1d1d;line-height:1.45}"
            + "h1{margin-bottom:0.1em}h2{border-bottom:1px solid #ddd;padding-bottom:0.2em;margin-top:1.8em}"
            + ".meta{color:#666;margin-top:0}.caution{background:#fff4e0;border-left:4px solid #d9822b;padding:0.5em 0.8em}"
            + "table{border-collapse:collapse;margin:0.8em 0}th,td{border:1px solid #ccc;padding:0.3em 0.6em;text-align:left}"
            + "th{background:#f3f3f3}td{font-variant-numeric:tabular-nums}"
            + "figure{margin:1.2em 0}figure img{max-width:100%;height:auto;border:1px solid #eee}"
            + "figcaption{color:#444;font-size:0.92em}.files a{margin-right:0.6em}"
            + "pre{background:#f6f6f6;padding:0.8em;overflow-x:auto;font-size:0.88em}";

    /**
     * Records in #page-check whether every image decoded and whether any script error occurred;
     * the headless-browser test reads it.
     */
    private static final String CHECK_SCRIPT = "window.__errors=[];window.addEventListener('error',function(e){"
            + "window.__errors.push(String(e.message||e.type)+' '+(e.target&&e.target.src?e.target.src:''));},true);"
            + "window.addEventListener('load',function(){var bad=[];var imgs=document.images;"
            + "for(var i=0;i<imgs.length;i++){if(!imgs[i].complete||imgs[i].naturalWidth===0){bad.push(imgs[i].getAttribute('src'));}}"
            + "var el=document.getElementById('page-check');el.setAttribute('data-images',String(imgs.length));"
            + "el.setAttribute('data-broken',bad.join(' '));el.setAttribute('data-errors',window.__errors.join(' | '));"
            + "el.setAttribute('data-state',bad.length===0&&window.__errors.length===0?'ok':'failed');});";
}
