package org.tautline.analysis.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class WelchSettingsTest {

    private static String message(Runnable action) {
        return assertThrows(AnalysisException.class, action::run).getMessage();
    }

    @Test
    void rejectsBadSettingsNamingFieldValueAndExpectation() {
        assertEquals("Welch segmentLength must be at least 2 frames, got 1",
                message(() -> WelchSettings.of(1)));
        assertEquals("Welch overlap must be a fraction with 0 <= overlap < 1 (0.5 for half a segment), got 1.0",
                message(() -> WelchSettings.of(64).withOverlap(1.0)));
        assertEquals("Welch overlap must be a fraction with 0 <= overlap < 1 (0.5 for half a segment), got -0.1",
                message(() -> WelchSettings.of(64).withOverlap(-0.1)));
        assertEquals("Welch overlap must be a fraction with 0 <= overlap < 1 (0.5 for half a segment), got NaN",
                message(() -> WelchSettings.of(64).withOverlap(Double.NaN)));
        assertEquals("Welch window is missing: expected one of [RECTANGULAR, HANN, HAMMING, BLACKMAN_HARRIS_3,"
                + " BLACKMAN_HARRIS_4, FLAT_TOP_HFT95]", message(() -> WelchSettings.of(64).withWindow(null, true)));
        assertEquals("Welch detrend is missing: expected one of [NONE, MEAN, LINEAR]",
                message(() -> WelchSettings.of(64).withDetrend(null)));
        assertEquals("Welch scaling is missing: expected one of [DENSITY, SPECTRUM]",
                message(() -> WelchSettings.of(64).withScaling(null)));
    }

    @Test
    void hopIsTheSegmentLessTheRoundedOverlap() {
        assertEquals(2048, WelchSettings.of(4096).hopFrames(), "50 % of 4096");
        assertEquals(700, WelchSettings.of(1000).withOverlap(0.3).hopFrames(), "30 % of 1000");
        assertEquals(1, WelchSettings.of(2).withOverlap(0.99).hopFrames(), "the hop is never below one frame");
        assertEquals(333, WelchSettings.of(333).withOverlap(0).hopFrames(), "no overlap");
    }

    @Test
    void rejectsARecordShorterThanOneSegment() {
        ArraySampleSource source = ArraySampleSource.of("short", 1000, new double[100], new double[100]);
        assertEquals("recording too short for one Welch segment: it ended after 100 frames (at short, frame 100),"
                + " segmentLength needs 128; use a shorter segment or a longer recording",
                message(() -> estimate(new WelchEstimator(WelchSettings.of(128)), source, 0, 1)));
    }

    @Test
    void rejectsUnknownAndRepeatedChannels() {
        ArraySampleSource source = new ArraySampleSource("rig", 1000, List.of("force", "accel"), new double[2][256]);
        WelchEstimator estimator = new WelchEstimator(WelchSettings.of(64));
        assertEquals("channel 2 is not in rig, frame 0: expected a 0-based index below 2 of [force, accel]",
                message(() -> estimate(estimator, source, 0, 2)));
        assertEquals("channel 1 (accel) is listed twice: expected each channel once",
                message(() -> estimate(estimator, source, 1, 1)));
        assertEquals("Welch estimate needs at least one channel of rig, frame 0: expected indices below 2 of [force, accel]",
                message(() -> estimate(estimator, source)));
    }

    @Test
    void arraySourceRejectsRaggedChannels() {
        assertEquals("channel 1 (b) of rec has 9 samples, expected 10 like channel 0",
                message(() -> new ArraySampleSource("rec", 100, List.of("a", "b"), new double[][] {new double[10], new double[9]})));
        assertEquals("sample rate of rec must be positive and finite, got 0.0 Hz",
                message(() -> ArraySampleSource.of("rec", 0, new double[4])));
    }

    private static void estimate(WelchEstimator estimator, SampleSource source, int... channels) {
        try {
            estimator.estimate(source, channels);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
