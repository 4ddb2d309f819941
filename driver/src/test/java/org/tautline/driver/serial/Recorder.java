package org.tautline.driver.serial;

import java.util.ArrayList;
import java.util.List;

import org.tautline.driver.RigLinkException;

/** Test helper: a decoder sink that keeps everything it is given. */
final class Recorder implements StreamDecoder.Sink {
    final List<String> lines = new ArrayList<>();
    final List<DataBlock> blocks = new ArrayList<>();
    final List<RigLinkException> faults = new ArrayList<>();

    @Override
    public void line(String line) {
        lines.add(line);
    }

    @Override
    public void block(DataBlock block) {
        blocks.add(block);
    }

    @Override
    public void fault(RigLinkException fault) {
        faults.add(fault);
    }
}
