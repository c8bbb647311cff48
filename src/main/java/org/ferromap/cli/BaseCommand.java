package org.ferromap.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.ferromap.errors.FerromapException;
import picocli.CommandLine;

/**
 * What every verb shares: streams from picocli (so tests run commands in-process), and the one
 * place where failures become messages and exit codes. A verb implements {@link #work()}.
 */
@CommandLine.Command(mixinStandardHelpOptions = true, sortOptions = false)
abstract class BaseCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    PrintWriter out() {
        return spec.commandLine().getOut();
    }

    PrintWriter err() {
        return spec.commandLine().getErr();
    }

    /** Does the verb's work; returns the exit code. Throws FerromapException for failures. */
    abstract int work() throws Exception;

    @Override
    public final Integer call() {
        try {
            return work();
        } catch (FerromapException e) {
            err().println("ferromap " + spec.name() + ": " + e.getMessage());
            err().flush();
            return e.key().isInputError() ? Main.BAD_INPUT : Main.FAILED;
        } catch (OutOfMemoryError e) {
            err().println("ferromap " + spec.name() + ": out of memory; ask for a smaller grid or raise the heap with FERROMAP_JAVA_OPTS=-Xmx...");
            return Main.BAD_INPUT;
        } catch (Exception e) {
            // A bug, not the user's fault: say so plainly, without a stack trace, and ask for a report.
            err().println("ferromap " + spec.name() + ": internal error (" + e.getClass().getSimpleName()
                    + (e.getMessage() == null ? "" : ": " + e.getMessage()) + "); please report it with the study file");
            return Main.FAILED;
        }
    }
}
