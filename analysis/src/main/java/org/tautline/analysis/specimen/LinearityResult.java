package org.tautline.analysis.specimen;

import java.util.List;

/**
 * Whether a specimen behaved linearly between two runs.
 *
 * @param shifts per-harmonic shifts, by harmonic
 * @param linear true when no harmonic shifted significantly
 * @param findings the result in words
 */
public record LinearityResult(List<HarmonicShift> shifts, boolean linear, List<String> findings) {

    /** Copies the lists so that the record stays immutable. */
    public LinearityResult {
        shifts = List.copyOf(shifts);
        findings = List.copyOf(findings);
    }
}
