package org.ferromap.cli;

import org.ferromap.errors.FerromapException;
import org.ferromap.errors.MessageKey;
import org.ferromap.maps.LocalPoolExecutor;
import picocli.CommandLine.Option;

/** The thread count of verbs that run many independent computations (results do not depend on it). */
final class ThreadOptions {

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads (default: one per processor). Results are the same for any count.")
    Integer threads;

    /** The executor: a local pool stopping cleanly on Ctrl-C. */
    LocalPoolExecutor executor() {
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1 || n > 1024) {
            throw new FerromapException(MessageKey.BAD_REQUEST, "--threads " + n + " is not allowed; expected 1 to 1024");
        }
        return new LocalPoolExecutor(n);
    }
}
