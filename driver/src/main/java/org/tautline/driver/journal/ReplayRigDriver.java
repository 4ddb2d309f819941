package org.tautline.driver.journal;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.RigDriver;
import org.tautline.driver.spi.RigOption;
import org.tautline.driver.spi.RigOptionValues;

/**
 * The {@code replay} rig driver: plays a recorded journal back as a rig, see {@link ReplayRig}.
 *
 * <p>Option {@code journal}: the journal file to play back (required).
 */
public final class ReplayRigDriver implements RigDriver {
    @Override
    public String name() {
        return "replay";
    }

    @Override
    public String description() {
        return "plays a recorded sweep journal back as a rig: its raw samples when kept, otherwise its fitted phasors";
    }

    @Override
    public List<RigOption> options() {
        return List.of(RigOption.required("journal", "the journal file to play back", ""));
    }

    @Override
    public Rig open(Map<String, String> options) {
        RigOptionValues values = RigOptionValues.of(this, options);
        return new ReplayRig(JournalReader.read(Path.of(values.text("journal"))));
    }
}
