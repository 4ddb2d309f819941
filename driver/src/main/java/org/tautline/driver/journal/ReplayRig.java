package org.tautline.driver.journal;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.RigException;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * A rig that plays a journal back: at each recorded step frequency it returns what was measured there.
 *
 * <p>When the journal kept raw samples, each step's integration samples are played cyclically,
 * positioned so that after the recorded plan's settle time the next read starts at the first
 * recorded sample: replaying with the recorded plan returns the recorded blocks exactly, noise and
 * distortion included. Otherwise the steady-state sines of the recorded force and response phasors
 * are synthesised with the same time origin (no offset, harmonics or noise). Samples scale with the
 * commanded amplitude over the recorded one; with the output off the channels read zero. The drive
 * may not exceed the highest recorded level, and a frequency that was not recorded is refused. The clock
 * advances by the samples read and by ramps, as on the simulated rig.
 */
public final class ReplayRig implements Rig {
    private final JournalContents journal;
    private final Map<Double, JournalStep> byFrequency = new HashMap<>();
    private final Map<Integer, double[][]> raw = new HashMap<>();
    private final double sampleRateHz;
    private final double recordedDriveV;
    private final ReplayExciter exciter = new ReplayExciter();
    private final ReplayAcquisition acquisition = new ReplayAcquisition();
    private JournalStep current;
    private double amplitudeV;
    private boolean outputOn;
    private long cursor;
    private long nextSampleIndex;

    /** @param journal the journal to play back; it must hold at least one step */
    public ReplayRig(JournalContents journal) {
        if (journal.steps().isEmpty()) {
            throw new RigException("replay rig: journal " + journal.file() + " holds no completed step to play back");
        }
        this.journal = journal;
        this.sampleRateHz = journal.header().sampleRateHz();
        journal.steps().forEach(s -> byFrequency.put(s.frequencyHz(), s));
        this.recordedDriveV = journal.steps().stream().mapToDouble(JournalStep::driveAmplitudeV).max().orElse(0.0);
    }

    @Override
    public String identity() {
        return "Tautline replay of journal " + journal.file() + " (recorded on " + journal.header().identity() + ")";
    }

    @Override
    public Exciter exciter() {
        return exciter;
    }

    @Override
    public Acquisition acquisition() {
        return acquisition;
    }

    @Override
    public synchronized void close() {
        outputOn = false;
        amplitudeV = 0;
    }

    private double[][] rawOf(JournalStep step) {
        return raw.computeIfAbsent(step.index(), i -> journal.samples(step));
    }

    private double sample(int channel, long k) {
        double scale = amplitudeV / current.driveAmplitudeV();
        if (current.hasSamples()) {
            double[] block = rawOf(current)[channel];
            return scale * block[(int) Math.floorMod(k, (long) block.length)];
        }
        SinePhasor p = channel == 0 ? current.force() : current.response();
        return scale * p.amplitude() * Math.cos(2 * Math.PI * current.frequencyHz() * k / sampleRateHz + p.phaseRad());
    }

    private final class ReplayExciter implements Exciter {
        @Override
        public void setSine(double frequencyHz, double newAmplitudeV) {
            synchronized (ReplayRig.this) {
                JournalStep step = byFrequency.get(frequencyHz);
                if (step == null) {
                    List<JournalStep> steps = journal.steps();
                    throw new RigException("replay rig: journal " + journal.file() + " has no step at " + frequencyHz
                            + " Hz; it holds " + steps.size() + " step(s) from " + steps.get(0).frequencyHz() + " to "
                            + steps.get(steps.size() - 1).frequencyHz() + " Hz");
                }
                checkAmplitude(newAmplitudeV);
                current = step;
                amplitudeV = newAmplitudeV;
                cursor = -(long) Math.ceil(journal.header().plan().settle().dwellS(frequencyHz) * sampleRateHz);
            }
        }

        @Override
        public void rampTo(double targetV, double durationS) {
            synchronized (ReplayRig.this) {
                checkAmplitude(targetV);
                long samples = Math.round(durationS * sampleRateHz);
                nextSampleIndex += samples;
                cursor += samples;
                amplitudeV = targetV;
            }
        }

        private void checkAmplitude(double v) {
            if (!(v >= 0) || v > maxAmplitudeV()) {
                throw new RigException("replay rig: drive amplitude must lie between 0 and the recorded "
                        + maxAmplitudeV() + " V, got " + v + " V");
            }
        }

        @Override
        public void setOutputEnabled(boolean enabled) {
            synchronized (ReplayRig.this) {
                outputOn = enabled;
            }
        }

        @Override
        public boolean isOutputEnabled() {
            synchronized (ReplayRig.this) {
                return outputOn;
            }
        }

        @Override
        public double maxAmplitudeV() {
            return recordedDriveV;
        }
    }

    private final class ReplayAcquisition implements Acquisition {
        @Override
        public double sampleRateHz() {
            return sampleRateHz;
        }

        @Override
        public List<ChannelInfo> channels() {
            return journal.header().channels();
        }

        @Override
        public SampleBlock read(int sampleCount) {
            synchronized (ReplayRig.this) {
                if (sampleCount < 1) {
                    throw new RigException("replay rig: read needs 1 or more samples per channel, got " + sampleCount);
                }
                double[][] out = new double[2][sampleCount];
                if (outputOn && current != null) {
                    for (int i = 0; i < sampleCount; i++) {
                        out[0][i] = sample(0, cursor + i);
                        out[1][i] = sample(1, cursor + i);
                    }
                }
                cursor += sampleCount;
                SampleBlock block = new SampleBlock(nextSampleIndex, out);
                nextSampleIndex += sampleCount;
                return block;
            }
        }

        @Override
        public long nextSampleIndex() {
            synchronized (ReplayRig.this) {
                return nextSampleIndex;
            }
        }
    }
}
