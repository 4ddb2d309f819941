package org.tautline.app.ui.setup;

import java.util.Locale;

import org.tautline.analysis.specimen.EndCondition;

/**
 * What the choices of the setup's choice fields are called on screen. The project file keeps the value itself (an
 * end condition's or a sensor quantity's name); people see its label. Free of Swing.
 */
public final class ChoiceLabels {
    private ChoiceLabels() {
    }

    /**
     * @param fieldKey the key of a choice field, for example {@code ends}
     * @param choice one of its values, for example {@code PINNED}
     * @return the label for people, for example "pinned"; a value the field does not know is shown as it stands
     */
    public static String of(String fieldKey, String choice) {
        if (choice == null) {
            return "";
        }
        if (fieldKey.equals("ends")) {
            for (EndCondition e : EndCondition.values()) {
                if (e.name().equals(choice)) {
                    return e.label();
                }
            }
        }
        if (fieldKey.equals("responseQuantity") && choice.matches("DISPLACEMENT|VELOCITY|ACCELERATION")) {
            return choice.toLowerCase(Locale.ROOT);
        }
        return choice;
    }
}
