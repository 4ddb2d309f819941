package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.util.List;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;

/** The local one-pole fit recovers a single mode's frequency and damping from its noise-free receptance. */
class ModalResidualStartTest {

    /** The pole fitted around the peak line of one mode at 100 Hz on 0.05 Hz lines, plus a constant offset. */
    private static Pole fitted(double dampingRatio) {
        double[] f = LscfTestData.uniformLines(80, 120, 801);
        // Reference: the mode's own receptance from ModalSynthesis; the offset stands for the other modes' misfit.
        Frf h = ModalSynthesis.receptance(List.of(new Mode(100, dampingRatio, new Complex(1600, 200))), f);
        Complex offset = new Complex(2e-5, -1e-5);
        Complex[] residual = new Complex[f.length];
        int peak = 0;
        for (int k = 0; k < f.length; k++) {
            residual[k] = h.value(k).add(offset);
            if (residual[k].norm() > residual[peak].norm()) {
                peak = k;
            }
        }
        Pole p = ModalResidualStart.at(f, residual, peak);
        assertNotNull(p, "zeta " + dampingRatio + ": a plausible pole");
        return p;
    }

    @Test
    void recoversALightlyDampedMode() {
        Pole p = fitted(0.002);
        assertEquals(100, p.frequencyHz(), 1e-3 * 100 * 0.002);
        assertEquals(0.002, p.dampingRatio(), 1e-3 * 0.002);
    }

    @Test
    void recoversAModeTenTimesWiderThanTheFirstLines() {
        Pole p = fitted(0.01);
        assertEquals(100, p.frequencyHz(), 1e-3 * 100 * 0.01);
        assertEquals(0.01, p.dampingRatio(), 1e-3 * 0.01);
    }
}
