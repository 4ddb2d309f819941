package org.tautline.app.ui.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tautline.app.qualify.DemoScenario;
import org.tautline.driver.sweep.SafetyLimits;
import org.tautline.driver.sweep.SweepPlan;

/** The setup names its fields and choices in words, and says how much rig time the plan takes. */
class SetupWordsTest {
    @Test
    void aUniformPlansRigTimeIsItsDwellsAndFittedCyclesAndItsRamps() {
        // Three steps at 100, 200 and 400 Hz (log-spaced), 50 cycles settle but at least 0.3 s, 20 cycles fitted,
        // 0.5 s ramps, worked by hand: ramp 0.5 + (0.5 + 0.2) + (0.3 + 0.1) + (0.3 + 0.05) + ramp 0.5 = 2.45 s.
        SweepPlan plan = SweepPlan.uniform(100, 400, 3, 50, 0.3, 20, 1, 0.5, 3, new SafetyLimits(5, 2, 1e-3, 1e-3));
        assertEquals(2.45, RigTimeEstimate.stepsS(plan), 1e-12);
        RigTimeEstimate demo = RigTimeEstimate.of(DemoScenario.plan(), DemoScenario.specimen());
        assertTrue(demo.text().startsWith("Rig time: about 14 min "), demo.text());
        assertTrue(demo.text().contains(" for the sweep, then about "), demo.text());
        assertTrue(demo.text().endsWith(" for the level check at the fundamental."), demo.text());
        assertEquals("8.5 s", RigTimeEstimate.duration(8.5));
        assertEquals("2 min 05 s", RigTimeEstimate.duration(125));
        assertEquals("1 h 02 min", RigTimeEstimate.duration(3720));
    }

    @Test
    void choicesAndMessagesNameFieldsAsTheFormShowsThem() {
        assertEquals("pinned", ChoiceLabels.of("ends", "PINNED"));
        assertEquals("velocity", ChoiceLabels.of("responseQuantity", "VELOCITY"));
        SetupForm form = SetupForm.demo();
        form.set("stopHz", "100");
        Map<String, String> problems = form.problems();
        assertEquals(1, problems.size(), problems.toString());
        String message = problems.values().iterator().next();
        assertTrue(message.contains("'Band stop'") && message.contains("'Band start'") && !message.contains("stopHz"),
                message);
        form.set("stopHz", "1500");
        form.set("ends", "HINGED");
        assertEquals("got 'HINGED'; expected one of pinned, clamped", form.problems().get("ends"));
    }
}
