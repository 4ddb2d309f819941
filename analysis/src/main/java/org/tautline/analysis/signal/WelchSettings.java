package org.tautline.analysis.signal;

import java.util.Arrays;

import org.tautline.analysis.AnalysisException;

/**
 * Settings of a Welch spectral estimate: segment length, overlap, window, detrending and scaling.
 *
 * <p>Segments of {@code segmentLength} frames start every {@link #hopFrames()} frames; frames after
 * the last whole segment are not used (P. D. Welch, IEEE Trans. AU-15:70, 1967, from memory).
 *
 * @param segmentLength frames per segment N, 2 or more, any length (powers of two are fastest;
 *                      lengths with a prime factor of 211 or more use a slower transform)
 * @param overlap fraction of a segment shared with the next, 0 <= overlap < 1 (0.5 is common practice with Hann)
 * @param window the window applied to each segment
 * @param periodic true for the periodic (DFT-even) window, the usual choice for spectra; false for the symmetric form
 * @param detrend what is removed from each segment before windowing
 * @param scaling density (units^2/Hz) or power spectrum (units^2)
 */
public record WelchSettings(int segmentLength, double overlap, WindowType window, boolean periodic, Detrend detrend,
                            SpectrumScaling scaling) {

    /** Checks the settings; see the record components for what is expected. */
    public WelchSettings {
        if (segmentLength < 2) {
            throw new AnalysisException("Welch segmentLength must be at least 2 frames, got " + segmentLength);
        }
        if (!(overlap >= 0 && overlap < 1)) {
            throw new AnalysisException("Welch overlap must be a fraction with 0 <= overlap < 1 (0.5 for half a segment), got "
                    + overlap);
        }
        if (window == null) {
            throw new AnalysisException("Welch window is missing: expected one of " + Arrays.toString(WindowType.values()));
        }
        if (detrend == null) {
            throw new AnalysisException("Welch detrend is missing: expected one of " + Arrays.toString(Detrend.values()));
        }
        if (scaling == null) {
            throw new AnalysisException("Welch scaling is missing: expected one of " + Arrays.toString(SpectrumScaling.values()));
        }
    }

    /**
     * The usual settings for FRF estimation: periodic Hann, 50 % overlap, mean removed, density scaling.
     *
     * @param segmentLength frames per segment, 2 or more
     * @return the settings
     */
    public static WelchSettings of(int segmentLength) {
        return new WelchSettings(segmentLength, 0.5, WindowType.HANN, true, Detrend.MEAN, SpectrumScaling.DENSITY);
    }

    /** @param value the new overlap fraction @return a copy with that overlap */
    public WelchSettings withOverlap(double value) {
        return new WelchSettings(segmentLength, value, window, periodic, detrend, scaling);
    }

    /** @param value the new window @param periodicForm true for the periodic form @return a copy with that window */
    public WelchSettings withWindow(WindowType value, boolean periodicForm) {
        return new WelchSettings(segmentLength, overlap, value, periodicForm, detrend, scaling);
    }

    /** @param value the new detrending @return a copy with that detrending */
    public WelchSettings withDetrend(Detrend value) {
        return new WelchSettings(segmentLength, overlap, window, periodic, value, scaling);
    }

    /** @param value the new scaling @return a copy with that scaling */
    public WelchSettings withScaling(SpectrumScaling value) {
        return new WelchSettings(segmentLength, overlap, window, periodic, detrend, value);
    }

    /** @return frames shared by consecutive segments: round(overlap N), at most N - 1 */
    public int overlapFrames() {
        return (int) Math.min(Math.round(overlap * segmentLength), segmentLength - 1L);
    }

    /** @return frames from the start of one segment to the start of the next, N - {@link #overlapFrames()}, 1 or more */
    public int hopFrames() {
        return segmentLength - overlapFrames();
    }

    /** @return the window these settings apply to each segment */
    public Window windowSamples() {
        return Window.of(window, segmentLength, periodic);
    }
}
