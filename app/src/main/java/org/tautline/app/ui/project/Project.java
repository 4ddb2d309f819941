package org.tautline.app.ui.project;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

import org.tautline.analysis.verdict.Measurement;
import org.tautline.app.qualify.QualificationResult;

/**
 * A workbench project: the setup as typed, a summary of the last result and the FRF it was measured as.
 *
 * @param setup setup field values by key (specimen, sweep plan and limits), as typed
 * @param resultSummary figures of the last result by key (verdict, f1Hz, tensionN, ...), empty when none
 * @param measuredFrf the FRF of the last run or import, absent when none
 */
public record Project(Map<String, String> setup, Map<String, String> resultSummary, Optional<MeasuredFrf> measuredFrf) {

    /** Copies the maps, keeping their order. */
    public Project {
        setup = Collections.unmodifiableMap(new LinkedHashMap<>(setup));
        resultSummary = Collections.unmodifiableMap(new LinkedHashMap<>(resultSummary));
    }

    /**
     * @param setup the setup values
     * @param result the result to summarise
     * @return a project with the result's verdict, figures and measured FRF
     */
    public static Project of(Map<String, String> setup, QualificationResult result) {
        Map<String, String> summary = new LinkedHashMap<>();
        summary.put("verdict", result.verdict().map(v -> v.outcome().name()).orElse("none"));
        for (Map.Entry<String, Measurement> e : result.measurements().entrySet()) {
            Measurement m = e.getValue();
            if (Double.isFinite(m.value())) {
                summary.put(e.getKey(), Double.toString(m.value()));
            }
        }
        return new Project(setup, summary, Optional.of(MeasuredFrf.of(result.receptance())));
    }

    /**
     * @param newSetup the new setup values
     * @return this project with another setup
     */
    public Project withSetup(Map<String, String> newSetup) {
        return new Project(newSetup, resultSummary, measuredFrf);
    }
}
