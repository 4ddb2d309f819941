package org.tautline.driver.sim;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.spi.SampleBlock;

/** What the simulated acquisition and exciter add to the ideal signals: noise, hum, distortion, ADC and clock. */
class SensorImperfectionsTest {
    private static final double FS_HZ = SimulationConfig.DEFAULT_SAMPLE_RATE_HZ;

    /** Demo transducer positions with the given noise, ranges, ADC and hum. */
    private static SensorSetup sensors(double sensorPositionM, double forceNoiseDensity, double responseNoiseDensity,
                                       double forceFullScale, double responseFullScale, int adcBits, double mainsHz,
                                       double mainsAmplitude, int mainsHarmonicCount) {
        return new SensorSetup(0.07, sensorPositionM, ResponseSensor.DISPLACEMENT, 0.0, 0.0, forceNoiseDensity,
                responseNoiseDensity, forceFullScale, responseFullScale, adcBits, mainsHz, mainsAmplitude,
                mainsHarmonicCount);
    }

    /** Ramps a fresh rig to a sine, dwells, then returns one record of whole seconds. */
    private static SampleBlock steadyRecord(SimulatedRig rig, double frequencyHz, double amplitudeV, double dwellS,
                                            double recordS) {
        rig.exciter().setSine(frequencyHz, 0.0);
        rig.exciter().setOutputEnabled(true);
        rig.exciter().rampTo(amplitudeV, 0.5);
        rig.acquisition().read((int) Math.round(dwellS * FS_HZ));
        return rig.acquisition().read((int) Math.round(recordS * FS_HZ));
    }

    @Test
    void noiseStandardDeviationIsDensityTimesRootOfHalfTheSampleRate() {
        int n = 200_000;
        // Two rates with their own seeds, so a density scaled by any other power of fs, or by a fixed rate, fails.
        for (double fs : new double[] {20_000.0, 50_000.0}) {
            SimulationConfig config = SimulationConfigs.demoWire()
                    .withSensors(sensors(0.43, 1e-6, 2e-10, 5.0, 1e-3, 24, 50.0, 0.0, 0))
                    .withSampleRateHz(fs).withRandomSeed(20240611L + (long) fs);
            SimulatedRig rig = new SimulatedRig(config);
            // Drive off and at rest: the channels carry noise and quantisation only.
            double[][] x = rig.acquisition().read(n).samples();
            double[] density = {1e-6, 2e-10};
            double[] fullScale = {5.0, 1e-3};
            for (int ch = 0; ch < 2; ch++) {
                double lsb = fullScale[ch] / Math.scalb(1.0, 23);
                // Source: one-sided PSD of white noise of variance s^2 is 2 s^2/fs, so s = D sqrt(fs/2)
                // (checks.md; Bendat & Piersol, Random Data, 4th ed. 2010, from memory), plus the ADC's
                // LSB^2/12 (Widrow's quantisation model, from memory; a 3e-6 relative share here).
                double expectedStd = Math.sqrt(density[ch] * density[ch] * fs / 2.0 + lsb * lsb / 12.0);
                double mean = Arrays.stream(x[ch]).average().orElseThrow();
                double m2 = 0;
                double m4 = 0;
                double lag1 = 0;
                for (int i = 0; i < n; i++) {
                    double d = x[ch][i] - mean;
                    m2 += d * d;
                    m4 += d * d * d * d;
                    if (i > 0) {
                        lag1 += d * (x[ch][i - 1] - mean);
                    }
                }
                double std = Math.sqrt(m2 / (n - 1));
                // Gaussian samples: std of the sample standard deviation is s/sqrt(2n), of the mean s/sqrt(n),
                // of the lag-1 correlation 1/sqrt(n), of the kurtosis sqrt(24/n) (common practice); allow 5 of each.
                String where = "channel " + ch + " at " + fs + " Hz";
                assertEquals(expectedStd, std, 5.0 * expectedStd / Math.sqrt(2.0 * n), where + ": per-sample std"
                        + " must be D sqrt(fs/2) (one-sided density, Bendat & Piersol 2010 from memory; checks.md)");
                assertEquals(0.0, mean, 5.0 * expectedStd / Math.sqrt(n), where + ": white noise has zero mean");
                assertEquals(0.0, lag1 / m2, 5.0 / Math.sqrt(n), where + ": white noise has no lag-1 correlation"
                        + " (common practice)");
                assertEquals(3.0, n * m4 / (m2 * m2), 5.0 * Math.sqrt(24.0 / n), where + ": Gaussian noise has"
                        + " kurtosis 3 (common practice)");
            }
            double cross = 0;
            double fx = 0;
            double rx = 0;
            for (int i = 0; i < n; i++) {
                cross += x[0][i] * x[1][i];
                fx += x[0][i] * x[0][i];
                rx += x[1][i] * x[1][i];
            }
            assertEquals(0.0, cross / Math.sqrt(fx * rx), 5.0 / Math.sqrt(n), "force and response noise at " + fs
                    + " Hz come from separate transducers and must be uncorrelated (common practice)");
        }
    }

    @Test
    void mainsHumHasHarmonicKAtAmplitudeOverKAndNoneAboveTheCount() {
        double amplitude = 2e-9;
        for (double[] hum : new double[][] {{50.0, 3}, {60.0, 5}}) {
            double mainsHz = hum[0];
            int count = (int) hum[1];
            // 32-bit ADC with a 0.1 um range: one step is 5e-17 m, far below the 1e-6 relative tolerance.
            SimulationConfig config = SimulationConfigs.demoWire()
                    .withSensors(sensors(0.43, 0.0, 0.0, 5.0, 1e-7, 32, mainsHz, amplitude, count));
            SimulatedRig rig = new SimulatedRig(config);
            // Drive off, noise off; one second holds whole cycles of every hum harmonic.
            double[][] x = rig.acquisition().read((int) FS_HZ).samples();
            for (int k = 1; k <= count + 1; k++) {
                double a = SineFit.threeParameter(x[1], FS_HZ, k * mainsHz).amplitude();
                // Source: the model's documented hum, harmonic k at k mainsHz with amplitude mainsAmplitude / k
                // (SensorSetup Javadoc), harmonics 1..mainsHarmonicCount only.
                if (k <= count) {
                    assertEquals(amplitude / k, a, 1e-6 * amplitude / k, "hum harmonic " + k + " of " + mainsHz
                            + " Hz must have amplitude mainsAmplitude/" + k + " (SensorSetup documentation)");
                } else {
                    assertTrue(a < 1e-6 * amplitude, "no hum at " + k + " x " + mainsHz + " Hz with mainsHarmonicCount "
                            + count + " (SensorSetup documentation), found " + a + " m");
                }
            }
            assertTrue(Arrays.stream(x[0]).allMatch(v -> v == 0.0), "hum is documented on the response channel"
                    + " only; the force channel of a rig at rest with no noise must read exactly 0");
        }
    }

    @Test
    void shakerDistortionFollowsTheDocumentedCoilNonlinearityThroughTheLinearTransfer() {
        SimulationConfig demo = SimulationConfigs.demoWire();
        // Method. The force channel carries the force transmitted into the wire, not the coil force, so the
        // coil's harmonics reach it through the linear shaker-plus-wire dynamics at 2f and 3f. In the model
        // the nonlinear part of the coil force, Bl (a2 i^2 + a3 i^3), enters exactly where the linear part
        // Bl V/R does (RigDynamics.advanceBodies), so it reaches the force sensor through the same transfer
        // G(f) = F/V scaled by R/Bl. With i = I cos wt, a2 = 2 HD2/i_ref and a3 = 4 HD3/i_ref^2 (what the
        // documented relative harmonics HDk at i_ref imply for g(i) = i + a2 i^2 + a3 i^3), the coil force
        // has Bl (a2 I^2/2) at 2f and Bl (a3 I^3/4) at 3f, so the transmitted harmonic k is
        // |G(k f)| V HDk s^(k-1) with s = I/i_ref = V/maxDriveV, and the fundamental is |G(f)| V (1 + 3 HD3 s^2)
        // (the cubic's own share, 3/4 a3 I^3). G is measured separately at f, 2f and 3f with pure drives on
        // the same rig with distortion off. The back-EMF makes I differ from V/R by at most
        // eps = Bl w |X|/V, X the armature (= drive point) displacement, read on the response channel placed
        // at the stinger; harmonic k is then uncertain by (1 + eps)^k - 1. The demo coil (Bl 3 N/A, 4 ohm)
        // has eps ~ 6 % at 330 Hz; a coil with the same force per volt and a tenth of the back-EMF damping
        // (Bl 0.3 N/A, 0.4 ohm) brings eps to ~0.6 % and the tolerance to ~1 % and ~2 %.
        ShakerModel coil = new ShakerModel(0.02, 2000.0, 1.0, 0.3, 0.4, demo.shaker().secondHarmonicDistortion(),
                demo.shaker().thirdHarmonicDistortion());
        SimulationConfig distorted = demo.idealised().withShaker(coil)
                .withSensors(sensors(0.07, 0.0, 0.0, 50.0, 1e-2, 32, 50.0, 0.0, 0));
        SimulationConfig clean = distorted.withShaker(coil.withoutDistortion());
        double f = 330.0;
        double below = 0;
        double above = Double.POSITIVE_INFINITY;
        for (TrueMode m : SimulationTruth.of(clean).modes()) {
            double fn = m.mode().frequencyHz();
            below = fn < f ? Math.max(below, fn) : below;
            above = fn > f ? Math.min(above, fn) : above;
        }
        assertTrue(f > 1.1 * below && f < 0.9 * above, f + " Hz must lie between specimen modes (" + below + " and "
                + above + " Hz) with 10 % margin");
        double[] gain = new double[4];
        for (int k = 1; k <= 3; k++) {
            SampleBlock b = steadyRecord(new SimulatedRig(clean), k * f, 1.0, 2.0, 1.0);
            gain[k] = SineFit.threeParameter(b.samples()[0], FS_HZ, k * f).amplitude();
        }
        double maxV = distorted.maxDriveV();
        double bl = coil.forceConstantNPerA();
        for (double s : new double[] {1.0, 0.4}) {
            double v = s * maxV;
            SimulatedRig rig = new SimulatedRig(distorted);
            SampleBlock b = steadyRecord(rig, f, v, 2.0, 1.0);
            assertEquals(0L, rig.clippedSampleCount(), "the record must not clip");
            SinePhasor force = SineFit.fit(b.samples()[0], FS_HZ, f, 3);
            double eps = bl * 2.0 * Math.PI * f * SineFit.threeParameter(b.samples()[1], FS_HZ, f).amplitude() / v;
            assertTrue(eps < 0.01, "back-EMF share of the coil current should be below 1 %, was " + eps);
            double fundamental = 1.0 + 3.0 * coil.thirdHarmonicDistortion() * s * s;
            double[] hd = {coil.secondHarmonicDistortion(), coil.thirdHarmonicDistortion()};
            for (int k = 2; k <= 3; k++) {
                double expected = hd[k - 2] * Math.pow(s, k - 1) * gain[k] / gain[1] / fundamental;
                double measured = force.harmonicAmplitudes()[k - 2] / force.amplitude();
                double tolerance = Math.pow(1.0 + eps, k) - 1.0 + 1e-4;
                // Source: the documented static nonlinearity g(i) = i + a2 i^2 + a3 i^3 with relative harmonics
                // HDk at i_ref = maxDriveV/R, falling as i^(k-1) (ShakerModel Javadoc; Tomlinson in Harris'
                // Shock and Vibration Handbook, 5th ed. 2002, ch. 25, from memory), carried by the measured G.
                assertEquals(expected, measured, tolerance * expected, "force harmonic " + k + " / fundamental at "
                        + v + " V: HD" + k + " (V/Vmax)^" + (k - 1) + " |G(" + k + "f)|/|G(f)| (ShakerModel"
                        + " documentation), eps " + eps);
            }
        }
        SinePhasor off = SineFit.fit(steadyRecord(new SimulatedRig(clean), f, maxV, 2.0, 1.0).samples()[0], FS_HZ,
                f, 3);
        for (int k = 2; k <= 3; k++) {
            double relative = off.harmonicAmplitudes()[k - 2] / off.amplitude();
            assertTrue(relative < 1e-6, "with distortion off the force harmonic " + k + " must vanish (linear"
                    + " model, ShakerModel documentation), was " + relative + " of the fundamental");
        }
    }

    @Test
    void adcSamplesAreWholeStepsMidTreadAndSaturateAtTheEndCodes() {
        for (int bits : new int[] {12, 24}) {
            SimulationConfig config = SimulationConfigs.demoWire().idealised()
                    .withSensors(sensors(0.43, 0.0, 0.0, 1.0, 1e-3, bits, 50.0, 0.0, 0));
            SimulatedRig rig = new SimulatedRig(config);
            double[][] rest = rig.acquisition().read(100).samples();
            // Source: an ideal mid-tread quantiser has a code at zero (IEEE Std 1241-2010 terms, from memory;
            // SensorChannel Javadoc); a mid-rise one would read plus or minus half a step.
            assertTrue(Arrays.stream(rest[0]).allMatch(v -> v == 0.0) && Arrays.stream(rest[1]).allMatch(v -> v == 0.0),
                    bits + "-bit ADC: a rig at rest with no noise must read exactly 0 (mid-tread quantiser)");
            rig.exciter().setSine(330.0, 1.0);
            rig.exciter().setOutputEnabled(true);
            double[][] x = rig.acquisition().read(20_000).samples();
            double[] fullScale = {1.0, 1e-3};
            for (int ch = 0; ch < 2; ch++) {
                double lsb = fullScale[ch] / Math.scalb(1.0, bits - 1);
                long distinct = Arrays.stream(x[ch]).map(v -> Math.rint(v / lsb)).distinct().count();
                assertTrue(distinct > 20, "channel " + ch + " must span many codes for the check to mean"
                        + " anything, spans " + distinct);
                for (double v : x[ch]) {
                    double code = v / lsb;
                    // Source: step = 2 fullScale / 2^bits (SensorSetup Javadoc; IEEE Std 1241-2010, from memory).
                    assertEquals(Math.rint(code), code, 1e-6, bits + "-bit channel " + ch + ": every sample must be"
                            + " a whole number of steps fullScale/2^(bits-1) (SensorSetup documentation)");
                }
            }
        }
        SimulationConfig tight = SimulationConfigs.demoWire().idealised()
                .withSensors(sensors(0.43, 0.0, 0.0, 0.01, 5e-6, 12, 50.0, 0.0, 0));
        SampleBlock b = steadyRecord(new SimulatedRig(tight), 330.0, 1.0, 0.5, 0.1);
        double[] fullScale = {0.01, 5e-6};
        for (int ch = 0; ch < 2; ch++) {
            double lsb = fullScale[ch] / 2048.0;
            double min = Arrays.stream(b.samples()[ch]).min().orElseThrow();
            double max = Arrays.stream(b.samples()[ch]).max().orElseThrow();
            // Source: a two's-complement ADC's codes run from -2^(bits-1) to 2^(bits-1) - 1 (IEEE Std 1241-2010
            // terms, from memory): clipping saturates at -fullScale and at fullScale minus one step.
            assertEquals(-fullScale[ch], min, 1e-12 * fullScale[ch], "channel " + ch + " clips at the bottom code"
                    + " -fullScale (IEEE Std 1241 terms, from memory)");
            assertEquals(fullScale[ch] - lsb, max, 1e-12 * fullScale[ch], "channel " + ch + " clips at the top code"
                    + " fullScale - step (IEEE Std 1241 terms, from memory)");
        }
    }

    @Test
    void quantisationResidualOfACleanSineIsOneStepOverRootTwelve() {
        int bits = 12;
        double[] fullScale = {1.0, 1e-3};
        SimulationConfig config = SimulationConfigs.demoWire().idealised()
                .withSensors(sensors(0.43, 0.0, 0.0, fullScale[0], fullScale[1], bits, 50.0, 0.0, 0));
        // 330 Hz at 20 kS/s repeats every 2000 samples, so the record meets the error at 2000 phases.
        SampleBlock b = steadyRecord(new SimulatedRig(config), 330.0, 1.0, 2.0, 1.0);
        for (int ch = 0; ch < 2; ch++) {
            double lsb = fullScale[ch] / Math.scalb(1.0, bits - 1);
            SinePhasor fit = SineFit.threeParameter(b.samples()[ch], FS_HZ, 330.0);
            assertTrue(fit.amplitude() > 20 * lsb, "channel " + ch + ": the sine must span tens of steps for the"
                    + " uniform-error model to hold, amplitude " + fit.amplitude() / lsb + " steps");
            double ratio = fit.residualRms() / (lsb / Math.sqrt(12.0));
            // Source: Widrow's quantisation noise model, error uniform over one step, RMS LSB/sqrt(12)
            // (B. Widrow, from memory); the noise-free steady-state sine leaves only that error to the fit.
            assertEquals(1.0, ratio, 0.2, "channel " + ch + ": residual RMS of a quantised clean sine must be"
                    + " LSB/sqrt(12) within 20 % (Widrow's model, from memory)");
            // A rounding (mid-tread) quantiser leaves no mean error; a truncating one would leave -LSB/2.
            assertEquals(0.0, fit.offset() / lsb, 0.05, "channel " + ch + ": rounding to the nearest code leaves"
                    + " no offset (IEEE Std 1241 mid-tread quantiser, from memory)");
        }
    }

    @Test
    void rigClockCountsReadsRampsAndToggles() {
        SimulatedRig rig = new SimulatedRig(SimulationConfigs.demoWire());
        var daq = rig.acquisition();
        var drive = rig.exciter();
        drive.setSine(330.0, 0.0);
        drive.setOutputEnabled(true);
        assertEquals(0L, daq.nextSampleIndex(), "setting the sine and switching on take no rig time");
        drive.rampTo(1.0, 0.05);
        // Source: rig time is sample index / sample rate and a ramp runs the clock through its duration
        // (SimulatedRig and Acquisition documentation).
        assertEquals(1000L, daq.nextSampleIndex(), "a 0.05 s ramp at 20 kS/s advances 1000 samples");
        SampleBlock first = daq.read(777);
        assertEquals(1000L, first.firstSampleIndex(), "a block starts where the ramp ended");
        drive.setOutputEnabled(false);
        SampleBlock off = daq.read(1);
        assertEquals(1777L, off.firstSampleIndex(), "switching off takes no rig time; blocks are contiguous");
        drive.rampTo(0.0, 0.0);
        drive.setOutputEnabled(true);
        drive.setSine(400.0, 0.5);
        assertEquals(1778L, daq.nextSampleIndex(), "a zero-length ramp, a toggle and a new sine take no rig time");
        drive.rampTo(0.5, 0.0123);
        daq.read(3000);
        assertEquals(2024L + 3000L, daq.nextSampleIndex(), "a 0.0123 s ramp is 246 samples");
        assertEquals((1000 + 778 + 246 + 3000) / FS_HZ, daq.rigTimeS(), 1e-15,
                "rig time is the sum of ramp durations and samples read over the sample rate");
        SimulatedRig fast = new SimulatedRig(SimulationConfigs.demoWire().withSampleRateHz(50_000.0));
        fast.exciter().rampTo(0.0, 0.01);
        fast.acquisition().read(250);
        assertEquals(0.015, fast.acquisition().rigTimeS(), 1e-15, "at 50 kS/s a 0.01 s ramp and 250 samples are"
                + " 15 ms of rig time");
    }

    @Test
    void rampedStretchesGiveTheSamplesAContinuousReadWouldHaveGiven() {
        // Noise off (ramped samples draw no noise, so noisy runs would legitimately differ), hum on so the
        // hum's time base, which is the sample index, is checked along with the drive and the dynamics.
        SimulationConfig config = SimulationConfigs.demoWire().idealised()
                .withSensors(sensors(0.43, 0.0, 0.0, 5.0, 1e-3, 24, 50.0, 2e-9, 3));
        SimulatedRig ramped = new SimulatedRig(config);
        SimulatedRig read = new SimulatedRig(config);
        for (SimulatedRig rig : new SimulatedRig[] {ramped, read}) {
            rig.exciter().setSine(330.0, 1.0);
            rig.exciter().setOutputEnabled(true);
        }
        SampleBlock a0 = ramped.acquisition().read(1234);
        SampleBlock b0 = read.acquisition().read(1234);
        ramped.exciter().rampTo(1.0, 0.0371);
        read.acquisition().read(742);
        ramped.exciter().setOutputEnabled(false);
        read.exciter().setOutputEnabled(false);
        ramped.exciter().rampTo(1.0, 0.02);
        read.acquisition().read(400);
        ramped.exciter().setOutputEnabled(true);
        read.exciter().setOutputEnabled(true);
        SampleBlock a1 = ramped.acquisition().read(3000);
        SampleBlock b1 = read.acquisition().read(3000);
        // Source: a ramp "runs the rig clock through the ramp, discarding those samples" (SimulatedRig
        // documentation): at constant amplitude it must leave the rig exactly where reading would.
        assertEquals(b1.firstSampleIndex(), a1.firstSampleIndex(), "both rigs are at the same sample index");
        for (int ch = 0; ch < 2; ch++) {
            assertArrayEquals(b0.samples()[ch], a0.samples()[ch], "channel " + ch + " before the ramps");
            assertArrayEquals(b1.samples()[ch], a1.samples()[ch], "channel " + ch + " after ramps with the output"
                    + " on and off must equal the continuously read samples (SimulatedRig documentation)");
        }
        assertTrue(Arrays.stream(a1.samples()[1]).distinct().count() > 100, "the compared record must not be flat");
    }

    @Test
    void frequencyChangeKeepsTheDrivePhaseContinuous() {
        // A 32-bit ADC: 400 Hz repeats every 50 samples, so a 24-bit quantisation error would not average out
        // and would differ between the two rigs' sample grids by about 2e-5 of the amplitude.
        SimulationConfig config = SimulationConfigs.demoWire().idealised()
                .withSensors(sensors(0.43, 0.0, 0.0, 5.0, 1e-3, 32, 50.0, 0.0, 0));
        double fa = 330.0;
        double fb = 400.0;
        int switchIndex = 20_071;
        int dwell = 60_000;
        SimulatedRig switched = new SimulatedRig(config);
        switched.exciter().setSine(fa, 1.0);
        switched.exciter().setOutputEnabled(true);
        switched.acquisition().read(switchIndex);
        switched.exciter().setSine(fb, 1.0);
        switched.acquisition().read(dwell);
        SampleBlock a = switched.acquisition().read(20_000);
        SimulatedRig direct = new SimulatedRig(config);
        direct.exciter().setSine(fb, 1.0);
        direct.exciter().setOutputEnabled(true);
        direct.acquisition().read(switchIndex + dwell);
        SampleBlock b = direct.acquisition().read(20_000);
        // Both rigs are the same linear system driven at fb, so after the switch transient has decayed
        // (3 s, over 14 time constants of the slowest mode) their steady states differ only by the drive's
        // phase offset. Source: a phase-continuous switch at sample n1 continues with phase
        // 2 pi fa n1/fs, so the offset against a rig driven at fb from sample 0 is 2 pi (fa - fb) n1/fs
        // (Exciter documentation, "frequency changes are phase-continuous"). A phase reset at the switch
        // would give -2 pi fb n1/fs, a phase tied to absolute time 0; n1 is chosen to keep both well away.
        double expected = 2.0 * Math.PI * (fa - fb) * switchIndex / FS_HZ;
        double reset = -2.0 * Math.PI * fb * switchIndex / FS_HZ;
        assertTrue(Math.abs(Math.IEEEremainder(expected, 2.0 * Math.PI)) > 1.0
                && Math.abs(Math.IEEEremainder(expected - reset, 2.0 * Math.PI)) > 1.0,
                "the switch instant must tell a continuous phase from a reset or an absolute-time phase");
        for (int ch = 0; ch < 2; ch++) {
            SinePhasor pa = SineFit.threeParameter(a.samples()[ch], FS_HZ, fb);
            SinePhasor pb = SineFit.threeParameter(b.samples()[ch], FS_HZ, fb);
            double offset = Math.IEEEremainder(pa.phaseRad() - pb.phaseRad() - expected, 2.0 * Math.PI);
            assertEquals(0.0, offset, 1e-4, "channel " + ch + ": after the switch the drive phase must continue"
                    + " from the old frequency's phase (Exciter documentation: phase-continuous)");
            assertEquals(pb.amplitude(), pa.amplitude(), 1e-5 * pb.amplitude(), "channel " + ch + ": the same"
                    + " steady-state amplitude after the switch");
        }
    }
}
