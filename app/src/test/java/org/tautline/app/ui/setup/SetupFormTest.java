package org.tautline.app.ui.setup;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.specimen.Material;
import org.tautline.app.qualify.DemoScenario;

class SetupFormTest {
    @Test
    void theDemoSetupIsValidAndGivesBackTheDemoSpecimenPlanAndLimits() {
        SetupForm form = SetupForm.demo();
        assertEquals(Map.of(), form.problems());
        assertEquals(DemoScenario.specimen(), form.specimen());
        assertEquals(DemoScenario.plan(), form.plan());
        assertEquals(DemoScenario.specification().limits(), form.specification().limits());
    }

    @Test
    void saysWhatWasTypedAndWhatWasExpectedBesideTheField() {
        SetupForm form = SetupForm.demo();
        form.set("lengthM", "0,6");
        form.set("stepCount", "10.5");
        form.set("id", "  ");
        Map<String, String> problems = form.problems();
        assertEquals("got '0,6'; expected a positive number of m", problems.get("lengthM"));
        assertEquals("got '10.5'; expected a whole number", problems.get("stepCount"));
        assertEquals("must not be empty; expected some text", problems.get("id"));
        assertEquals(3, problems.size());
    }

    @Test
    void putsAProblemBetweenFieldsOnTheFieldTheSpecimenNames() {
        SetupForm form = SetupForm.demo();
        form.set("forcingPositionM", "0.7");
        Map<String, String> problems = form.problems();
        assertEquals(1, problems.size());
        assertTrue(problems.containsKey("forcingPositionM"), problems.toString());
    }

    @Test
    void putsAnInvertedLimitOnItsBound() {
        SetupForm form = SetupForm.demo();
        form.set("limit.tensionN.lower", "170");
        Map<String, String> problems = form.problems();
        assertEquals(1, problems.size(), problems.toString());
        String key = problems.keySet().iterator().next();
        assertTrue(key.startsWith("limit.tensionN."), key);
        assertEquals("limit 'tension' lower bound 170.0 N must be below its upper bound 165.0 N", problems.get(key));
    }

    @Test
    void anEmptyBoundMeansNoBound() {
        SetupForm form = SetupForm.demo();
        form.set("limit.tensionN.upper", "");
        assertEquals(Map.of(), form.problems());
        assertTrue(Double.isNaN(form.specification().limits().get(1).upperBound()));
    }

    @Test
    void fillsASolidRoundMusicWireFromTheHandbookValues() {
        SetupForm form = SetupForm.demo();
        form.applyMaterial(new MaterialPreset(Material.MUSIC_WIRE), 0.5e-3);
        // mu = rho pi d^2 / 4 and EI = E pi d^4 / 64 (solid round section; Roark's Formulas for Stress and
        // Strain, from memory), with rho 7850 kg/m^3 and E 200 GPa from the handbook ranges in Material:
        // computed by hand, 1.54135e-3 kg/m and 6.13592e-4 N m^2.
        assertEquals(1.54135e-3, Double.parseDouble(form.value("linearDensityKgPerM")), 1e-8);
        assertEquals(6.13592e-4, Double.parseDouble(form.value("bendingStiffnessNm2")), 1e-9);
        assertEquals(200e9 * Math.PI * 0.25e-6 / 4, Double.parseDouble(form.value("axialStiffnessN")), 1.0);
        assertEquals(Map.of(), form.problems());
    }

    @Test
    void writesNumbersWithoutNoise() {
        assertEquals("0.6", SetupForm.format(0.6));
        assertEquals("100000", SetupForm.format(100000));
        assertEquals("0.000614", SetupForm.format(6.14e-4));
        assertEquals("", SetupForm.format(Double.NaN));
    }
}
