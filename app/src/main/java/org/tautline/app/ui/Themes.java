package org.tautline.app.ui;

import java.awt.Toolkit;
import java.awt.Window;
import java.util.Locale;

import javax.swing.SwingUtilities;

import com.formdev.flatlaf.FlatDarkLaf;
import com.formdev.flatlaf.FlatLaf;
import com.formdev.flatlaf.FlatLightLaf;

/** The light and dark looks, and following the desktop's choice where the desktop tells it. */
final class Themes {
    /** The choices of the View menu. */
    enum Choice {
        /** Light or dark as the desktop theme is named; light when the desktop does not say. */
        SYSTEM("Follow the system"),
        /** Light. */
        LIGHT("Light"),
        /** Dark. */
        DARK("Dark");

        private final String label;

        Choice(String label) {
            this.label = label;
        }

        String label() {
            return label;
        }
    }

    private Themes() {
    }

    /**
     * Whether a desktop theme name asks for a dark look (GNOME and GTK themes name their dark variants so).
     *
     * @param desktopThemeName the theme name the desktop reports, or null
     * @return true for a dark theme
     */
    static boolean isDarkThemeName(String desktopThemeName) {
        return desktopThemeName != null && desktopThemeName.toLowerCase(Locale.ROOT).contains("dark");
    }

    static boolean systemPrefersDark() {
        Object gtk = Toolkit.getDefaultToolkit().getDesktopProperty("gnome.Net/ThemeName");
        return isDarkThemeName(gtk == null ? System.getenv("GTK_THEME") : gtk.toString());
    }

    /** Sets the look before any window exists; FlatLaf scales by the JVM's uiScale, so HiDPI is handled. */
    static void setup(Choice choice) {
        if (isDark(choice)) {
            FlatDarkLaf.setup();
        } else {
            FlatLightLaf.setup();
        }
    }

    static boolean isDark(Choice choice) {
        return choice == Choice.DARK || choice == Choice.SYSTEM && systemPrefersDark();
    }

    /** Switches the look of open windows; call on the event thread. */
    static void apply(Choice choice) {
        setup(choice);
        FlatLaf.updateUI();
        for (Window w : Window.getWindows()) {
            SwingUtilities.updateComponentTreeUI(w);
        }
    }
}
