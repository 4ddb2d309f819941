package org.tautline.driver.journal;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.signal.SinePhasor;
import org.tautline.driver.sweep.CompletedStep;
import org.tautline.driver.sweep.SettleState;
import org.tautline.driver.sweep.StepPhase;
import org.tautline.driver.sweep.SweepPoint;

/**
 * A completed step as the journal holds it: the step and where its raw samples are, when they are kept.
 *
 * @param step the step: its place, pass, phase, drive and both channels' full sine fits
 * @param samplesOffset byte offset of the step's samples in the side file, or -1 when not kept
 * @param sampleCount samples per channel kept in the side file (0 when not kept)
 * @param samplesCrc CRC-32 of the step's side-file bytes as eight hex digits (empty when not kept)
 */
public record JournalStep(CompletedStep step, long samplesOffset, int sampleCount, String samplesCrc) {

    /** @return the step's place in the sweep, 0 first */
    public int index() {
        return step.index();
    }

    /** @return the step's frequency, Hz */
    public double frequencyHz() {
        return step.point().frequencyHz();
    }

    /** @return the commanded peak drive, V */
    public double driveAmplitudeV() {
        return step.point().driveAmplitudeV();
    }

    /** @return the force channel's fit */
    public SinePhasor force() {
        return step.force();
    }

    /** @return the response channel's fit */
    public SinePhasor response() {
        return step.response();
    }

    /** @return the sweep point, computed from the fits exactly as the sweep computed it */
    public SweepPoint point() {
        return step.point();
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
        SweepPoint p = step.point();
        f.put("index", Integer.toString(step.index()));
        f.put("pass", Integer.toString(step.pass()));
        f.put("phase", step.phase().name().toLowerCase(Locale.ROOT));
        f.put("frequencyHz", Double.toString(p.frequencyHz()));
        f.put("driveAmplitudeV", Double.toString(p.driveAmplitudeV()));
        f.put("rigTimeS", Double.toString(p.rigTimeS()));
        f.put("settle", step.settleState().name().toLowerCase(Locale.ROOT));
        f.put("settleS", Double.toString(step.settleS()));
        step.warning().ifPresent(w -> f.put("warning", w));
        put(f, "force", step.force());
        put(f, "response", step.response());
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
        double f = line.number("frequencyHz");
        SinePhasor force = phasor(line, "force");
        SinePhasor response = phasor(line, "response");
        SweepPoint point = SweepPoint.of(f, line.number("driveAmplitudeV"), force, response, line.number("rigTimeS"));
        CompletedStep step = new CompletedStep((int) line.whole("index"), (int) line.whole("pass"),
                PlanFields.choice(line, "phase", StepPhase.class), point, force, response,
                PlanFields.choice(line, "settle", SettleState.class), line.number("settleS"),
                Optional.ofNullable(line.fields().get("warning")));
        return new JournalStep(step, kept ? line.whole("samples.offset") : -1, kept ? (int) line.whole("samples.count") : 0,
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
                try {
                    harmonics[i] = Double.parseDouble(parts[i]);
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException("STEP field '" + prefix + ".harmonics' holds '" + parts[i]
                            + "', not a number", e);
                }
            }
        }
        return new SinePhasor(line.number(prefix + ".frequencyHz"), line.number(prefix + ".amplitude"),
                line.number(prefix + ".phaseRad"), line.number(prefix + ".offset"), harmonics,
                line.number(prefix + ".residualRms"), line.number(prefix + ".amplitudeStd"),
                line.number(prefix + ".phaseStdRad"), (int) line.whole(prefix + ".sampleCount"));
    }
}
