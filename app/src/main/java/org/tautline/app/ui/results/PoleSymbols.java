package org.tautline.app.ui.results;

import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.GeneralPath;
import java.awt.geom.Rectangle2D;

/**
 * Our own symbols for the pole chart: a small plus for a pole matching nothing in the order below,
 * an open triangle for agreement in frequency, an open square for frequency and damping, a filled
 * square when the modal constant agrees too, and a ring around a chosen pole.
 */
final class PoleSymbols {
    private PoleSymbols() {
    }

    static Shape lone() {
        GeneralPath p = new GeneralPath();
        p.moveTo(-2.5, 0);
        p.lineTo(2.5, 0);
        p.moveTo(0, -2.5);
        p.lineTo(0, 2.5);
        return p;
    }

    static Shape frequencyOnly() {
        GeneralPath p = new GeneralPath();
        p.moveTo(0, -4);
        p.lineTo(3.5, 3);
        p.lineTo(-3.5, 3);
        p.closePath();
        return p;
    }

    static Shape square() {
        return new Rectangle2D.Double(-3, -3, 6, 6);
    }

    static Shape ring() {
        return new Ellipse2D.Double(-6.5, -6.5, 13, 13);
    }
}
