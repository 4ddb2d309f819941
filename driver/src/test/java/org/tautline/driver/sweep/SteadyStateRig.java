package org.tautline.driver.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

import org.hipparchus.complex.Complex;
import org.tautline.driver.spi.Acquisition;
import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.spi.Exciter;
import org.tautline.driver.spi.Rig;
import org.tautline.driver.spi.SampleBlock;

/**
 * A test rig whose channels are exact steady-state sines: force = drive * forcePerVolt(f),
 * response = force * frf(f), with no transients. It records every command it receives.
 */
final class SteadyStateRig implements Rig {
    final List<String> commands = new ArrayList<>();
    private final double sampleRateHz;
    private final DoubleFunction<Complex> forcePerVolt;
    private final DoubleFunction<Complex> frf;
    private double frequencyHz = 1;
    private double amplitudeV;
    private boolean outputOn;
    private long nextIndex;
    private double phaseRad;
    boolean closed;

    SteadyStateRig(double sampleRateHz, DoubleFunction<Complex> forcePerVolt, DoubleFunction<Complex> frf) {
        this.sampleRateHz = sampleRateHz;
        this.forcePerVolt = forcePerVolt;
        this.frf = frf;
    }

    @Override
    public String identity() {
        return "steady-state test rig";
    }

    @Override
    public Exciter exciter() {
        return new Exciter() {
            @Override
            public void setSine(double f, double a) {
                commands.add("sine " + f + " " + a);
                frequencyHz = f;
                amplitudeV = a;
            }

            @Override
            public void rampTo(double a, double durationS) {
                commands.add("ramp " + a);
                amplitudeV = a;
            }

            @Override
            public void setOutputEnabled(boolean enabled) {
                commands.add(enabled ? "on" : "off");
                outputOn = enabled;
            }

            @Override
            public boolean isOutputEnabled() {
                return outputOn;
            }

            @Override
            public double maxAmplitudeV() {
                return 5.0;
            }
        };
    }

    @Override
    public Acquisition acquisition() {
        return new Acquisition() {
            @Override
            public double sampleRateHz() {
                return sampleRateHz;
            }

            @Override
            public List<ChannelInfo> channels() {
                return List.of(new ChannelInfo("force", "force", "N"), new ChannelInfo("response", "displacement", "m"));
            }

            @Override
            public SampleBlock read(int count) {
                double[][] samples = new double[2][count];
                double v = outputOn ? amplitudeV : 0.0;
                Complex force = forcePerVolt.apply(frequencyHz).multiply(v);
                Complex response = force.multiply(frf.apply(frequencyHz));
                double dPhase = 2 * Math.PI * frequencyHz / sampleRateHz;
                for (int i = 0; i < count; i++) {
                    double p = phaseRad + i * dPhase;
                    samples[0][i] = force.norm() * Math.cos(p + force.getArgument());
                    samples[1][i] = response.norm() * Math.cos(p + response.getArgument());
                }
                phaseRad = (phaseRad + count * dPhase) % (2 * Math.PI);
                SampleBlock block = new SampleBlock(nextIndex, samples);
                nextIndex += count;
                return block;
            }

            @Override
            public long nextSampleIndex() {
                return nextIndex;
            }
        };
    }

    @Override
    public void close() {
        closed = true;
        outputOn = false;
    }
}
