package org.tautline.app.ui.results;

import java.util.List;
import java.util.Optional;

import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.modal.StabilisationChart;

/**
 * The poles a user has chosen on a stabilisation chart: a click on a pole adds it, a click on a chosen one drops it.
 *
 * <p>Immutable; {@link #toggle(Pole)} returns a new choice. Free of Swing.
 *
 * @param chart the chart the poles come from
 * @param selection the chosen poles
 * @param automatic the automatic choice, for {@link #reset()}
 */
public record PoleChoice(StabilisationChart chart, ModeSelection selection, ModeSelection automatic) {

    /** Checks the values. */
    public PoleChoice {
        if (chart == null || selection == null || automatic == null) {
            throw new IllegalArgumentException("a pole choice needs a chart, a selection and the automatic selection, got "
                    + chart + ", " + selection + ", " + automatic);
        }
    }

    /**
     * The choice a fit started from.
     *
     * @param chart the chart
     * @param selection the poles the fit used
     * @return the choice, whose automatic selection is the chart's own
     */
    public static PoleChoice of(StabilisationChart chart, ModeSelection selection) {
        return new PoleChoice(chart, selection, ModeSelection.automatic(chart));
    }

    /**
     * Adds a pole, or drops it when it is already chosen.
     *
     * @param pole a pole of the chart, or a chosen pole
     * @return the new choice
     */
    public PoleChoice toggle(Pole pole) {
        Optional<Integer> chosen = indexOf(pole);
        ModeSelection next = chosen.isPresent() ? selection.withDropped(chosen.get()) : selection.withAdded(pole);
        return new PoleChoice(chart, next, automatic);
    }

    /** @return the choice with the chart's automatic selection */
    public PoleChoice reset() {
        return new PoleChoice(chart, automatic, automatic);
    }

    /**
     * @param pole a pole
     * @return whether it is chosen
     */
    public boolean isChosen(Pole pole) {
        return indexOf(pole).isPresent();
    }

    /** @return the chosen poles, in increasing frequency */
    public List<Pole> poles() {
        return selection.poles();
    }

    private Optional<Integer> indexOf(Pole pole) {
        List<Pole> poles = selection.poles();
        for (int i = 0; i < poles.size(); i++) {
            if (poles.get(i).equals(pole)) {
                return Optional.of(i);
            }
        }
        return Optional.empty();
    }
}
