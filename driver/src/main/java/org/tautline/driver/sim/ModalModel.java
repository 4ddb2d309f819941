package org.tautline.driver.sim;

import org.tautline.analysis.specimen.StringPhysics;
import org.tautline.driver.RigException;

/**
 * The specimen's modal coordinates: frequencies, damping and projections at the stinger and the sensor.
 *
 * <p>Coordinate i = 2 (n - 1) + (p - 1) is harmonic n in polarisation p. Principal axis 1 makes the
 * angle alpha with the drive direction d, axis 2 is perpendicular: e1 = (cos a, sin a),
 * e2 = (-sin a, cos a) in the (drive, cross) frame. Mode shapes are mass-normalised,
 * phi_n(x) = sqrt(2/(mu L)) sin(n pi x/L) (see {@link SimulatedSpecimen}).
 */
final class ModalModel {
    final int dofCount;
    final int[] harmonic;
    final int[] polarisation;
    final double[] frequencyHz;
    final double[] dampingRatio;
    /** Drive-direction displacement at x_f per unit coordinate: phi_n(x_f) (e_p . d). */
    final double[] driveProjection;
    /** Sensing-direction displacement at x_s per unit coordinate: phi_n(x_s) (e_p . s). */
    final double[] sensorProjection;
    /** Drive-direction displacement at x_s per unit coordinate. */
    final double[] sensorPointDrive;
    /** Cross-direction displacement at x_s per unit coordinate. */
    final double[] sensorPointCross;
    /** Wavenumber squared (n pi / L)^2, 1/m^2. */
    final double[] wavenumberSquared;

    ModalModel(SimulationConfig config) {
        SimulatedSpecimen s = config.specimen();
        SensorSetup sensors = config.sensors();
        int modes = s.modeCount();
        dofCount = 2 * modes;
        harmonic = new int[dofCount];
        polarisation = new int[dofCount];
        frequencyHz = new double[dofCount];
        dampingRatio = new double[dofCount];
        driveProjection = new double[dofCount];
        sensorProjection = new double[dofCount];
        sensorPointDrive = new double[dofCount];
        sensorPointCross = new double[dofCount];
        wavenumberSquared = new double[dofCount];
        double f0 = StringPhysics.mersenneFundamentalHz(s.lengthM(), s.tensionN(), s.linearDensityKgPerM());
        double b = StringPhysics.inharmonicity(s.bendingStiffnessNm2(), s.tensionN(), s.lengthM());
        double alpha = s.polarisationAngleRad();
        double beta = sensors.sensorAngleRad();
        // Components of the two principal axes along the drive direction, the cross direction and the sensing direction.
        double[] alongDrive = {Math.cos(alpha), -Math.sin(alpha)};
        double[] alongCross = {Math.sin(alpha), Math.cos(alpha)};
        double[] alongSensor = {Math.cos(alpha - beta), Math.sin(beta - alpha)};
        for (int n = 1; n <= modes; n++) {
            double fn = StringPhysics.stiffStringFrequencyHz(n, f0, b, s.ends());
            double phiF = StringPhysics.modeShape(n, sensors.forcingPositionM(), s.lengthM(), s.linearDensityKgPerM());
            double phiS = StringPhysics.modeShape(n, sensors.sensorPositionM(), s.lengthM(), s.linearDensityKgPerM());
            double k = n * Math.PI / s.lengthM();
            for (int p = 0; p < 2; p++) {
                int i = 2 * (n - 1) + p;
                harmonic[i] = n;
                polarisation[i] = p + 1;
                frequencyHz[i] = p == 0 ? fn : fn * (1.0 + s.polarisationSplit());
                dampingRatio[i] = s.damping().dampingRatioAt(frequencyHz[i]);
                if (!(dampingRatio[i] < 1.0)) {
                    throw new RigException("SimulatedSpecimen.damping gives damping ratio " + dampingRatio[i]
                            + " at harmonic " + n + " (" + frequencyHz[i] + " Hz); the simulation expects below 1");
                }
                driveProjection[i] = phiF * alongDrive[p];
                sensorProjection[i] = phiS * alongSensor[p];
                sensorPointDrive[i] = phiS * alongDrive[p];
                sensorPointCross[i] = phiS * alongCross[p];
                wavenumberSquared[i] = k * k;
            }
        }
    }

    /** @param i coordinate @return natural angular frequency, rad/s */
    double omega(int i) {
        return 2.0 * Math.PI * frequencyHz[i];
    }
}
