package org.ferromap.cli;

import java.nio.file.Path;
import org.ferromap.circuit.EquivalentCircuit;
import org.ferromap.dynamics.SimulationBenchmark;
import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.report.Json;
import org.ferromap.study.Study;
import org.ferromap.study.StudyReader;
import org.ferromap.units.Form;
import org.ferromap.units.Quantities;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * Speed benchmarks: figures for docs/BENCHMARKS.md, nothing asserted and nothing written.
 * {@code bench simulate} times the single-phase integration that a simulation does
 * ({@link SimulationBenchmark}), the same work as the peer program {@code gsl_circuit.c}.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Speed benchmarks (figures only; see docs/BENCHMARKS.md).",
        subcommands = {BenchCommand.Simulate.class})
final class BenchCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /**
     * The JSON of {@code bench simulate}.
     *
     * @param study the study's title
     * @param circuit what was integrated
     * @param sourcePeak source peak used, V
     * @param periods source periods integrated from rest (lambda = 0, v = 0)
     * @param repeat integrations timed in one process
     * @param rtol relative tolerance (also absolute, per unit of the rated peak)
     * @param engine "lean DOP853" or "Hipparchus DormandPrince853Integrator"
     * @param medianSeconds median wall time of one integration, s
     * @param medianCpuSeconds median CPU time of the benchmark thread for one integration, s
     * @param rhsEvaluations right-hand-side evaluations of one integration
     * @param finalFlux flux linkage at the end, Wb-turn
     * @param finalVoltage terminal voltage at the end, V
     * @param peakVoltageLast10 largest |v| among the output samples of the last 10 periods, V
     * @param status how the integration ended
     */
    record BenchJson(String study, String circuit, double sourcePeak, int periods, int repeat, double rtol,
                     String engine, double medianSeconds, double medianCpuSeconds, long rhsEvaluations,
                     double finalFlux, double finalVoltage, double peakVoltageLast10, String status) { }

    /** {@code ferromap bench simulate STUDY --periods N --repeat R [--rtol X] [--source Q] [--json]}. */
    @Command(name = "simulate", description = {
        "Integrate the study's single-phase circuit from rest for N source periods with "
                + SimulationBenchmark.SAMPLES_PER_PERIOD + " output samples a period, R times in one warm process; "
                + "print the median time and the right-hand-side evaluations.",
        "Equipment studies use their reduced circuit. The same work as the peer program gsl_circuit.c "
                + "(see docs/BENCHMARKS.md). The status says how the integration ended; exit 2 for bad input, 1 when "
                + "Hipparchus's integrator (--hipparchus) throws."})
    static final class Simulate extends BaseCommand {

        @Parameters(index = "0", paramLabel = "STUDY", description = "Study file (YAML).")
        Path study;

        @Option(names = "--periods", paramLabel = "N", defaultValue = "1000",
                description = "Source periods per integration, >= 10 (default ${DEFAULT-VALUE}).")
        int periods;

        @Option(names = "--repeat", paramLabel = "R", defaultValue = "11",
                description = "Integrations timed; the median is reported (default ${DEFAULT-VALUE}).")
        int repeat;

        @Option(names = "--rtol", paramLabel = "X", defaultValue = "1e-8",
                description = "Relative tolerance, also absolute per unit of the rated peak (default ${DEFAULT-VALUE}).")
        double rtol;

        @Option(names = "--source", paramLabel = "Q",
                description = "Source peak voltage instead of the study's (20 kV peak; an rms value is converted).")
        String source;

        @Option(names = "--hipparchus",
                description = "Time Hipparchus's DormandPrince853Integrator on the same work instead of the lean integrator.")
        boolean hipparchus;

        @Option(names = "--json", description = "Print the figures as one JSON object on stdout.")
        boolean json;

        @Override
        int work() {
            if (periods < 10) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "--periods = " + periods + " is not allowed; expected at least 10 source periods");
            }
            if (repeat < 1) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "--repeat = " + repeat + " is not allowed; expected at least 1");
            }
            if (!(rtol >= 1e-14 && rtol < 1)) {
                throw new FerromapException(MessageKey.OUT_OF_RANGE,
                        "--rtol = " + rtol + " is not allowed; expected a value in [1e-14, 1)");
            }
            Study s = StudyReader.read(study);
            EquivalentCircuit c = s.circuit();
            if (source != null) {
                double peak = Quantities.voltage(source).peak(Form.PEAK);
                if (!(peak > 0)) {
                    throw new FerromapException(MessageKey.OUT_OF_RANGE,
                            "--source '" + source + "' is not allowed; expected a peak voltage > 0 (20 kV peak)");
                }
                c = c.withSourcePeak(peak);
            }
            SimulationBenchmark.Result r;
            if (hipparchus) {
                try {
                    r = SimulationBenchmark.runHipparchus(c, periods, repeat, rtol);
                } catch (RuntimeException e) {
                    // Hipparchus throws where the lean integrator returns a status: a result, said plainly
                    throw new FerromapException(MessageKey.INTEGRATION_FAILED,
                            "Hipparchus's DormandPrince853Integrator failed: " + e.getMessage(), e);
                }
            } else {
                r = SimulationBenchmark.run(c, periods, repeat, rtol);
            }
            String what = s.isEquipmentForm() ? "reduced single-phase circuit (" + s.exactness().explanation() + ")"
                    : "single-phase circuit";
            BenchJson j = new BenchJson(s.title(), what, c.sourcePeak(), periods, repeat, rtol,
                    hipparchus ? "Hipparchus DormandPrince853Integrator" : "lean DOP853", r.medianSeconds(),
                    r.medianCpuSeconds(), r.rhsEvaluations(), r.finalFlux(), r.finalVoltage(), r.peakVoltageLast10(),
                    r.status().name());
            if (json) {
                out().println(Json.text(j));
            } else {
                out().printf("%s: %d periods x %d, rtol %.1e, source %.6g V peak, %s%n", s.title(), periods, repeat,
                        rtol, c.sourcePeak(), j.engine());
                out().printf("  median %.4f s wall, %.4f s CPU; %d right-hand-side evaluations%n", r.medianSeconds(),
                        r.medianCpuSeconds(), r.rhsEvaluations());
                out().printf("  end: lambda %.9e Wb-turn, v %.9e V; peak |v| over the last 10 periods %.6e V (%s)%n",
                        r.finalFlux(), r.finalVoltage(), r.peakVoltageLast10(), r.status());
            }
            return Main.OK;
        }
    }
}
