package org.tautline.app.ui;

import java.awt.Component;
import java.awt.Container;

import javax.swing.AbstractButton;

/**
 * Keeps the lot screen's "Add the shown result to this lot" button off while the result on the results screen is not
 * current, so that a result left over from an earlier run cannot be added to a lot as if it were the last one.
 *
 * <p>The lot screen enables its button whenever it has been given a result; this guard switches it off again as long
 * as the workbench says the result is not current. It stands in until the lot screen can be told that its result was
 * withdrawn. Use on the event thread.
 */
final class LotAddGuard {
    private final AbstractButton add;
    private boolean allowed;

    /**
     * @param lotScreen the lot screen's component, which holds a button named {@code addToLot}
     * @throws IllegalStateException when it holds no such button
     */
    LotAddGuard(Container lotScreen) {
        add = find(lotScreen);
        add.addPropertyChangeListener("enabled", e -> {
            if (!allowed && add.isEnabled()) {
                add.setEnabled(false);
            }
        });
    }

    /** @param current true when the result on show is current and may be added; false switches the button off */
    void resultCurrent(boolean current) {
        allowed = current;
        if (!current) {
            add.setEnabled(false);
        }
    }

    private static AbstractButton find(Container root) {
        for (Component c : root.getComponents()) {
            if (c instanceof AbstractButton b && "addToLot".equals(b.getName())) {
                return b;
            }
            if (c instanceof Container inner) {
                try {
                    return find(inner);
                } catch (IllegalStateException e) {
                    // not in this branch
                }
            }
        }
        throw new IllegalStateException("the lot screen has no button named 'addToLot' to keep off while the result"
                + " on show is not current");
    }
}
