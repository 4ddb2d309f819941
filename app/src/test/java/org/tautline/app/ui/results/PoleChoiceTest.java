package org.tautline.app.ui.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.modal.ModeSelection;
import org.tautline.analysis.modal.Pole;
import org.tautline.analysis.modal.StabilisationChart;

/** A click adds a pole, a click on a chosen one drops it, and reset restores the chart's own choice. */
class PoleChoiceTest {
    // Poles from lambda = -zeta w_n + j w_n sqrt(1 - zeta^2) (Ewins, Modal Testing, 2000, from memory).
    private final Pole a = Pole.of(100.0, 0.01);
    private final Pole b = Pole.of(250.0, 0.02);
    private final StabilisationChart chart = StabilisationChart.classify(50, 400,
            new java.util.TreeMap<>(java.util.Map.of(2, List.of(a), 4, List.of(a, b))), null);

    @Test
    void clickAddsThenDrops() {
        PoleChoice choice = new PoleChoice(chart, ModeSelection.of(List.of(a)), ModeSelection.of(List.of()));
        PoleChoice added = choice.toggle(b);
        assertEquals(List.of(a, b), added.poles());
        assertTrue(added.isChosen(b));
        PoleChoice dropped = added.toggle(a);
        assertEquals(List.of(b), dropped.poles());
        assertFalse(dropped.isChosen(a));
        assertEquals(List.of(a), choice.poles(), "the earlier choice is unchanged");
    }

    @Test
    void resetRestoresTheAutomaticChoice() {
        PoleChoice choice = new PoleChoice(chart, ModeSelection.of(List.of(a, b)), ModeSelection.of(List.of(b)));
        assertEquals(List.of(b), choice.toggle(a).toggle(b).reset().poles());
    }

    @Test
    void refusesAMissingChart() {
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new PoleChoice(null, ModeSelection.of(List.of()), ModeSelection.of(List.of())));
        assertTrue(e.getMessage().startsWith("a pole choice needs a chart"), e.getMessage());
    }
}
