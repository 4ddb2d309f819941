package org.tautline.app.ui;

import java.awt.Component;
import java.awt.KeyEventDispatcher;
import java.awt.Window;
import java.awt.event.KeyEvent;

import javax.swing.JComboBox;
import javax.swing.MenuSelectionManager;
import javax.swing.SwingUtilities;

/**
 * Escape in the main window stops the excitation, unless it is closing something: an open menu, a combo box's list.
 *
 * <p>It looks at the key before any component does (a {@link KeyEventDispatcher}), so it sees whether a menu is open
 * at the moment Escape is pressed, not after the menu has closed itself; it never consumes the key, so menus, lists
 * and fields still get their Escape. Keys typed in a dialog belong to the dialog and are left alone.
 */
final class EscapeStop implements KeyEventDispatcher {
    private final Window window;
    private final Runnable stop;

    /**
     * @param window the main window
     * @param stop what Escape does when it closes nothing
     */
    EscapeStop(Window window, Runnable stop) {
        this.window = window;
        this.stop = stop;
    }

    @Override
    public boolean dispatchKeyEvent(KeyEvent e) {
        if (e.getID() == KeyEvent.KEY_PRESSED && e.getKeyCode() == KeyEvent.VK_ESCAPE && e.getModifiersEx() == 0
                && belongsToWindow(e.getComponent()) && !closesSomething(e.getComponent())) {
            stop.run();
        }
        return false;
    }

    private boolean belongsToWindow(Component c) {
        return c != null && (c == window || SwingUtilities.getWindowAncestor(c) == window);
    }

    private static boolean closesSomething(Component focused) {
        if (MenuSelectionManager.defaultManager().getSelectedPath().length > 0) {
            return true;
        }
        return focused instanceof JComboBox<?> combo && combo.isPopupVisible();
    }
}
