package org.tautline.analysis.modal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import java.util.Random;

import org.hipparchus.complex.Complex;
import org.jtransforms.fft.DoubleFFT_1D;
import org.junit.jupiter.api.Test;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfEstimator;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.signal.ArraySampleSource;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.Detrend;
import org.tautline.analysis.signal.WelchEstimator;
import org.tautline.analysis.signal.WelchSettings;
import org.tautline.analysis.signal.WindowType;

/**
 * Sub-bands of a clean two-mode Welch FRF at coarse resolution: the fit gives modes with finite standard errors, or
 * says why it cannot, never a standard error that is not a number, and never a doublet the window made.
 *
 * <p>Data: white-noise force through two modes A/(w_n^2 - w^2 + 2 j zeta w_n w) (Ewins 2000, from memory), 100 and
 * 140 Hz, damping ratio 0.01, applied in the frequency domain to a 2^18-sample record (fixed seed); H1 = G_xy/G_xx
 * from Hann-windowed 4096-sample segments with half overlap (Bendat and Piersol, Random Data, 4th ed. 2010; Welch
 * 1967, from memory), at sample rates giving 0.25, 0.5 and 1 Hz lines, so 8, 4 and 2 lines per half-power band.
 */
class WelchSubBandTest {
    private static final List<Mode> TRUTH = List.of(new Mode(100, 0.01, new Complex(1)),
            new Mode(140, 0.01, new Complex(-0.7)));

    private static Frf welch(double sampleRateHz) throws IOException {
        int n = 1 << 18;
        Random random = new Random(3);
        double[] force = new double[n];
        double[] spectrum = new double[2 * n];
        for (int i = 0; i < n; i++) {
            force[i] = random.nextGaussian();
            spectrum[2 * i] = force[i];
        }
        DoubleFFT_1D fft = new DoubleFFT_1D(n);
        fft.complexForward(spectrum);
        for (int k = 0; k < n; k++) {
            int signed = k <= n / 2 ? k : k - n;
            double f = Math.abs(signed) * sampleRateHz / n;
            Complex h = Complex.ZERO;
            if (f > 0) {
                for (Mode m : TRUTH) {
                    h = h.add(m.receptanceAt(f));
                }
            }
            Complex v = new Complex(spectrum[2 * k], spectrum[2 * k + 1]).multiply(signed < 0 ? h.conjugate() : h);
            spectrum[2 * k] = v.getReal();
            spectrum[2 * k + 1] = v.getImaginary();
        }
        fft.complexInverse(spectrum, true);
        double[] response = new double[n];
        for (int i = 0; i < n; i++) {
            response[i] = spectrum[2 * i];
        }
        WelchSettings settings = WelchSettings.of(4096).withOverlap(0.5).withWindow(WindowType.HANN, true)
                .withDetrend(Detrend.MEAN);
        CrossSpectra spectra = new WelchEstimator(settings).estimate(ArraySampleSource.of("invented", sampleRateHz,
                force, response), 0, 1);
        return FrfEstimator.h1(spectra, 0, 1, FrfQuantity.RECEPTANCE);
    }

    @Test
    void everySubBandGivesFiniteStandardErrorsOrSaysWhyNot() throws IOException {
        double[][] bands = {{60, 200}, {80, 120}, {90, 160}, {120, 160}};
        for (double rate : new double[] {1024, 2048, 4096}) {
            Frf h = welch(rate);
            for (double[] band : bands) {
                ModalEstimate e = ModalEstimator.defaults().withBand(band[0], band[1]).estimate(h);
                String what = (rate / 4096) + " Hz lines, band " + band[0] + " .. " + band[1] + " Hz: " + e.plainModes()
                        + " " + e.warnings();
                assertTrue(!e.modes().isEmpty() || e.unexplained().isPresent(), "a mode, or why none: " + what);
                long inBand = TRUTH.stream().filter(m -> m.frequencyHz() > band[0] && m.frequencyHz() < band[1]).count();
                // The window smooths each peak over a few lines; two poles a line apart fit that better than one, but
                // they are not two modes (Hann main lobe, Harris 1978, from memory).
                assertTrue(e.modes().size() <= inBand, "no mode beyond the true ones in the band: " + what);
                for (FittedMode m : e.modes()) {
                    boolean finite = Double.isFinite(m.frequencyStdHz()) && Double.isFinite(m.dampingRatioStd());
                    boolean said = e.warnings().stream().anyMatch(w -> w.contains("no standard errors"));
                    assertTrue(finite || said, "finite standard errors, or a warning that there are none: " + what);
                }
            }
        }
    }

    @Test
    void atEightLinesPerHalfPowerBandAWideSubBandGivesBothModes() throws IOException {
        // Truth: the two modes the record was made with; the window's smoothing of the peaks is well under 1 %.
        ModalEstimate e = ModalEstimator.defaults().withBand(60, 200).estimate(welch(1024));
        assertEquals(2, e.modes().size(), e.plainModes() + " " + e.warnings());
        for (int i = 0; i < 2; i++) {
            assertEquals(TRUTH.get(i).frequencyHz(), e.modes().get(i).mode().frequencyHz(),
                    1e-3 * TRUTH.get(i).frequencyHz(), "mode " + i);
            assertEquals(TRUTH.get(i).dampingRatio(), e.modes().get(i).mode().dampingRatio(),
                    0.05 * TRUTH.get(i).dampingRatio(), "mode " + i);
        }
    }
}
