package org.tautline.app.ui;

import java.util.function.Consumer;

import javax.swing.JComponent;

import org.tautline.app.qualify.QualificationResult;
import org.tautline.app.ui.results.ResultsView;

/**
 * The results screen: the FRF with the fit, the pole choice, the modes, the participation pattern, and the
 * properties with the verdict, in a {@link ResultsView}.
 *
 * <p>Everything the workbench shows of a result goes through {@link #showResults(QualificationResult)};
 * a new fit the user makes by choosing poles comes back through {@link #onRefit(Consumer)}.
 */
final class ResultsScreen {
    private final ResultsView view = new ResultsView();

    JComponent component() {
        return view.component();
    }

    /**
     * Shows a qualification result.
     *
     * @param result the result; call on the event thread
     */
    void showResults(QualificationResult result) {
        view.show(result);
    }

    /** @param listener told, on the event thread, of each new fit made from the user's pole choice */
    void onRefit(Consumer<QualificationResult> listener) {
        view.onResultChanged(listener);
    }
}
