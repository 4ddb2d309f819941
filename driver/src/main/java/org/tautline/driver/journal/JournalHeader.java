package org.tautline.driver.journal;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.tautline.driver.spi.ChannelInfo;
import org.tautline.driver.sweep.SweepPlan;

/**
 * The first record of a journal: what was run, on which rig, and when.
 *
 * @param formatVersion the journal format version, {@value #FORMAT_VERSION} for this format
 * @param startedAt when the sweep started (UTC)
 * @param driver the rig driver's name, for example {@code sim}
 * @param options the options the rig was opened with, defaults filled in
 * @param identity the rig's one-line identity
 * @param sampleRateHz the acquisition sample rate, Hz
 * @param channels the rig's channels, force first
 * @param plan the sweep plan
 * @param samplesFile file name of the raw-samples side file beside the journal, or empty when samples are not kept
 */
public record JournalHeader(int formatVersion, Instant startedAt, String driver, Map<String, String> options,
                            String identity, double sampleRateHz, List<ChannelInfo> channels, SweepPlan plan,
                            String samplesFile) {
    /** The format version this code writes and reads. */
    public static final int FORMAT_VERSION = 2;
    /** The value of the header's {@code format} field. */
    static final String FORMAT_NAME = "tautline-journal";

    /** Copies the collections so the record stays immutable. */
    public JournalHeader {
        options = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(options));
        channels = List.copyOf(channels);
    }

    /** @return true when the journal keeps every step's integration samples in a side file */
    public boolean keepsSamples() {
        return !samplesFile.isEmpty();
    }

    JournalLine toLine() {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("format", FORMAT_NAME);
        f.put("version", Integer.toString(formatVersion));
        f.put("startedAt", startedAt.toString());
        f.put("driver", driver);
        options.forEach((k, v) -> f.put("option." + k, v));
        f.put("identity", identity);
        f.put("sampleRateHz", Double.toString(sampleRateHz));
        f.put("channels", Integer.toString(channels.size()));
        for (int i = 0; i < channels.size(); i++) {
            f.put("channel." + i + ".name", channels.get(i).name());
            f.put("channel." + i + ".quantity", channels.get(i).quantity());
            f.put("channel." + i + ".unit", channels.get(i).unit());
        }
        PlanFields.put(f, plan);
        f.put("samples", samplesFile.isEmpty() ? "none" : samplesFile);
        return new JournalLine("HEADER", f);
    }

    static JournalHeader fromLine(JournalLine line) {
        if (!line.type().equals("HEADER") || !FORMAT_NAME.equals(line.fields().get("format"))) {
            throw new IllegalArgumentException("the first record is not a " + FORMAT_NAME + " HEADER");
        }
        int version = (int) line.whole("version");
        if (version != FORMAT_VERSION) {
            throw new IllegalArgumentException("format version " + version + " is not the version this Tautline reads ("
                    + FORMAT_VERSION + ")" + (version < FORMAT_VERSION ? "; the journal was written by an earlier"
                    + " Tautline: finish it with that version, or run the sweep again" : "; update Tautline"));
        }
        Map<String, String> options = new LinkedHashMap<>();
        line.fields().forEach((k, v) -> {
            if (k.startsWith("option.")) {
                options.put(k.substring("option.".length()), v);
            }
        });
        List<ChannelInfo> channels = new ArrayList<>();
        long count = line.whole("channels");
        for (int i = 0; i < count; i++) {
            channels.add(new ChannelInfo(line.text("channel." + i + ".name"), line.text("channel." + i + ".quantity"),
                    line.text("channel." + i + ".unit")));
        }
        SweepPlan plan = PlanFields.read(line);
        String samples = line.text("samples");
        return new JournalHeader(version, Instant.parse(line.text("startedAt")), line.text("driver"), options,
                line.text("identity"), line.number("sampleRateHz"), channels, plan, samples.equals("none") ? "" : samples);
    }
}
