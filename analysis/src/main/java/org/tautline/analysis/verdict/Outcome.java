package org.tautline.analysis.verdict;

/** The result of checking one measured figure, or a whole specimen, against its limits. */
public enum Outcome {
    /** The measured value with its expanded uncertainty lies inside the limits. */
    PASS("pass"),
    /** The measured value with its expanded uncertainty lies wholly outside the limits. */
    FAIL("fail"),
    /** The uncertainty interval straddles a bound, or the figure was not measured: no decision can be made. */
    NOT_DETERMINABLE("not determinable");

    private final String label;

    Outcome(String label) {
        this.label = label;
    }

    /** @return what the outcome is called for people, lower case: "pass", "fail", "not determinable" */
    public String label() {
        return label;
    }
}
