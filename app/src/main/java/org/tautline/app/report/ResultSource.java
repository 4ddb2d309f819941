package org.tautline.app.report;

/**
 * How the modes of a reported result were obtained: taken as a run folder's result file records them, or fitted again
 * from its FRF because there was none to take, which the report says plainly.
 *
 * @param sentence what the report says of it, one sentence; empty when there is nothing to say (a result that was
 *        neither read from nor written to a run folder)
 * @param refitted whether the FRF was fitted again by the report
 */
public record ResultSource(String sentence, boolean refitted) {
    /** A result that was neither read from nor written to a run folder. */
    public static final ResultSource NONE = new ResultSource("", false);
    /** Modes taken from the folder's result file. */
    public static final ResultSource RECORDED = new ResultSource("Modes as recorded in " + RunDirectory.RESULT
            + " with this " + RunDirectory.FRF + " (the SHA-256 it names is that of " + RunDirectory.FRF + "); the FRF"
            + " was not fitted again.", false);
    /** Modes of the workbench's result, written to the folder with its report. */
    public static final ResultSource SHOWN = new ResultSource("Modes as shown in the workbench when this report was"
            + " exported, recorded in " + RunDirectory.RESULT + " beside it; the FRF was not fitted again.", false);

    /**
     * @param why why the FRF was fitted again, a clause ("the folder has no result.json")
     * @return modes fitted again by the report
     */
    public static ResultSource refitted(String why) {
        return new ResultSource("Modes re-fitted from " + RunDirectory.FRF + " by this report, because " + why + ":"
                + " poles chosen by hand at the test are not known here, so the modes and the verdict may differ from"
                + " the run's.", true);
    }
}
