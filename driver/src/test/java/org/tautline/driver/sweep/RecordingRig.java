package org.tautline.driver.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.ForwardingAcquisition;
import org.tautline.driver.spi.ForwardingExciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Wraps a rig and records every exciter command and the peaks of every block read; checks what a safety stop did.
 *
 * <p>Shared with the app's tests (the driver's test jar), so that every path that excites a rig is held to the same
 * check: a limit trips on the first block that reaches it (no block is read after it), then the drive ramps to zero
 * over the plan's ramp time before the output is switched off (never a step to zero, which would ring the specimen:
 * common practice).
 */
public final class RecordingRig implements Rig {
    /**
     * One exciter command.
     *
     * @param kind "sine", "ramp", "on" or "off"
     * @param amplitudeV amplitude, V
     * @param durationS ramp duration, s
     * @param atSample the rig's sample index when commanded
     */
    public record Command(String kind, double amplitudeV, double durationS, long atSample) {
    }

    /** Every exciter command, in order. */
    public final List<Command> commands = new ArrayList<>();
    /** Per block: {force peak, response peak, drive frequency}. */
    public final List<double[]> blockPeaks = new ArrayList<>();
    /** Asks for a stop once {@link #readsBeforeCancel} blocks have been read. */
    public final SweepControl control = new SweepControl();
    /** Blocks read before {@link #control} asks for a stop. */
    public int readsBeforeCancel = Integer.MAX_VALUE;
    /** Blocks read before a read throws a link fault. */
    public int readsBeforeLinkFault = Integer.MAX_VALUE;
    /** Stop reason {@link #control} is given the moment the output is switched on, or null for none. */
    public String stopWhenSwitchedOn;
    private final Rig inner;
    private double frequencyHz;

    /** @param inner the rig to wrap */
    public RecordingRig(Rig inner) {
        this.inner = inner;
    }

    @Override
    public String identity() {
        return inner.identity();
    }

    @Override
    public Exciter exciter() {
        return new ForwardingExciter(inner.exciter()) {
            @Override
            public void setSine(double f, double a) {
                frequencyHz = f;
                commands.add(new Command("sine", a, 0, inner.acquisition().nextSampleIndex()));
                super.setSine(f, a);
            }

            @Override
            public void rampTo(double a, double d) {
                commands.add(new Command("ramp", a, d, inner.acquisition().nextSampleIndex()));
                super.rampTo(a, d);
            }

            @Override
            public void setOutputEnabled(boolean on) {
                commands.add(new Command(on ? "on" : "off", 0, 0, inner.acquisition().nextSampleIndex()));
                super.setOutputEnabled(on);
                if (on && stopWhenSwitchedOn != null) {
                    control.requestStop(stopWhenSwitchedOn);
                }
            }
        };
    }

    @Override
    public Acquisition acquisition() {
        return new ForwardingAcquisition(inner.acquisition()) {
            @Override
            public SampleBlock read(int n) {
                if (blockPeaks.size() >= readsBeforeLinkFault) {
                    throw new RigException("link lost: the rig stopped answering");
                }
                SampleBlock b = super.read(n);
                blockPeaks.add(new double[] {peak(b.samples()[0]), peak(b.samples()[1]), frequencyHz});
                if (blockPeaks.size() >= readsBeforeCancel) {
                    control.requestStop("cancelled by the test");
                }
                return b;
            }
        };
    }

    private static double peak(double[] x) {
        double m = 0;
        for (double v : x) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    @Override
    public void close() {
        inner.close();
    }

    /**
     * Checks that the block that first reached a measured limit is the last block read.
     *
     * @param what "force", "response" or "specimen displacement" (a displacement sensor: the response is displacement)
     * @param limits the limits the sweep ran under
     */
    public void assertTrippedOnTheLastBlock(String what, SafetyLimits limits) {
        int firstOver = -1;
        for (int i = 0; i < blockPeaks.size() && firstOver < 0; i++) {
            double[] p = blockPeaks.get(i);
            boolean over = switch (what) {
                case "force" -> p[0] >= limits.forceN();
                case "response" -> p[1] >= limits.responseAmplitude();
                default -> p[1] >= limits.displacementM();
            };
            firstOver = over ? i : -1;
        }
        assertTrue(firstOver >= 0, "a block reached the " + what + " limit");
        assertEquals(blockPeaks.size() - 1, firstOver, "the block that reached the limit is the last one read");
    }

    /**
     * Checks the way down: a ramp to 0 V over the ramp time, then output off, and no step of the drive to zero while on.
     *
     * @param rampS the plan's ramp time, s
     */
    public void assertRampedDownThenOff(double rampS) {
        Command last = commands.get(commands.size() - 1);
        Command beforeLast = commands.get(commands.size() - 2);
        assertEquals("off", last.kind());
        assertEquals("ramp", beforeLast.kind());
        assertEquals(0.0, beforeLast.amplitudeV());
        assertEquals(rampS, beforeLast.durationS(), 1e-12);
        boolean on = false;
        for (Command cmd : commands) {
            on = cmd.kind().equals("on") || (on && !cmd.kind().equals("off"));
            if (on && cmd.kind().equals("sine")) {
                assertTrue(cmd.amplitudeV() > 0, "no step of the drive to zero while the output is on");
            }
        }
        assertFalse(inner.exciter().isOutputEnabled(), "the output is off");
    }
}
