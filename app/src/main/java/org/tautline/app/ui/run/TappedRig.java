package org.tautline.app.ui.run;

import java.util.function.Consumer;

import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/** A rig whose acquisition is tapped for live traces; everything else goes to the wrapped rig. */
public final class TappedRig implements Rig {
    private final Rig inner;
    private final Acquisition acquisition;

    /**
     * @param inner the connected rig
     * @param tap receives every sample block the sweep reads, on the sweep's thread
     */
    public TappedRig(Rig inner, Consumer<SampleBlock> tap) {
        this.inner = inner;
        this.acquisition = new TappedAcquisition(inner.acquisition(), tap);
    }

    @Override
    public String identity() {
        return inner.identity();
    }

    @Override
    public Exciter exciter() {
        return inner.exciter();
    }

    @Override
    public Acquisition acquisition() {
        return acquisition;
    }

    @Override
    public void close() {
        inner.close();
    }
}
