package org.tautline.analysis;

/** Receives progress of long computations; called on the computing thread. */
@FunctionalInterface
public interface ProgressListener {

    /** A listener that ignores progress. */
    ProgressListener NONE = (done, total) -> { };

    /**
     * Reports progress.
     *
     * @param done units of work done so far (frames read, lines parsed, ...)
     * @param total units of work in all, or -1 when unknown
     */
    void progress(long done, long total);
}
