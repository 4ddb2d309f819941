package org.tautline.app.ui;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.ProgressListener;
import org.tautline.analysis.frf.CalibratedSource;
import org.tautline.analysis.frf.ChannelCalibration;
import org.tautline.analysis.frf.FrfEstimator;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.frf.TimeSeriesCsvReader;
import org.tautline.analysis.frf.WavReader;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.Detrend;
import org.tautline.analysis.signal.WelchEstimator;
import org.tautline.analysis.signal.WelchSettings;
import org.tautline.analysis.signal.WindowType;

/**
 * Turns a recording into an FRF for the workbench: channel 0 force, channel 1 the response, each in volts
 * scaled by the setup's sensor sensitivities (1 for a recording already in SI units); H1 by Welch's
 * method (Welch 1967; 4096-sample Hann segments, 50 % overlap, mean removed). Other channel layouts go
 * through {@code tautline frf}.
 */
final class RecordingImport {
    private RecordingImport() {
    }

    static Frf frfOf(Path file, List<ChannelCalibration> calibrations, FrfQuantity quantity) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!Files.isRegularFile(file)) {
            throw new AnalysisException(file + ": no such recording");
        }
        WelchSettings settings = WelchSettings.of(4096).withOverlap(0.5).withWindow(WindowType.HANN, true)
                .withDetrend(Detrend.MEAN);
        try (CalibratedSource source = CalibratedSource.of(name.endsWith(".wav") ? WavReader.open(file)
                : TimeSeriesCsvReader.open(file), calibrations)) {
            if (source.channelNames().size() < 2) {
                throw new AnalysisException(file + ": the workbench needs two channels (0 force, 1 the response),"
                        + " got " + source.channelNames().size());
            }
            CrossSpectra spectra = new WelchEstimator(settings).estimate(source, new int[] {0, 1}, ProgressListener.NONE,
                    () -> Thread.currentThread().isInterrupted());
            return FrfEstimator.h1(spectra, 0, 1, quantity);
        }
    }
}
