package org.tautline.app.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Locale;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.tautline.driver.RigException;
import org.tautline.driver.sweep.CompletedStep;
import org.tautline.driver.sweep.SweepJournal;
import org.tautline.driver.sweep.SweepPoint;
import org.tautline.driver.sweep.SweepStatus;

/**
 * The journal of an adaptive sweep: one JSON object per line, each step fsynced before the next is commanded.
 *
 * <p>Lines: {@code {"record":"step","index":..,"frequencyHz":..,"driveV":..,"forceN":..,"responseRe":..,
 * "responseIm":..,"rigTimeS":..}} for each completed step, then one
 * {@code {"record":"end","status":"completed|cancelled|limit|fault","reason":".."}}. The stepped-sine
 * journal's format checks every step against a uniform plan, which an adaptive sweep does not have.
 */
final class AdaptiveJournalFile implements SweepJournal, AutoCloseable {
    /** File name inside a run folder. */
    static final String NAME = "adaptive-journal.jsonl";

    /** A mapper that writes each record on one line. */
    private static final ObjectMapper LINES = new ObjectMapper();

    private final Path file;
    private final FileChannel channel;

    AdaptiveJournalFile(Path file) throws IOException {
        this.file = file;
        this.channel = FileChannel.open(file, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE);
    }

    @Override
    public void stepCompleted(CompletedStep step) {
        SweepPoint p = step.point();
        ObjectNode line = LINES.createObjectNode();
        line.put("record", "step");
        line.put("index", step.index());
        line.put("frequencyHz", p.frequencyHz());
        line.put("driveV", p.driveAmplitudeV());
        line.put("forceN", p.forceAmplitudeN());
        line.put("responseRe", p.response().getReal());
        line.put("responseIm", p.response().getImaginary());
        line.put("relativeStdError", p.relativeStdError());
        line.put("rigTimeS", p.rigTimeS());
        append(line, "step " + (step.index() + 1));
    }

    @Override
    public void sweepEnded(SweepStatus status, String reason) {
        ObjectNode line = LINES.createObjectNode();
        line.put("record", "end");
        line.put("status", status.name().toLowerCase(Locale.ROOT));
        line.put("reason", reason);
        append(line, "the end of the sweep");
    }

    private void append(ObjectNode line, String what) {
        try {
            ByteBuffer bytes = ByteBuffer.wrap((LINES.writeValueAsString(line) + "\n")
                    .getBytes(StandardCharsets.UTF_8));
            while (bytes.hasRemaining()) {
                channel.write(bytes);
            }
            channel.force(true);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        } catch (IOException e) {
            throw new RigException("journal " + file + ": could not record " + what + ": " + e, e);
        }
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }
}
