package org.tautline.driver.sim;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tautline.analysis.modal.Mode;

/**
 * What the simulated rig really contains: its configuration and its modes.
 *
 * <p>The FRF of the simulated measurement is the specimen's receptance from drive-direction force at
 * x_f to sensing-direction displacement at x_s. By modal expansion with mass-normalised modes
 * (L. Meirovitch, Elements of Vibration Analysis, 2nd ed., McGraw-Hill 1986, ch. 7, from memory) it
 * is H(w) = sum A_r / (w_r^2 - w^2 + 2 j zeta_r w_r w) over harmonics and both polarisations, with
 * A_r = phi_n(x_s) phi_n(x_f) (e_p . d)(e_p . s). For the linear specimen with no accelerometer mass
 * this is exact for the simulated FRF (the measured force is the force into the specimen, so the shaker
 * does not enter). Immutable.
 *
 * @param config the rig's configuration
 * @param modes every simulated mode, harmonic 1 polarisation 1 first
 */
public record SimulationTruth(SimulationConfig config, List<TrueMode> modes) {

    /** Copies the mode list. */
    public SimulationTruth {
        Checks.present("SimulationTruth", "config", config);
        modes = List.copyOf(modes);
    }

    /**
     * The truth of a configuration.
     *
     * @param config the rig's configuration
     * @return its modes and configuration
     */
    public static SimulationTruth of(SimulationConfig config) {
        ModalModel model = new ModalModel(config);
        List<TrueMode> modes = new ArrayList<>(model.dofCount);
        for (int i = 0; i < model.dofCount; i++) {
            double a = model.sensorProjection[i] * model.driveProjection[i];
            modes.add(new TrueMode(model.harmonic[i], model.polarisation[i],
                    new Mode(model.frequencyHz[i], model.dampingRatio[i], new Complex(a, 0.0))));
        }
        return new SimulationTruth(config, modes);
    }

    /**
     * The analytic receptance at one frequency.
     *
     * @param frequencyHz drive frequency, Hz
     * @return sum of the modes' contributions, m/N
     */
    public Complex receptanceAt(double frequencyHz) {
        Checks.positive("SimulationTruth", "frequencyHz", frequencyHz, "Hz");
        double re = 0;
        double im = 0;
        for (TrueMode m : modes) {
            Complex c = m.mode().receptanceAt(frequencyHz);
            re += c.getReal();
            im += c.getImaginary();
        }
        return new Complex(re, im);
    }
}
