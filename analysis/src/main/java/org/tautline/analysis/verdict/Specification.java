package org.tautline.analysis.verdict;

import java.util.List;

import org.tautline.analysis.AnalysisException;

/**
 * A named set of acceptance limits that a specimen must meet.
 *
 * @param name the specification's name, for example a part number
 * @param revision its revision, empty when not stated
 * @param limits the limits, at least one; copied
 */
public record Specification(String name, String revision, List<Limit> limits) {

    /**
     * A specification with no revision stated.
     *
     * @param name the specification's name
     * @param limits the limits
     */
    public Specification(String name, List<Limit> limits) {
        this(name, "", limits);
    }

    /** Checks the name and copies the limits. */
    public Specification {
        if (revision == null) {
            throw new AnalysisException("a specification's revision must be text, empty when not stated, got none");
        }
        if (name == null || name.isBlank()) {
            throw new AnalysisException("a specification needs a name, got " + (name == null ? "none" : "a blank name"));
        }
        if (limits == null || limits.isEmpty()) {
            throw new AnalysisException("specification '" + name + "' needs at least one limit, got none");
        }
        for (int i = 0; i < limits.size(); i++) {
            if (limits.get(i) == null) {
                throw new AnalysisException("specification '" + name + "' limit " + i + " is missing");
            }
        }
        limits = List.copyOf(limits);
    }
}
