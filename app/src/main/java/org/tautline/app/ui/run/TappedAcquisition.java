package org.tautline.app.ui.run;

import java.util.function.Consumer;

import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ForwardingAcquisition;
import org.tautline.driver.spi.SampleBlock;

/**
 * An acquisition that hands every block it reads to a listener as well as to the caller, for live traces.
 *
 * <p>The listener runs on the reading thread (the sweep's); it must be quick and must not keep the
 * block's arrays beyond copying what it needs.
 */
final class TappedAcquisition extends ForwardingAcquisition {
    private final Consumer<SampleBlock> tap;

    TappedAcquisition(Acquisition inner, Consumer<SampleBlock> tap) {
        super(inner);
        this.tap = tap;
    }

    @Override
    public SampleBlock read(int sampleCount) {
        SampleBlock block = super.read(sampleCount);
        tap.accept(block);
        return block;
    }
}
