package org.tautline.app.ui;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.time.Instant;

import javax.swing.JOptionPane;
import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import javax.swing.Timer;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.app.SafetyNotice;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.qualify.RigQualification;
import org.tautline.app.ui.results.ResultOrigin;
import org.tautline.app.ui.run.ProgressText;
import org.tautline.app.ui.run.RigConnection;
import org.tautline.app.ui.run.SweepSession;
import org.tautline.app.ui.run.TappedRig;
import org.tautline.app.ui.run.TraceBuffer;
import org.tautline.app.ui.setup.SetupForm;
import org.tautline.analysis.specimen.Specimen;
import org.tautline.analysis.verdict.Specification;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepEvent;
import org.tautline.driver.sweep.SweepPlan;
import org.tautline.driver.sweep.SweepResult;
import org.tautline.driver.sweep.SweepStatus;
import org.tautline.driver.sweep.WallTimeEstimate;

/**
 * Connects the rig, runs, pauses, resumes and cancels sweeps and fits their results, all off the event thread.
 *
 * <p>Every method is called on the event thread; the blocking work runs in {@link SwingWorker}s and
 * comes back through their {@code process} and {@code done}.
 */
final class RunController {
    /** The button that acknowledges the safety cautions and starts the first excitation. */
    static final String START_CHOICE = "I have read the cautions: start";
    private final WorkbenchParts parts;
    private final RigDrivers drivers;
    private final ResultSink results;
    private final TraceBuffer traceBuffer = new TraceBuffer(600);
    private final Timer traceTimer;
    private TappedRig rig;
    private SweepSession session;
    private Snapshot snapshot;
    private boolean running;
    private boolean safetyAcknowledged;
    private final java.util.List<Double> pendingHz = new java.util.ArrayList<>();
    private final java.util.List<Double> pendingMagnitude = new java.util.ArrayList<>();
    private final java.util.List<Double> pendingPhaseDeg = new java.util.ArrayList<>();
    private String connectedDriver = "";
    private Instant sweepStartedAt = Instant.EPOCH;

    /** Where the results of runs and fits go, and word that the result on show is no longer current. */
    interface ResultSink {
        /**
         * @param result a new result, current
         * @param origin when and on which rig it was made
         */
        void show(QualificationResult result, ResultOrigin origin);

        /** @param why what made the result on show not current, as a clause */
        void withdraw(String why);
    }

    /**
     * What a sweep analyses, taken from the setup form on the event thread when Start is pressed: edits made during
     * or after the sweep do not change the analysis of the sweep that ran.
     */
    private record Snapshot(SweepPlan plan, Specimen specimen, Specification specification) {
    }

    RunController(WorkbenchParts parts, RigDrivers drivers, ResultSink results) {
        this.parts = parts;
        this.drivers = drivers;
        this.results = results;
        // Redraw the live charts four times a second rather than on every block or step: each redraw paints
        // the whole chart, and the event thread must stay free for the stop control.
        this.traceTimer = new Timer(250, e -> redrawLive());
    }

    private void redrawLive() {
        parts.run().traces().show(traceBuffer.snapshot());
        if (!pendingHz.isEmpty()) {
            double[] f = pendingHz.stream().mapToDouble(Double::doubleValue).toArray();
            double[] m = pendingMagnitude.stream().mapToDouble(Double::doubleValue).toArray();
            double[] p = pendingPhaseDeg.stream().mapToDouble(Double::doubleValue).toArray();
            clearPending();
            parts.run().frf().addMeasuredPoints(f, m, p);
        }
    }

    boolean connected() {
        return rig != null;
    }

    void connect() {
        String driver = parts.rig().driverName();
        java.util.Map<String, String> options = parts.rig().options();
        parts.status().rig("connecting to " + driver + "...");
        parts.status().progress(-1, "connecting");
        new SwingWorker<TappedRig, Void>() {
            @Override
            protected TappedRig doInBackground() {
                TappedRig[] holder = new TappedRig[1];
                holder[0] = RigConnection.open(drivers, driver, options,
                        block -> traceBuffer.offer(block, holder[0].acquisition().sampleRateHz()));
                return holder[0];
            }

            @Override
            protected void done() {
                parts.status().progress(0, "idle");
                try {
                    rig = get();
                    connectedDriver = driver;
                    parts.rig().connected(true, RigConnection.health(rig));
                    parts.status().rig("connected: " + driver + ", excitation off");
                    parts.status().message("Connected to " + PlainWords.of(rig.identity()));
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    parts.rig().connected(false, List.of("Could not connect: " + PlainWords.of(e.getCause().getMessage()),
                            "Check the settings above and press Connect again."));
                    parts.status().rig("not connected");
                    parts.status().message("Could not connect: " + PlainWords.of(e.getCause().getMessage()));
                }
                updateButtons();
            }
        }.execute();
    }

    void disconnect() {
        if (running) {
            parts.status().message("Stop the sweep before disconnecting.");
            return;
        }
        TappedRig closing = rig;
        rig = null;
        if (session != null && session.state() != SweepSession.State.PAUSED) {
            // A paused or interrupted sweep is kept: reconnect (on another port if the rig moved) and Resume.
            session = null;
        }
        parts.rig().connected(false, List.of(RigScreen.NOT_CONNECTED));
        parts.status().rig("not connected");
        updateButtons();
        if (closing != null) {
            new SwingWorker<Void, Void>() {
                @Override
                protected Void doInBackground() {
                    closing.close();
                    return null;
                }
            }.execute();
        }
    }

    /** Starts a sweep from the first step, after the cautions the first time since the program started. */
    void start() {
        if (rig == null || running) {
            return;
        }
        SetupForm form = parts.setup().form();
        if (!parts.setup().validate()) {
            parts.showSetup();
            parts.status().message("The setup has errors: see the messages beside the fields.");
            return;
        }
        if (!acknowledgeSafety()) {
            return;
        }
        snapshot = new Snapshot(form.plan(), form.specimen(), form.specification());
        session = new SweepSession(snapshot.plan());
        sweepStartedAt = Instant.now();
        results.withdraw(sweepWords() + " is running");
        parts.run().frf().clear();
        parts.run().frf().band(snapshot.plan().startHz(), snapshot.plan().stopHz());
        org.tautline.driver.spi.ChannelInfo response = rig.acquisition().channels().get(1);
        parts.run().traces().response("Response, " + response.quantity(), response.unit());
        parts.run().traces().clear();
        traceBuffer.clear();
        clearPending();
        sweep(false);
    }

    void pause() {
        if (running) {
            session.requestStop(SweepSession.StopRequest.PAUSE, "paused from the run screen");
            parts.status().rig("pausing: ramping the drive down");
        }
    }

    /** Goes on with a paused or interrupted sweep on the rig connected now (reconnected on a new port if need be). */
    void resume() {
        if (running || session == null || session.state() != SweepSession.State.PAUSED) {
            return;
        }
        if (rig == null) {
            parts.status().message("Connect the rig first (on its new port if it moved), then press Resume.");
            return;
        }
        results.withdraw(sweepWords() + " is running again");
        sweep(true);
    }

    void cancel() {
        if (running) {
            session.requestStop(SweepSession.StopRequest.CANCEL, "cancelled from the run screen");
            parts.status().rig("cancelling: ramping the drive down");
        } else if (session != null) {
            session = null;
            parts.run().progress(0, "cancelled; the completed steps were dropped");
            results.withdraw(sweepWords() + " was cancelled");
            updateButtons();
        }
    }

    /** The stop control: ramps the drive down and ends the sweep; the completed steps are kept for Resume. */
    void stopExcitation() {
        if (running) {
            session.requestStop(SweepSession.StopRequest.PAUSE, "stopped with the STOP control");
            parts.status().rig("STOP: ramping the drive down");
            parts.status().message("Stop pressed: the drive ramps down and the output switches off. The completed"
                    + " steps are kept: Resume goes on from the next step.");
        } else {
            parts.status().message("Stop: the excitation is already off.");
        }
    }

    private boolean acknowledgeSafety() {
        if (safetyAcknowledged) {
            return true;
        }
        String[] choices = {START_CHOICE, "Cancel"};
        int answer = JOptionPane.showOptionDialog(parts.frame(), SafetyNotice.asHtml(parts.rig().driverName().equals("sim")),
                "Safety: before excitation", JOptionPane.OK_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE, null, choices,
                choices[1]);
        safetyAcknowledged = answer == 0;
        return safetyAcknowledged;
    }

    private void sweep(boolean resuming) {
        if (resuming) {
            // The kept steps are reported again as the engine takes them over: the live FRF is drawn anew from them.
            clearPending();
            parts.run().frf().clear();
            parts.run().frf().band(snapshot.plan().startHz(), snapshot.plan().stopHz());
        }
        running = true;
        updateButtons();
        traceTimer.start();
        parts.status().rig("connected: excitation ON");
        long startNs = System.nanoTime();
        SweepSession s = session;
        Snapshot setup = snapshot;
        TappedRig sweepRig = rig;
        double rateHz = sweepRig.acquisition().sampleRateHz();
        WallTimeEstimate eta = new WallTimeEstimate();
        new SwingWorker<Optional<QualificationResult>, SweepEvent>() {
            @Override
            protected Optional<QualificationResult> doInBackground() {
                SweepResult sweep = resuming ? s.resume(sweepRig, this::publish) : s.run(sweepRig, this::publish);
                if (!sweep.completed()) {
                    return Optional.empty();
                }
                return Optional.of(RigQualification.of(sweepRig, sweep, setup.specimen(),
                        Optional.of(setup.specification()), s.control(), notice -> SwingUtilities.invokeLater(() -> {
                            parts.status().progress(-1, "level check: sweeping the fundamental again");
                            parts.run().progress(1, "sweep complete; level check: the fundamental again at two drive"
                                    + " levels");
                            parts.status().message(Character.toUpperCase(notice.charAt(0)) + notice.substring(1));
                        }), startNs));
            }

            @Override
            protected void process(List<SweepEvent> events) {
                if (isDone()) {
                    // A late batch of progress after done() has shown how the sweep ended: it must not overwrite that.
                    return;
                }
                SweepEvent last = null;
                for (SweepEvent e : events) {
                    if (e.completed()) {
                        pendingHz.add(e.frequencyHz());
                        pendingMagnitude.add(e.point().response().norm());
                        pendingPhaseDeg.add(Math.toDegrees(e.point().response().getArgument()));
                        last = e;
                    }
                }
                if (last == null) {
                    return;
                }
                double wallS = eta.remainingWallS(last);
                parts.run().progress(last.fraction(), ProgressText.progress(last, wallS));
                parts.status().progress(last.fraction(), ProgressText.eta(wallS));
                parts.run().settle(ProgressText.settle(setup.plan(), last, rateHz));
                if (last.pass() == last.passCount() - 1 && last.stepNumber() >= last.plannedSteps()) {
                    parts.status().progress(-1, "fitting the modal model");
                }
            }

            @Override
            protected void done() {
                running = false;
                traceTimer.stop();
                redrawLive();
                parts.status().rig(rig == null ? "not connected" : "connected: excitation off");
                parts.status().progress(0, "idle");
                try {
                    Optional<QualificationResult> result = get();
                    if (result.isPresent()) {
                        parts.run().progress(1, "sweep complete");
                        parts.status().message(result.get().linearity().isPresent()
                                ? "Finished: the sweep and the level check are done, the output is off, and the result"
                                + " is on the Results screen."
                                : "Finished: the sweep is done (no level check; the result says why), the output is"
                                + " off, and the result is on the Results screen.");
                        results.show(result.get(), ResultOrigin.sweep(sweepStartedAt, connectedDriver, sweepRig.identity()));
                    } else if (s.state() == SweepSession.State.PAUSED) {
                        SweepResult partial = s.partial().orElseThrow();
                        showKept(partial);
                        results.withdraw(sweepWords() + " " + (partial.status() == SweepStatus.CANCELLED ? "is paused"
                                : partial.status().label()) + " after " + partial.steps().size() + " steps");
                    } else {
                        parts.run().progress(0, "cancelled; the drive was ramped down and the steps were dropped");
                        results.withdraw(sweepWords() + " was cancelled");
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    parts.run().progress(0, "could not start");
                    parts.status().message("The sweep could not run; nothing was excited: " + PlainWords.of(e.getCause().getMessage()));
                    results.withdraw(sweepWords() + " could not run (" + PlainWords.of(e.getCause().getMessage()) + ")");
                }
                updateButtons();
            }
        }.execute();
    }

    /** Says why a sweep stopped before its end and that its steps are kept for Resume. */
    private void showKept(SweepResult partial) {
        int kept = partial.steps().size();
        double fraction = partial.passes().isEmpty() ? 0 : partial.passes().get(partial.passes().size() - 1).points().size()
                / (double) Math.max(1, partial.plan().coarseStepCount());
        String why = switch (partial.status()) {
            case LIMIT -> "stopped at a safety limit (" + partial.reason() + ")";
            case FAULT -> "stopped by a fault (" + partial.reason() + "); the output was switched off. Reconnect the rig"
                    + " (on its new port if it moved) before resuming";
            default -> "paused";
        };
        parts.run().progress(Math.min(1, fraction), why + " after " + kept
                + " steps; the steps are kept and Resume goes on from the next one");
        if (partial.status() == SweepStatus.FAULT || partial.status() == SweepStatus.LIMIT) {
            parts.status().message("The sweep " + why + ".");
        }
    }

    /** Fits an FRF that came from a file, off the event thread. */
    void analyse(Frf frf, SetupForm form, String source) {
        parts.status().progress(-1, "fitting " + source);
        results.withdraw("fitting " + source);
        new SwingWorker<QualificationResult, Void>() {
            @Override
            protected QualificationResult doInBackground() {
                return Qualification.analyse(form.specimen(), frf, Optional.empty(), ModalEstimator.defaults(),
                        Optional.of(form.specification()), System.nanoTime());
            }

            @Override
            protected void done() {
                parts.status().progress(0, "idle");
                try {
                    results.show(get(), ResultOrigin.file(Instant.now(), source));
                    parts.status().message("Fitted " + source);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    parts.status().message("Could not fit " + source + ": " + PlainWords.of(e.getCause().getMessage()));
                    results.withdraw(source + " could not be fitted (" + PlainWords.of(e.getCause().getMessage()) + ")");
                }
            }
        }.execute();
    }

    private void clearPending() {
        pendingHz.clear();
        pendingMagnitude.clear();
        pendingPhaseDeg.clear();
    }

    /** @return the sweep in words, for the results screen, for example "the sweep started at 14:03:12" */
    private String sweepWords() {
        return "the sweep started at " + ResultOrigin.timeOfDay(sweepStartedAt);
    }

    private void updateButtons() {
        boolean paused = session != null && session.state() == SweepSession.State.PAUSED;
        parts.run().buttons(rig != null, running, paused);
        parts.setup().locked(running || paused);
    }

    boolean isRunning() {
        return running;
    }

    /** Closes the rig on a background thread (a serial link may take a while), for closing the window. */
    void closeRig() {
        TappedRig closing = rig;
        rig = null;
        if (closing != null) {
            Thread closer = new Thread(closing::close, "rig-close");
            closer.start();
        }
    }
}
