package org.tautline.analysis.specimen;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.tautline.analysis.AnalysisException;

class SpecimenTest {
    private static String message(Runnable r) {
        return assertThrows(AnalysisException.class, r::run).getMessage();
    }

    private static Specimen with(double length, double mu, double xf, double xs, double speed) {
        return new Specimen("s1", length, mu, 0, 0, 0, EndCondition.PINNED, xf, xs, 500, speed, 0, 0, Optional.empty());
    }

    @Test
    void musicWirePresetGivesTheChecksMdDensityAndStiffness() {
        // Material tables, as summarised in checks.md: music wire rho 7850 kg/m^3, E 200 GPa; mu = 6.1654e-3 kg/m.
        Specimen s = Specimen.roundWire("w", Material.MUSIC_WIRE, 1e-3, 1, EndCondition.PINNED, 0.3, 0.1, 500);
        assertEquals(6.1654e-3, s.linearDensityKgPerM(), 0.00005e-3, "mu of 1 mm music wire (checks.md)");
        assertEquals(200e9 * Math.PI * 1e-12 / 64, s.bendingStiffnessNm2(), 1e-15, "EI = E pi d^4/64");
        assertEquals(60 / Math.sqrt(12) * Math.PI * 1e-6 / 4, s.linearDensityStdKgPerM(), 1e-15,
                "uniform over 7800..7860 kg/m^3 (checks.md range)");
        assertEquals(200e9 * Math.PI * 1e-6 / 4, s.axialStiffnessN(), 1e-3, "EA = E pi d^2/4");
        Specimen pet = Specimen.roundWire("p", Material.PET, 1e-3, 1, EndCondition.PINNED, 0.3, 0.1, 50);
        assertEquals(0.0, pet.bendingStiffnessNm2(), "PET: no modulus in the table, EI unknown");
        assertEquals(1380 * Math.PI * 1e-6 / 4, pet.linearDensityKgPerM(), 1e-12, "PET rho 1380 kg/m^3 (checks.md)");
        assertEquals(193e9, Material.STAINLESS_302_304.youngsModulusPa(), "302/304 stainless E 193 GPa (checks.md)");
    }

    @Test
    void rejectsPositionsOutsideTheSpan() {
        assertEquals("specimen forcingPositionM must lie strictly inside the span, 0 < x < 1.0 m, got 1.2 m",
                message(() -> with(1, 0.01, 1.2, 0.3, 0)));
        assertEquals("specimen sensorPositionM must lie strictly inside the span, 0 < x < 1.0 m, got 0.0 m",
                message(() -> with(1, 0.01, 0.5, 0, 0)));
    }

    @Test
    void rejectsNonPhysicalValues() {
        assertEquals("specimen lengthM must be a positive finite number of m, got -1.0",
                message(() -> with(-1, 0.01, 0.5, 0.3, 0)));
        assertEquals("specimen linearDensityKgPerM must be a positive finite number of kg/m, got NaN",
                message(() -> with(1, Double.NaN, 0.5, 0.3, 0)));
        assertEquals("specimen s1: beltSpeedMPerS must be below the transverse wave speed sqrt(T/mu) = "
                + Math.sqrt(500 / 0.01) + " m/s, got 300.0 m/s", message(() -> with(1, 0.01, 0.5, 0.3, 300)));
        assertEquals("specimen id must not be blank, got ' '", message(() -> new Specimen(" ", 1, 0.01, 0, 0, 0,
                EndCondition.PINNED, 0.5, 0.3, 500, 0, 0, 0, Optional.empty())));
        assertEquals("specimen s1: sensorAngleRad must lie in -pi..pi, got 4.0", message(() -> new Specimen("s1", 1,
                0.01, 0, 0, 0, EndCondition.PINNED, 0.5, 0.3, 500, 0, 4, 0, Optional.empty())));
    }
}
