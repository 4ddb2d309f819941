package org.tautline.driver.journal;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import java.util.Optional;

import org.tautline.driver.RigException;
import org.tautline.driver.sweep.CompletedStep;
import org.tautline.driver.sweep.SweepStatus;

/**
 * What a journal holds, read up to its last whole, valid record.
 *
 * @param file the journal file
 * @param header the header record
 * @param steps the completed steps, in plan order
 * @param sessions the start and every resume, in order
 * @param validBytes length of the valid part of the file: where an append must start
 * @param fileBytes length of the file as read
 * @param warning why reading stopped before the end of the file; empty when the whole file was valid
 */
public record JournalContents(Path file, JournalHeader header, List<JournalStep> steps, List<JournalSession> sessions,
                              long validBytes, long fileBytes, Optional<String> warning) {

    /** Copies the lists so the record stays immutable. */
    public JournalContents {
        steps = List.copyOf(steps);
        sessions = List.copyOf(sessions);
    }

    /** @return how the last session ended; empty when it has no END record (the writer stopped abruptly) */
    public Optional<SweepStatus> lastStatus() {
        return sessions.get(sessions.size() - 1).status();
    }

    /** @return true when the last session ran the plan to its end: there is nothing left to resume */
    public boolean finished() {
        return lastStatus().filter(s -> s == SweepStatus.COMPLETED).isPresent();
    }

    /** @return the completed steps, in order, as the sweep engine continues from them */
    public List<CompletedStep> completedSteps() {
        return steps.stream().map(JournalStep::step).toList();
    }

    /** @return what channel 1 measured: displacement, velocity or acceleration */
    public String responseQuantity() {
        return header.channels().get(1).quantity();
    }

    /** @return the raw-samples side file, beside the journal; empty when the journal keeps no samples */
    public Optional<Path> samplesFile() {
        return header.keepsSamples() ? Optional.of(file.resolveSibling(header.samplesFile())) : Optional.empty();
    }

    /**
     * Reads one step's integration samples back from the side file and checks their CRC.
     *
     * @param step a step of this journal that kept its samples
     * @return samples[channel][i]: force, then response
     * @throws RigException when the step kept none, or the side file is short or damaged
     */
    public double[][] samples(JournalStep step) {
        if (!step.hasSamples() || samplesFile().isEmpty()) {
            throw new RigException("journal " + file + ": step " + (step.index() + 1) + " kept no samples");
        }
        Path side = samplesFile().get();
        ByteBuffer bytes = ByteBuffer.allocate(Math.toIntExact(step.samplesBytes()));
        try (FileChannel channel = FileChannel.open(side, StandardOpenOption.READ)) {
            while (bytes.hasRemaining()) {
                if (channel.read(bytes, step.samplesOffset() + bytes.position()) < 0) {
                    throw new RigException("samples file " + side + " ends before the " + step.samplesBytes()
                            + " bytes of step " + (step.index() + 1) + " at byte " + step.samplesOffset());
                }
            }
        } catch (IOException e) {
            throw new RigException("samples file " + side + " could not be read: " + e.getMessage(), e);
        }
        if (!JournalLine.crcHex(bytes.array()).equals(step.samplesCrc())) {
            throw new RigException("samples file " + side + ": the samples of step " + (step.index() + 1) + " at byte "
                    + step.samplesOffset() + " fail their CRC check (" + step.samplesCrc() + " recorded)");
        }
        bytes.flip();
        double[][] out = new double[2][step.sampleCount()];
        for (double[] channel : out) {
            bytes.asDoubleBuffer().get(channel);
            bytes.position(bytes.position() + 8 * channel.length);
        }
        return out;
    }
}
