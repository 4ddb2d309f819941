package org.tautline.driver.sim;

import java.util.List;
import java.util.SplittableRandom;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * A rig with no hardware: a time-domain model of specimen, shaker and sensors that runs on demand.
 *
 * <p>Channel 0 is the force the stinger transmits into the specimen, N; channel 1 the response at the
 * sensor point along the sensing direction, m (displacement) or m/s^2 (acceleration). Rig time is the
 * sample index over the sample rate; {@link Acquisition#read(int)} computes the samples it returns, and
 * {@link Exciter#rampTo(double, double)} runs the rig clock through the ramp, discarding those samples.
 * The drive is a phase-continuous sine; with the output off the coil sees 0 V while the shaker and the
 * specimen ring down. The model is described in {@link RigDynamics}; its modes in {@link #truth()}.
 * Methods are synchronised, so one rig may be shared between threads.
 */
public final class SimulatedRig implements Rig {
    /** Internal integration rate the rig aims at, Hz: internal steps per sample = ceil(this / sample rate). */
    static final double INTERNAL_RATE_HZ = 20000.0;
    /** Internal rate with an accelerometer, Hz: its second difference needs finer steps. */
    static final double ACCELEROMETER_RATE_HZ = 80000.0;

    private final SimulationConfig config;
    private final SimulationTruth truth;
    private final RigDynamics dynamics;
    private final SensorChannel forceChannel;
    private final SensorChannel responseChannel;
    private final List<ChannelInfo> channels;
    private final int substeps;
    private final int sampledSubstep;
    private final double sampleRateHz;
    private final SimExciter exciter = new SimExciter();
    private final SimAcquisition acquisition = new SimAcquisition();

    private long nextSampleIndex;
    private double frequencyHz;
    private double amplitudeV;
    private double phaseRad;
    private boolean outputEnabled;
    private boolean closed;

    /**
     * Builds the rig at rest with the output off.
     *
     * @param config the specimen, shaker, sensors and acquisition
     */
    public SimulatedRig(SimulationConfig config) {
        this.config = Checks.present("SimulatedRig", "config", config);
        this.sampleRateHz = config.sampleRateHz();
        boolean accelerometer = config.sensors().responseSensor() == ResponseSensor.ACCELERATION;
        this.substeps = (int) Math.ceil((accelerometer ? ACCELEROMETER_RATE_HZ : INTERNAL_RATE_HZ) / sampleRateHz
                - 1e-9);
        this.sampledSubstep = accelerometer ? 1 : 0;
        ModalModel model = new ModalModel(config);
        this.truth = SimulationTruth.of(config);
        this.dynamics = new RigDynamics(config, model, 1.0 / (sampleRateHz * substeps));
        SensorSetup s = config.sensors();
        SplittableRandom root = new SplittableRandom(config.randomSeed());
        this.forceChannel = new SensorChannel(s.forceNoiseDensity(), s.forceFullScale(), s.adcBits(), s.mainsHz(),
                0.0, 0, sampleRateHz, root.split());
        this.responseChannel = new SensorChannel(s.responseNoiseDensity(), s.responseFullScale(), s.adcBits(),
                s.mainsHz(), s.mainsAmplitude(), s.mainsHarmonicCount(), sampleRateHz, root.split());
        boolean displacement = s.responseSensor() == ResponseSensor.DISPLACEMENT;
        this.channels = List.of(new ChannelInfo("force", "force", "N"),
                new ChannelInfo("response", displacement ? "displacement" : "acceleration",
                        displacement ? "m" : "m/s^2"));
    }

    /**
     * @return what the rig is, including the simulated specimen's tension, mass per length, bending stiffness, ends
     *         and damping, so that a journal recorded on one simulated specimen is not resumed on another
     */
    @Override
    public String identity() {
        SimulatedSpecimen s = config.specimen();
        double zeta1 = truth.modes().isEmpty() ? Double.NaN : truth.modes().get(0).mode().dampingRatio();
        return "Tautline simulated rig (model of specimen, shaker and sensors), specimen " + digits(s.tensionN()) + " N, "
                + digits(s.linearDensityKgPerM()) + " kg/m, EI " + digits(s.bendingStiffnessNm2()) + " N m^2, "
                + s.ends().label() + " ends, damping " + digits(zeta1) + ", seed " + config.randomSeed();
    }

    /** Six significant digits without trailing zeros: 146.5, 0.002, 0.000614. */
    private static String digits(double value) {
        return Double.isFinite(value) ? new java.math.BigDecimal(value).round(new java.math.MathContext(6))
                .stripTrailingZeros().toPlainString() : "unknown";
    }

    @Override
    public Exciter exciter() {
        return exciter;
    }

    @Override
    public Acquisition acquisition() {
        return acquisition;
    }

    /** @return the modes and configuration the rig really has */
    public SimulationTruth truth() {
        return truth;
    }

    /** @return the configuration */
    public SimulationConfig config() {
        return config;
    }

    /** @return samples clipped by the ADC so far, both channels together (ramp samples not counted) */
    public synchronized long clippedSampleCount() {
        return forceChannel.clippedCount() + responseChannel.clippedCount();
    }

    /**
     * @param channel 0 (force) or 1 (response)
     * @return samples of that channel clipped so far
     */
    public synchronized long clippedSampleCount(int channel) {
        return switch (channel) {
            case 0 -> forceChannel.clippedCount();
            case 1 -> responseChannel.clippedCount();
            default -> throw new RigException("channel must be 0 (force) or 1 (response), got " + channel);
        };
    }

    /** @return the Kirchhoff-Carrier tension increase at the last sample, N (0 with the nonlinearity off) */
    public synchronized double dynamicTensionN() {
        return dynamics.extraTensionN();
    }

    @Override
    public synchronized void close() {
        outputEnabled = false;
        amplitudeV = 0.0;
        closed = true;
    }

    private void requireOpen() {
        if (closed) {
            throw new RigException("the simulated rig is closed; build a new SimulatedRig to go on");
        }
    }

    private void checkAmplitude(double v) {
        if (!(v >= 0) || Double.isInfinite(v)) {
            throw new RigException("drive amplitude must be zero or a positive finite number of volts, got " + v);
        }
        if (v > config.maxDriveV()) {
            throw new RigException("drive amplitude " + v + " V exceeds the rig limit of " + config.maxDriveV()
                    + " V (maxDriveV)");
        }
    }

    /**
     * Simulates sampleCount samples from amplitude a0 ramping linearly to a1; fills out when given.
     *
     * <p>The source's phase keeps advancing while the output is off, as a generator's oscillator
     * does, so switching back on resumes a phase locked to the rig clock. Ramps draw no sensor noise
     * (their samples are not delivered).
     */
    private void simulate(int sampleCount, double a0, double a1, double[][] out) {
        double phaseStep = 2.0 * Math.PI * frequencyHz / (sampleRateHz * substeps);
        for (int k = 0; k < sampleCount; k++) {
            double amplitude = a1 == a0 ? a0 : a0 + (a1 - a0) * (k + 1) / sampleCount;
            for (int s = 0; s < substeps; s++) {
                double v = outputEnabled ? amplitude * Math.sin(phaseRad) : 0.0;
                phaseRad += phaseStep;
                if (phaseRad > Math.PI) {
                    phaseRad -= 2.0 * Math.PI;
                }
                dynamics.step(v);
                if (s == sampledSubstep && out != null) {
                    out[0][k] = forceChannel.acquire(dynamics.forceN(), nextSampleIndex);
                    out[1][k] = responseChannel.acquire(dynamics.response(), nextSampleIndex);
                }
            }
            nextSampleIndex++;
        }
    }

    private final class SimExciter implements Exciter {
        @Override
        public void setSine(double newFrequencyHz, double newAmplitudeV) {
            synchronized (SimulatedRig.this) {
                requireOpen();
                if (!(newFrequencyHz > 0 && newFrequencyHz < sampleRateHz / 2)) {
                    throw new RigException("drive frequency must lie between 0 and half the sample rate ("
                            + sampleRateHz / 2 + " Hz), got " + newFrequencyHz + " Hz");
                }
                checkAmplitude(newAmplitudeV);
                frequencyHz = newFrequencyHz;
                amplitudeV = newAmplitudeV;
            }
        }

        @Override
        public void rampTo(double targetV, double durationS) {
            synchronized (SimulatedRig.this) {
                requireOpen();
                checkAmplitude(targetV);
                if (!(durationS >= 0) || Double.isInfinite(durationS)) {
                    throw new RigException("ramp duration must be zero or a positive finite number of seconds, got "
                            + durationS);
                }
                long samples = Math.round(durationS * sampleRateHz);
                double start = amplitudeV;
                long done = 0;
                while (done < samples) {
                    int chunk = (int) Math.min(samples - done, 1 << 20);
                    double a0 = start + (targetV - start) * done / samples;
                    double a1 = start + (targetV - start) * (done + chunk) / samples;
                    simulate(chunk, a0, a1, null);
                    done += chunk;
                }
                amplitudeV = targetV;
            }
        }

        @Override
        public void setOutputEnabled(boolean enabled) {
            synchronized (SimulatedRig.this) {
                if (enabled) {
                    requireOpen();
                }
                outputEnabled = enabled;
            }
        }

        @Override
        public boolean isOutputEnabled() {
            synchronized (SimulatedRig.this) {
                return outputEnabled;
            }
        }

        @Override
        public double maxAmplitudeV() {
            return config.maxDriveV();
        }
    }

    private final class SimAcquisition implements Acquisition {
        @Override
        public double sampleRateHz() {
            return sampleRateHz;
        }

        @Override
        public List<ChannelInfo> channels() {
            return channels;
        }

        @Override
        public SampleBlock read(int sampleCount) {
            synchronized (SimulatedRig.this) {
                requireOpen();
                if (sampleCount < 1) {
                    throw new RigException("read needs 1 or more samples per channel, got " + sampleCount);
                }
                long first = nextSampleIndex;
                double[][] out = new double[2][sampleCount];
                simulate(sampleCount, amplitudeV, amplitudeV, out);
                return new SampleBlock(first, out);
            }
        }

        @Override
        public long nextSampleIndex() {
            synchronized (SimulatedRig.this) {
                return nextSampleIndex;
            }
        }
    }
}
