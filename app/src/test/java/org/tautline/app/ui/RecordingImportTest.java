package org.tautline.app.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.app.ui.setup.SetupForm;

class RecordingImportTest {
    @TempDir
    Path dir;

    @Test
    void scalesTheChannelsByTheSensorSensitivitiesOfTheSetup() throws IOException {
        // Response volts = 0.5 x force volts at every sample: with force 0.01 V/N and response 2 V/(m/s^2), H1 is
        // (0.5 / 2) / (1 / 0.01) = 0.0025 (m/s^2)/N at every line (H1 = Gxy/Gxx, Bendat and Piersol, from memory).
        StringBuilder csv = new StringBuilder("# sample_rate_hz: 1000\nforce,response\n");
        SplittableRandom random = new SplittableRandom(7);
        for (int i = 0; i < 16384; i++) {
            double v = random.nextGaussian();
            csv.append(String.format(Locale.ROOT, "%.9f,%.9f%n", v, 0.5 * v));
        }
        Path file = dir.resolve("rec.csv");
        Files.writeString(file, csv, StandardCharsets.UTF_8);
        SetupForm form = SetupForm.demo();
        form.set("forceSensitivityVPerN", "0.01");
        form.set("responseQuantity", "ACCELERATION");
        form.set("responseSensitivityVPerUnit", "2");
        Frf frf = RecordingImport.frfOf(file, form.recordingCalibrations(), form.recordingQuantity());
        assertEquals(FrfQuantity.ACCELERANCE, frf.quantity());
        for (int line = 1; line < frf.size(); line += 97) {
            assertEquals(0.0025, frf.value(line).getReal(), 1e-9, "line " + line);
            assertEquals(0.0, frf.value(line).getImaginary(), 1e-9, "line " + line);
        }
    }
}
