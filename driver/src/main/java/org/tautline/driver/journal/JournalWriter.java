package org.tautline.driver.journal;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Clock;
import java.util.LinkedHashMap;
import java.util.Map;

import org.tautline.driver.RigException;
import org.tautline.driver.spi.SampleBlock;
import org.tautline.driver.sweep.CompletedStep;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepStatus;

/**
 * Appends a sweep's records to a journal file, each one forced to the storage device before the next step starts.
 *
 * <p>The format is described in the {@linkplain org.tautline.driver.journal package documentation}. Each
 * record is written with one write and then {@link FileChannel#force(boolean) force(true)}; a step's
 * raw samples, when kept, are written and forced to the side file before its STEP record, so a STEP
 * record on disk always refers to samples on disk. Not safe for use by several threads at once.
 */
public final class JournalWriter implements SweepJournal, AutoCloseable {
    private final Path file;
    private final Path samplesFile;
    private final FileChannel journal;
    private final FileChannel samples;
    private final Clock clock;
    private int stepsWritten;

    private JournalWriter(Path file, Path samplesFile, FileChannel journal, FileChannel samples, Clock clock,
                          int stepsWritten) {
        this.file = file;
        this.samplesFile = samplesFile;
        this.journal = journal;
        this.samples = samples;
        this.clock = clock;
        this.stepsWritten = stepsWritten;
    }

    /**
     * Starts a new journal with its header; the file (and the samples side file) must not exist yet.
     *
     * @param file the journal file to create
     * @param header what is being run and on which rig
     * @param clock the clock for the END and RESUMED times
     * @return the writer
     * @throws RigException when the file exists or cannot be written
     */
    public static JournalWriter create(Path file, JournalHeader header, Clock clock) {
        FileChannel journal = null;
        try {
            journal = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
            FileChannel samples = header.keepsSamples() ? FileChannel.open(file.resolveSibling(header.samplesFile()),
                    StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE) : null;
            JournalWriter writer = new JournalWriter(file, header.keepsSamples() ? file.resolveSibling(header.samplesFile())
                    : null, journal, samples, clock, 0);
            writer.append(header.toLine(), "the header");
            forceFolder(file);
            return writer;
        } catch (IOException e) {
            closeQuietly(journal);
            throw new RigException("journal " + file + " could not be created: " + e, e);
        }
    }

    /**
     * Reopens a journal to go on with it: cuts off anything after its last valid record and appends a RESUMED record.
     *
     * @param contents the journal as read back
     * @param identity the identity of the rig the sweep goes on with
     * @param clock the clock for the RESUMED, END times
     * @return the writer, positioned after the RESUMED record
     * @throws RigException when the journal cannot be written
     */
    public static JournalWriter resume(JournalContents contents, String identity, Clock clock) {
        Path file = contents.file();
        FileChannel journal = null;
        try {
            journal = FileChannel.open(file, StandardOpenOption.WRITE);
            journal.truncate(contents.validBytes());
            journal.position(contents.validBytes());
            FileChannel samples = null;
            Path side = contents.samplesFile().orElse(null);
            if (side != null) {
                samples = FileChannel.open(side, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
                long end = contents.steps().stream().mapToLong(s -> s.samplesOffset() + s.samplesBytes()).max().orElse(0L);
                samples.truncate(Math.max(0, end));
                samples.position(samples.size());
            }
            JournalWriter writer = new JournalWriter(file, side, journal, samples, clock, contents.steps().size());
            Map<String, String> f = new LinkedHashMap<>();
            f.put("at", clock.instant().toString());
            f.put("identity", identity);
            f.put("completedSteps", Integer.toString(contents.steps().size()));
            writer.append(new JournalLine("RESUMED", f), "the RESUMED record");
            return writer;
        } catch (IOException e) {
            closeQuietly(journal);
            throw new RigException("journal " + file + " could not be reopened to resume: " + e, e);
        }
    }

    /** @return the journal file */
    public Path file() {
        return file;
    }

    @Override
    public void stepCompleted(CompletedStep step, SampleBlock block) {
        if (step.index() != stepsWritten) {
            throw new RigException("journal " + file + ": step " + (step.index() + 1) + " arrived where step "
                    + (stepsWritten + 1) + " was expected");
        }
        long offset = -1;
        int count = 0;
        String crc = "";
        if (samples != null) {
            byte[] raw = rawBytes(block);
            try {
                offset = samples.size();
                writeFully(samples, ByteBuffer.wrap(raw), offset);
                samples.force(true);
            } catch (IOException e) {
                throw new RigException("samples file " + samplesFile + ": could not record the samples of step "
                        + (step.index() + 1) + ": " + e, e);
            }
            count = block.length();
            crc = JournalLine.crcHex(raw);
        }
        JournalStep record = new JournalStep(step, offset, count, crc);
        append(record.toLine(), "step " + (step.index() + 1));
        stepsWritten++;
    }

    @Override
    public void sweepEnded(SweepStatus status, String reason) {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("status", status.name().toLowerCase(java.util.Locale.ROOT));
        f.put("at", clock.instant().toString());
        f.put("completedSteps", Integer.toString(stepsWritten));
        f.put("reason", reason);
        append(new JournalLine("END", f), "the END record");
    }

    /** Closes the files; never throws. */
    @Override
    public void close() {
        closeQuietly(journal);
        closeQuietly(samples);
    }

    private void append(JournalLine line, String what) {
        try {
            writeFully(journal, ByteBuffer.wrap(line.encode()), journal.position());
            journal.force(true);
        } catch (IOException e) {
            throw new RigException("journal " + file + ": could not record " + what + ": " + e, e);
        }
    }

    private static void writeFully(FileChannel channel, ByteBuffer buffer, long at) throws IOException {
        long position = at;
        while (buffer.hasRemaining()) {
            position += channel.write(buffer, position);
        }
        channel.position(position);
    }

    private static byte[] rawBytes(SampleBlock block) {
        int n = block.length();
        ByteBuffer buffer = ByteBuffer.allocate(16 * n);
        buffer.asDoubleBuffer().put(block.samples()[0]).put(block.samples()[1]);
        return buffer.array();
    }

    /** Makes the new file's directory entry durable too; some platforms cannot open a folder, and then it is skipped. */
    private static void forceFolder(Path file) {
        Path folder = file.toAbsolutePath().getParent();
        try (FileChannel dir = FileChannel.open(folder, StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // The file's own contents are forced; only the folder entry's durability is left to the platform.
        }
    }

    private static void closeQuietly(FileChannel channel) {
        if (channel != null) {
            try {
                channel.close();
            } catch (IOException e) {
                // Closing after the data was forced loses nothing.
            }
        }
    }
}
