package org.tautline.app.ui;

import java.util.Optional;
import java.util.function.Consumer;

import javax.swing.JComponent;

import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.results.ResultOrigin;
import org.tautline.app.ui.results.ResultsView;

/**
 * The results screen: the verdict banner and run header over the FRF with the fit, the pole choice, the modes, the
 * participation pattern, and the properties with the verdict per limit, in a {@link ResultsView}.
 *
 * <p>Everything the workbench shows of a result goes through {@link #showResults}; a result stops being current
 * through {@link #withdraw}; a new fit the user makes by choosing poles comes back through {@link #onRefit(Consumer)}.
 */
final class ResultsScreen {
    private final ResultsView view = new ResultsView();

    JComponent component() {
        return view.component();
    }

    /**
     * Shows a current qualification result.
     *
     * @param result the result; call on the event thread
     * @param origin when and on which rig it was made
     */
    void showResults(QualificationResult result, ResultOrigin origin) {
        view.show(result, origin);
    }

    /**
     * Marks the result on show as not current (or, with none, says why there is none).
     *
     * @param why what happened, as a clause
     */
    void withdraw(String why) {
        view.withdraw(why);
    }

    /** @param why what happened, as a sentence: the screen shows no result and says what to do next */
    void clear(String why) {
        view.clear(why);
    }

    /** @return the result on show while it is current */
    Optional<QualificationResult> current() {
        return view.current();
    }

    /** @param listener told, on the event thread, of each new fit made from the user's pole choice */
    void onRefit(Consumer<QualificationResult> listener) {
        view.onResultChanged(listener);
    }
}
