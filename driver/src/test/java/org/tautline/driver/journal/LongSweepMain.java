package org.tautline.driver.journal;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;

import org.tautline.driver.spi.RigDrivers;
import org.tautline.driver.sweep.SweepControl;
import org.tautline.driver.sweep.SweepPlan;

/**
 * A child process for {@link KillResumeTest}: runs a long journaled sweep on the clean simulated rig.
 *
 * <p>It prints {@code journaled N} after step N is in the journal and waits 150 ms after every step, so a
 * parent can kill it mid-sweep. Argument: the journal file to create.
 */
public final class LongSweepMain {
    /** The plan: {@link JournalFixtures#PLAN} with 40 steps. */
    static final SweepPlan PLAN = SweepPlan.uniform(150, 300, 40, 400, 0.0, 20, 1.0, 0.02, 3,
            JournalFixtures.wideLimits());

    private LongSweepMain() {
    }

    /** @param args the journal file */
    public static void main(String[] args) {
        JournaledSweep.run(RigDrivers.load(List.of()), "sim", JournalFixtures.SIM_OPTIONS, PLAN, Path.of(args[0]), true,
                e -> {
                    if (!e.completed()) {
                        return;
                    }
                    System.out.println("journaled " + e.stepNumber());
                    System.out.flush();
                    try {
                        Thread.sleep(150);
                    } catch (InterruptedException interrupted) {
                        Thread.currentThread().interrupt();
                    }
                }, SweepControl.none(), Clock.systemUTC());
    }
}
