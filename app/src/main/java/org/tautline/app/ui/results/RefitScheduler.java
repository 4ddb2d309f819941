package org.tautline.app.ui.results;

import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;

import javax.swing.SwingWorker;

import org.tautline.analysis.modal.ModeSelection;
import org.tautline.app.qualify.QualificationResult;

/**
 * Runs refits off the event thread, one at a time: a newer request supersedes (cancels and ignores) an older one.
 *
 * <p>Call every method on the event thread; the callbacks run there too.
 */
final class RefitScheduler {
    /** What a refit reports back. */
    interface Listener {
        void finished(QualificationResult result);

        void failed(String message);

        void idle();
    }

    private final Listener listener;
    private SwingWorker<QualificationResult, Void> running;
    private long generation;

    RefitScheduler(Listener listener) {
        this.listener = listener;
    }

    void submit(QualificationResult base, ModeSelection selection) {
        // Supersede quietly: the newer refit takes over, so there is no idle moment to report.
        if (running != null) {
            running.cancel(true);
        }
        long mine = ++generation;
        running = new SwingWorker<>() {
            @Override
            protected QualificationResult doInBackground() {
                return Refit.run(base, selection);
            }

            @Override
            protected void done() {
                if (mine != generation) {
                    return;
                }
                running = null;
                try {
                    listener.finished(get());
                } catch (CancellationException e) {
                    listener.idle();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    listener.idle();
                } catch (ExecutionException e) {
                    Throwable cause = e.getCause() == null ? e : e.getCause();
                    listener.failed("the refit with " + selection.size() + " poles failed: "
                            + org.tautline.app.ui.PlainWords.of(cause.getMessage()));
                }
            }
        };
        running.execute();
    }

    /** Cancels the running refit, if any; its result will be ignored. */
    void cancel() {
        if (running != null) {
            generation++;
            running.cancel(true);
            running = null;
            listener.idle();
        }
    }

    boolean isRunning() {
        return running != null;
    }

    /** @return a listener made of three callbacks */
    static Listener of(Consumer<QualificationResult> finished, Consumer<String> failed, Runnable idle) {
        return new Listener() {
            @Override
            public void finished(QualificationResult result) {
                finished.accept(result);
            }

            @Override
            public void failed(String message) {
                failed.accept(message);
            }

            @Override
            public void idle() {
                idle.run();
            }
        };
    }
}
