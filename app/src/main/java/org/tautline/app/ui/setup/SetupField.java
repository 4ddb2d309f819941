package org.tautline.app.ui.setup;

import java.util.List;

/**
 * One field of the setup form: what it holds, in which unit, and what it accepts.
 *
 * @param key the key, also the JSON key in a project file (units in the name, for example {@code lengthM})
 * @param section the group it is shown in
 * @param label the label shown beside it
 * @param unit the unit shown after it, empty for none
 * @param kind what text it accepts
 * @param choices the allowed values of a {@link Kind#CHOICE} field, empty otherwise
 */
public record SetupField(String key, Section section, String label, String unit, Kind kind, List<String> choices) {

    /** Copies the choices. */
    public SetupField {
        choices = List.copyOf(choices);
    }

    /** The groups of the setup screen. */
    public enum Section {
        /** What is stated about the specimen. */
        SPECIMEN("Specimen"),
        /** The sensors' calibration, applied to recordings imported in volts. */
        SENSORS("Sensors (for imported recordings)"),
        /** The stepped-sine sweep. */
        PLAN("Sweep plan"),
        /** The safety limits that stop a sweep. */
        SAFETY("Safety limits (the sweep ramps down and stops at any of them)"),
        /** The specification limits the verdict judges. */
        LIMITS("Specification limits");

        private final String title;

        Section(String title) {
            this.title = title;
        }

        /** @return the heading shown above the group */
        public String title() {
            return title;
        }
    }

    /** What text a field accepts. */
    public enum Kind {
        /** Any text that is not blank. */
        TEXT("some text"),
        /** A positive number. */
        POSITIVE("a positive number"),
        /** Zero or a positive number. */
        NON_NEGATIVE("zero or a positive number"),
        /** A whole number. */
        WHOLE("a whole number"),
        /** A number, or empty for no bound. */
        OPTIONAL_NUMBER("a number, or empty for no bound"),
        /** One of the choices. */
        CHOICE("one of the listed choices");

        private final String expected;

        Kind(String expected) {
            this.expected = expected;
        }

        /** @return what the field expects, for messages */
        public String expected() {
            return expected;
        }
    }

    static SetupField of(String key, Section section, String label, String unit, Kind kind) {
        return new SetupField(key, section, label, unit, kind, List.of());
    }
}
