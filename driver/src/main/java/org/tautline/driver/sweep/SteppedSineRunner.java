package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * Runs a stepped-sine sweep on a rig: at each step, settle, then fit force and response.
 *
 * <p>At each step the drive is set (phase-continuous), the rig settles for the plan's settle time,
 * then a whole number of cycles of force (channel 0) and response (channel 1) are fitted by the
 * three-parameter sine fit of IEEE Std 1057 with harmonics for distortion; the FRF value is the
 * ratio of the response and force phasors. The drive ramps up at the start and, whatever happens
 * (completion, cancel, fault), ramps down and the output is switched off before the runner returns.
 */
public final class SteppedSineRunner {
    /** Settle samples are read in chunks of this many so that a cancel is seen quickly. */
    private static final int SETTLE_CHUNK_SAMPLES = 4096;

    private final Rig rig;

    /** @param rig the rig to drive; channel 0 must be force and channel 1 the response */
    public SteppedSineRunner(Rig rig) {
        this.rig = rig;
    }

    /**
     * Runs the plan.
     *
     * @param plan what to run
     * @param listener progress after every step
     * @param cancelRequested polled between chunks; true stops the sweep after ramping down
     * @return the completed steps; {@code completed} is false after a cancel
     * @throws RigException on a rig fault, after the drive has been switched off
     */
    public SweepRecord run(SteppedSinePlan plan, SweepListener listener, BooleanSupplier cancelRequested) {
        Acquisition acquisition = rig.acquisition();
        Exciter exciter = rig.exciter();
        String responseQuantity = checkChannels(acquisition.channels());
        if (plan.driveAmplitudeV() > exciter.maxAmplitudeV()) {
            throw new RigException("sweep plan: drive amplitude " + plan.driveAmplitudeV() + " V is above the exciter's limit of "
                    + exciter.maxAmplitudeV() + " V");
        }
        double fs = acquisition.sampleRateHz();
        double[] frequencies = plan.frequenciesHz();
        double startRigS = acquisition.rigTimeS();
        long startWallNs = System.nanoTime();
        double[] remainingAfterStepS = remainingRigTimeAfterEachStep(plan, frequencies, fs);
        List<SweepPoint> points = new ArrayList<>(frequencies.length);
        boolean completed = false;
        try {
            exciter.setSine(frequencies[0], 0.0);
            exciter.setOutputEnabled(true);
            exciter.rampTo(plan.driveAmplitudeV(), plan.rampS());
            for (int step = 0; step < frequencies.length; step++) {
                double f = frequencies[step];
                exciter.setSine(f, plan.driveAmplitudeV());
                if (!settle(acquisition, plan.settleTimeS(f), cancelRequested)) {
                    break;
                }
                SampleBlock block = acquisition.read(plan.integrationSamples(f, fs));
                SweepPoint point = fitStep(block, f, plan, fs, acquisition.rigTimeS() - startRigS);
                points.add(point);
                double rigSoFar = acquisition.rigTimeS() - startRigS;
                double remainingRig = remainingAfterStepS[step];
                double wallSoFar = (System.nanoTime() - startWallNs) * 1e-9;
                double remainingWall = rigSoFar > 0 ? wallSoFar / rigSoFar * remainingRig : Double.NaN;
                listener.onStep(new SweepProgress(step + 1, frequencies.length, f, rigSoFar, remainingRig, remainingWall,
                        point));
                if (cancelRequested.getAsBoolean()) {
                    break;
                }
            }
            completed = points.size() == frequencies.length;
        } finally {
            switchOff(exciter, plan.rampS());
        }
        return new SweepRecord(plan, responseQuantity, points, acquisition.rigTimeS() - startRigS, completed);
    }

    /** Planned rig time still to go after each step: the later steps and the final ramp, s. */
    private static double[] remainingRigTimeAfterEachStep(SteppedSinePlan plan, double[] frequencies, double fs) {
        double[] remaining = new double[frequencies.length];
        double toGo = plan.rampS();
        for (int i = frequencies.length - 1; i >= 0; i--) {
            remaining[i] = toGo;
            toGo += plan.stepRigTimeS(frequencies[i], fs);
        }
        return remaining;
    }

    private static String checkChannels(List<ChannelInfo> channels) {
        if (channels.size() < 2) {
            throw new RigException("the rig offers " + channels.size()
                    + " channel(s); a sweep needs channel 0 = force and channel 1 = response");
        }
        if (!"force".equals(channels.get(0).quantity())) {
            throw new RigException("rig channel 0 ('" + channels.get(0).name() + "') measures " + channels.get(0).quantity()
                    + "; a sweep needs force on channel 0");
        }
        String response = channels.get(1).quantity();
        if (!List.of("displacement", "velocity", "acceleration").contains(response)) {
            throw new RigException("rig channel 1 ('" + channels.get(1).name() + "') measures " + response
                    + "; a sweep needs displacement, velocity or acceleration on channel 1");
        }
        return response;
    }

    /** Reads and discards the settle span; returns false if a cancel arrived. */
    private static boolean settle(Acquisition acquisition, double settleS, BooleanSupplier cancelRequested) {
        long remaining = (long) Math.ceil(settleS * acquisition.sampleRateHz());
        while (remaining > 0) {
            if (cancelRequested.getAsBoolean()) {
                return false;
            }
            int chunk = (int) Math.min(remaining, SETTLE_CHUNK_SAMPLES);
            acquisition.read(chunk);
            remaining -= chunk;
        }
        return !cancelRequested.getAsBoolean();
    }

    private static SweepPoint fitStep(SampleBlock block, double f, SteppedSinePlan plan, double fs, double rigTimeS) {
        SinePhasor[] fitted = SineFit.fitChannels(new double[][] {block.samples()[0], block.samples()[1]}, fs, f,
                plan.harmonicOrder());
        SinePhasor force = fitted[0];
        SinePhasor response = fitted[1];
        if (!(force.amplitude() > 0)) {
            throw new RigException("no force measured at " + f + " Hz: check the force sensor on channel 0 and the stinger");
        }
        double relForceErr = force.amplitudeStd() / force.amplitude();
        double relResponseErr = response.amplitude() > 0 ? response.amplitudeStd() / response.amplitude() : 1.0;
        return new SweepPoint(f, plan.driveAmplitudeV(), response.phasor().divide(force.phasor()), force.amplitude(),
                response.amplitude(), Math.max(force.relativeResidual(), response.relativeResidual()),
                Math.hypot(relForceErr, relResponseErr), force.totalHarmonicDistortion(),
                response.totalHarmonicDistortion(), rigTimeS);
    }

    /** Ramps the drive down and switches the output off; a fault here must not hide the first one. */
    private static void switchOff(Exciter exciter, double rampS) {
        try {
            if (exciter.isOutputEnabled()) {
                exciter.rampTo(0.0, rampS);
            }
        } catch (RuntimeException rampFault) {
            // The output is switched off below in any case; the ramp is a courtesy to the specimen.
        } finally {
            exciter.setOutputEnabled(false);
        }
    }
}
