package org.tautline.driver.journal;

import java.util.LinkedHashMap;
import java.util.Map;

import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.sweep.SweepPoint;

/**
 * A completed step as the journal holds it: the commanded drive and both channels' full sine fits.
 *
 * @param index the step's place in the plan, 0 first
 * @param frequencyHz commanded frequency, Hz
 * @param driveAmplitudeV commanded peak drive, V
 * @param force the force channel's fit
 * @param response the response channel's fit
 * @param rigTimeS rig time since the sweep started when the step's integration ended, s
 * @param samplesOffset byte offset of the step's samples in the side file, or -1 when not kept
 * @param sampleCount samples per channel kept in the side file (0 when not kept)
 * @param samplesCrc CRC-32 of the step's side-file bytes as eight hex digits (empty when not kept)
 */
public record JournalStep(int index, double frequencyHz, double driveAmplitudeV, SinePhasor force, SinePhasor response,
                          double rigTimeS, long samplesOffset, int sampleCount, String samplesCrc) {

    /** @return the sweep point, computed from the fits exactly as the sweep computed it */
    public SweepPoint point() {
        return SweepPoint.of(frequencyHz, driveAmplitudeV, force, response, rigTimeS);
    }

    /** @return true when the step's samples are in the side file */
    public boolean hasSamples() {
        return samplesOffset >= 0;
    }

    /** @return the side-file bytes the step's samples take: 8 per sample, two channels */
    long samplesBytes() {
        return hasSamples() ? 16L * sampleCount : 0L;
    }

    JournalLine toLine() {
        Map<String, String> f = new LinkedHashMap<>();
        f.put("index", Integer.toString(index));
        f.put("frequencyHz", Double.toString(frequencyHz));
        f.put("driveAmplitudeV", Double.toString(driveAmplitudeV));
        f.put("rigTimeS", Double.toString(rigTimeS));
        put(f, "force", force);
        put(f, "response", response);
        SweepPoint p = point();
        f.put("frf.re", Double.toString(p.response().getReal()));
        f.put("frf.im", Double.toString(p.response().getImaginary()));
        f.put("relativeResidual", Double.toString(p.relativeResidual()));
        f.put("relativeStdError", Double.toString(p.relativeStdError()));
        if (hasSamples()) {
            f.put("samples.offset", Long.toString(samplesOffset));
            f.put("samples.count", Integer.toString(sampleCount));
            f.put("samples.crc", samplesCrc);
        }
        return new JournalLine("STEP", f);
    }

    private static void put(Map<String, String> f, String prefix, SinePhasor s) {
        f.put(prefix + ".frequencyHz", Double.toString(s.frequencyHz()));
        f.put(prefix + ".amplitude", Double.toString(s.amplitude()));
        f.put(prefix + ".phaseRad", Double.toString(s.phaseRad()));
        f.put(prefix + ".offset", Double.toString(s.offset()));
        StringBuilder h = new StringBuilder();
        for (double a : s.harmonicAmplitudes()) {
            h.append(h.length() == 0 ? "" : ",").append(a);
        }
        f.put(prefix + ".harmonics", h.length() == 0 ? "none" : h.toString());
        f.put(prefix + ".residualRms", Double.toString(s.residualRms()));
        f.put(prefix + ".amplitudeStd", Double.toString(s.amplitudeStd()));
        f.put(prefix + ".phaseStdRad", Double.toString(s.phaseStdRad()));
        f.put(prefix + ".sampleCount", Integer.toString(s.sampleCount()));
    }

    static JournalStep fromLine(JournalLine line) {
        boolean kept = line.fields().containsKey("samples.offset");
        return new JournalStep((int) line.whole("index"), line.number("frequencyHz"), line.number("driveAmplitudeV"),
                phasor(line, "force"), phasor(line, "response"), line.number("rigTimeS"),
                kept ? line.whole("samples.offset") : -1, kept ? (int) line.whole("samples.count") : 0,
                kept ? line.text("samples.crc") : "");
    }

    private static SinePhasor phasor(JournalLine line, String prefix) {
        String h = line.text(prefix + ".harmonics");
        double[] harmonics;
        if (h.equals("none")) {
            harmonics = new double[0];
        } else {
            String[] parts = h.split(",");
            harmonics = new double[parts.length];
            for (int i = 0; i < parts.length; i++) {
                harmonics[i] = Double.parseDouble(parts[i]);
            }
        }
        return new SinePhasor(line.number(prefix + ".frequencyHz"), line.number(prefix + ".amplitude"),
                line.number(prefix + ".phaseRad"), line.number(prefix + ".offset"), harmonics,
                line.number(prefix + ".residualRms"), line.number(prefix + ".amplitudeStd"),
                line.number(prefix + ".phaseStdRad"), (int) line.whole(prefix + ".sampleCount"));
    }
}
