package org.tautline.driver.journal;

import java.util.List;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * A rig wrapper that injects one rig fault: the first read after the drive has been set for step
 * {@code failingStep} (0 first) throws, as a link that stops answering mid-step would.
 */
final class FaultyRig implements Rig {
    static final String FAULT = "link lost: the rig stopped answering";

    private final Rig inner;
    private final int failingStep;
    private int sinesSet;
    private boolean fired;

    FaultyRig(Rig inner, int failingStep) {
        this.inner = inner;
        this.failingStep = failingStep;
    }

    @Override
    public String identity() {
        return inner.identity();
    }

    @Override
    public Exciter exciter() {
        Exciter e = inner.exciter();
        return new Exciter() {
            @Override
            public void setSine(double frequencyHz, double amplitudeV) {
                sinesSet++;
                e.setSine(frequencyHz, amplitudeV);
            }

            @Override
            public void rampTo(double amplitudeV, double durationS) {
                e.rampTo(amplitudeV, durationS);
            }

            @Override
            public void setOutputEnabled(boolean enabled) {
                e.setOutputEnabled(enabled);
            }

            @Override
            public boolean isOutputEnabled() {
                return e.isOutputEnabled();
            }

            @Override
            public double maxAmplitudeV() {
                return e.maxAmplitudeV();
            }
        };
    }

    @Override
    public Acquisition acquisition() {
        Acquisition a = inner.acquisition();
        return new Acquisition() {
            @Override
            public double sampleRateHz() {
                return a.sampleRateHz();
            }

            @Override
            public List<ChannelInfo> channels() {
                return a.channels();
            }

            @Override
            public SampleBlock read(int sampleCount) {
                // The runner sets the drive once at zero before the ramp, then once per step.
                if (!fired && sinesSet == failingStep + 2) {
                    fired = true;
                    throw new RigException(FAULT);
                }
                return a.read(sampleCount);
            }

            @Override
            public long nextSampleIndex() {
                return a.nextSampleIndex();
            }
        };
    }

    @Override
    public void close() {
        inner.close();
    }
}
