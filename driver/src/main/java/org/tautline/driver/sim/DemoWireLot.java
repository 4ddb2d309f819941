package org.tautline.driver.sim;

import java.util.SplittableRandom;

/**
 * The demo wire's production lot (invented): how one specimen differs from the next.
 *
 * <p>A seed draws one specimen of the demo wire's type ({@link SimulationConfigs#demoWire()}): each drawn property is
 * the built wire's value times (1 + s z), with z a standard normal value and s the relative standard deviation below.
 * The spreads are invented for the demo, not measured on any product; they are chosen so that a lot of them behaves
 * as a plausible tensioned-wire lot:
 * <ul>
 *   <li>tension 2 % (about 2.9 N around 146.5 N): set by hand on a tensioner, the figure that varies most from one
 *       assembly to the next; against the demo's 135..165 N limits that is a Cpk near 1.3;</li>
 *   <li>mass per length 0.5 %: the drawn core and its jacket, half the 1 % the stated specimen allows;</li>
 *   <li>bending stiffness 3 %: EI goes as the fourth power of the core diameter (0.5 % in diameter is 2 %), plus the
 *       scatter of the steel's modulus; well inside the stated 10 %;</li>
 *   <li>damping 5 %: one factor on all three parts of the damping model, for the clamp and jacket losses; kept small
 *       because the rig's largest motion (about 1.1 mm near 259 Hz for the wire as built, where the shaker's moving
 *       mass resonates with the wire) goes as the inverse of the damping, and the demo stops at 1.5 mm: a third less
 *       damping would stop a specimen's demo at that safety limit (a 6.6 sigma draw at 5 %).</li>
 * </ul>
 * Span, ends, polarisation split and axis, the axial stiffness, the shaker and the sensors are the rig's and stay as
 * built. The draws are independent. Normal values come from the Box-Muller transform (G. E. P. Box and M. E. Muller,
 * Ann. Math. Statist. 29(2):610-611, 1958) of {@link SplittableRandom} doubles, whose algorithm is specified, so the
 * same seed gives the same specimen on every Java version. Its largest value, about 8.6, keeps every drawn property
 * positive.
 */
public final class DemoWireLot {
    /** Relative standard deviation of the true tension from specimen to specimen (invented). */
    public static final double TENSION_REL_STD = 0.02;
    /** Relative standard deviation of the mass per length (invented). */
    public static final double LINEAR_DENSITY_REL_STD = 0.005;
    /** Relative standard deviation of the bending stiffness (invented). */
    public static final double BENDING_STIFFNESS_REL_STD = 0.03;
    /** Relative standard deviation of the common factor on the damping model (invented). */
    public static final double DAMPING_REL_STD = 0.05;

    /**
     * Mixed into the seed for the specimen's draws, so that they and the sensor noise (seeded with the seed itself)
     * come from different streams; the first output of that generator then seeds the draws, so that neighbouring
     * seeds (1, 2, 3, ...) start from unrelated states.
     */
    private static final long SPECIMEN_STREAM = 0x6A09E667F3BCC909L;

    private DemoWireLot() {
    }

    /**
     * Draws one specimen of the lot.
     *
     * @param asBuilt the wire the lot scatters around (the demo wire as built)
     * @param seed the specimen's seed; the same seed gives the same specimen
     * @return the drawn specimen
     */
    public static SimulatedSpecimen draw(SimulatedSpecimen asBuilt, long seed) {
        Checks.present("DemoWireLot", "asBuilt", asBuilt);
        SplittableRandom random = new SplittableRandom(new SplittableRandom(seed ^ SPECIMEN_STREAM).nextLong());
        double[] z = normals(random, 4);
        DampingModel d = asBuilt.damping();
        double dampingFactor = 1 + DAMPING_REL_STD * z[3];
        return new SimulatedSpecimen(asBuilt.lengthM(),
                asBuilt.linearDensityKgPerM() * (1 + LINEAR_DENSITY_REL_STD * z[1]),
                asBuilt.tensionN() * (1 + TENSION_REL_STD * z[0]),
                asBuilt.bendingStiffnessNm2() * (1 + BENDING_STIFFNESS_REL_STD * z[2]), asBuilt.ends(),
                asBuilt.modeCount(),
                new DampingModel(d.constantRatio() * dampingFactor, d.airRatioAtReference() * dampingFactor,
                        d.internalRatioAtReference() * dampingFactor, d.referenceHz()),
                asBuilt.polarisationSplit(), asBuilt.polarisationAngleRad(), asBuilt.geometricNonlinearity(),
                asBuilt.axialStiffnessN());
    }

    /**
     * Box-Muller (Box and Muller 1958): two uniform values give two independent standard normal values; with
     * {@link StrictMath}, so that every platform draws the same numbers.
     */
    private static double[] normals(SplittableRandom random, int count) {
        double[] z = new double[count];
        for (int i = 0; i < count; i += 2) {
            double u1 = 1.0 - random.nextDouble(); // in (0, 1], so the logarithm is finite
            double u2 = random.nextDouble();
            double r = StrictMath.sqrt(-2.0 * StrictMath.log(u1));
            z[i] = r * StrictMath.cos(2 * Math.PI * u2);
            if (i + 1 < count) {
                z[i + 1] = r * StrictMath.sin(2 * Math.PI * u2);
            }
        }
        return z;
    }
}
