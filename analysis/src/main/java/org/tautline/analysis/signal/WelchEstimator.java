package org.tautline.analysis.signal;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.jtransforms.fft.DoubleFFT_1D;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.ProgressListener;

/**
 * Streaming Welch estimator of all auto and cross spectra of a set of channels.
 *
 * <p>Method: P. D. Welch, "The use of fast Fourier transform for the estimation of power spectra:
 * a method based on time averaging over short, modified periodograms", IEEE Trans. Audio
 * Electroacoust. AU-15(2):70-73, 1967 (from memory); scaling as in G. Heinzel, A. Ruediger and
 * R. Schilling, 2002 (see {@link SpectrumScaling}); cross-spectrum convention
 * G_ab = c conj(X_a) X_b of J. S. Bendat and A. G. Piersol, Random Data, 4th ed. 2010 (from memory).
 * Segments of N frames start every D = {@link WelchSettings#hopFrames()} frames; each is detrended,
 * windowed and transformed with JTransforms' real FFT, and the products are summed; frames after
 * the last whole segment are not used.
 *
 * <p>The source is read block by block and never held whole: an estimate keeps one segment per
 * estimated channel, one read block of N frames per recorded channel and the running sums, so its
 * memory is O(N x channels) whatever the record length. The estimator's own code allocates nothing
 * per segment (JTransforms allocates a scratch array per transform for segment lengths that are not
 * powers of two). An estimator holds one FFT plan, reused by every estimate; use one estimator per thread.
 */
public final class WelchEstimator {
    private final WelchSettings settings;
    private final Window window;
    private final DoubleFFT_1D fft;

    /**
     * Creates an estimator and its FFT plan.
     *
     * @param settings segment length, overlap, window, detrending and scaling
     */
    public WelchEstimator(WelchSettings settings) {
        if (settings == null) {
            throw new AnalysisException("Welch settings are missing: expected for example WelchSettings.of(4096)");
        }
        this.settings = settings;
        this.window = settings.windowSamples();
        this.fft = new DoubleFFT_1D(settings.segmentLength());
    }

    /** @return the settings */
    public WelchSettings settings() {
        return settings;
    }

    /**
     * Estimates the spectra of some channels, without progress reports or cancellation.
     *
     * @param source the recording, read from its current position to the end (not closed)
     * @param channels 0-based channel indices in the recording, at least one, no repeats
     * @return the averaged spectra; channel positions follow the order of {@code channels}
     * @throws IOException when the source cannot be read
     */
    public CrossSpectra estimate(SampleSource source, int... channels) throws IOException {
        return estimate(source, channels, ProgressListener.NONE, () -> false);
    }

    /**
     * Estimates the spectra of some channels, streaming through the source.
     *
     * <p>Progress is reported after each segment as frames consumed against
     * {@link SampleSource#frameCount()} (-1 when unknown). {@code cancel} is asked before each
     * segment; when it answers true the estimate stops with an {@link AnalysisException} whose
     * message starts with "cancelled".
     *
     * @param source the recording, read from its current position to the end (not closed)
     * @param channels 0-based channel indices in the recording, at least one, no repeats
     * @param progress receives progress, may be null
     * @param cancel asked between segments, may be null
     * @return the averaged spectra; channel positions follow the order of {@code channels}
     * @throws IOException when the source cannot be read
     * @throws AnalysisException for bad channels, a bad sample rate, a record shorter than one segment, or on cancel
     */
    public CrossSpectra estimate(SampleSource source, int[] channels, ProgressListener progress, BooleanSupplier cancel)
            throws IOException {
        if (source == null) {
            throw new AnalysisException("Welch estimate needs a sample source, got none");
        }
        double fs = source.sampleRateHz();
        if (!(fs > 0) || Double.isInfinite(fs)) {
            throw new AnalysisException("sample rate of " + source.position() + " must be positive and finite, got " + fs + " Hz");
        }
        List<String> names = checkChannels(source, channels);
        ProgressListener listener = progress == null ? ProgressListener.NONE : progress;
        BooleanSupplier stop = cancel == null ? () -> false : cancel;

        int n = settings.segmentLength();
        int hop = settings.hopFrames();
        int kept = n - hop;
        int count = channels.length;
        long total = source.frameCount();
        double[][] block = new double[source.channelCount()][n];
        double[][] segment = new double[count][n];
        double[][] spectra = new double[count][n];
        double[] line = new double[2];
        double[] w = window.samples();
        double mid = 0.5 * (n - 1);
        Detrend detrend = settings.detrend();
        WelchAccumulator sums = new WelchAccumulator(n, count);

        long consumed = 0;
        int fill = 0;
        int got;
        while ((got = source.read(block, n)) >= 0) {
            if (got > n) {
                throw new AnalysisException("source " + source.position() + " returned " + got + " frames for a read of at most "
                        + n);
            }
            int offset = 0;
            while (offset < got) {
                int take = Math.min(got - offset, n - fill);
                for (int c = 0; c < count; c++) {
                    System.arraycopy(block[channels[c]], offset, segment[c], fill, take);
                }
                fill += take;
                offset += take;
                consumed += take;
                if (fill == n) {
                    if (stop.getAsBoolean()) {
                        throw new AnalysisException("cancelled: Welch estimate stopped at " + source.position() + " after "
                                + sums.segments() + " segments");
                    }
                    for (int c = 0; c < count; c++) {
                        double[] x = segment[c];
                        double[] s = spectra[c];
                        detrend.fit(x, n, line);
                        double offsetValue = line[0] - line[1] * mid;
                        double slope = line[1];
                        for (int i = 0; i < n; i++) {
                            s[i] = (x[i] - offsetValue - slope * i) * w[i];
                        }
                        fft.realForward(s);
                        System.arraycopy(x, hop, x, 0, kept);
                    }
                    sums.add(spectra);
                    fill = kept;
                    listener.progress(consumed, total);
                }
            }
        }
        if (sums.segments() == 0) {
            throw new AnalysisException("recording too short for one Welch segment: it ended after " + consumed + " frames (at "
                    + source.position() + "), segmentLength needs " + n + "; use a shorter segment or a longer recording");
        }
        listener.progress(consumed, total);
        long used = n + (long) (sums.segments() - 1) * hop;
        return sums.finish(settings, window, fs, names, used);
    }

    private static List<String> checkChannels(SampleSource source, int[] channels) {
        List<String> all = source.channelNames();
        if (channels == null || channels.length == 0) {
            throw new AnalysisException("Welch estimate needs at least one channel of " + source.position() + ": expected indices"
                    + " below " + all.size() + " of " + all);
        }
        List<String> names = new ArrayList<>(channels.length);
        for (int i = 0; i < channels.length; i++) {
            int c = channels[i];
            if (c < 0 || c >= all.size()) {
                throw new AnalysisException("channel " + c + " is not in " + source.position() + ": expected a 0-based index below "
                        + all.size() + " of " + all);
            }
            for (int j = 0; j < i; j++) {
                if (channels[j] == c) {
                    throw new AnalysisException("channel " + c + " (" + all.get(c) + ") is listed twice: expected each channel once");
                }
            }
            names.add(all.get(c));
        }
        return names;
    }
}
