package org.tautline.app.ui;

import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutionException;
import java.util.function.Consumer;

import javax.swing.JOptionPane;
import javax.swing.SwingWorker;
import javax.swing.Timer;

import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.modal.ModalEstimator;
import org.tautline.analysis.specimen.LinearityResult;
import org.tautline.app.SafetyNotice;
import org.tautline.app.qualify.LevelCheck;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.run.ProgressText;
import org.tautline.app.ui.run.RigConnection;
import org.tautline.app.ui.run.SweepSession;
import org.tautline.app.ui.run.TappedRig;
import org.tautline.app.ui.run.TraceBuffer;
import org.tautline.app.ui.setup.SetupForm;
import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepProgress;
import org.tautline.driver.sweep.SweepRecord;

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
    private final Consumer<QualificationResult> onResult;
    private final TraceBuffer traceBuffer = new TraceBuffer(600);
    private final Timer traceTimer;
    private TappedRig rig;
    private SweepSession session;
    private boolean running;
    private boolean safetyAcknowledged;
    private final java.util.List<Double> pendingHz = new java.util.ArrayList<>();
    private final java.util.List<Double> pendingMagnitude = new java.util.ArrayList<>();

    RunController(WorkbenchParts parts, RigDrivers drivers, Consumer<QualificationResult> onResult) {
        this.parts = parts;
        this.drivers = drivers;
        this.onResult = onResult;
        // Redraw the live charts four times a second rather than on every block or step: each redraw paints
        // the whole chart, and the event thread must stay free for the stop control.
        this.traceTimer = new Timer(250, e -> redrawLive());
    }

    private void redrawLive() {
        parts.run().traces().show(traceBuffer.snapshot());
        if (!pendingHz.isEmpty()) {
            double[] f = pendingHz.stream().mapToDouble(Double::doubleValue).toArray();
            double[] m = pendingMagnitude.stream().mapToDouble(Double::doubleValue).toArray();
            pendingHz.clear();
            pendingMagnitude.clear();
            parts.run().frf().addMeasuredPoints(f, m);
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
                    parts.rig().connected(true, RigConnection.health(rig));
                    parts.status().rig("connected: " + driver + ", excitation off");
                    parts.status().message("Connected to " + rig.identity());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    parts.rig().connected(false, List.of("Could not connect: " + e.getCause().getMessage()));
                    parts.status().rig("not connected");
                    parts.status().message("Could not connect: " + e.getCause().getMessage());
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
        session = null;
        parts.rig().connected(false, List.of("Not connected."));
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
        session = new SweepSession(rig, form.plan());
        parts.run().frf().clear();
        parts.run().frf().band(form.plan().startHz(), form.plan().stopHz());
        org.tautline.driver.spi.ChannelInfo response = rig.acquisition().channels().get(1);
        parts.run().traces().responseLabel("Response, " + response.quantity() + " (" + response.unit() + ")");
        parts.run().traces().clear();
        traceBuffer.clear();
        pendingHz.clear();
        pendingMagnitude.clear();
        sweep(false, form);
    }

    void pause() {
        if (running) {
            session.requestStop(SweepSession.StopRequest.PAUSE);
            parts.status().rig("pausing: ramping the drive down");
        }
    }

    void resume() {
        if (!running && session != null && session.state() == SweepSession.State.PAUSED) {
            sweep(true, parts.setup().form());
        }
    }

    void cancel() {
        if (running) {
            session.requestStop(SweepSession.StopRequest.CANCEL);
            parts.status().rig("cancelling: ramping the drive down");
        } else if (session != null) {
            session = null;
            parts.run().progress(0, "cancelled; the completed steps were dropped");
            updateButtons();
        }
    }

    /** The stop control: ramps the drive down and ends the sweep, keeping nothing running. */
    void stopExcitation() {
        if (running) {
            session.requestStop(SweepSession.StopRequest.CANCEL);
            parts.status().rig("STOP: ramping the drive down");
            parts.status().message("Stop pressed: the drive ramps down and the output switches off.");
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

    private void sweep(boolean resuming, SetupForm form) {
        running = true;
        updateButtons();
        traceTimer.start();
        parts.status().rig("connected: excitation ON");
        long startNs = System.nanoTime();
        SweepSession s = session;
        double rateHz = rig.acquisition().sampleRateHz();
        new SwingWorker<Optional<QualificationResult>, SweepProgress>() {
            @Override
            protected Optional<QualificationResult> doInBackground() {
                SweepRecord record = resuming ? s.resume(this::publish) : s.run(this::publish);
                if (!record.completed()) {
                    return Optional.empty();
                }
                QualificationResult result = Qualification.analyse(form.specimen(), record, form.specification(), startNs);
                Optional<LinearityResult> linearity = LevelCheck.run(rig, result, form.plan(),
                        progress -> { }, () -> s.stopRequested() != SweepSession.StopRequest.NONE);
                return Optional.of(linearity.isPresent()
                        ? Qualification.withLinearity(result, linearity.get(), Optional.of(form.specification())) : result);
            }

            @Override
            protected void process(List<SweepProgress> steps) {
                for (SweepProgress step : steps) {
                    pendingHz.add(step.frequencyHz());
                    pendingMagnitude.add(step.point().response().norm());
                }
                SweepProgress last = steps.get(steps.size() - 1);
                parts.run().progress(last.fraction(), ProgressText.progress(last));
                parts.status().progress(last.fraction(), ProgressText.eta(last.remainingWallTimeS()));
                parts.run().settle(ProgressText.settle(form.plan(), last, rateHz));
                if (last.completedSteps() == last.totalSteps()) {
                    parts.status().progress(-1, "fitting the modal model");
                }
            }

            @Override
            protected void done() {
                running = false;
                traceTimer.stop();
                redrawLive();
                parts.status().rig("connected: excitation off");
                parts.status().progress(0, "idle");
                try {
                    Optional<QualificationResult> result = get();
                    if (result.isPresent()) {
                        parts.run().progress(1, "sweep complete");
                        onResult.accept(result.get());
                    } else if (s.state() == SweepSession.State.PAUSED) {
                        int kept = s.partial().map(r -> r.points().size()).orElse(0);
                        parts.run().progress(kept / (double) form.plan().stepCount(), "paused after " + kept
                                + " steps; Resume goes on from the next step");
                    } else {
                        parts.run().progress(0, "cancelled; the drive was ramped down");
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    parts.run().progress(0, "failed");
                    parts.status().message("The sweep failed and the excitation was switched off: "
                            + e.getCause().getMessage());
                }
                updateButtons();
            }
        }.execute();
    }

    /** Fits an FRF that came from a file, off the event thread. */
    void analyse(Frf frf, SetupForm form, String source) {
        parts.status().progress(-1, "fitting " + source);
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
                    onResult.accept(get());
                    parts.status().message("Fitted " + source);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                } catch (ExecutionException e) {
                    parts.status().message("Could not fit " + source + ": " + e.getCause().getMessage());
                }
            }
        }.execute();
    }

    private void updateButtons() {
        boolean paused = session != null && session.state() == SweepSession.State.PAUSED;
        parts.run().buttons(rig != null, running, paused);
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
