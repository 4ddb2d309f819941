package org.tautline.app.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.ProgressListener;
import org.tautline.analysis.frf.CalibratedSource;
import org.tautline.analysis.frf.ChannelCalibration;
import org.tautline.analysis.frf.ChannelCalibration.Quantity;
import org.tautline.analysis.frf.Frf;
import org.tautline.analysis.frf.FrfCsvWriter;
import org.tautline.analysis.frf.FrfEstimator;
import org.tautline.analysis.frf.FrfQuantity;
import org.tautline.analysis.frf.TimeSeriesCsvReader;
import org.tautline.analysis.frf.WavReader;
import org.tautline.analysis.signal.CrossSpectra;
import org.tautline.analysis.signal.Detrend;
import org.tautline.analysis.signal.SampleSource;
import org.tautline.analysis.signal.WelchEstimator;
import org.tautline.analysis.signal.WelchSettings;
import org.tautline.analysis.signal.WindowType;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code tautline frf}: an FRF with coherence from a recording of force and response. */
@Command(name = "frf", mixinStandardHelpOptions = true,
        description = "Estimate an FRF (H1 or H2) with coherence and per-line variance from a recording of force and"
                + " response (WAV or time-series CSV), by Welch averaging, and write it as FRF CSV.")
final class FrfCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--input", required = true, paramLabel = "REC", description = "The recording: .wav or .csv.")
    private Path input;

    @Option(names = "--force", required = true, paramLabel = "CH", description = "Force channel: 0-based index or name.")
    private String forceChannel;

    @Option(names = "--response", required = true, paramLabel = "CH",
            description = "Response channel: 0-based index or name.")
    private String responseChannel;

    @Option(names = "--segment", paramLabel = "N", defaultValue = "4096",
            description = "Samples per segment, any length of 2 or more (default: ${DEFAULT-VALUE}).")
    private int segmentLength;

    @Option(names = "--window", paramLabel = "NAME", defaultValue = "hann",
            description = "rectangular, hann, hamming, blackman-harris-3, blackman-harris-4 or flat-top"
                    + " (default: ${DEFAULT-VALUE}).")
    private String window;

    @Option(names = "--overlap", paramLabel = "F", defaultValue = "0.5",
            description = "Segment overlap, 0 <= F < 1 (default: ${DEFAULT-VALUE}).")
    private double overlap;

    @Option(names = "--estimator", paramLabel = "h1|h2", defaultValue = "h1",
            description = "h1 (noise on the response) or h2 (noise on the force) (default: ${DEFAULT-VALUE}).")
    private String estimator;

    @Option(names = "--calibration", paramLabel = "FILE", description = "Channel calibrations as JSON (see the README).")
    private Path calibrationFile;

    @Option(names = "--sensitivity", paramLabel = "CH=V,UNIT",
            description = "A channel's sensitivity in volts per SI unit, e.g. force=0.0225,N or 1=0.0102,m/s^2."
                    + " Repeatable.")
    private List<String> sensitivities = new ArrayList<>();

    @Option(names = "--quantity", paramLabel = "Q",
            description = "receptance, mobility or accelerance, for recordings without calibration (raw ratios).")
    private String quantityName;

    @Option(names = "--out", required = true, paramLabel = "FRF.csv", description = "Where to write the FRF.")
    private Path out;

    @Option(names = "--json", description = "Print a summary as JSON.")
    private boolean json;

    @Option(names = "--no-progress", description = "Do not draw the progress bar.")
    private boolean noProgress;

    @Override
    public Integer call() throws IOException {
        List<ChannelCalibration> calibrations = new ArrayList<>();
        if (calibrationFile != null) {
            calibrations.addAll(Calibrations.readFile(calibrationFile));
        }
        for (String text : sensitivities) {
            calibrations.add(Calibrations.parseOption(text));
        }
        WelchSettings settings = WelchSettings.of(segmentLength).withOverlap(overlap)
                .withWindow(windowType(window), true).withDetrend(Detrend.MEAN);
        boolean h2 = parseEstimator(estimator);
        try (CalibratedSource source = CalibratedSource.of(open(input), calibrations)) {
            int force = source.channelIndex(forceChannel);
            int response = source.channelIndex(responseChannel);
            if (force == response) {
                throw new AnalysisException("--force and --response name the same channel (" + force + ")");
            }
            FrfQuantity quantity = quantity(source, force, response);
            ProgressListener progress = noProgress ? ProgressListener.NONE
                    : new ProgressBar(System.err, System.console() != null).frames(input.getFileName().toString());
            CrossSpectra spectra = new WelchEstimator(settings).estimate(source, new int[] {force, response}, progress,
                    () -> Thread.currentThread().isInterrupted());
            Frf frf = h2 ? FrfEstimator.h2(spectra, 0, 1, quantity) : FrfEstimator.h1(spectra, 0, 1, quantity);
            Map<String, String> metadata = metadata(source, force, response, spectra, h2);
            Path parent = out.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            FrfCsvWriter.write(frf, metadata, out);
            report(frf, spectra, metadata);
        }
        return 0;
    }

    private static SampleSource open(Path file) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!Files.isRegularFile(file)) {
            throw new AnalysisException(file + ": no such recording");
        }
        if (name.endsWith(".wav")) {
            return WavReader.open(file);
        }
        if (name.endsWith(".csv")) {
            return TimeSeriesCsvReader.open(file);
        }
        throw new AnalysisException(file + ": expected a recording ending in .wav or .csv");
    }

    static WindowType windowType(String name) {
        switch (name.toLowerCase(Locale.ROOT)) {
            case "rectangular":
                return WindowType.RECTANGULAR;
            case "hann":
                return WindowType.HANN;
            case "hamming":
                return WindowType.HAMMING;
            case "blackman-harris-3":
                return WindowType.BLACKMAN_HARRIS_3;
            case "blackman-harris-4":
                return WindowType.BLACKMAN_HARRIS_4;
            case "flat-top":
                return WindowType.FLAT_TOP_HFT95;
            default:
                throw new AnalysisException("--window '" + name + "': expected rectangular, hann, hamming,"
                        + " blackman-harris-3, blackman-harris-4 or flat-top");
        }
    }

    private static boolean parseEstimator(String name) {
        switch (name.toLowerCase(Locale.ROOT)) {
            case "h1":
                return false;
            case "h2":
                return true;
            default:
                throw new AnalysisException("--estimator '" + name + "': expected h1 or h2");
        }
    }

    private FrfQuantity quantity(CalibratedSource source, int force, int response) {
        Optional<ChannelCalibration> forceCal = source.calibration(force);
        Optional<ChannelCalibration> responseCal = source.calibration(response);
        if (forceCal.isPresent() && responseCal.isPresent()) {
            if (forceCal.get().quantity() != Quantity.FORCE) {
                throw new AnalysisException("the force channel '" + source.channelNames().get(force) + "' is calibrated as "
                        + forceCal.get().quantity().label() + "; expected force");
            }
            FrfQuantity fromCalibration = frfQuantity(responseCal.get().quantity(), source.channelNames().get(response));
            if (quantityName != null && FrfQuantity.valueOf(quantityName.toUpperCase(Locale.ROOT)) != fromCalibration) {
                throw new AnalysisException("--quantity " + quantityName + " contradicts the response calibration ("
                        + responseCal.get().quantity().label() + ")");
            }
            return fromCalibration;
        }
        if (quantityName == null) {
            throw new AnalysisException("say what the FRF relates: calibrate both channels (--calibration or --sensitivity)"
                    + " or give --quantity receptance|mobility|accelerance for raw ratios");
        }
        try {
            return FrfQuantity.valueOf(quantityName.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new AnalysisException("--quantity '" + quantityName + "': expected receptance, mobility or accelerance");
        }
    }

    private static FrfQuantity frfQuantity(Quantity response, String name) {
        switch (response) {
            case DISPLACEMENT:
                return FrfQuantity.RECEPTANCE;
            case VELOCITY:
                return FrfQuantity.MOBILITY;
            case ACCELERATION:
                return FrfQuantity.ACCELERANCE;
            default:
                throw new AnalysisException("the response channel '" + name + "' is calibrated as "
                        + response.label() + "; expected displacement, velocity or acceleration");
        }
    }

    private Map<String, String> metadata(CalibratedSource source, int force, int response, CrossSpectra spectra,
                                         boolean h2) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("source", input.getFileName().toString());
        m.put("force_channel", source.channelNames().get(force));
        m.put("response_channel", source.channelNames().get(response));
        m.put("estimator", h2 ? "H2" : "H1");
        m.put("window", window.toLowerCase(Locale.ROOT));
        m.put("segment_samples", Integer.toString(spectra.settings().segmentLength()));
        m.put("overlap", Double.toString(spectra.settings().overlap()));
        m.put("averages", Integer.toString(spectra.averageCount()));
        m.put("sample_rate_hz", Double.toString(spectra.sampleRateHz()));
        boolean calibrated = source.calibration(force).isPresent() && source.calibration(response).isPresent();
        m.put("calibrated", calibrated ? "yes" : "no: values are raw response/force ratios");
        return m;
    }

    private void report(Frf frf, CrossSpectra spectra, Map<String, String> metadata) throws IOException {
        double[] coherence = frf.coherence().orElseThrow();
        double sum = 0;
        for (double g2 : coherence) {
            sum += g2;
        }
        double meanCoherence = sum / coherence.length;
        if (json) {
            ObjectNode node = ResultJson.MAPPER.createObjectNode();
            node.put("out", out.toString());
            node.put("lines", frf.size());
            node.put("firstFrequencyHz", frf.frequencyHz(0));
            node.put("lastFrequencyHz", frf.frequencyHz(frf.size() - 1));
            node.put("averages", spectra.averageCount());
            node.put("meanCoherence", meanCoherence);
            node.put("quantity", frf.quantity().name().toLowerCase(Locale.ROOT));
            node.put("units", frf.quantity().siUnits());
            ObjectNode meta = node.putObject("metadata");
            metadata.forEach(meta::put);
            spec.commandLine().getOut().println(ResultJson.MAPPER.writeValueAsString(node));
        } else {
            spec.commandLine().getOut().printf(Locale.ROOT,
                    "frf: %d lines %.4g..%.4g Hz from %d averages, mean coherence %.4f, %s in %s, written to %s%n",
                    frf.size(), frf.frequencyHz(0), frf.frequencyHz(frf.size() - 1), spectra.averageCount(),
                    meanCoherence, frf.quantity().label(), frf.quantity().siUnits(), out);
        }
        spec.commandLine().getOut().flush();
    }
}
