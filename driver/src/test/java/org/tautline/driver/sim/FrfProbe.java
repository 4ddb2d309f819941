package org.tautline.driver.sim;

import org.hipparchus.complex.Complex;
import org.tautline.analysis.signal.SineFit;
import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.spi.SampleBlock;

/** Test helper: a stepped-sine FRF point from the simulated rig by three-parameter sine fits over whole cycles. */
final class FrfProbe {
    final SinePhasor force;
    final SinePhasor response;

    private FrfProbe(SinePhasor force, SinePhasor response) {
        this.force = force;
        this.response = response;
    }

    /**
     * Drives the rig at one frequency, lets it settle, then fits both channels over whole cycles.
     *
     * @param rig the rig, output is switched on
     * @param frequencyHz drive frequency
     * @param amplitudeV drive amplitude
     * @param settleS settling time before the record, s
     * @param cycles whole cycles in the fitted record
     * @return the fitted phasors
     */
    static FrfProbe measure(SimulatedRig rig, double frequencyHz, double amplitudeV, double settleS, int cycles) {
        rig.exciter().setSine(frequencyHz, amplitudeV);
        rig.exciter().setOutputEnabled(true);
        double fs = rig.acquisition().sampleRateHz();
        if (settleS > 0) {
            rig.acquisition().read((int) Math.round(settleS * fs));
        }
        int n = (int) Math.round(cycles * fs / frequencyHz);
        SampleBlock block = rig.acquisition().read(n);
        // Fit at the exact drive frequency; the record spans whole cycles up to rounding of one sample.
        SinePhasor f = SineFit.threeParameter(block.samples()[0], fs, frequencyHz);
        SinePhasor r = SineFit.threeParameter(block.samples()[1], fs, frequencyHz);
        return new FrfProbe(f, r);
    }

    /** @return response phasor over force phasor */
    Complex frf() {
        return response.phasor().divide(force.phasor());
    }
}
