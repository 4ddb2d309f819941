package org.tautline.app.ui.run;

import java.util.List;
import java.util.function.Consumer;

import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.SampleBlock;

/**
 * An acquisition that hands every block it reads to a listener as well as to the caller, for live traces.
 *
 * <p>The listener runs on the reading thread (the sweep's); it must be quick and must not keep the
 * block's arrays beyond copying what it needs.
 */
final class TappedAcquisition implements Acquisition {
    private final Acquisition inner;
    private final Consumer<SampleBlock> tap;

    TappedAcquisition(Acquisition inner, Consumer<SampleBlock> tap) {
        this.inner = inner;
        this.tap = tap;
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
        SampleBlock block = inner.read(sampleCount);
        tap.accept(block);
        return block;
    }

    @Override
    public long nextSampleIndex() {
        return inner.nextSampleIndex();
    }
}
