package org.tautline.app.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

import com.fasterxml.jackson.databind.JsonNode;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvReader;
import org.tautline.analysis.frf.FrfQuantity;

/** {@code tautline frf} on a recording whose true FRF is known exactly: a digital resonator. */
class FrfCommandTest {
    private static final double FS = 4000;
    private static final int FRAMES = 200_000;
    // A two-pole resonator y[n] = x[n] + a1 y[n-1] + a2 y[n-2] with poles at r e^{+-j theta}.
    private static final double R = 0.995;
    private static final double THETA = 2 * Math.PI * 400 / FS;
    private static final double A1 = 2 * R * Math.cos(THETA);
    private static final double A2 = -R * R;
    private static final double GAIN = 1e-4;

    @TempDir
    static Path dir;
    private static Path recording;

    @BeforeAll
    static void writeTheRecording() throws IOException {
        recording = dir.resolve("bench 01.csv");
        SplittableRandom random = new SplittableRandom(2010L);
        try (Writer out = Files.newBufferedWriter(recording)) {
            out.write("# sample_rate_hz: " + FS + "\nforce,response\n");
            double y1 = 0;
            double y2 = 0;
            for (int n = 0; n < FRAMES; n++) {
                double x = random.nextGaussian();
                double y = GAIN * x + A1 * y1 + A2 * y2;
                y2 = y1;
                y1 = y;
                out.write(String.format(Locale.ROOT, "%.17g,%.17g%n", x, y + 1e-6 * random.nextGaussian()));
            }
        }
    }

    /** The resonator's exact frequency response H(e^{jw}) = g / (1 - a1 e^{-jw} - a2 e^{-2jw}) (digital filter theory). */
    private static Complex exact(double frequencyHz) {
        double w = 2 * Math.PI * frequencyHz / FS;
        Complex z1 = new Complex(Math.cos(w), -Math.sin(w));
        return new Complex(GAIN).divide(Complex.ONE.subtract(z1.multiply(A1)).subtract(z1.multiply(z1).multiply(A2)));
    }

    @Test
    void estimatesTheKnownFrfWithinItsOwnRandomError() throws Exception {
        Path out = dir.resolve("out/frf.csv");
        CliRun r = CliRun.of("frf", "--input", recording.toString(), "--force", "force", "--response", "1", "--segment", "4000",
                "--sensitivity", "force=1,N", "--sensitivity", "response=1,m", "--out", out.toString(), "--json",
                "--no-progress");
        assertEquals(0, r.exitCode(), r.err());
        JsonNode summary = ResultJson.MAPPER.readTree(r.out());
        assertEquals(2000, summary.get("lines").asInt());
        assertEquals("receptance", summary.get("quantity").asText());
        assertEquals(99, summary.get("averages").asInt(), "(200000 - 4000) / 2000 + 1 segments at 50 % overlap");

        FrfCsvReader.Contents contents = FrfCsvReader.read(out);
        Frf frf = contents.frf();
        assertEquals(FrfQuantity.RECEPTANCE, frf.quantity());
        assertEquals("H1", contents.metadata().get("estimator"));
        assertEquals("yes", contents.metadata().get("calibrated"));
        double[] variance = frf.variance().orElseThrow();
        double worst = 0;
        double sumSquares = 0;
        for (int i = 0; i < frf.size(); i++) {
            double error = frf.value(i).subtract(exact(frf.frequencyHz(i))).norm();
            double z = error / Math.sqrt(variance[i]);
            sumSquares += z * z;
            worst = Math.max(worst, z);
        }
        // Bendat & Piersol (from memory): the H1 error is complex with variance |H|^2 (1 - g2) / (g2 n_d); the
        // normalised errors then average to 1 in mean square. The 1 Hz lines put six in the resonator's
        // half-power band (about 6.4 Hz), so the window's bias at the peak stays small beside the random error.
        double meanSquare = sumSquares / frf.size();
        assertTrue(meanSquare > 0.5 && meanSquare < 2.0, "mean square of the normalised error " + meanSquare);
        assertTrue(worst < 6, "largest normalised error " + worst);
    }

    @Test
    void anUncalibratedRecordingNeedsAQuantity() {
        CliRun r = CliRun.of("frf", "--input", recording.toString(), "--force", "0", "--response", "1", "--out",
                dir.resolve("x.csv").toString(), "--no-progress");
        assertEquals(1, r.exitCode());
        assertEquals("tautline: say what the FRF relates: calibrate both channels (--calibration or --sensitivity) or give"
                + " --quantity receptance|mobility|accelerance for raw ratios", r.err().strip());
    }

    @Test
    void anUnknownChannelNamesTheChannelsThereAre() {
        CliRun r = CliRun.of("frf", "--input", recording.toString(), "--force", "load", "--response", "1", "--quantity",
                "receptance", "--out", dir.resolve("x.csv").toString(), "--no-progress");
        assertEquals(1, r.exitCode());
        assertEquals("tautline: channel 'load' is not in the recording: expected a 0-based index below 2 or one of the"
                + " names [force, response]", r.err().strip());
    }

    @Test
    void aBadWindowNameSaysWhichAreKnown() {
        CliRun r = CliRun.of("frf", "--input", recording.toString(), "--force", "0", "--response", "1", "--quantity",
                "receptance", "--window", "triangle", "--out", dir.resolve("x.csv").toString());
        assertEquals(1, r.exitCode());
        assertEquals("tautline: --window 'triangle': expected rectangular, hann, hamming, blackman-harris-3,"
                + " blackman-harris-4 or flat-top", r.err().strip());
    }

    @Test
    void aCalibrationFileWithABadUnitIsNamedWithItsEntry() throws IOException {
        Path calibration = dir.resolve("cal.json");
        Files.writeString(calibration, "{\"channels\": [{\"channel\": \"force\", \"quantity\": \"force\","
                + " \"sensitivityVoltsPerUnit\": 0.0225, \"unit\": \"lbf\"}]}");
        CliRun r = CliRun.of("frf", "--input", recording.toString(), "--force", "0", "--response", "1", "--calibration",
                calibration.toString(), "--out", dir.resolve("x.csv").toString());
        assertEquals(1, r.exitCode());
        assertEquals("tautline: " + calibration + ", channels[0]: calibration of channel 'force': unit 'lbf' does not"
                + " match force; expected 'N' (sensitivities are volts per SI unit)", r.err().strip());
    }

    @Test
    void brokenCalibrationJsonIsNamedByLine() throws IOException {
        Path calibration = dir.resolve("broken.json");
        Files.writeString(calibration, "{\"channels\": [\n  {\"channel\": \"force\",,}\n]}");
        CliRun r = CliRun.of("frf", "--input", recording.toString(), "--force", "0", "--response", "1", "--calibration",
                calibration.toString(), "--out", dir.resolve("x.csv").toString());
        assertEquals(1, r.exitCode());
        assertTrue(r.err().startsWith("tautline: " + calibration + ", line 2, column "), r.err());
    }
}
