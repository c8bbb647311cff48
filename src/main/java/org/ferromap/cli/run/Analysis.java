package org.ferromap.cli.run;

/**
 * One analysis the notebook can run (a name of the study's {@code analyses:} section). Planning
 * checks the settings before anything is computed or written, so bad settings end the run with
 * exit 2 and nothing written; the step then computes and writes its section.
 */
interface Analysis {

    /** The analysis's name in study files. */
    String name();

    /**
     * Checks the settings and returns the step to run.
     *
     * @param ctx      what the run knows (the study, its parameters)
     * @param settings the raw settings from the study (a mapping, or null)
     * @return the step, or null to skip the analysis; a skipped analysis adds a note saying why
     *         through {@link RunContext#note}
     * @throws org.ferromap.errors.FerromapException with an input key for bad settings
     */
    Step plan(RunContext ctx, Object settings);

    /** The planned work: computes and writes the section into the notebook. */
    interface Step {
        void run(RunContext ctx);
    }
}
