package org.tautline.analysis.specimen;

import java.util.Objects;
import java.util.Optional;

import org.tautline.analysis.AnalysisException;

/**
 * A tensioned string, wire or belt in the rig, as stated by the person running the test.
 *
 * <p>Positions are measured along the span from one end. The response sensor's angle is that of its
 * sensing axis to the direction of the drive, in the plane normal to the specimen: 0 when it senses
 * along the drive, pi/2 when across it. Immutable; the constructor checks every value.
 *
 * @param id identifier of the specimen, for reports; not blank
 * @param lengthM vibrating length L between the supports, m
 * @param linearDensityKgPerM mass per unit length mu, kg/m
 * @param linearDensityStdKgPerM standard uncertainty of mu, kg/m; NaN when declared not evaluated (every figure that
 *        depends on it then has an unknown uncertainty and is never judged to pass)
 * @param bendingStiffnessNm2 bending stiffness EI, N m^2 (0 when unknown or negligible)
 * @param bendingStiffnessStdNm2 standard uncertainty of EI, N m^2; NaN when declared not evaluated
 * @param ends how the ends are held
 * @param forcingPositionM x_f, where the shaker drives through the force sensor, strictly inside the span, m
 * @param sensorPositionM x_s, where the response is sensed, strictly inside the span, m
 * @param nominalTensionN the tension the specimen is meant to carry, N
 * @param beltSpeedMPerS axial speed of a moving belt, m/s (0 for a static specimen)
 * @param sensorAngleRad angle of the response sensor's axis to the drive direction, rad, -pi..pi
 * @param axialStiffnessN axial stiffness EA, N (0 when unknown; needed for the linearity and sag checks)
 * @param material the material when known
 */
public record Specimen(String id, double lengthM, double linearDensityKgPerM, double linearDensityStdKgPerM,
                       double bendingStiffnessNm2, double bendingStiffnessStdNm2, EndCondition ends,
                       double forcingPositionM, double sensorPositionM, double nominalTensionN,
                       double beltSpeedMPerS, double sensorAngleRad, double axialStiffnessN,
                       Optional<Material> material) {

    /** Checks every value; messages name the field, the value and what was expected. */
    public Specimen {
        if (id == null || id.isBlank()) {
            throw new AnalysisException("specimen id must not be blank, got " + (id == null ? "null" : "'" + id + "'"));
        }
        positive("lengthM", lengthM, "m");
        positive("linearDensityKgPerM", linearDensityKgPerM, "kg/m");
        uncertainty("linearDensityStdKgPerM", linearDensityStdKgPerM, "kg/m");
        nonNegative("bendingStiffnessNm2", bendingStiffnessNm2, "N m^2");
        uncertainty("bendingStiffnessStdNm2", bendingStiffnessStdNm2, "N m^2");
        Objects.requireNonNull(ends, "specimen ends must be given (PINNED or CLAMPED)");
        inside("forcingPositionM", forcingPositionM, lengthM);
        inside("sensorPositionM", sensorPositionM, lengthM);
        positive("nominalTensionN", nominalTensionN, "N");
        nonNegative("beltSpeedMPerS", beltSpeedMPerS, "m/s");
        if (!(Math.abs(sensorAngleRad) <= Math.PI)) {
            throw new AnalysisException("specimen " + id + ": sensorAngleRad must lie in -pi..pi, got " + sensorAngleRad);
        }
        nonNegative("axialStiffnessN", axialStiffnessN, "N");
        Objects.requireNonNull(material, "specimen material must be an Optional, empty when not known");
        double waveSpeed = Math.sqrt(nominalTensionN / linearDensityKgPerM);
        if (!(beltSpeedMPerS < waveSpeed)) {
            throw new AnalysisException("specimen " + id + ": beltSpeedMPerS must be below the transverse wave speed "
                    + "sqrt(T/mu) = " + waveSpeed + " m/s, got " + beltSpeedMPerS + " m/s");
        }
    }

    /**
     * A static, solid round wire of a handbook material, pinned or clamped, with the sensor along the drive.
     *
     * <p>mu = rho pi d^2/4 and EI = E pi d^4/64 (solid round section), EA = E pi d^2/4, with the
     * uncertainties of the material's handbook range ({@link Material}).
     *
     * @param id identifier
     * @param material handbook material
     * @param diameterM wire diameter, m
     * @param lengthM vibrating length, m
     * @param ends end condition
     * @param forcingPositionM x_f, m
     * @param sensorPositionM x_s, m
     * @param nominalTensionN nominal tension, N
     * @return the specimen
     */
    public static Specimen roundWire(String id, Material material, double diameterM, double lengthM, EndCondition ends,
                                     double forcingPositionM, double sensorPositionM, double nominalTensionN) {
        Objects.requireNonNull(material, "material must be given");
        positive("diameterM", diameterM, "m");
        double area = Math.PI * diameterM * diameterM / 4.0;
        double mu = StringPhysics.linearDensityKgPerM(material.densityKgPerM3(), diameterM);
        double muStd = material.densityStdKgPerM3() * area;
        double ei = 0;
        double eiStd = 0;
        double ea = 0;
        if (material.hasYoungsModulus()) {
            ei = StringPhysics.bendingStiffnessNm2(material.youngsModulusPa(), diameterM);
            eiStd = ei * material.youngsModulusStdPa() / material.youngsModulusPa();
            ea = material.youngsModulusPa() * area;
        }
        return new Specimen(id, lengthM, mu, muStd, ei, eiStd, ends, forcingPositionM, sensorPositionM,
                nominalTensionN, 0.0, 0.0, ea, Optional.of(material));
    }

    /**
     * The same specimen moving axially.
     *
     * @param speedMPerS belt speed, m/s
     * @return a copy with the new speed
     */
    public Specimen withBeltSpeedMPerS(double speedMPerS) {
        return new Specimen(id, lengthM, linearDensityKgPerM, linearDensityStdKgPerM, bendingStiffnessNm2,
                bendingStiffnessStdNm2, ends, forcingPositionM, sensorPositionM, nominalTensionN, speedMPerS,
                sensorAngleRad, axialStiffnessN, material);
    }

    /**
     * The same specimen with the shaker and the sensor somewhere else.
     *
     * @param forcingM new x_f, m
     * @param sensorM new x_s, m
     * @return a copy with the new positions
     */
    public Specimen withPositions(double forcingM, double sensorM) {
        return new Specimen(id, lengthM, linearDensityKgPerM, linearDensityStdKgPerM, bendingStiffnessNm2,
                bendingStiffnessStdNm2, ends, forcingM, sensorM, nominalTensionN, beltSpeedMPerS,
                sensorAngleRad, axialStiffnessN, material);
    }

    /**
     * The same specimen with another sensor orientation.
     *
     * @param angleRad angle of the sensor axis to the drive, rad
     * @return a copy with the new angle
     */
    public Specimen withSensorAngleRad(double angleRad) {
        return new Specimen(id, lengthM, linearDensityKgPerM, linearDensityStdKgPerM, bendingStiffnessNm2,
                bendingStiffnessStdNm2, ends, forcingPositionM, sensorPositionM, nominalTensionN, beltSpeedMPerS,
                angleRad, axialStiffnessN, material);
    }

    /** @return the Mersenne fundamental at the nominal tension, sqrt(T/mu)/(2L), Hz */
    public double nominalFundamentalHz() {
        return StringPhysics.mersenneFundamentalHz(lengthM, nominalTensionN, linearDensityKgPerM);
    }

    /**
     * The pinned-string mode shape sin(n pi x/L) at the forcing point.
     *
     * @param harmonic n
     * @return sin(n pi x_f/L)
     */
    public double forcingShape(int harmonic) {
        return Math.sin(harmonic * Math.PI * forcingPositionM / lengthM);
    }

    /**
     * The pinned-string mode shape sin(n pi x/L) at the sensor.
     *
     * @param harmonic n
     * @return sin(n pi x_s/L)
     */
    public double sensorShape(int harmonic) {
        return Math.sin(harmonic * Math.PI * sensorPositionM / lengthM);
    }

    private static void positive(String field, double value, String unit) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new AnalysisException("specimen " + field + " must be a positive finite number of " + unit
                    + ", got " + value);
        }
    }

    /** A standard uncertainty: zero or more, or NaN for one declared not evaluated. */
    private static void uncertainty(String field, double value, String unit) {
        if (!Double.isNaN(value)) {
            nonNegative(field, value, unit);
        }
    }

    /** @return true when the uncertainty of the mass per length was declared not evaluated */
    public boolean linearDensityUncertaintyUnknown() {
        return Double.isNaN(linearDensityStdKgPerM);
    }

    private static void nonNegative(String field, double value, String unit) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new AnalysisException("specimen " + field + " must be zero or a positive finite number of " + unit
                    + ", got " + value);
        }
    }

    private static void inside(String field, double value, double lengthM) {
        if (!(value > 0 && value < lengthM)) {
            throw new AnalysisException("specimen " + field + " must lie strictly inside the span, 0 < x < "
                    + lengthM + " m, got " + value + " m");
        }
    }
}
