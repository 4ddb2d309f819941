package org.tautline.app.trace;

import java.util.List;

/**
 * A rig and its instruments, entered once per rig in a rig file ({@link RigFile}) and copied into each run's setup.
 *
 * @param name the rig's name or asset number, for example "bench 2"
 * @param instruments its instruments, in the file's order
 */
public record RigDescription(String name, List<Instrument> instruments) {
    /** Checks the name and copies the list. */
    public RigDescription {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a rig needs a name");
        }
        instruments = List.copyOf(instruments);
    }
}
