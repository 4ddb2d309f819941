package org.tautline.app.ui.setup;

import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Puts the setup's own labels into the messages of the specimen and the sweep plan, which name their fields as
 * program keys ({@code stopHz}, {@code limits.driveV}): on screen a message names the field as the form shows it
 * ("'Band stop'"). Free of Swing.
 */
final class FieldWords {
    /** Keys the plan's messages use for fields the form keeps under another key. */
    private static final Map<String, String> ALIASES = Map.of(
            "limits.driveV", "safety.driveV",
            "limits.forceN", "safety.forceN",
            "limits.responseAmplitude", "safety.responseAmplitude",
            "limits.displacementM", "safety.displacementM",
            "levels[]", "driveAmplitudeV",
            "initialDriveV", "driveAmplitudeV");

    private FieldWords() {
    }

    /**
     * @param message a message of the specimen or the plan
     * @return the message with the keys the plan uses for the safety limits and the drive written as the form's keys
     */
    static String withFormKeys(String message) {
        String out = message;
        for (Map.Entry<String, String> e : ALIASES.entrySet()) {
            out = replaceKey(out, e.getKey(), e.getValue());
        }
        return out;
    }

    /**
     * @param message a message that names fields by their keys (after {@link #withFormKeys})
     * @param fields the form's fields
     * @return the message with each key replaced by the field's label in quotes
     */
    static String inWords(String message, List<SetupField> fields) {
        Map<String, String> names = new LinkedHashMap<>();
        String above = "";
        for (SetupField f : fields) {
            // An indented label ("  its standard uncertainty") belongs to the field above it.
            boolean indented = f.label().startsWith(" ");
            names.put(f.key(), "'" + (indented ? above + ": " : "") + f.label().strip() + "'");
            above = indented ? above : f.label().strip();
        }
        Map<String, String> labels = new LinkedHashMap<>();
        fields.stream().map(SetupField::key).sorted(Comparator.comparingInt(String::length).reversed())
                .forEach(k -> labels.put(k, names.get(k)));
        String out = message;
        for (Map.Entry<String, String> e : labels.entrySet()) {
            out = replaceKey(out, e.getKey(), e.getValue());
        }
        return out;
    }

    private static String replaceKey(String text, String key, String replacement) {
        Pattern p = Pattern.compile("(?<![A-Za-z0-9.\\[])" + Pattern.quote(key) + "(?![A-Za-z0-9\\[])");
        return p.matcher(text).replaceAll(Matcher.quoteReplacement(replacement));
    }
}
