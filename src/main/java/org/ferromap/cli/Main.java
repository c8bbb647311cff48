package org.ferromap.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The ferromap command line. Exit codes: 0 success, 1 a computation that failed, 2 bad input
 * (study file, request or output folder), never a stack trace for either.
 */
@Command(name = "ferromap",
        mixinStandardHelpOptions = true,
        versionProvider = Main.Version.class,
        description = "Maps where a cable-fed transformer with open phases is safe from ferroresonance.",
        subcommands = {
            CommandLine.HelpCommand.class,
            CheckCommand.class,
            CurveCommand.class,
            PointsCommand.class,
            BranchCommand.class,
            FoldsCommand.class,
            SimulateCommand.class,
            BenchCommand.class,
            OrbitsCommand.class,
            SweepCommand.class,
            MapCommand.class,
            RunCommand.class,
            LimitsCommand.class,
            CompareCommand.class,
            DampingCommand.class,
            OddsCommand.class,
        })
public final class Main implements Runnable {

    /** Exit code for success. */
    public static final int OK = 0;
    /** Exit code for a computation that failed. */
    public static final int FAILED = 1;
    /** Exit code for input the user must fix. */
    public static final int BAD_INPUT = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    public static void main(String[] args) {
        System.exit(execute(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args));
    }

    /** Runs a command in-process with the given streams; returns its exit code. Tests call this. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("ferromap: " + ex.getMessage());
            err.println("Try 'ferromap " + ex.getCommandLine().getCommandName() + " --help'.");
            return BAD_INPUT;
        });
        return cl.execute(args);
    }

    /** Reads the version from the jar manifest when packaged. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"ferromap " + (v == null ? "development build" : v)};
        }
    }
}
