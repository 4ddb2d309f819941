package org.tautline.app.cli;

/**
 * The exit statuses of the {@code tautline} commands; the README lists them.
 *
 * <p>0 and 1 follow common practice (success, error); 2 is picocli's for a command line it cannot parse. A
 * sweep that ends early has its own status per cause, so a script can tell a stop it may resume from a limit
 * that needs a change of plan or a rig that needs repair. A stop signal (Ctrl-C is SIGINT, {@code kill} sends
 * SIGTERM) ends the process with the usual 128 + signal number once the output is off, the journal ends as
 * cancelled and the way to resume has been printed: 130 for SIGINT, 143 for SIGTERM (common practice).
 */
final class ExitCodes {
    /** Done: a sweep ran to its end, a file was written. */
    static final int OK = 0;
    /** An error: bad input, a rig that could not be opened or that cannot run the plan (nothing was excited). */
    static final int ERROR = 1;
    /** A sweep was stopped before its end; the completed steps are journaled and {@code resume} continues it. */
    static final int SWEEP_STOPPED = 3;
    /** A sweep stopped at a safety limit; the completed steps are journaled. */
    static final int SWEEP_LIMIT = 4;
    /** A sweep stopped by a rig or link fault; the completed steps are journaled and {@code resume} continues it. */
    static final int SWEEP_FAULT = 5;

    private ExitCodes() {
    }
}
