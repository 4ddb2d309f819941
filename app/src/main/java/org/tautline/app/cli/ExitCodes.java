package org.tautline.app.cli;

/**
 * The exit statuses of the {@code tautline} commands; the README lists them.
 *
 * <p>0 and 1 follow common practice (success, error); 2 is picocli's for a command line it cannot parse. A
 * sweep that ends early has its own status per cause, so a script can tell a stop it may resume from a limit
 * that needs a change of plan or a rig that needs repair. A stop signal (Ctrl-C is SIGINT, {@code kill} sends
 * SIGTERM) ends the process with the usual 128 + signal number once the output is off, the journal ends as
 * cancelled and the way to resume has been printed: 130 for SIGINT, 143 for SIGTERM (common practice). A command
 * that qualifies ({@code demo}, {@code fit}, {@code report}, {@code lot --add}) ends with its verdict: 0 PASS,
 * 10 FAIL, 11 NOT_DETERMINABLE.
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
    /** A qualification whose verdict is FAIL: some limit is not met, beyond the measurement's uncertainty. */
    static final int VERDICT_FAIL = 10;
    /** A qualification whose verdict is NOT_DETERMINABLE: the uncertainty, a figure not measured, or a caution. */
    static final int VERDICT_NOT_DETERMINABLE = 11;

    private ExitCodes() {
    }

    /**
     * @param verdict a qualification's verdict, absent when no specification was given
     * @return 0 for PASS or no verdict, {@link #VERDICT_FAIL} or {@link #VERDICT_NOT_DETERMINABLE}
     */
    static int of(java.util.Optional<org.tautline.analysis.verdict.Verdict> verdict) {
        return verdict.map(v -> switch (v.outcome()) {
            case PASS -> OK;
            case FAIL -> VERDICT_FAIL;
            case NOT_DETERMINABLE -> VERDICT_NOT_DETERMINABLE;
        }).orElse(OK);
    }
}
