package org.tautline.driver.spi;

import java.util.List;

/**
 * An acquisition that passes every call to another; extend it to watch or change one call (a tap for live
 * traces, a recorder, a fault injector) without writing out the others.
 */
public class ForwardingAcquisition implements Acquisition {
    private final Acquisition inner;

    /** @param inner the acquisition every call goes to */
    public ForwardingAcquisition(Acquisition inner) {
        this.inner = inner;
    }

    @Override
    public double sampleRateHz() {
        return inner.sampleRateHz();
    }

    @Override
    public List<ChannelInfo> channels() {
        return inner.channels();
    }

    @Override
    public SampleBlock read(int sampleCount) {
        return inner.read(sampleCount);
    }

    @Override
    public long nextSampleIndex() {
        return inner.nextSampleIndex();
    }
}
