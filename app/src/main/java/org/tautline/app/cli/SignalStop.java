package org.tautline.app.cli;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import org.tautline.driver.serial.ShutdownHooks;
import org.tautline.driver.sweep.SweepControl;

/**
 * Turns a stop signal (Ctrl-C, {@code kill}) during a sweep into a stop of the sweep, and holds the process until
 * the user has been told what happened.
 *
 * <p>On the signal, a shutdown hook calls {@link SweepControl#stopNow(String)}: the rig's output is commanded off
 * at once from the hook's thread where the rig allows it (a serial rig does), and the sweep ramps down and ends
 * as cancelled before its next block. The hook then waits (at most {@value #HOLD_S} s) until {@link #close()} is
 * called, which the command does after it has journaled the end and printed how to resume, so nothing is cut
 * short by the process ending; {@link #close()} then keeps the command from returning, so the process ends with the
 * signal's status (128 + its number) and not with the command's own.
 */
final class SignalStop implements AutoCloseable {
    /** Longest time the ending process waits for the sweep to wind down and the command to report, s. */
    static final long HOLD_S = 60;
    /** The reason a stop signal gives, as the journal records it. */
    static final String REASON = "interrupted by a stop signal (Ctrl-C or kill)";

    private final SweepControl control = new SweepControl();
    private final CountDownLatch reported = new CountDownLatch(1);
    /** Set when the hook ran: the process is ending on a signal. */
    private volatile boolean signalled;

    /** Installs the shutdown hook. */
    SignalStop() {
        Thread hook = new Thread(() -> {
            if (reported.getCount() == 0) {
                return;
            }
            signalled = true;
            try {
                control.stopNow(REASON);
            } catch (RuntimeException e) {
                // The off command is best effort here; the sweep still switches off at its next block.
            }
            try {
                reported.await(HOLD_S, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "tautline-stop-signal");
        // Through the serial library: it releases its ports only after this hook has run, so a serial rig can
        // still be switched off and the sweep can ramp down and journal its end.
        ShutdownHooks.add(hook);
    }

    /** @return the control to hand to the sweep */
    SweepControl control() {
        return control;
    }

    /**
     * Lets an ending process end: call once the end of the sweep is journaled and reported. Idempotent. The hook
     * stays registered (the serial library offers no removal) and does nothing when the process ends later.
     */
    @Override
    public void close() {
        reported.countDown();
        if (signalled) {
            // The process is ending on the signal and its exit status is the signal's (128 + its number), which the
            // ending JVM gives once the hook returns. Returning here would let the command's own status (cancelled)
            // race it to the exit, so this thread waits for the end instead, its report already written.
            System.out.flush();
            System.err.flush();
            while (true) {
                try {
                    Thread.sleep(Long.MAX_VALUE);
                } catch (InterruptedException e) {
                    // Keep waiting: the JVM ends the process.
                }
            }
        }
    }
}
