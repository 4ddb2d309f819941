package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.ForwardingAcquisition;
import org.tautline.driver.spi.ForwardingExciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/** Wraps a rig and records every exciter command and the peaks of every block read. */
final class RecordingRig implements Rig {
    /** One exciter command: kind "sine", "ramp", "on" or "off", amplitude V, duration s. */
    record Command(String kind, double amplitudeV, double durationS, long atSample) {
    }

    final List<Command> commands = new ArrayList<>();
    /** Per block: {force peak, response peak, drive frequency}. */
    final List<double[]> blockPeaks = new ArrayList<>();
    private final Rig inner;
    private double frequencyHz;
    int readsBeforeCancel = Integer.MAX_VALUE;
    int readsBeforeLinkFault = Integer.MAX_VALUE;

    RecordingRig(Rig inner) {
        this.inner = inner;
    }

    /** Asks for a stop once {@link #readsBeforeCancel} blocks have been read. */
    final org.tautline.driver.sweep.SweepControl control = new org.tautline.driver.sweep.SweepControl();

    @Override
    public String identity() {
        return "recording " + inner.identity();
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
            }
        };
    }

    @Override
    public Acquisition acquisition() {
        return new ForwardingAcquisition(inner.acquisition()) {
            @Override
            public SampleBlock read(int n) {
                if (blockPeaks.size() >= readsBeforeLinkFault) {
                    throw new org.tautline.driver.RigException("link lost: the rig stopped answering");
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
}
