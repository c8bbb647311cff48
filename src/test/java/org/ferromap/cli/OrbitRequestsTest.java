package org.ferromap.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Requests the orbits and sweep verbs must refuse: exit 2, a message naming the problem, nothing written. */
class OrbitRequestsTest {

    @TempDir
    Path tmp;

    static Stream<Arguments> refused() {
        return Stream.of(
                Arguments.of("unknown parameter", List.of("orbits", "--vary", "cable-colour", "--from", "1", "--to", "2"), "cable-colour"),
                Arguments.of("frequency changes the bases", List.of("orbits", "--vary", "frequency", "--from", "50 Hz", "--to", "60 Hz"),
                        "frequency"),
                Arguments.of("equipment parameter on a circuit study",
                        List.of("sweep", "--vary", "cable-length", "--from", "1 km", "--to", "2 km", "--steps", "5"), "equipment"),
                Arguments.of("empty range", List.of("orbits", "--vary", "source", "--from", "4.8 V peak", "--to", "4.8 V peak"), "empty"),
                Arguments.of("negative capacitance",
                        List.of("orbits", "--vary", "shunt-capacitance", "--from", "-1 F", "--to", "1 F"), "shunt-capacitance"),
                Arguments.of("zero resistance",
                        List.of("sweep", "--vary", "core-loss-resistance", "--from", "0 ohm", "--to", "10 ohm", "--steps", "5"),
                        "core-loss-resistance"),
                Arguments.of("per unit of an infinite value",
                        List.of("orbits", "--vary", "load-resistance", "--from", "0.5", "--to", "2"), "per unit"),
                Arguments.of("source without peak or rms", List.of("orbits", "--vary", "source", "--from", "4 V", "--to", "5 V peak"),
                        "peak or rms"),
                Arguments.of("wrong kind of quantity", List.of("orbits", "--vary", "source", "--from", "4 uF", "--to", "5 V peak"),
                        "--from"),
                Arguments.of("period 0", List.of("orbits", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak", "--period", "0"),
                        "--period"),
                Arguments.of("period 9", List.of("orbits", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak", "--period", "9"),
                        "1 to 8"),
                Arguments.of("start outside the range",
                        List.of("orbits", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak", "--start", "6 V peak"), "--start"),
                Arguments.of("one step", List.of("sweep", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak", "--steps", "1"),
                        "--steps"),
                Arguments.of("absurd steps",
                        List.of("sweep", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak", "--steps", "1000000"), "--steps"),
                Arguments.of("hours of work", List.of("sweep", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak",
                        "--steps", "2000", "--initial-states", "16", "--transient", "5000"), "source periods"),
                Arguments.of("no initial state", List.of("sweep", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak",
                        "--steps", "5", "--initial-states", "0"), "--initial-states"),
                Arguments.of("threads", List.of("sweep", "--vary", "source", "--from", "4 V peak", "--to", "5 V peak", "--steps", "5",
                        "--threads", "0"), "--threads"),
                Arguments.of("missing --to", List.of("sweep", "--vary", "source", "--from", "4 V peak", "--steps", "5"), "--to"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("refused")
    void refusedWithExitTwoAndNothingWritten(String what, List<String> request, String mentioned) throws Exception {
        Path study = OrbitsCommandTest.cubicStudy(tmp, "4.8 V peak");
        Path out = tmp.resolve("out");
        List<String> args = new ArrayList<>(request);
        args.add(1, study.toString());
        args.addAll(List.of("--out", out.toString()));
        var r = CliTestSupport.run(args.toArray(String[]::new));
        assertEquals(2, r.code(), what + ": " + r.err());
        assertTrue(r.err().contains(mentioned), what + ": " + r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace");
        assertFalse(Files.exists(out), "nothing written for " + what);
    }
}
