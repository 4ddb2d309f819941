package org.tautline.app.ui.run;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.tautline.driver.spi.RigOption;

/**
 * What a rig driver's setting is called on screen: its key in words, with the unit apart, so that
 * {@code timeoutMs} reads "Timeout (ms)". The key stays what the command line takes. Free of Swing.
 */
public final class OptionLabel {
    private OptionLabel() {
    }

    /**
     * @param option a driver's setting
     * @return its label, for example "Timeout (ms)", "Tension (N)", "Port"
     */
    public static String of(RigOption option) {
        List<String> words = new ArrayList<>();
        for (String part : option.name().split("\\.")) {
            for (String w : part.split("(?<=[a-z0-9])(?=[A-Z])")) {
                words.add(w);
            }
        }
        String unit = option.unit().strip();
        if (words.size() > 1 && words.get(words.size() - 1).equalsIgnoreCase(unit)) {
            words.remove(words.size() - 1);
        }
        String text = String.join(" ", words).toLowerCase(Locale.ROOT);
        text = Character.toUpperCase(text.charAt(0)) + text.substring(1);
        boolean unitIsTheName = text.equalsIgnoreCase(unit);
        return unit.isEmpty() || unitIsTheName ? text : text + " (" + unit + ")";
    }
}
