package org.tautline.app.ui;

import java.awt.Component;
import java.awt.Container;
import java.awt.Window;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Predicate;

import javax.swing.AbstractButton;
import javax.swing.JDialog;
import javax.swing.SwingUtilities;

/**
 * Drives the workbench from outside the event thread, as a person would: finds its components by name or text, runs
 * a question on the event thread, and waits for a condition or a dialog with a deadline. Used by {@code bench ui} and
 * by the workbench tests.
 */
public final class WindowSearch {
    private WindowSearch() {
    }

    /**
     * @param call what to run on the event thread
     * @param <T> its result's type
     * @return its result
     * @throws Exception what it threw
     */
    public static <T> T onEdt(Callable<T> call) throws Exception {
        AtomicReference<T> result = new AtomicReference<>();
        AtomicReference<Exception> error = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                result.set(call.call());
            } catch (Exception e) {
                error.set(e);
            }
        });
        if (error.get() != null) {
            throw error.get();
        }
        return result.get();
    }

    /**
     * Asks the event thread every 50 ms until the condition holds.
     *
     * @param what what is awaited, for the message
     * @param seconds the deadline
     * @param condition asked on the event thread
     * @throws IllegalStateException when the deadline passes first
     * @throws Exception what the condition threw
     */
    public static void waitFor(String what, double seconds, Callable<Boolean> condition) throws Exception {
        long deadline = System.nanoTime() + (long) (seconds * 1e9);
        while (System.nanoTime() < deadline) {
            if (onEdt(condition)) {
                return;
            }
            Thread.sleep(50);
        }
        throw new IllegalStateException("timed out after " + seconds + " s waiting for " + what);
    }

    /**
     * @param title the dialog's title
     * @param seconds the deadline
     * @return the dialog, once it shows
     * @throws Exception as {@link #waitFor}
     */
    public static JDialog waitForDialog(String title, double seconds) throws Exception {
        AtomicReference<JDialog> found = new AtomicReference<>();
        waitFor("the dialog '" + title + "'", seconds, () -> {
            for (Window w : Window.getWindows()) {
                if (w instanceof JDialog d && w.isShowing() && title.equals(d.getTitle())) {
                    found.set(d);
                    return true;
                }
            }
            return false;
        });
        return found.get();
    }

    /**
     * @param root where to look
     * @param type the component's type
     * @param name its name
     * @param <T> the type
     * @return the component
     * @throws IllegalStateException when there is none
     */
    public static <T extends Component> T find(Container root, Class<T> type, String name) {
        T found = findOrNull(root, type, c -> name.equals(c.getName()));
        if (found == null) {
            throw new IllegalStateException("no " + type.getSimpleName() + " named '" + name + "' in the window");
        }
        return found;
    }

    /**
     * @param root where to look
     * @param text the button's text
     * @return the button
     * @throws IllegalStateException when there is none
     */
    public static AbstractButton findButtonByText(Container root, String text) {
        AbstractButton b = findOrNull(root, AbstractButton.class, c -> text.equals(((AbstractButton) c).getText()));
        if (b == null) {
            throw new IllegalStateException("no button '" + text + "'");
        }
        return b;
    }

    private static <T extends Component> T findOrNull(Container root, Class<T> type, Predicate<Component> match) {
        for (Component c : root.getComponents()) {
            if (type.isInstance(c) && match.test(c)) {
                return type.cast(c);
            }
            if (c instanceof Container inner) {
                T found = findOrNull(inner, type, match);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
