package org.tautline.driver.sim;

import java.util.SplittableRandom;

/**
 * What the acquisition does to one transducer signal: white noise, mains hum, ADC clipping and quantisation.
 *
 * <p>White noise of one-sided density D sampled at fs has per-sample standard deviation D sqrt(fs/2)
 * (J. S. Bendat and A. G. Piersol, Random Data, 4th ed., Wiley 2010, from memory). The ADC is an
 * ideal mid-tread quantiser of step 2 fullScale / 2^bits whose codes saturate at the ends of the
 * range (IEEE Std 1241-2010 terms, from memory).
 */
final class SensorChannel {
    private final double noiseStd;
    private final double stepSize;
    private final double maxCode;
    private final double minCode;
    private final double[] humAmplitude;
    private final double[] humPhaseRad;
    private final double[] humRadPerSample;
    private final SplittableRandom random;
    private long clippedCount;

    SensorChannel(double noiseDensity, double fullScale, int adcBits, double mainsHz, double mainsAmplitude,
                  int mainsHarmonics, double sampleRateHz, SplittableRandom random) {
        this.noiseStd = noiseDensity * Math.sqrt(sampleRateHz / 2.0);
        this.stepSize = 2.0 * fullScale / Math.scalb(1.0, adcBits);
        this.maxCode = Math.scalb(1.0, adcBits - 1) - 1.0;
        this.minCode = -Math.scalb(1.0, adcBits - 1);
        this.random = random;
        int harmonics = 0;
        if (mainsAmplitude > 0) {
            while (harmonics < mainsHarmonics && (harmonics + 1) * mainsHz < sampleRateHz / 2.0) {
                harmonics++;
            }
        }
        humAmplitude = new double[harmonics];
        humPhaseRad = new double[harmonics];
        humRadPerSample = new double[harmonics];
        for (int k = 0; k < harmonics; k++) {
            humAmplitude[k] = mainsAmplitude / (k + 1);
            humPhaseRad[k] = 2.0 * Math.PI * random.nextDouble();
            humRadPerSample[k] = 2.0 * Math.PI * (k + 1) * mainsHz / sampleRateHz;
        }
    }

    /**
     * Turns one true transducer value into what the acquisition reports.
     *
     * @param value true value in engineering units
     * @param sampleIndex running sample index (the hum's time base)
     * @return noisy, quantised, possibly clipped value
     */
    double acquire(double value, long sampleIndex) {
        double x = value;
        if (noiseStd > 0) {
            x += noiseStd * random.nextGaussian();
        }
        for (int k = 0; k < humAmplitude.length; k++) {
            double turns = humRadPerSample[k] * sampleIndex / (2.0 * Math.PI);
            double phase = 2.0 * Math.PI * (turns - Math.floor(turns));
            x += humAmplitude[k] * Math.sin(phase + humPhaseRad[k]);
        }
        double code = Math.rint(x / stepSize);
        if (code > maxCode) {
            code = maxCode;
            clippedCount++;
        } else if (code < minCode) {
            code = minCode;
            clippedCount++;
        }
        return code * stepSize;
    }

    /** @return samples clipped so far */
    long clippedCount() {
        return clippedCount;
    }
}
