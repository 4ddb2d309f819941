package org.tautline.app.ui.results;

import java.util.Optional;

import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.verdict.Specification;
import org.tautline.app.qualify.Qualification;
import org.tautline.app.qualify.QualificationResult;

/** Fits a result again with a chosen set of poles, judged against the limits its verdict was judged against. Free of Swing. */
final class Refit {
    private Refit() {
    }

    /**
     * Runs the real modal fit (LSFD, joint refinement) and everything downstream of it.
     *
     * @param previous the result to refit
     * @param selection the poles to fit
     * @return the new result
     */
    static QualificationResult run(QualificationResult previous, ModeSelection selection) {
        return Qualification.refit(previous, selection, specificationOf(previous), System.nanoTime());
    }

    /**
     * The specification a result was judged against, with its name and revision, so that a refit exported as a run
     * folder names the specification it was judged against.
     *
     * @param result a result
     * @return the specification, absent when the result has no verdict
     */
    static Optional<Specification> specificationOf(QualificationResult result) {
        return result.assessment().request().specification();
    }
}
