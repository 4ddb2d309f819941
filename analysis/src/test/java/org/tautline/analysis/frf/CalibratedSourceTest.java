package org.tautline.analysis.frf;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.frf.ChannelCalibration.Quantity;

class CalibratedSourceTest {
    private static TimeSeriesCsvReader recording() throws IOException {
        return TimeSeriesCsvReader.open(new StringReader("# sample_rate_hz: 1000\nforce,accel,monitor\n"
                + "0.045,0.0102,1.25\n-0.0225,-0.0306,-2\n0.1,0.7,3\n"), "rec.csv");
    }

    @Test
    void dividesCalibratedChannelsBySensitivityAndSetsTheirUnits() throws IOException {
        List<ChannelCalibration> calibrations = List.of(ChannelCalibration.of("force", 0.0225, Quantity.FORCE),
                new ChannelCalibration("1", -0.0102, "m/s^2", Quantity.ACCELERATION));
        try (CalibratedSource source = CalibratedSource.of(recording(), calibrations)) {
            assertEquals(1000.0, source.sampleRateHz());
            assertEquals(List.of("force", "accel", "monitor"), source.channelNames());
            assertEquals(Optional.of("N"), source.unit(0));
            assertEquals(Optional.of("m/s^2"), source.unit(1));
            assertEquals(Optional.empty(), source.unit(2), "an uncalibrated channel stays raw");
            assertEquals(Optional.of(calibrations.get(1)), source.calibration(1));
            double[][] samples = Sources.readAll(source, 2);
            // Each value is exactly the raw value divided by the sensitivity (IEEE 754 division).
            assertArrayEquals(new double[] {0.045 / 0.0225, -0.0225 / 0.0225, 0.1 / 0.0225}, samples[0], 0);
            assertArrayEquals(new double[] {0.0102 / -0.0102, -0.0306 / -0.0102, 0.7 / -0.0102}, samples[1], 0);
            assertArrayEquals(new double[] {1.25, -2, 3}, samples[2], 0);
            assertEquals(2.0, samples[0][0], 1e-15, "0.045 V at 0.0225 V/N is 2 N");
        }
    }

    @Test
    void rejectsCalibrationsOfMissingOrRepeatedChannels() throws IOException {
        try (TimeSeriesCsvReader raw = recording()) {
            assertEquals("channel 'load' is not in the recording: expected a 0-based index below 3 or one of the names"
                    + " [force, accel, monitor]", assertThrows(AnalysisException.class, () -> CalibratedSource.of(raw,
                    List.of(ChannelCalibration.of("load", 1, Quantity.FORCE)))).getMessage());
            assertEquals("channel 0 ('force') is calibrated twice, as 'force' and as '0'; expected one calibration per"
                    + " channel", assertThrows(AnalysisException.class, () -> CalibratedSource.of(raw,
                    List.of(ChannelCalibration.of("force", 1, Quantity.FORCE), ChannelCalibration.of("0", 2,
                            Quantity.FORCE)))).getMessage());
        }
    }

    @Test
    void rejectsCalibrationsThatAreNotInSiUnitsOrHaveNoUsableSensitivity() {
        assertEquals("calibration of channel 'force': unit 'lbf' does not match force; expected 'N' (sensitivities are"
                + " volts per SI unit)", assertThrows(AnalysisException.class,
                () -> new ChannelCalibration("force", 0.1, "lbf", Quantity.FORCE)).getMessage());
        assertEquals("calibration of channel 'accel': sensitivity 0.0 V per m/s^2 must be finite and not zero",
                assertThrows(AnalysisException.class, () -> ChannelCalibration.of("accel", 0, Quantity.ACCELERATION))
                        .getMessage());
        assertEquals("calibration of channel 'v': sensitivity NaN V per m/s must be finite and not zero",
                assertThrows(AnalysisException.class, () -> ChannelCalibration.of("v", Double.NaN, Quantity.VELOCITY))
                        .getMessage());
        assertEquals("a channel calibration needs a channel name or 0-based index, got ' '",
                assertThrows(AnalysisException.class, () -> ChannelCalibration.of(" ", 1, Quantity.VOLTAGE)).getMessage());
        assertEquals("calibration of channel 'x': quantity is missing; expected force, displacement, velocity,"
                + " acceleration or voltage", assertThrows(AnalysisException.class,
                () -> ChannelCalibration.of("x", 1, null)).getMessage());
    }

    @Test
    void namesQuantitiesCaseInsensitively() {
        assertEquals(Quantity.DISPLACEMENT, Quantity.of(" Displacement"));
        assertEquals("m", Quantity.DISPLACEMENT.siUnit());
        assertEquals("channel quantity 'strain' is unknown; expected force, displacement, velocity, acceleration or"
                + " voltage", assertThrows(AnalysisException.class, () -> Quantity.of("strain")).getMessage());
    }
}
