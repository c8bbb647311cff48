package org.ferromap.cli;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.ferromap.report.Json;

/** Runs commands in-process and captures their streams. */
final class CliTestSupport {

    private CliTestSupport() {
    }

    /** A finished command: exit code and the text it printed. */
    record Run(int code, String out, String err) {
        JsonNode json() {
            try {
                return Json.mapper().readTree(out);
            } catch (Exception e) {
                throw new AssertionError("stdout is not JSON: " + out + "\nstderr: " + err, e);
            }
        }
    }

    static Run run(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.execute(new PrintWriter(o, true), new PrintWriter(e, true), args);
        return new Run(code, o.toString(), e.toString());
    }
}
