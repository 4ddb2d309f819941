package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.Random;

import org.junit.jupiter.api.Test;

/** Levels of Welch estimates against their textbook values. */
class WelchNoiseTest {
    private static final double FS = 1000;

    private static double[] whiteNoise(int frames, double sigma, long seed) {
        Random random = new Random(seed);
        double[] x = new double[frames];
        for (int i = 0; i < frames; i++) {
            x[i] = sigma * random.nextGaussian();
        }
        return x;
    }

    /** Mean and relative scatter of G / (2 s^2 / fs) over the interior lines. */
    private static double[] levelAndScatter(WelchSettings settings, double[] x, double sigma) throws IOException {
        CrossSpectra s = new WelchEstimator(settings).estimate(ArraySampleSource.of("noise", FS, x), 0);
        double expected = 2 * sigma * sigma / FS;
        double[] g = s.auto(0);
        int lines = g.length - 2;
        double sum = 0;
        double sum2 = 0;
        for (int k = 1; k <= lines; k++) {
            double r = g[k] / expected;
            sum += r;
            sum2 += r * r;
        }
        double mean = sum / lines;
        double std = Math.sqrt((sum2 - lines * mean * mean) / (lines - 1));
        return new double[] {mean, std, s.averageCount(), s.effectiveAverageCount(), lines};
    }

    @Test
    void whiteNoiseDensityIsTwoSigmaSquaredOverFs() throws IOException {
        // Welch, IEEE Trans. AU-15:70, 1967 (from memory) and checks.md: one-sided PSD of white noise = 2 s^2 / fs;
        // each line scatters as chi-square with 2 n_e degrees of freedom, relative std 1/sqrt(n_e)
        double sigma = 0.3;
        double[] x = whiteNoise(1024 * 100, sigma, 1967L);
        for (WindowType type : new WindowType[] {WindowType.HANN, WindowType.BLACKMAN_HARRIS_4, WindowType.RECTANGULAR}) {
            WelchSettings settings = WelchSettings.of(1024).withWindow(type, true);
            double[] r = levelAndScatter(settings, x, sigma);
            double perLine = 1 / Math.sqrt(r[3]);
            double enbw = Window.of(type, 1024, true).enbwBins();
            // lines closer than the ENBW are correlated: count r[4] / ENBW independent ones, allow 5 standard errors
            double tolerance = 5 * perLine / Math.sqrt(r[4] / enbw);
            assertEquals(1.0, r[0], tolerance, type + ": mean PSD / (2 s^2/fs) over " + r[4] + " lines (Welch 1967)");
        }
    }

    @Test
    void lineScatterFollowsTheEquivalentNumberOfAverages() throws IOException {
        // Welch 1967 (from memory): overlapped segments reduce the variance by less than their count;
        // for Hann the 50 % overlap correlation is 1/6 (Heinzel et al. 2002), so n_e = K / (1 + 2 (1/6)^2) for large K
        double sigma = 1.0;
        double[] x = whiteNoise(512 * 80, sigma, 70L);
        double[] none = levelAndScatter(WelchSettings.of(512).withOverlap(0), x, sigma);
        assertEquals(none[2], none[3], 1e-12, "without overlap the equivalent count is the segment count");
        double[] half = levelAndScatter(WelchSettings.of(512), x, sigma);
        double k = half[2];
        assertEquals(k / (1 + 2 * (1 - 1 / k) / 36.0), half[3], 1e-9, "Hann, 50 % overlap: n_e from the 1/6 overlap correlation");
        double[] most = levelAndScatter(WelchSettings.of(512).withOverlap(0.75), x, sigma);
        assertTrue(most[3] < 0.6 * most[2], "at 75 % overlap Hann segments are far from independent: n_e " + most[3]
                + " of " + most[2]);
        for (double[] r : new double[][] {none, half, most}) {
            double predicted = 1 / Math.sqrt(r[3]);
            assertEquals(predicted, r[1], 0.15 * predicted, "relative scatter of PSD lines vs 1/sqrt(n_e) with " + r[2]
                    + " segments (Welch 1967)");
        }
    }

    @Test
    void spectrumScalingGivesTheRmsSquaredOfASine() throws IOException {
        // Heinzel, Ruediger & Schilling 2002: with power-spectrum scaling a sine of amplitude A reads A^2/2 on its line;
        // a flat-top window keeps that within its 0.004 dB scalloping when the sine falls between lines
        double amplitude = 2.0;
        int n = 1000;
        for (double bin : new double[] {50.0, 50.37, 123.5}) {
            double[] x = new double[20 * n];
            for (int i = 0; i < x.length; i++) {
                x[i] = amplitude * Math.cos(2 * Math.PI * bin * i / n + 0.3);
            }
            WelchSettings settings = WelchSettings.of(n).withWindow(WindowType.FLAT_TOP_HFT95, true)
                    .withScaling(SpectrumScaling.SPECTRUM);
            double[] g = new WelchEstimator(settings).estimate(ArraySampleSource.of("sine", FS, x), 0).auto(0);
            double peak = 0;
            for (double v : g) {
                peak = Math.max(peak, v);
            }
            assertEquals(amplitude * amplitude / 2, peak, 0.0025 * amplitude * amplitude / 2,
                    "HFT95 power spectrum of a sine at " + bin + " bins reads A^2/2 (Heinzel et al. 2002)");
            if (bin == 50.0) {
                WelchSettings hann = settings.withWindow(WindowType.HANN, true);
                double[] gh = new WelchEstimator(hann).estimate(ArraySampleSource.of("sine", FS, x), 0).auto(0);
                assertEquals(amplitude * amplitude / 2, gh[50], 1e-9, "Hann power spectrum of a sine on a line (Heinzel 2002)");
            }
        }
    }
}
