package org.tautline.driver.journal;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.ForwardingAcquisition;
import org.tautline.driver.spi.ForwardingExciter;
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
        return new ForwardingExciter(inner.exciter()) {
            @Override
            public void setSine(double frequencyHz, double amplitudeV) {
                sinesSet++;
                super.setSine(frequencyHz, amplitudeV);
            }
        };
    }

    @Override
    public Acquisition acquisition() {
        return new ForwardingAcquisition(inner.acquisition()) {
            @Override
            public SampleBlock read(int sampleCount) {
                // The runner sets the drive once at zero before the ramp, then once per step.
                if (!fired && sinesSet == failingStep + 2) {
                    fired = true;
                    throw new RigException(FAULT);
                }
                return super.read(sampleCount);
            }
        };
    }

    @Override
    public void close() {
        inner.close();
    }
}
