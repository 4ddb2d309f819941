package org.tautline.app.ui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.ProgressListener;
import org.tautline.analysis.frf.FrfEstimator;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.frf.TimeSeriesCsvReader;
import org.tautline.analysis.frf.WavReader;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.Detrend;
import org.tautline.analysis.signal.SampleSource;
import org.tautline.analysis.signal.WelchEstimator;
import org.tautline.analysis.signal.WelchSettings;
import org.tautline.analysis.signal.WindowType;

/**
 * Turns a recording into an FRF for the workbench: channel 0 force in newtons, channel 1 displacement
 * in metres, already in engineering units; H1 by Welch's method (4096-sample Hann segments, 50 %
 * overlap, mean removed). Other channel layouts and calibrations go through {@code tautline frf}.
 */
final class RecordingImport {
    private RecordingImport() {
    }

    static Frf frfOf(Path file) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!Files.isRegularFile(file)) {
            throw new AnalysisException(file + ": no such recording");
        }
        WelchSettings settings = WelchSettings.of(4096).withOverlap(0.5).withWindow(WindowType.HANN, true)
                .withDetrend(Detrend.MEAN);
        try (SampleSource source = name.endsWith(".wav") ? WavReader.open(file) : TimeSeriesCsvReader.open(file)) {
            if (source.channelNames().size() < 2) {
                throw new AnalysisException(file + ": the workbench needs two channels (0 force in N, 1 displacement in m),"
                        + " got " + source.channelNames().size());
            }
            CrossSpectra spectra = new WelchEstimator(settings).estimate(source, new int[] {0, 1}, ProgressListener.NONE,
                    () -> Thread.currentThread().isInterrupted());
            return FrfEstimator.h1(spectra, 0, 1, FrfQuantity.RECEPTANCE);
        }
    }
}
