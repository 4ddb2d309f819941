package org.tautline.analysis.frf;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.tautline.analysis.AnalysisException;
import org.tautline.analysis.signal.SampleSource;

/**
 * Streams a recording from our time-series CSV text, a line at a time.
 *
 * <p>Layout: optional metadata lines {@code # key: value}, then either a header
 * {@code time_s,<channel>,...} with a time column (the sample rate is the reciprocal of the first
 * time step, and every later step must equal the first within a relative 1e-6), or a
 * {@code # sample_rate_hz: 20000} line and a header of channel names only (not both). Then one line
 * per frame; a file with a time column needs at least two.
 * Lines, blank lines, the byte-order mark and cells follow the rules of {@link FrfCsvReader}.
 *
 * <p>Errors: a malformed line is reported as an {@link AnalysisException} naming the file and the
 * line. The frames before it are never lost: {@link #read} first returns the whole frames it has,
 * and the next call throws; every call after that throws the same exception.
 */
public final class TimeSeriesCsvReader implements SampleSource {
    private static final String TIME = "time_s";
    private static final String RATE = "sample_rate_hz";
    private static final String EXPECTED_HEADER = "the header time_s,<channel>,... or a '# sample_rate_hz: ...' line and"
            + " a header of channel names";
    private static final double STEP_TOLERANCE = 1e-6;

    private final Reader in;
    private final CsvLines lines;
    private final Map<String, String> metadata;
    private final List<String> channels;
    private final List<String> columns;
    private final boolean timed;
    private final String expectedCells;
    private final double[] row;
    private final List<double[]> ahead = new ArrayList<>(2);
    private double sampleRateHz;
    private double firstStepS;
    private double lastTimeS;
    private AnalysisException failure;
    private boolean ended;

    private TimeSeriesCsvReader(Reader in, String displayName) throws IOException {
        this.in = in;
        this.lines = new CsvLines(in, displayName);
        CsvPreamble preamble = CsvPreamble.read(lines, EXPECTED_HEADER);
        this.metadata = preamble.values();
        String header = preamble.header();
        this.columns = List.of(CsvCells.split(header));
        this.timed = columns.get(0).equals(TIME);
        String rate = metadata.get(RATE);
        if (timed && rate != null) {
            throw new AnalysisException(lines.at() + "the header has a time_s column and line " + preamble.lineOf(RATE)
                    + " gives '# sample_rate_hz'; expected one of them, not both");
        }
        if (!timed && rate == null) {
            throw new AnalysisException(lines.at() + "header " + CsvCells.quoted(header)
                    + " has no time_s column and no '# sample_rate_hz: ...' line came before it; expected " + EXPECTED_HEADER);
        }
        this.channels = channelNames(columns.subList(timed ? 1 : 0, columns.size()), header);
        this.expectedCells = "expected " + columns.size() + " (" + String.join(",", columns) + ")";
        this.row = new double[columns.size()];
        if (timed) {
            readFirstTwoFrames();
        } else {
            double hz = CsvCells.finiteOrNaN(rate);
            String where = lines.name() + ", line " + preamble.lineOf(RATE) + ": ";
            if (Double.isNaN(hz)) {
                throw new AnalysisException(where + "sample_rate_hz holds " + CsvCells.quoted(rate) + ", "
                        + CsvCells.expectation(rate));
            }
            if (!(hz > 0)) {
                throw new AnalysisException(where + "sample rate " + hz + " Hz is not positive; expected a sample rate"
                        + " above 0 Hz");
            }
            this.sampleRateHz = hz;
        }
    }

    /**
     * Opens a time-series CSV file, using its file name in messages; the header is read and checked now.
     *
     * @param file the file, UTF-8 text
     * @return the reader, to be closed by the caller
     * @throws IOException if the file cannot be read
     * @throws AnalysisException if the metadata or header are malformed (the file is then closed)
     */
    public static TimeSeriesCsvReader open(Path file) throws IOException {
        InputStream stream = Files.newInputStream(file);
        try {
            return open(stream, FrfCsvReader.displayName(file));
        } catch (IOException | RuntimeException e) {
            stream.close();
            throw e;
        }
    }

    /**
     * Opens time-series CSV text from a byte stream decoded as UTF-8; {@link #close} closes the stream.
     *
     * <p>When opening fails the stream is left open for the caller to close.
     *
     * @param in the bytes
     * @param displayName how messages name the source, for example {@code rec.csv}
     * @return the reader
     * @throws IOException if the stream cannot be read
     * @throws AnalysisException if the metadata or header are malformed
     */
    public static TimeSeriesCsvReader open(InputStream in, String displayName) throws IOException {
        return open(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8), 1 << 16), displayName);
    }

    /**
     * Opens time-series CSV text from characters; {@link #close} closes the reader.
     *
     * <p>When opening fails the reader is left open for the caller to close.
     *
     * @param in the text
     * @param displayName how messages name the source, for example {@code rec.csv}
     * @return the reader
     * @throws IOException if the reader fails
     * @throws AnalysisException if the metadata or header are malformed
     */
    public static TimeSeriesCsvReader open(Reader in, String displayName) throws IOException {
        return new TimeSeriesCsvReader(in, displayName);
    }

    private List<String> channelNames(List<String> names, String header) {
        if (names.isEmpty()) {
            throw new AnalysisException(lines.at() + "header " + CsvCells.quoted(header)
                    + " names no channels; expected at least one channel name");
        }
        for (int c = 0; c < names.size(); c++) {
            String name = names.get(c);
            String problem = null;
            if (name.isEmpty()) {
                problem = "is empty";
            } else if (name.indexOf('"') >= 0) {
                problem = "holds a double quote";
            } else if (CsvCells.hasControl(name)) {
                problem = "holds a control character";
            } else if (CsvCells.isDecimal(name)) {
                problem = "is a number (is the header missing?)";
            } else if (name.equals(TIME)) {
                problem = "is time_s, which may only be the first column";
            } else if (names.subList(0, c).contains(name)) {
                problem = "appears twice";
            }
            if (problem != null) {
                throw new AnalysisException(lines.at() + "channel name " + CsvCells.quoted(name) + " " + problem
                        + "; expected distinct channel names in the header");
            }
        }
        return List.copyOf(names);
    }

    private void readFirstTwoFrames() throws IOException {
        for (int i = 0; i < 2; i++) {
            String line = lines.nextContentLine();
            if (line == null) {
                throw new AnalysisException(lines.atEnd() + "found " + i + (i == 1 ? " frame" : " frames")
                        + "; expected at least two lines to find the sample rate from the time column");
            }
            parse(line);
            if (i == 1) {
                double step = row[0] - lastTimeS;
                if (!(step > 0)) {
                    throw new AnalysisException(lines.at() + "time " + row[0] + " s does not increase on the line before ("
                            + lastTimeS + " s), so the sample rate would be zero or negative; expected times that"
                            + " increase by one sample period per line");
                }
                double hz = 1.0 / step;
                if (!(hz > 0) || Double.isInfinite(hz)) {
                    throw new AnalysisException(lines.at() + "time step " + step + " s gives a sample rate of " + hz
                            + " Hz; expected a finite positive sample rate");
                }
                firstStepS = step;
                sampleRateHz = hz;
            }
            lastTimeS = row[0];
            ahead.add(java.util.Arrays.copyOfRange(row, 1, row.length));
        }
    }

    private void parse(String line) {
        String[] cells = CsvCells.splitRow(line, columns.size(), expectedCells, lines);
        for (int c = 0; c < cells.length; c++) {
            row[c] = CsvCells.number(cells[c], columns.get(c), lines);
        }
    }

    /** @return the {@code # key: value} lines in file order, {@code sample_rate_hz} included (unmodifiable) */
    public Map<String, String> metadata() {
        return metadata;
    }

    @Override
    public double sampleRateHz() {
        return sampleRateHz;
    }

    @Override
    public List<String> channelNames() {
        return channels;
    }

    /** @return -1: a CSV text does not declare its length */
    @Override
    public long frameCount() {
        return -1;
    }

    @Override
    public int read(double[][] buffer, int maxFrames) throws IOException {
        WavReader.checkBuffer(buffer, maxFrames, channels.size());
        if (failure != null) {
            throw failure;
        }
        int n = 0;
        int first = timed ? 1 : 0;
        while (n < maxFrames && !ahead.isEmpty()) {
            double[] frame = ahead.remove(0);
            for (int c = 0; c < frame.length; c++) {
                buffer[c][n] = frame[c];
            }
            n++;
        }
        while (n < maxFrames && !ended) {
            try {
                String line = lines.nextContentLine();
                if (line == null) {
                    ended = true;
                    break;
                }
                parse(line);
                if (timed) {
                    checkStep();
                }
            } catch (AnalysisException e) {
                failure = e;
                if (n > 0) {
                    return n;
                }
                throw e;
            }
            for (int c = first; c < row.length; c++) {
                buffer[c - first][n] = row[c];
            }
            n++;
        }
        return n == 0 ? -1 : n;
    }

    private void checkStep() {
        double step = row[0] - lastTimeS;
        if (!(Math.abs(step - firstStepS) <= STEP_TOLERANCE * firstStepS)) {
            throw new AnalysisException(lines.at() + "time step " + step + " s differs from the first step " + firstStepS
                    + " s by more than a relative 1e-6; expected uniformly sampled times");
        }
        lastTimeS = row[0];
    }

    /**
     * Where the reader is in the text.
     *
     * @return the last line read, for example {@code rec.csv, line 12} (at the start this runs up to
     *         two lines ahead of the frames delivered)
     */
    @Override
    public String position() {
        return lines.name() + ", line " + lines.lineNumber();
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
