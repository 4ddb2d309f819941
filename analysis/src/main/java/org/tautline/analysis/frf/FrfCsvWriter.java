package org.tautline.analysis.frf;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;
import java.util.Map;

import org.tautline.analysis.AnalysisException;

/**
 * Writes an FRF as a CSV text file, atomically.
 *
 * <p>Layout: metadata lines starting with {@code #} ({@code # quantity: receptance},
 * {@code # units: m/N}, then the caller's key/value pairs in the map's iteration order), a header
 * {@code frequency_hz,real,imag} followed by {@code coherence}, {@code quality} and {@code variance}
 * (in that order) when the FRF carries them, then one line per frequency line. Numbers are written by {@link Double#toString(double)}
 * (the shortest decimal that reads back to the same double), lines end with {@code \n}, text is
 * UTF-8. The file is written to a temporary file in the same directory and then moved over the
 * target, so a reader never sees half a file.
 */
public final class FrfCsvWriter {
    private FrfCsvWriter() {
    }

    /**
     * Writes the FRF with its metadata.
     *
     * @param frf the FRF
     * @param metadata extra key/value pairs (keys without {@code :} or line breaks, values without
     *                 line breaks, not {@code quantity} or {@code units}); may be empty
     * @param file the target file; replaced if it exists
     * @throws IOException if the file cannot be written
     */
    public static void write(Frf frf, Map<String, String> metadata, Path file) throws IOException {
        if (frf == null) {
            throw new AnalysisException("FRF CSV export needs an FRF, got none");
        }
        if (metadata == null) {
            throw new AnalysisException("FRF CSV export needs a metadata map (empty when none), got none");
        }
        if (file == null) {
            throw new AnalysisException("FRF CSV export needs a target file, got none");
        }
        String text = format(frf, metadata);
        Path target = file.toAbsolutePath();
        Path directory = target.getParent();
        Path temporary = Files.createTempFile(directory, "." + target.getFileName(), ".tmp");
        try {
            try (Writer out = Files.newBufferedWriter(temporary, StandardCharsets.UTF_8)) {
                out.write(text);
            }
            try {
                Files.move(temporary, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    /**
     * The CSV text that {@link #write} puts in the file.
     *
     * @param frf the FRF
     * @param metadata extra key/value pairs, as for {@link #write}
     * @return the whole file's text
     */
    public static String format(Frf frf, Map<String, String> metadata) {
        StringBuilder out = new StringBuilder(64 + 80 * frf.size());
        out.append("# quantity: ").append(frf.quantity().name().toLowerCase(Locale.ROOT)).append('\n');
        out.append("# units: ").append(frf.quantity().siUnits()).append('\n');
        for (Map.Entry<String, String> entry : metadata.entrySet()) {
            String key = checkedKey(entry.getKey());
            String value = entry.getValue();
            if (value == null || value.indexOf('\n') >= 0 || value.indexOf('\r') >= 0) {
                throw new AnalysisException("FRF CSV metadata value for '" + key
                        + "' must be one line of text, got " + (value == null ? "none" : "a line break"));
            }
            out.append("# ").append(key).append(": ").append(value).append('\n');
        }
        double[] coherence = frf.coherence().orElse(null);
        double[] quality = frf.quality().orElse(null);
        double[] variance = frf.variance().orElse(null);
        out.append("frequency_hz,real,imag");
        if (coherence != null) {
            out.append(",coherence");
        }
        if (quality != null) {
            out.append(",quality");
        }
        if (variance != null) {
            out.append(",variance");
        }
        out.append('\n');
        double[] frequency = frf.frequenciesHz();
        double[] real = frf.realParts();
        double[] imag = frf.imaginaryParts();
        for (int i = 0; i < frequency.length; i++) {
            out.append(Double.toString(frequency[i])).append(',').append(Double.toString(real[i]))
                    .append(',').append(Double.toString(imag[i]));
            if (coherence != null) {
                out.append(',').append(Double.toString(coherence[i]));
            }
            if (quality != null) {
                out.append(',').append(Double.toString(quality[i]));
            }
            if (variance != null) {
                out.append(',').append(Double.toString(variance[i]));
            }
            out.append('\n');
        }
        return out.toString();
    }

    private static String checkedKey(String key) {
        if (key == null || key.isBlank()) {
            throw new AnalysisException("FRF CSV metadata key must be a non-blank word, got "
                    + (key == null ? "none" : "'" + key + "'"));
        }
        if (key.indexOf(':') >= 0 || key.indexOf('\n') >= 0 || key.indexOf('\r') >= 0) {
            throw new AnalysisException("FRF CSV metadata key '" + key.strip()
                    + "' must not contain ':' or a line break");
        }
        if (key.strip().equals("quantity") || key.strip().equals("units")) {
            throw new AnalysisException("FRF CSV metadata key '" + key.strip()
                    + "' is reserved: the writer sets it from the FRF itself");
        }
        return key.strip();
    }
}
